/**
 * What a command needs from the outside world, passed in so tests run commands in-process:
 * two output streams and file reading and writing. One io for every command. main.ts passes the real ones.
 */
export interface CommandIo {
  /** Standard output, written as given. */
  out: (s: string) => void;
  /** One line of standard error (the newline is added). */
  err: (line: string) => void;
  /** A file as UTF-8 text (survey files). Rejects with Node's error (code ENOENT…) when unreadable. */
  readFile: (path: string) => Promise<string>;
  /** A file's bytes (logger files, whose encoding the importer works out). */
  readBytes: (path: string) => Promise<Uint8Array>;
  writeFile: (path: string, data: Uint8Array | string) => Promise<void>;
}

/** Exit codes: 0 done, 1 internal error, 2 bad input (arguments or files). */
export const EXIT = { ok: 0, internal: 1, badInput: 2 } as const;
