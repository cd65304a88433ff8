/**
 * One-handed at 360 px and in landscape: with the demo surveys loaded, no screen scrolls
 * sideways at 360 × 740 (a small phone held upright) or 740 × 360 (turned on its side).
 * A wide element (a file chooser in a grid, a long unbroken figure) makes the whole page pan
 * under the thumb; this catches it by comparing the page's scroll width with its viewport.
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import type { Page } from 'playwright-core';
import { openWatchedPhone, screenBuilt } from '../support/browser.ts';
import { demoFile } from '../support/fixtures.ts';

const baseURL = inject('baseURL');
const demo = demoFile();
const SIZES = [
  { width: 360, height: 740 },
  { width: 740, height: 360 },
] as const;

/** The elements that reach past the right edge, for a useful failure message. */
async function sidewaysScroll(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const width = document.documentElement.clientWidth;
    if (document.documentElement.scrollWidth <= width) return [];
    return [...document.querySelectorAll('body *')]
      .filter((el) => el.getBoundingClientRect().right > width + 0.5)
      .slice(0, 5)
      .map((el) => `${el.tagName.toLowerCase()}.${[...el.classList].join('.')} “${(el.textContent ?? '').trim().slice(0, 40)}”`);
  });
}

describe.skipIf(!baseURL)('screens at 360 px and in landscape', () => {
  let page: Page;
  let close: () => Promise<void>;
  let problems: string[] = [];

  beforeAll(async () => {
    ({ page, close, problems } = await openWatchedPhone());
    await page.goto(baseURL);
    await page.getByRole('button', { name: 'Load the demo surveys (invented data)' }).click();
    await page.getByText(`Loaded ${demo.surveys.length} demo surveys (invented data).`).waitFor();
  });

  afterAll(async () => {
    await close?.();
  });

  for (const size of SIZES) {
    it(`no screen scrolls sideways at ${size.width} × ${size.height}`, async () => {
      await page.setViewportSize(size);
      const wide: string[] = [];
      const look = async (hash: string, ready: () => Promise<unknown>) => {
        await page.goto(`${baseURL}${hash}`);
        await ready();
        await screenBuilt(page);
        const over = await sidewaysScroll(page);
        if (over.length) wide.push(`${hash}: ${over.join('; ')}`);
      };
      await look('#/surveys', () => page.getByRole('heading', { name: 'Start a survey' }).waitFor());
      for (const doc of demo.surveys) {
        const survey = `#/survey/${doc.survey.id}`;
        await look(survey, () => page.getByText('Findings are up to date.').waitFor({ timeout: 30_000 }));
        await look(`${survey}/visit`, () => page.getByRole('heading', { name: 'Start of visit' }).waitFor());
        await look(`${survey}/details`, () => page.getByRole('heading', { name: 'Survey details' }).waitFor());
        const room = doc.rooms[0]!;
        await look(`${survey}/room/${room.id}`, () => page.getByRole('heading', { name: room.name, exact: true }).waitFor());
        await look(`${survey}/room/${room.id}/findings`, () => page.getByTestId('headline').waitFor({ timeout: 30_000 }));
      }
      await look('#/settings', () => page.getByRole('heading', { level: 1 }).waitFor());
      expect(wide).toEqual([]);
    });
  }

  it('raised no error in the page throughout', () => {
    expect(problems).toEqual([]);
  });
});
