/**
 * The one owner of the IndexedDB connection.
 *
 * - Opens with a timeout, so a stuck open (an upgrade blocked by another tab, an old Safari that
 *   never answers) becomes a visible error instead of an endless splash screen.
 * - Handles `blocked` (another tab holds an old version), `blocking` (this tab holds up a newer
 *   version: close and ask to reload) and `terminated` (the browser closed the connection).
 * - `run()` executes one unit of work; when the connection was lost (Safari's "Connection to
 *   Indexed Database server lost", a closing connection, an abort from a dead handle) it drops
 *   the handle, reopens once and retries. Work passed to `run()` must be idempotent (puts by key).
 */
import { openDB, type IDBPDatabase } from 'idb';
import { DB_NAME, DB_VERSION, UPGRADES, type VentwalkDB } from './schema.ts';

export type Database = IDBPDatabase<VentwalkDB>;

/** What the connection tells the app, so screens can say what is going on. */
export interface ConnectionEvents {
  /** Another tab or window has the app open on an older version; it must be closed. */
  onBlocked?: () => void;
  /** A newer version of the app wants the database; this tab has let go and must reload. */
  onVersionChange?: () => void;
  /** The browser closed the connection abnormally; the next call reopens it. */
  onTerminated?: () => void;
}

export interface ConnectionOptions extends ConnectionEvents {
  name?: string;
  /** How long to wait for the database to open before giving up, in milliseconds. */
  openTimeoutMs?: number;
  /** The function that opens the database; tests replace it to simulate a stuck open. */
  opener?: typeof openDB<VentwalkDB>;
}

/** Errors after which a fresh connection may succeed where the old one cannot. */
const LOST_CONNECTION_ERRORS = new Set(['UnknownError', 'InvalidStateError', 'TransactionInactiveError']);

export class StorageError extends Error {
  constructor(
    message: string,
    readonly reason: 'open-timeout' | 'blocked' | 'quota' | 'lost-connection' | 'failed',
    options?: { cause?: unknown },
  ) {
    super(message, options);
    this.name = 'StorageError';
  }
}

/** A plain-English StorageError for anything thrown by IndexedDB. */
export function describeStorageError(error: unknown): StorageError {
  if (error instanceof StorageError) return error;
  const name = error instanceof DOMException || error instanceof Error ? error.name : '';
  if (name === 'QuotaExceededError') {
    return new StorageError(
      'The phone has no room left for this app’s data. Nothing was lost: free some space (or export a backup and delete old surveys), then try again.',
      'quota',
      { cause: error },
    );
  }
  if (LOST_CONNECTION_ERRORS.has(name)) {
    return new StorageError('The connection to on-device storage was lost. Try again.', 'lost-connection', {
      cause: error,
    });
  }
  const detail = error instanceof Error ? error.message : String(error);
  return new StorageError(`On-device storage refused the change: ${detail}`, 'failed', { cause: error });
}

export class Connection {
  private db: Promise<Database> | undefined;
  private readonly name: string;
  private readonly timeoutMs: number;

  constructor(private readonly options: ConnectionOptions = {}) {
    this.name = options.name ?? DB_NAME;
    this.timeoutMs = options.openTimeoutMs ?? 10_000;
  }

  /** The open database, opening it on first use. */
  get(): Promise<Database> {
    this.db ??= this.open().catch((error: unknown) => {
      this.db = undefined;
      throw error;
    });
    return this.db;
  }

  /** Run one unit of storage work; reopen and retry once if the connection was lost. */
  async run<T>(work: (db: Database) => Promise<T>): Promise<T> {
    try {
      return await work(await this.get());
    } catch (error) {
      if (!isLostConnection(error)) throw describeStorageError(error);
      this.drop();
      try {
        return await work(await this.get());
      } catch (retryError) {
        throw describeStorageError(retryError);
      }
    }
  }

  /** Close and forget the handle (tests, and the app before it reloads for an update). */
  close(): void {
    const pending = this.db;
    this.db = undefined;
    void pending?.then((db) => db.close()).catch(() => undefined);
  }

  private drop(): void {
    this.close();
  }

  private open(): Promise<Database> {
    const { onBlocked, onVersionChange, onTerminated } = this.options;
    const opener = this.options.opener ?? openDB<VentwalkDB>;
    const opening = opener(this.name, DB_VERSION, {
      upgrade: (db, oldVersion, _newVersion, tx) => {
        for (let step = oldVersion; step < DB_VERSION; step += 1) UPGRADES[step]!.run(db, tx);
      },
      blocked: () => onBlocked?.(),
      blocking: () => {
        // Let the newer version proceed: close our handle, then ask the app to reload.
        this.close();
        onVersionChange?.();
      },
      terminated: () => {
        this.db = undefined;
        onTerminated?.();
      },
    });
    let timer: ReturnType<typeof setTimeout> | undefined;
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(
        () =>
          reject(
            new StorageError(
              'On-device storage did not open. Close other tabs or windows of Ventwalk and reload; if it persists, restart the browser.',
              'open-timeout',
            ),
          ),
        this.timeoutMs,
      );
    });
    return Promise.race([opening, timeout]).finally(() => clearTimeout(timer));
  }
}

function isLostConnection(error: unknown): boolean {
  const name = error instanceof DOMException || error instanceof Error ? error.name : '';
  return LOST_CONNECTION_ERRORS.has(name);
}
