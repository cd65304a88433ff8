/**
 * Repeat visits, room lists and personal data through the screens, in Chromium at phone size:
 * the next visit started from the demo school opens with the same rooms and no readings, each
 * with its "since last visit" line; a room list with one bad row names the row's line and column
 * and adds the good rooms; the file shared without names holds no site; the keeping period
 * survives a reload, lists the surveys kept longer (with a reminder on the survey list) and
 * deletes their photos. The page's clock is set to September 2027, well after the demo's visits.
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import { readFileSync } from 'node:fs';
import type { BrowserContext, Page } from 'playwright-core';
import { openWatchedPhone } from '../support/browser.ts';
import { demoFile } from '../support/fixtures.ts';

const baseURL = inject('baseURL');
const demo = demoFile();
const school = demo.surveys[0]!;

describe.skipIf(!baseURL)('repeat visits, room lists and personal data (phone)', () => {
  let context: BrowserContext;
  let page: Page;
  let close: () => Promise<void>;
  let problems: string[] = [];

  beforeAll(async () => {
    ({ context, page, close, problems } = await openWatchedPhone());
    await page.clock.install({ time: new Date('2027-09-01T09:00:00') });
    await page.goto(baseURL);
    await page.getByRole('button', { name: 'Load the demo surveys (invented data)' }).click();
    await page.getByText(`Loaded ${demo.surveys.length} demo surveys (invented data).`).waitFor();
  });

  afterAll(async () => {
    await close?.();
  });

  it('starts the next visit from the demo school: same rooms, no readings, a since-last-visit line each', async () => {
    await page.getByRole('button', { name: `Start next visit from this survey: ${school.survey.title}` }).click();
    await page.getByRole('heading', { name: `${school.survey.title} (next visit)` }).waitFor();
    const cards = page.locator('li.room');
    await page.getByText('Since last visit:').first().waitFor({ timeout: 30_000 });
    await expect(cards.count()).resolves.toBe(school.rooms.length);
    for (const room of school.rooms) {
      const card = cards.filter({ has: page.getByRole('link', { name: room.name, exact: true }) });
      await expect(card.getByText(/Still to do: .*a reading/).count()).resolves.toBe(1);
      await expect(card.getByText(/^Since last visit: /).count()).resolves.toBe(1);
    }
  });

  it('imports a room list: the bad row is named by line and column, the good rooms are added', async () => {
    const csv = ['Room,Use,Floor area (m²),Height (m),Occupants', 'Music room,Classroom,52,3,28', 'Library,Classroom,abc,3,20', 'Staff room,Office,30,2.7,8'].join('\n');
    await page.getByLabel('Room list file').setInputFiles({ name: 'rooms.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await page.getByText('1 row left out').waitFor();
    await page.getByText(/Line 3, column “Floor area \(m²\)”: The floor area "abc" is not a number/).waitFor();
    await expect(page.getByRole('combobox', { name: /Room taken as/ }).inputValue()).resolves.toBe('room');
    await page.getByRole('button', { name: 'Add 2 rooms' }).click();
    await page.getByText('✓ Added 2 rooms from rooms.csv.').waitFor();
    await page.getByRole('link', { name: 'Music room', exact: true }).waitFor();
    await page.getByRole('link', { name: 'Staff room', exact: true }).waitFor();
    await expect(page.getByRole('link', { name: 'Library', exact: true }).count()).resolves.toBe(0);
    await expect(page.locator('li.room').count()).resolves.toBe(school.rooms.length + 2);
  });

  it('shares a file without names: every survey, no site', async () => {
    await page.goto(`${baseURL}#/surveys`);
    await page.getByRole('button', { name: 'Prepare a file without names' }).click();
    await page.getByText(/^File without names ready: /).waitFor();
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download file without names' }).click()]);
    const text = readFileSync((await download.path())!, 'utf8');
    const file = JSON.parse(text) as { surveys: { survey: { site: string } }[] };
    expect(file.surveys.length).toBe(demo.surveys.length + 1);
    for (const s of file.surveys) expect(s.survey.site).toBe('');
    for (const s of demo.surveys) expect(text).not.toContain(s.survey.site);
  });

  it('keeps the chosen period across a reload, reminds on the list and deletes photos', async () => {
    await page.goto(`${baseURL}#/settings`);
    await page.getByText('12 months', { exact: true }).click();
    await page.getByRole('heading', { name: 'Kept longer than 12 months' }).waitFor();
    await page.reload();
    await expect(page.getByRole('radio', { name: '12 months' }).isChecked()).resolves.toBe(true);
    // The demo's surveys were last changed in January 2026; the next visit was started today.
    const past = page.getByRole('button', { name: /^Delete photos of / });
    await expect(past.count()).resolves.toBe(demo.surveys.length);
    await page.getByRole('button', { name: `Delete photos of ${school.survey.title}`, exact: true }).click();
    await page.getByText(new RegExp(`^Deleted \\d+ photos? of “${school.survey.title.replace(/[()]/g, '\\$&')}”`)).waitFor();
    await page.goto(`${baseURL}#/surveys`);
    await page.getByText(/Surveys kept longer than 12 months/).waitFor();
    expect(problems).toEqual([]);
  });
});
