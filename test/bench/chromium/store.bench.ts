/**
 * Store speed in Chromium on the real IndexedDB of a page of the built app: 50 surveys, 5,000
 * rooms, 50,000 readings imported in one transaction (after the full file check), the survey
 * list, loading one survey, and the latency of saving one reading with strict durability.
 * The store and model code run in the page as a bundle (test/support/page-bundle.ts).
 */
import type { BenchContext } from '../bench-context.ts';
import { pageBundle } from '../../support/page-bundle.ts';

const SURVEYS = 50;
const ROOMS_PER_SURVEY = 100;
const READINGS_PER_ROOM = 10;
const SAVES = 200;

export default async function storeBench(ctx: BenchContext): Promise<void> {
  const page = ctx.page;
  if (!page) return;
  await page.addScriptTag({ content: await pageBundle('test/bench/chromium/store-entry.ts', 'VentwalkStoreBench') });
  const figures = await page.evaluate(
    ([s, r, n, saves]) =>
      (window as unknown as { VentwalkStoreBench: typeof import('./store-entry.ts') }).VentwalkStoreBench.runStoreBench(s!, r!, n!, saves!),
    [SURVEYS, ROOMS_PER_SURVEY, READINGS_PER_ROOM, SAVES],
  );
  ctx.report('store: 50 surveys, 5,000 rooms, 50,000 readings', figures);
}
