/**
 * A list drawn a batch per animation frame: `count` items at first, `perFrame` more each frame,
 * until the whole list is drawn; from then on every item shows at once (one added later is not
 * held back a frame). A list with many editors (a room's openings, its readings) then never
 * blocks the page for long while a screen is built; `drawing` says when items still wait, for
 * the list's aria-busy (browser tests wait until no part of a screen is busy).
 *
 * Create it while a component initialises (it runs an effect). Example: with 3 openings,
 * `new FrameBatches(() => room.openings.length, 1, 1)` gives count 1, then 2, then every opening.
 */
export class FrameBatches {
  #drawn = $state(0);
  #complete = $state(false);

  constructor(total: () => number, first: number, perFrame: number) {
    this.#drawn = first;
    $effect(() => {
      if (this.#complete) return;
      if (this.#drawn >= total()) {
        this.#complete = true;
        return;
      }
      const frame = requestAnimationFrame(() => (this.#drawn += perFrame));
      return () => cancelAnimationFrame(frame);
    });
  }

  /** How many items to draw now. */
  get count(): number {
    return this.#complete ? Number.POSITIVE_INFINITY : this.#drawn;
  }

  /** True while some items are still waiting for their frame. */
  get drawing(): boolean {
    return !this.#complete;
  }
}
