/**
 * What a page does after an edit, counted inside it: analysis requests posted to the worker,
 * room records written to IndexedDB, and changes to the page (a MutationObserver). Install
 * `countWork` with `page.addInitScript(countWork)` before the page loads; `settledWork` waits
 * until saves and analyses stop, so a test can assert that one edit led to one save and one
 * analysis and that the page then went quiet (no reactive loop re-saving, re-analysing or
 * re-laying out the screen). A countdown (role="timer") is left out of the page changes.
 */
import type { Page } from 'playwright-core';

export interface PageWork {
  analyses: number;
  roomPuts: number;
  mutations: number;
}

/** Runs in the page (an init script): wraps Worker.postMessage and IDBObjectStore.put to count. */
export function countWork(): void {
  const counts = { analyses: 0, roomPuts: 0, mutations: 0 };
  (window as unknown as { __work: typeof counts }).__work = counts;
  const post = Worker.prototype.postMessage;
  Worker.prototype.postMessage = function (this: Worker, message: unknown, ...rest: never[]) {
    if (typeof message === 'object' && message !== null && 'surveyId' in message) counts.analyses += 1;
    return post.call(this, message, ...rest);
  } as typeof post;
  const put = IDBObjectStore.prototype.put;
  IDBObjectStore.prototype.put = function (this: IDBObjectStore, ...args: Parameters<typeof put>) {
    if (this.name === 'rooms') counts.roomPuts += 1;
    return put.apply(this, args);
  };
  // A running countdown (role="timer", e.g. a meter settling) changes the page every second by design: not counted.
  const counted = (r: MutationRecord) => !(r.target instanceof Element ? r.target : r.target.parentElement)?.closest('[role="timer"]');
  const watch = () =>
    new MutationObserver((records) => (counts.mutations += records.filter(counted).length)).observe(document, { subtree: true, childList: true, attributes: true, characterData: true });
  if (document.documentElement) watch();
  else document.addEventListener('DOMContentLoaded', watch);
}

/** The counts so far. */
export function pageWork(page: Page): Promise<PageWork> {
  return page.evaluate(() => ({ ...(window as unknown as { __work: PageWork }).__work }));
}

/** The counts once saves and analyses have stopped for 1.5 s (past the 400 ms save and 300 ms analysis debounces). */
export async function settledWork(page: Page): Promise<PageWork> {
  let last = await pageWork(page);
  for (let i = 0; i < 20; i += 1) {
    await page.waitForTimeout(1500);
    const now = await pageWork(page);
    if (now.analyses === last.analyses && now.roomPuts === last.roomPuts) return now;
    last = now;
  }
  throw new Error(`Saves or analyses never stopped: ${JSON.stringify(last)}`);
}

/**
 * After one edit, once it has settled: how many room saves and analyses it caused, and whether
 * the page then stayed quiet for `quietMs` (nothing saved, analysed or changed on the page).
 */
export async function workOfOneEdit(page: Page, before: PageWork, quietMs = 2000): Promise<{ roomPuts: number; analyses: number; quiet: boolean; settled: PageWork; later: PageWork }> {
  const settled = await settledWork(page);
  await page.waitForTimeout(quietMs);
  const later = await pageWork(page);
  return {
    roomPuts: settled.roomPuts - before.roomPuts,
    analyses: settled.analyses - before.analyses,
    quiet: JSON.stringify(later) === JSON.stringify(settled),
    settled,
    later,
  };
}
