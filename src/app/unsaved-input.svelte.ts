/**
 * Which forms hold input that is not yet saved. The update prompt asks this before reloading:
 * an update never reloads the page while anything here is pending.
 *
 * Example: const release = unsavedInput.hold('new-survey'); … release();
 */
class UnsavedInput {
  private holders = $state<string[]>([]);

  /** True while any form has input that is not saved. */
  get pending(): boolean {
    return this.holders.length > 0;
  }

  /** Names of the forms holding unsaved input (for messages). */
  get forms(): readonly string[] {
    return this.holders;
  }

  /** Mark a form as holding unsaved input; returns the function that releases it. */
  hold(form: string): () => void {
    if (!this.holders.includes(form)) this.holders = [...this.holders, form];
    return () => this.release(form);
  }

  release(form: string): void {
    this.holders = this.holders.filter((f) => f !== form);
  }
}

export const unsavedInput = new UnsavedInput();
