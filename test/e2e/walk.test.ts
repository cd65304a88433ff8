/**
 * The walk as a new surveyor would do it, in real Chromium at phone size: a new survey, the
 * meters and the outdoor reading, an area with two rooms, size, people, a window, a vent, a fan
 * test, a decay test of five readings with conditions (the clock is the page's own, moved on
 * three minutes between readings), the running fit; then offline, a reload, and everything still
 * there. Typed numbers: "2,7" is 2.7, an empty field is never 0, a bad value keeps its text.
 * Screenshots go to test-results/walk/ (not committed).
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import { mkdirSync } from 'node:fs';
import type { BrowserContext, Page } from 'playwright-core';
import { openPhone } from '../support/browser.ts';
import { countWork, settledWork, workOfOneEdit } from '../support/page-work.ts';

const baseURL = inject('baseURL');
const shots = new URL('../../test-results/walk/', import.meta.url).pathname;

describe.skipIf(!baseURL)('the walk in Chromium (phone)', () => {
  let context: BrowserContext;
  let page: Page;
  let close: () => Promise<void>;
  const problems: string[] = [];
  const shot = (name: string) => page.screenshot({ path: `${shots}${name}.png`, fullPage: true });

  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    ({ context, close } = await openPhone());
    page = context.pages()[0] ?? (await context.newPage());
    page.on('pageerror', (error) => problems.push(error.message));
    page.on('console', (m) => void (m.type() === 'error' && problems.push(m.text())));
    await page.addInitScript(countWork);
    await page.clock.install({ time: new Date('2026-01-14T09:00:00') });
    await page.goto(baseURL);
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await page.reload(); // the service worker serves the app from here on: it works offline
  });

  afterAll(async () => {
    await close?.();
  });

  it('starts a survey with the essentials and opens it', async () => {
    await page.getByLabel('Survey title').fill('Termly walk-round, Block D (invented)');
    await page.getByLabel(/^Site/).fill('Fernhollow School (invented)');
    await page.getByText('Natural', { exact: true }).click();
    await page.getByRole('button', { name: 'Start survey' }).click();
    await page.getByRole('heading', { name: 'Termly walk-round, Block D (invented)' }).waitFor();
    await page.getByText('No outdoor CO₂ reading yet').waitFor();
  });

  it('records the meters, a side-by-side check, the outdoor reading and the weather', async () => {
    await page.getByRole('link', { name: /Start of visit/ }).click();
    const form = page.getByRole('form', { name: 'Add an instrument' });
    await form.getByLabel('Make and model').fill('Room CO₂ meter R1');
    await form.getByRole('button', { name: 'Add instrument' }).click();
    await page.getByRole('strong').filter({ hasText: 'Room CO₂ meter R1' }).waitFor();
    await form.getByLabel('Make and model').fill('Vane anemometer V1');
    for (const q of ['CO₂', 'Temperature', 'Relative humidity']) await form.getByLabel(q, { exact: true }).uncheck();
    await form.getByLabel('Airflow (fan flow)').check();
    await form.getByRole('button', { name: 'Add instrument' }).click();
    await page.getByText('Check Room CO₂ meter R1 side by side').click();
    const check = page.getByRole('group').filter({ hasText: 'Check Room CO₂ meter R1 side by side' });
    await check.getByRole('button', { name: 'Meters placed together: start timing' }).click();
    await check.getByLabel('This meter reads').fill('452');
    await check.getByLabel('Outdoor level taken as').fill('430');
    await check.getByRole('button', { name: 'Save the offset' }).click();
    await page.getByText('Checked: CO₂ offset +22 ppm against outdoor air').waitFor();
    await page.getByRole('button', { name: 'Start CO₂ settling here (2 min)' }).click();
    await page.getByText(/CO₂ settling: 2:00 left/).waitFor();
    await page.getByLabel('Outdoor CO₂').fill('425');
    await page.getByLabel('Outdoor temperature').first().fill('4,5');
    await page.getByRole('button', { name: 'Save outdoor reading' }).click();
    await page.getByText(/425 ppm CO₂ · 4.5 °C/).waitFor();
    await page.getByLabel('In words').fill('Overcast, light wind from the west');
    await page.getByText('Light', { exact: true }).click();
    await page.getByTestId('save-status').getByText(/Saved on this device/).waitFor();
    // The day's temperature left empty: the screen says what the findings take instead.
    await page.getByTestId('day-used').getByText(/^Left empty, so the findings use 4\.5 °C \(mean of 1 outdoor reading\)/).waitFor({ timeout: 30_000 });
    await shot('visit');
    await page.getByRole('link', { name: 'Go to the rooms' }).click();
  });

  it('adds an area and two rooms with their size, showing the volume as it is typed', async () => {
    await page.getByLabel('Area name').fill('Ground floor');
    await page.getByRole('button', { name: 'Add area' }).click();
    await page.getByRole('heading', { name: 'Ground floor' }).waitFor();
    for (const [name, length] of [['Classroom D1', '7,2'], ['Classroom D2', '6,8']] as const) {
      if (name === 'Classroom D2') await page.getByRole('link', { name: '← Termly walk-round, Block D (invented)' }).click();
      await page.getByLabel('Room name').fill(name);
      await page.getByLabel('In area').selectOption({ label: 'Ground floor' });
      await page.getByLabel('Length', { exact: true }).fill(length);
      await page.getByLabel('Width', { exact: true }).fill('7');
      await page.getByText(/Volume: \d/).waitFor();
      await page.getByRole('button', { name: 'Add room and open it' }).click();
      await page.getByRole('heading', { name, exact: true }).waitFor();
      // The timer started at the door says so in the room, and offers one of the room's own.
      if (name === 'Classroom D1') {
        await page.getByText(/^CO₂ timer started outdoors: (\d:\d\d left|settled) there\.$/).waitFor();
        await page.getByRole('button', { name: 'Start CO₂ settling here (2 min)' }).click();
        // A reading started while the room's own timer runs says the meter is still settling.
        await page.getByRole('button', { name: 'Reading now' }).click();
        await page.getByText(/^The CO₂ meter is still settling here \(\d:\d\d left\): a reading now may not be the room's\.$/).waitFor();
        await page.getByRole('button', { name: 'Cancel' }).click();
      }
    }
  });

  it('reads "2,7" as 2.7, never takes an empty field as 0, and keeps a bad value with its message', async () => {
    const height = page.getByLabel('Height', { exact: true });
    await height.fill('2,7');
    await page.getByText('Volume: 128.5 m³').waitFor(); // 6.8 × 7 × 2.7 = 128.52 m³
    await height.fill('');
    await page.getByText('Volume: give the size').waitFor();
    await page.getByTestId('save-status').getByText('NOT SAVED').waitFor();
    await height.fill('2.7m');
    await page.getByText('Height: type a number such as 2.4 or 2,4').waitFor();
    await expect(height.inputValue()).resolves.toBe('2.7m');
    await height.fill('2,7');
    await page.getByTestId('save-status').getByText(/Saved on this device/).waitFor();
  });

  it('records people and the room’s own day: adding a period saves once, analyses once, then the page goes quiet', async () => {
    await page.getByRole('button', { name: /Add usual people: 30 pupils, 1 teacher/ }).click();
    await page.getByRole('button', { name: /^Set this room’s own day, starting from the school day/ }).click();
    await page.getByTestId('save-status').getByText(/Saved on this device/).waitFor();
    const before = await settledWork(page);
    await page.getByRole('button', { name: 'Add a period' }).click();
    await page.getByRole('heading', { name: 'Period 12' }).waitFor();
    await page.getByTestId('save-status').getByText(/Saved on this device/).waitFor();
    expect(await workOfOneEdit(page, before)).toMatchObject({ roomPuts: 1, analyses: 1, quiet: true });
  });

  it('records a window, a vent and a fan test', async () => {
    await page.getByRole('button', { name: 'Add a window' }).click();
    await page.getByLabel('Opening sash width').fill('0,6');
    await page.getByLabel('Opening sash height').fill('1,1');
    await page.getByLabel('Opens to').fill('30');
    await page.getByRole('button', { name: 'Add a vent (trickle vent, air brick, grille)' }).click();
    await page.getByLabel('Area on the label').fill('5000');
    await page.getByText('Equivalent area').click();
    await page.getByRole('button', { name: 'Add a fan' }).click();
    await page.getByLabel('Measured flow').fill('12,5');
    await page.getByLabel('Measured with').selectOption({ label: 'Vane anemometer V1' });
    await page.getByTestId('save-status').getByText(/Saved on this device/).waitFor();
    // The outside wall: the mould check needs what it is built of.
    await page.getByRole('group', { name: 'Add an outside wall: what is it built of?' }).getByText('Cavity wall, not filled').click();
    await page.getByLabel('Wall length').fill('7,2');
    await page.getByTestId('save-status').getByText(/Saved on this device/).waitFor();
    await shot('room');
  });

  it('runs a decay test of five readings and shows the running fit and what ten more minutes would buy', async () => {
    await page.getByRole('link', { name: 'Decay test (people have left)' }).click();
    await page.getByRole('group', { name: 'Windows' }).getByText('All shut').click();
    await page.getByRole('group', { name: 'Fans' }).getByText('Off').click();
    await page.getByText('Every 3 min').click();
    await page.getByRole('button', { name: 'People have left: start' }).click();
    for (const [i, ppm] of [1850, 1620, 1420, 1250, 1110].entries()) {
      if (i > 0) {
        await page.clock.fastForward('03:00');
        await page.getByText('Reading due now').waitFor();
      }
      await page.getByLabel('CO₂ now').fill(String(ppm));
      await page.getByRole('button', { name: 'Save reading' }).click();
      await page.getByText(`${i + 1} ${i === 0 ? 'reading' : 'readings'} so far`).waitFor();
    }
    const fit = page.getByTestId('running-fit');
    await fit.waitFor({ timeout: 30_000 });
    await expect(fit.innerText()).resolves.toMatch(/^Outdoor air: [\d.]+ L\/s \([\d.]+–[\d.]+ L\/s\); [\d.]+ h⁻¹/);
    // The fit catches up with the last reading and says so.
    await page.getByText(/from 5 of 5 readings; 95% interval/).waitFor({ timeout: 30_000 });
    await expect(page.getByText('Updating with the latest reading…').count()).resolves.toBe(0);
    await page.getByTestId('ten-more').waitFor({ timeout: 30_000 });
    await shot('decay');
  });

  it('shows the room’s findings with the decay as its best measurement, its priority and its mould check', async () => {
    await page.getByRole('link', { name: 'Finish the test' }).click();
    await page.getByRole('link', { name: 'Findings' }).click({ timeout: 5000 }); // stable at once: no re-laying out
    await page.getByText('Decay test, 09:00–09:12 — the best measurement here').waitFor({ timeout: 30_000 });
    await page.getByTestId('headline').getByText(/measured/).waitFor();
    await expect(page.getByTestId('priority').first().innerText()).resolves.toMatch(/Act now|Act within weeks|Plan an improvement|No action found/);
    await page.getByRole('heading', { name: 'Humidity and mould' }).waitFor();
    await shot('findings');
  });

  it('keeps everything across a reload, offline', async () => {
    await context.setOffline(true);
    try {
      await page.reload();
      await page.getByText('Offline — working on this device').waitFor();
      await page.getByText('Decay test, 09:00–09:12 — the best measurement here').waitFor({ timeout: 30_000 });
      await page.getByRole('link', { name: '← Back to Classroom D2' }).click();
      await expect(page.getByLabel('Height', { exact: true }).inputValue()).resolves.toBe('2.7');
      await expect(page.getByLabel('Measured flow').inputValue()).resolves.toBe('12.5');
      await expect(page.getByLabel('Area on the label').inputValue()).resolves.toBe('5000');
      await expect(page.getByLabel('Wall length').inputValue()).resolves.toBe('7.2');
      await page.getByText('Tests recorded: Decay (5 readings).').waitFor();
      await page.getByRole('link', { name: '← Termly walk-round, Block D (invented)' }).click();
      await page.getByRole('link', { name: 'Classroom D1', exact: true }).waitFor();
      await page.getByText('Before you leave').waitFor(); // the end-of-visit outdoor reading is asked for
      await page.getByRole('link', { name: /Start of visit/ }).click();
      await page.getByText(/425 ppm CO₂ · 4.5 °C/).waitFor();
      await expect(page.getByLabel('In words').inputValue()).resolves.toBe('Overcast, light wind from the west');
    } finally {
      await context.setOffline(false);
    }
  });

  it('removes a reading and a room, each only after a second tap', async () => {
    await page.getByRole('link', { name: '← Termly walk-round, Block D (invented)' }).first().click();
    await page.getByRole('link', { name: 'Classroom D2', exact: true }).click();
    await page.getByRole('button', { name: /^Remove the \d\d:\d\d reading$/ }).first().click();
    await page.getByRole('button', { name: 'Yes, remove it' }).click();
    await page.getByText('Tests recorded: Decay (4 readings).').waitFor();
    await page.getByRole('link', { name: '← Termly walk-round, Block D (invented)' }).click();
    await page.getByRole('link', { name: 'Classroom D1', exact: true }).click();
    await page.getByRole('button', { name: 'Remove this room' }).click();
    await page.getByRole('button', { name: 'Keep it' }).click();
    await page.getByRole('button', { name: 'Remove this room' }).click();
    await page.getByRole('button', { name: 'Yes, remove it' }).click();
    await page.getByRole('link', { name: 'Classroom D2', exact: true }).waitFor();
    expect(await page.getByRole('link', { name: 'Classroom D1', exact: true }).count()).toBe(0);
    await page.reload();
    await page.getByRole('link', { name: 'Classroom D2', exact: true }).waitFor();
    expect(await page.getByRole('link', { name: 'Classroom D1', exact: true }).count()).toBe(0);
  });

  it('raised no error in the page throughout', () => {
    expect(problems).toEqual([]);
  });
});
