/**
 * How a write transaction is driven: queue its requests without awaiting each one, then ask for
 * the commit at once instead of waiting for the transaction to fall idle. The early commit is
 * what lets a save started on `pagehide` (a reload, the app being closed) reach the disk before
 * the page is torn down: without it Chromium drops the unfinished transaction with the page.
 */
/**
 * Queue a request in a write transaction. Its failure also fails the transaction, whose
 * `tx.done` the caller awaits; catching it here keeps that one failure from being reported a
 * second time as an unhandled rejection.
 */
export function queue(request: Promise<unknown>): void {
  request.catch(() => undefined);
}

/**
 * Commit now, where the browser can (Chrome 76+, Safari 15+, Firefox 74+); older ones commit when
 * idle. A transaction that has already ended (aborted) cannot commit: `tx.done` says why.
 */
export function commitNow(tx: { commit?: () => void }): void {
  try {
    tx.commit?.();
  } catch {
    // Already finished or aborted; the caller's `await tx.done` reports the outcome.
  }
}
