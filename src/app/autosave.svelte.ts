/**
 * Autosave for a form: saves within `delayMs` of the last edit, at once on `flush()` (a field's
 * change event, leaving the screen), and when the page is hidden or unloaded (`attach()`:
 * visibilitychange to hidden, pagehide — iOS gives no beforeunload). The state it shows is the
 * truth: "saved" only after the save resolved (the store awaits tx.done); on failure it says
 * NOT SAVED with the reason, keeps the edit in memory and retries on `retry()` or the next edit.
 * While anything is unsaved it holds `unsavedInput`, so an app update waits.
 *
 * Values are snapshotted ($state.snapshot) when edited: storage never sees a Svelte proxy.
 */
import { unsavedInput } from './unsaved-input.svelte.ts';

export type SaveState = 'saved' | 'pending' | 'saving' | 'failed';

export interface AutosaveOptions<T> {
  /** Writes the value durably; rejects when it was not saved. */
  save: (value: T) => Promise<void>;
  /** The form's name, for the update prompt's "waiting for …". */
  form: string;
  /** Quiet time after the last edit before saving, ms (default 400). */
  delayMs?: number;
  /** The clock, for "saved at"; tests pass their own. */
  now?: () => Date;
}

export class Autosave<T> {
  state = $state<SaveState>('saved');
  /** Why the last save failed (or why the edit cannot be saved), in plain words. */
  error = $state<string | null>(null);
  savedAt = $state<Date | null>(null);

  private latest: T | undefined;
  private dirty = false;
  /** The input on screen was refused since the last edit (a save landing after it must not say "saved"). */
  private refused = false;
  private timer: ReturnType<typeof setTimeout> | undefined;
  private running: Promise<void> | null = null;
  private release: (() => void) | null = null;

  constructor(private readonly options: AutosaveOptions<T>) {}

  /** The edit not yet saved (kept in memory after a failure), or undefined. */
  get unsaved(): T | undefined {
    return this.dirty || this.state === 'failed' ? this.latest : undefined;
  }

  /** A new value: save it once edits pause for `delayMs`. */
  edit(value: T): void {
    this.latest = $state.snapshot(value) as T;
    this.dirty = true;
    this.refused = false;
    if (this.state !== 'failed') this.state = 'pending';
    this.holdUnsaved();
    clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.flush(), this.options.delayMs ?? 400);
  }

  /** The current input cannot be saved (e.g. an empty title): say so and keep it in memory. */
  refuse(message: string): void {
    clearTimeout(this.timer);
    this.dirty = false;
    this.refused = true;
    this.state = 'failed';
    this.error = message;
    this.holdUnsaved();
  }

  /**
   * Part of the input breaks a rule: save its valid part (`value`) as usual, but keep saying NOT
   * SAVED with `message` for the rest until the input is put right (the next `edit`).
   */
  editPartly(value: T, message: string): void {
    this.edit(value);
    this.refused = true;
    this.state = 'failed';
    this.error = message;
  }

  /** Save what is pending now; resolves once it is saved or has failed. */
  async flush(): Promise<void> {
    clearTimeout(this.timer);
    while (this.running) await this.running;
    if (!this.dirty) return;
    const value = this.latest as T;
    this.dirty = false;
    // A partial save (editPartly) runs quietly under its NOT SAVED message.
    if (!this.refused) this.state = 'saving';
    this.running = this.options.save(value).then(
      () => {
        this.savedAt = (this.options.now ?? (() => new Date()))();
        if (this.refused) return; // the input now on screen was refused while this save ran: still NOT SAVED
        this.error = null;
        if (this.dirty) {
          this.state = 'pending';
        } else {
          this.state = 'saved';
          this.release?.();
          this.release = null;
        }
      },
      (error: unknown) => {
        if (!this.dirty) this.dirty = true;
        this.state = 'failed';
        this.error = error instanceof Error ? error.message : String(error);
      },
    );
    try {
      await this.running;
    } finally {
      this.running = null;
    }
    // Edits made while that save ran are saved straight after it.
    if (this.dirty && (this.state as SaveState) === 'pending') await this.flush();
  }

  /**
   * The form is closing with input that was refused (it broke a rule, so it was never a save
   * to retry): the stored version stands, and an app update need not wait for it.
   * A failed save of valid input is kept (and retried on the next flush).
   */
  closeForm(): void {
    if (this.state !== 'failed' || this.dirty) return;
    this.refused = false;
    this.state = 'saved';
    this.error = null;
    this.release?.();
    this.release = null;
  }

  /** Try the failed save again. */
  retry(): Promise<void> {
    return this.flush();
  }

  /** Save at once when the page is hidden or unloaded. Returns the function that stops it. */
  attach(win: Window = window): () => void {
    const onVisibility = () => {
      if (win.document.visibilityState === 'hidden') void this.flush();
    };
    const onPageHide = () => void this.flush();
    win.document.addEventListener('visibilitychange', onVisibility);
    win.addEventListener('pagehide', onPageHide);
    return () => {
      win.document.removeEventListener('visibilitychange', onVisibility);
      win.removeEventListener('pagehide', onPageHide);
    };
  }

  private holdUnsaved(): void {
    this.release ??= unsavedInput.hold(this.options.form);
  }
}
