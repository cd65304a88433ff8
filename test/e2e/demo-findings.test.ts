/**
 * The demo surveys in Chromium at phone size: they load from the start screen, every room of
 * every demo survey shows findings, every screen passes axe's WCAG 2 A/AA rules, the main actions
 * work from the keyboard alone (Tab to them, then Enter or Space), and the page logs no error.
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openWatchedPhone, screenBuilt } from '../support/browser.ts';
import { axeViolations } from '../support/axe.ts';
import { demoFile } from '../support/fixtures.ts';
import { tabTo } from '../support/keyboard.ts';

const baseURL = inject('baseURL');
const demo = demoFile();

describe.skipIf(!baseURL)('demo surveys in Chromium (phone)', () => {
  let context: BrowserContext;
  let page: Page;
  let close: () => Promise<void>;
  let problems: string[] = [];

  beforeAll(async () => {
    ({ context, page, close, problems } = await openWatchedPhone());
    await page.goto(baseURL);
  });

  afterAll(async () => {
    await close?.();
  });

  it('loads the demo surveys from the start screen, by keyboard', async () => {
    await tabTo(page, page.getByRole('button', { name: 'Load the demo surveys (invented data)' }));
    await page.keyboard.press('Enter');
    await page.getByText(`Loaded ${demo.surveys.length} demo surveys (invented data).`).waitFor();
    expect(await axeViolations(page)).toEqual([]);
  });

  for (const doc of demo.surveys) {
    it(`shows findings for every room of “${doc.survey.title}”, with no WCAG 2 A/AA violations on its screens`, async () => {
      await page.goto(`${baseURL}#/surveys`);
      await page.getByRole('link', { name: doc.survey.title }).click();
      await page.getByText('Findings are up to date.').waitFor({ timeout: 30_000 });
      await expect(page.getByTestId('headline').count()).resolves.toBe(doc.rooms.length);
      expect(await axeViolations(page)).toEqual([]);
      for (const [i, room] of doc.rooms.entries()) {
        await page.goto(`${baseURL}#/survey/${doc.survey.id}/room/${room.id}/findings`);
        await page.getByRole('heading', { name: `Findings: ${room.name}` }).waitFor();
        await page.getByTestId('headline').waitFor({ timeout: 30_000 });
        await expect(page.getByTestId('headline').innerText()).resolves.toMatch(/Outdoor air: .*\d.*(L\/s)/);
        if (i === 0) {
          // The predicted day with its two ends, the readings and the periods in use (rooms used by day).
          const day = page.getByRole('figure', { name: 'The day in this room, predicted, with the readings' });
          await day.waitFor();
          await expect(day.locator('path.line').count()).resolves.toBeGreaterThanOrEqual(2);
          await expect(day.locator('.summary').innerText()).resolves.toMatch(/^Predicted CO₂ over the day from .+: highest [\d,]+–[\d,]+ ppm/);
          await day.screenshot({ path: `test-results/walk/day-chart-${demo.surveys.indexOf(doc)}.png` });
          expect(await axeViolations(page)).toEqual([]);
          await page.getByRole('link', { name: `← Back to ${room.name}` }).click();
          await page.getByRole('heading', { name: room.name, exact: true }).waitFor();
          expect(await axeViolations(page)).toEqual([]);
        }
      }
    });
  }

  it('has no WCAG 2 A/AA violations on the start of visit, settings, guided test and area screens', async () => {
    const doc = demo.surveys[0]!;
    const homes = demo.surveys.find((s) => s.areas.some((a) => a.dwelling))!;
    const flat = homes.areas.find((a) => a.dwelling)!;
    for (const [survey, path, heading] of [
      [doc, 'visit', 'Start of visit'],
      [doc, 'details', 'Survey details'],
      [doc, `room/${doc.rooms[0]!.id}/test/decay`, `Decay test: ${doc.rooms[0]!.name}`],
      [homes, `area/${flat.id}`, flat.name],
    ] as const) {
      await page.goto(`${baseURL}#/survey/${survey.survey.id}/${path}`);
      await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
      expect(await axeViolations(page), path).toEqual([]);
    }
  });

  it('works from the keyboard: a reading, a copy of a room, a move, a delete and its undo', async () => {
    const doc = demo.surveys[2]!;
    const room = doc.rooms[1]!;
    await page.goto(`${baseURL}#/survey/${doc.survey.id}/room/${room.id}`);
    await page.getByRole('heading', { name: room.name, exact: true }).waitFor();
    await screenBuilt(page);
    const before = await page.locator('#section-readings li').count();
    await tabTo(page, page.getByRole('button', { name: 'Reading now' }));
    await page.keyboard.press('Enter');
    await expect(page.getByLabel('CO₂', { exact: true }).evaluate((el) => el === document.activeElement)).resolves.toBe(true);
    await page.keyboard.type('812');
    await tabTo(page, page.getByRole('button', { name: 'Save reading' }));
    await page.keyboard.press('Space');
    // Not saved until the conditions are looked at: one required tap, and the focus is taken there.
    await page.getByText('Conditions: look at the room and tick “Conditions checked now”, changing any that differ').waitFor();
    await expect(page.getByLabel('Conditions checked now').evaluate((el) => el === document.activeElement)).resolves.toBe(true);
    await page.keyboard.press('Space');
    await tabTo(page, page.getByRole('button', { name: 'Save reading' }));
    await page.keyboard.press('Space');
    await expect.poll(() => page.locator('#section-readings li').count()).toBe(before + 1);

    await page.goto(`${baseURL}#/survey/${doc.survey.id}`);
    await tabTo(page, page.getByRole('button', { name: `Duplicate ${room.name} (size and openings only)` }));
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: `${room.name} (copy)` }).waitFor();
    await page.goto(`${baseURL}#/survey/${doc.survey.id}`);
    await tabTo(page, page.getByRole('button', { name: `Move ${room.name} up` }));
    await page.keyboard.press('Space');
    await expect.poll(() => page.locator('.rooms .name').first().innerText()).toBe(room.name);

    await page.goto(`${baseURL}#/surveys`);
    await tabTo(page, page.getByRole('button', { name: `Delete ${doc.survey.title}` }));
    await page.keyboard.press('Enter');
    await page.getByText(`“${doc.survey.title}” deleted`).waitFor();
    await tabTo(page, page.getByRole('button', { name: 'Undo delete' }));
    await page.keyboard.press('Enter');
    await page.getByRole('link', { name: doc.survey.title }).waitFor();
  });

  it('raised no error in the page throughout', () => {
    expect(problems).toEqual([]);
  });
});
