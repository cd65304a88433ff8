/** WCAG 2 A and AA violations on a page, found by axe-core injected into it. */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

type AxeRun = (ctx: Document, opts: object) => Promise<{ violations: Array<{ id: string; help: string; nodes: unknown[] }> }>;

/** Violations on the whole page, or only inside the element `selector` names (e.g. one section). */
export async function axeViolations(page: Page, selector?: string): Promise<string[]> {
  // Check the whole screen, not one half-built: wait until no part is still being mounted.
  await page.waitForFunction(() => document.querySelector('[aria-busy="true"]') === null);
  await page.addScriptTag({ content: axeSource });
  const result = await page.evaluate(async (within) => {
    const axe = (window as unknown as { axe: { run: AxeRun } }).axe;
    return axe.run(within ? ({ include: [within] } as unknown as Document) : document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa'] } });
  }, selector ?? null);
  return result.violations.map((v) => `${v.id}: ${v.help} (${v.nodes.length} nodes)`);
}
