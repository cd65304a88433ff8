/**
 * Editing a room in real Chromium at phone size: the room's own day (copied from its template,
 * a period added, an overlap refused with its field named, then fixed), a room made of parts
 * (the whole room's volume follows every part, and survives a reload), and a saved reading
 * corrected in place (its id kept, the findings re-analysed). After one edit the page goes
 * quiet: one save, one analysis, no more layout. Accessibility checked with axe-core; the new
 * controls reached and used from the keyboard; nothing wider than a 360 px phone.
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import { mkdirSync } from 'node:fs';
import type { BrowserContext, Page } from 'playwright-core';
import { openWatchedPhone } from '../support/browser.ts';
import { axeViolations } from '../support/axe.ts';
import { countWork, settledWork, workOfOneEdit, type PageWork } from '../support/page-work.ts';

const baseURL = inject('baseURL');
const shots = new URL('../../test-results/room-editing/', import.meta.url).pathname;

describe.skipIf(!baseURL)('editing a room in Chromium (phone)', () => {
  let context: BrowserContext;
  let page: Page;
  let close: () => Promise<void>;
  let problems: string[];
  const shot = (name: string, selector: string) => page.locator(selector).screenshot({ path: `${shots}${name}.png` });
  const saved = () => page.getByTestId('save-status').getByText(/Saved on this device/).waitFor();

  /** Press Tab until the control named `name` has focus (at most 80 presses), as a keyboard user would. */
  async function tabTo(name: string): Promise<void> {
    for (let i = 0; i < 80; i += 1) {
      await page.keyboard.press('Tab');
      const focused = await page.evaluate(() => document.activeElement?.textContent?.trim() ?? '');
      if (focused === name) return;
    }
    throw new Error(`${name} is not reachable with Tab`);
  }

  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    ({ context, page, close, problems } = await openWatchedPhone());
    await page.addInitScript(countWork);
    await page.clock.install({ time: new Date('2026-01-14T09:00:00') });
    await page.goto(baseURL);
    await page.getByLabel('Survey title').fill('Room editing check (invented)');
    await page.getByText('Natural', { exact: true }).click();
    await page.getByRole('button', { name: 'Start survey' }).click();
    await page.getByLabel('Room name').fill('Classroom E4');
    await page.getByLabel('Used as').selectOption('classroom');
    await page.getByLabel('Length', { exact: true }).fill('7');
    await page.getByLabel('Width', { exact: true }).fill('7');
    await page.getByRole('button', { name: 'Add room and open it' }).click();
    await page.getByRole('heading', { name: 'Classroom E4', exact: true }).waitFor();
    await page.getByLabel('Height', { exact: true }).fill('2,7');
    await page.getByRole('button', { name: /Add usual people: 30 pupils, 1 teacher/ }).click();
    await saved();
    await page.getByRole('button', { name: 'Reading now' }).click();
    await page.getByLabel('CO₂', { exact: true }).fill('1400');
    await page.getByLabel('Temperature', { exact: true }).fill('20');
    await page.getByLabel('Conditions checked now').check();
    await page.getByRole('button', { name: 'Save reading' }).click();
    await page.getByText('1400 ppm CO₂').waitFor();
  });

  afterAll(async () => {
    await close?.();
  });

  it('copies the school day in as the room’s own day; adding a period saves once, analyses once, and the page goes quiet', async () => {
    await page.getByRole('button', { name: 'Set this room’s own day, starting from the school day (lessons and breaks)' }).click();
    await page.getByText('This room has its own day of 11 periods, used instead of the template.').waitFor();
    await expect(page.locator('#day-0-start').inputValue()).resolves.toBe('07:30'); // the first period is open to change
    await page.getByText('10:15–11:25 · Full').waitFor(); // the others are one line each
    await page.locator('#day-0-label').focus();
    await tabTo('Change period 2'); // from the keyboard
    await page.keyboard.press('Enter');
    await expect(page.locator('#day-1-start').inputValue()).resolves.toBe('08:40');
    expect(await page.locator('#day-0-start').count()).toBe(0); // one open at a time
    await saved();
    const before: PageWork = await settledWork(page);
    await page.getByRole('button', { name: 'Add a period' }).click();
    await page.getByRole('heading', { name: 'Period 12' }).waitFor();
    await expect(page.locator('#day-11-start').inputValue()).resolves.toBe('18:00'); // follows on from 16:30–18:00
    await saved();
    const edit = await workOfOneEdit(page, before);
    expect(edit).toMatchObject({ roomPuts: 1, analyses: 1, quiet: true });
  });

  it('refuses an overlap with both periods named under the field, then saves the fix', async () => {
    await page.locator('#day-11-start').fill('17:30');
    await page.getByText('Start of period 12 (17:30) is inside period 11 (16:30–18:00): periods must not overlap').first().waitFor();
    await page.getByTestId('save-status').getByText('NOT SAVED').waitFor();
    await expect(page.locator('#day-11-start').getAttribute('aria-invalid')).resolves.toBe('true');
    await page.locator('#day-11-start').fill('18:00');
    await page.locator('#day-11-end').fill('20:30');
    await page.getByRole('group', { name: 'How full' }).last().getByText('Half full').click();
    await page.locator('#day-11-label').fill('parents’ evening');
    await page.getByRole('heading', { name: 'Period 12: parents’ evening' }).waitFor();
    await saved();
    await shot('own-day', '#section-day');
  });

  it('shows findings over the room’s own day, with the Findings link usable at once', async () => {
    await page.getByRole('link', { name: 'Findings' }).click({ timeout: 5000 });
    await page.getByRole('heading', { name: 'Findings: Classroom E4' }).waitFor();
    await page.getByText(/Over the day \(the room’s recorded periods\)/).first().waitFor({ timeout: 30_000 });
    await page.getByRole('link', { name: '← Back to Classroom E4' }).click();
  });

  it('goes back to the plain template only after a second tap', async () => {
    await page.getByRole('button', { name: 'Use the template instead (removes these periods)' }).click();
    await page.getByRole('button', { name: 'Keep it' }).click();
    await page.getByText('This room has its own day of 12 periods, used instead of the template.').waitFor();
    await page.getByRole('button', { name: 'Use the template instead (removes these periods)' }).click();
    await page.getByRole('button', { name: 'Yes, remove it' }).click();
    await page.getByRole('group', { name: 'Day schedule' }).waitFor();
    await saved();
    // And back again, for the rest: the own day starts from the template once more.
    await page.getByRole('button', { name: /^Set this room’s own day/ }).click();
    await page.getByText('This room has its own day of 11 periods, used instead of the template.').waitFor();
    await saved();
  });

  it('makes the room of parts: a bay added, the whole room’s volume follows, and it survives a reload', async () => {
    await page.getByRole('group', { name: 'Size by' }).first().getByText('Several parts (L-shape, bay)').click();
    await page.getByRole('heading', { name: 'Part 1' }).waitFor();
    await page.getByText('Whole room: 132.3 m³').waitFor(); // 7 × 7 × 2.7 = 132.3 m³
    await page.getByRole('button', { name: 'Add a part' }).click();
    await expect(page.locator('#part-1-height').inputValue()).resolves.toBe('2.7'); // the height follows part 1
    await page.getByTestId('save-status').getByText('NOT SAVED').waitFor(); // a part without its size is not saved
    await page.locator('#part-1-length').fill('2,4');
    await page.locator('#part-1-width').fill('1,5');
    await page.getByText('Whole room: 142 m³').waitFor(); // + 2.4 × 1.5 × 2.7 = 9.72 m³ → 142.02 m³
    await page.getByTestId('room-totals').getByText('· floor 52.6 m²').waitFor(); // 49 + 3.6 m²
    await saved();
    await shot('parts', '#section-use');
    await page.reload();
    await page.getByRole('heading', { name: 'Part 2' }).waitFor();
    await expect(page.locator('#part-1-length').inputValue()).resolves.toBe('2.4');
    await page.getByText('Whole room: 142 m³').waitFor();
  });

  it('adds and removes a part from the keyboard', async () => {
    await page.locator('#part-1-width').focus();
    await tabTo('Add a part');
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: 'Part 3' }).waitFor();
    await expect(page.evaluate(() => document.activeElement?.id)).resolves.toBe('part-2-length');
    await tabTo('Remove part 3');
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: 'Part 2' }).waitFor();
    expect(await page.getByRole('heading', { name: 'Part 3' }).count()).toBe(0);
    await saved();
  });

  it('corrects a saved reading: same reading, new values and time, and the findings change', async () => {
    await page.getByRole('link', { name: 'Findings' }).click();
    const measured = page.getByRole('heading', { name: 'Findings: Classroom E4' });
    await measured.waitFor();
    await page.getByText(/1400 ppm|1,400 ppm/).first().waitFor({ timeout: 30_000 });
    const before = await page.locator('main').innerText();
    await page.getByRole('link', { name: '← Back to Classroom E4' }).click();

    await page.getByRole('button', { name: 'Correct the 09:00 reading' }).click();
    const form = page.getByRole('form', { name: 'Correct the 09:00 reading' });
    await expect(page.evaluate(() => document.activeElement?.id)).resolves.toBe('correct-co2');
    await expect(form.getByLabel('CO₂', { exact: true }).inputValue()).resolves.toBe('1400');
    await form.getByLabel('CO₂', { exact: true }).fill('9,5');
    await form.getByRole('button', { name: 'Save the correction' }).click();
    await form.getByText('CO₂ must be between 250 and 10,000 ppm (check the meter and the units it shows)').waitFor();
    await expect(form.getByLabel('CO₂', { exact: true }).inputValue()).resolves.toBe('9,5'); // the typed text is kept
    await shot('correction', '#section-readings');
    await form.getByLabel('CO₂', { exact: true }).fill('950');
    await form.getByLabel('Time taken').fill('09:20');
    await form.getByRole('group', { name: 'Windows' }).getByText('Some open').click();
    await form.getByRole('button', { name: 'Save the correction' }).click();
    await form.waitFor({ state: 'detached' });
    await page.getByText('950 ppm CO₂').waitFor();
    await expect(page.evaluate(() => document.activeElement?.id?.startsWith('correct-'))).resolves.toBe(true);
    expect(await page.getByRole('button', { name: /^Correct the \d\d:\d\d reading$/ }).count()).toBe(1); // corrected, not added
    await page.getByRole('button', { name: 'Correct the 09:20 reading' }).waitFor();
    await page.getByText(/some windows open/).waitFor();

    await page.getByRole('link', { name: 'Findings' }).click();
    await page.getByText(/950 ppm/).first().waitFor({ timeout: 30_000 });
    const after = await page.locator('main').innerText();
    expect(after).not.toBe(before);
    expect(after).not.toMatch(/1400 ppm|1,400 ppm/);
    await page.getByRole('link', { name: '← Back to Classroom E4' }).click();
  });

  it('saves everything else while one field breaks its rule, and keeps the typed text on screen', async () => {
    const activity = page.getByLabel(/^Activity/).first();
    const before = await activity.inputValue();
    await activity.fill('9');
    await page.getByLabel('Room name').fill('Classroom E4 (north)');
    const status = page.getByTestId('save-status');
    await status.getByText(/Activity must be between .*Everything else in this room is saved\./).waitFor();
    await expect(activity.inputValue()).resolves.toBe('9');
    await page.waitForTimeout(800); // the valid part's save lands quietly
    await page.reload();
    await page.getByRole('heading', { name: 'Classroom E4 (north)', exact: true }).waitFor();
    await expect(page.getByLabel(/^Activity/).first().inputValue()).resolves.toBe(before);
    await page.getByLabel('Room name').fill('Classroom E4');
    await saved();
  });

  it('is clean for axe with the own day, the parts and a correction open, and fits a 360 px phone', async () => {
    await page.getByRole('button', { name: 'Correct the 09:20 reading' }).click();
    expect(await axeViolations(page)).toEqual([]);
    await page.setViewportSize({ width: 360, height: 740 });
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await page.getByRole('button', { name: 'Cancel' }).last().click();
    expect(problems).toEqual([]);
  });
});
