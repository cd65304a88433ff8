/**
 * A surveyor's walk-round at phone size, for the things that got in the way on a trial walk of an
 * invented block of flats: a new room of a homes survey starts as a bedroom; a flat with no rooms
 * yet is not judged ("No action found" would reassure wrongly); an airflow meter's side-by-side
 * check is in its own quantity, not CO₂ ppm; a room reading starts on the meter the outdoor
 * reading used (so its side-by-side offset applies); a door undercut is recorded only once its gap
 * and door width are typed (a made-up 10 mm gap was judged as a measured "Meets it"). The survey,
 * its flat, meters and readings are invented.
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import type { Page } from 'playwright-core';
import { openWatchedPhone } from '../support/browser.ts';
import { axeViolations } from '../support/axe.ts';

const baseURL = inject('baseURL');
const TITLE = 'Rowan House flats (invented)';

describe.skipIf(!baseURL)('walk polish in Chromium (phone)', () => {
  let page: Page;
  let close: () => Promise<void>;
  let problems: string[];
  let surveyAt = '';

  beforeAll(async () => {
    ({ page, close, problems } = await openWatchedPhone());
    await page.goto(baseURL);
    await page.getByLabel('Survey title').fill(TITLE);
    await page.getByText('Homes (houses and flats)').click();
    await page.getByRole('button', { name: 'Start survey' }).click();
    await page.getByRole('heading', { name: TITLE }).waitFor();
    surveyAt = page.url();
  });

  afterAll(async () => {
    await close?.();
  });

  it('offers a new room of a homes survey as a bedroom, 2.4 m high', async () => {
    const form = page.getByRole('form', { name: 'Add a room' });
    await expect(form.getByLabel('Used as').inputValue()).resolves.toBe('bedroom');
    await expect(form.getByLabel('Height', { exact: true }).inputValue()).resolves.toBe('2.4');
  });

  it('does not judge a flat with no rooms yet', async () => {
    await page.getByLabel('Area name').fill('Flat 4');
    await page.getByRole('group', { name: 'Kind of area' }).getByText('Flat', { exact: true }).click();
    await page.getByRole('button', { name: 'Add area' }).click();
    const flat = page.getByRole('region', { name: 'Flat 4' });
    await flat.getByTestId('area-findings').getByText('Whole flat: not judged yet, as it has no rooms.').waitFor();
    await expect(flat.getByText('No action found').count()).resolves.toBe(0);
    await expect(flat.getByText('0 L/s').count()).resolves.toBe(0);
  });

  it('checks an airflow meter side by side in its own quantity, and starts a room reading on the outdoor reading’s meter', async () => {
    await page.getByRole('link', { name: /Start of visit/ }).click();
    const form = page.getByRole('form', { name: 'Add an instrument' });
    for (const serial of ['RH-1', 'RH-2']) {
      await form.getByLabel('Make and model').fill('Roomcheck 5');
      await form.getByLabel('Serial number').fill(serial);
      await form.getByRole('button', { name: 'Add instrument' }).click();
      await page.getByText(`Roomcheck 5 · ${serial}`).waitFor();
    }
    await form.getByLabel('Make and model').fill('Vane 60');
    for (const q of ['CO₂', 'Temperature', 'Relative humidity']) await form.getByLabel(q, { exact: true }).uncheck();
    await form.getByLabel('Airflow (fan flow)').check();
    await form.getByRole('button', { name: 'Add instrument' }).click();
    const vane = page.locator('details', { has: page.getByText('Check Vane 60 side by side') });
    await vane.getByText('Check Vane 60 side by side').click();
    await expect(vane.getByRole('radio', { name: 'Airflow (fan flow)' }).isChecked()).resolves.toBe(true);
    await expect(vane.getByText('ppm', { exact: true }).count()).resolves.toBe(0);

    const outdoor = page.getByRole('region', { name: 'Outdoor reading' });
    await outdoor.getByLabel('Outdoor CO₂').fill('432');
    await outdoor.getByLabel('Meter').selectOption({ label: 'Roomcheck 5 (RH-2)' });
    await outdoor.getByRole('button', { name: 'Save outdoor reading' }).click();
    await outdoor.getByText(/432 ppm CO₂/).waitFor();

    await page.goto(surveyAt);
    await page.getByLabel('Room name').fill('Flat 4 bedroom');
    await page.getByLabel('Length', { exact: true }).fill('3,4');
    await page.getByLabel('Width', { exact: true }).fill('3');
    await page.getByRole('button', { name: 'Add room and open it' }).click();
    await page.getByRole('heading', { name: 'Flat 4 bedroom', exact: true }).waitFor();
    await page.getByRole('button', { name: 'Reading now' }).click();
    const meter = page.locator('#reading-meter');
    await meter.waitFor();
    await expect(meter.locator('option:checked').textContent()).resolves.toBe('Roomcheck 5 (RH-2)');
    await page.getByRole('button', { name: 'Cancel' }).click();
  });

  it('records a door undercut only once its gap and door width are typed', async () => {
    const openings = page.getByRole('region', { name: 'Openings' });
    await openings.getByRole('button', { name: 'Add a door undercut' }).click();
    await openings.getByText('No openings recorded yet.').waitFor();
    await openings.getByRole('button', { name: 'Record this undercut' }).click();
    await openings.getByRole('alert').getByText('Door undercut: type the gap under the door (mm) and the door width (m) as measured.').waitFor();
    await openings.getByLabel('Gap under the door').fill('6');
    await openings.getByLabel('Door width').fill('0,76');
    await openings.getByRole('button', { name: 'Record this undercut' }).click();
    await openings.getByRole('heading', { name: 'Door undercut' }).waitFor();
    await expect(openings.getByLabel('Gap under the door').inputValue()).resolves.toBe('6');
    await expect(openings.getByText('No openings recorded yet.').count()).resolves.toBe(0);
    expect(await axeViolations(page, '#section-openings')).toEqual([]);
    expect(problems).toEqual([]);
  });
});
