/**
 * A logger file brought into a room in Chromium at phone size, offline after the first load:
 * the demo surveys load from the start screen, a room takes a generated CSV (semicolons, decimal
 * commas, a note line above the header), the columns are shown, the decay is accepted and saved,
 * and the room's findings show a measured supply from the logger period. The file is our own
 * invented record: a rise for an hour, then a decay from about 1400 ppm towards 430 ppm at about
 * 1 air change per hour, one reading every 2 minutes with small noise.
 */
import { describe, it, expect, inject } from 'vitest';
import { openWatchedPhone } from '../support/browser.ts';
import { axeViolations } from '../support/axe.ts';
import { demoFile } from '../support/fixtures.ts';

const baseURL = inject('baseURL');
const demo = demoFile();

/** The invented record as a semicolon-separated file with decimal commas and day-first dates. */
function decayCsv(): string {
  const lines = ['Exported from the test logger, one reading every 2 minutes', 'Time;CO2 (ppm);Temperature (°C);RH (%)'];
  const start = Date.UTC(2026, 10, 30, 13, 0);
  let seed = 7;
  const noise = () => {
    seed = (seed * 16807) % 2147483647;
    return (seed / 2147483647 - 0.5) * 10;
  };
  const pad = (n: number) => String(n).padStart(2, '0');
  const comma = (v: number) => v.toFixed(1).replace('.', ',');
  for (let k = 0; k <= 120; k++) {
    const minutes = k * 2;
    const level = minutes < 60 ? 600 + (800 * minutes) / 60 : 430 + 970 * Math.exp(-(minutes - 60) / 60);
    const d = new Date(start + minutes * 60_000);
    const stamp = `${pad(d.getUTCDate())}/${pad(d.getUTCMonth() + 1)}/${d.getUTCFullYear()} ${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())}`;
    lines.push(`${stamp};${comma(level + noise())};${comma(20.5 + noise() / 20)};${comma(48 + noise() / 5)}`);
  }
  return lines.join('\n') + '\n';
}

describe.skipIf(!baseURL)('logger file on a room (phone, offline)', () => {
  it('imports a file, accepts the decay, saves it and shows the measured supply in the findings', async () => {
    const { context, page, close, problems } = await openWatchedPhone();
    try {
      await page.goto(baseURL);
      await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
      await page.reload();
      await expect(page.evaluate(() => navigator.serviceWorker.controller !== null)).resolves.toBe(true);
      await page.getByRole('button', { name: 'Load the demo surveys (invented data)' }).click();
      await page.getByText(`Loaded ${demo.surveys.length} demo surveys (invented data).`).waitFor();

      await context.setOffline(true);
      const doc = demo.surveys[0]!;
      const room = doc.rooms[0]!;
      await page.goto(`${baseURL}#/survey/${doc.survey.id}/room/${room.id}`);
      await page.getByRole('heading', { name: room.name, exact: true }).waitFor();

      await page.getByLabel('Choose logger file').setInputFiles({ name: 'room-logger.csv', mimeType: 'text/csv', buffer: Buffer.from(decayCsv(), 'utf8') });
      const section = page.locator('#section-logger');
      await section.getByTestId('column-co2').getByText('“CO2 (ppm)”', { exact: false }).waitFor({ timeout: 30_000 });
      await expect(section.getByTestId('column-time').innerText()).resolves.toContain('“Time”');
      await expect(section.getByText('semicolon', { exact: true }).count()).resolves.toBe(1);
      await expect(section.getByText('comma (21,5)').count()).resolves.toBe(1);
      await expect(section.getByText(/day-first dates/).count()).resolves.toBe(1);
      await expect(section.getByText('121 kept of 121 rows').count()).resolves.toBe(1);
      expect(await axeViolations(page, '#section-logger')).toEqual([]);
      await section.screenshot({ path: 'test-results/walk/logger-section.png' });
      await section.locator('figure').screenshot({ path: 'test-results/walk/logger-chart.png' });

      const decay = section.locator('li.period').filter({ hasText: 'Decay,' });
      await expect(decay.getByText(/Suggested: accept/).count()).resolves.toBe(1);
      await expect(decay.getByText(/Outdoor air: .*L\/s/).count()).resolves.toBe(1);
      await decay.getByRole('button', { name: /^Accept/ }).click();
      await expect(decay.getByRole('button', { name: /^Accept/ }).getAttribute('aria-pressed')).resolves.toBe('true');
      await section.getByRole('button', { name: 'Save to this room' }).click();
      await section.getByText('Saved room-logger.csv with this room, 1 accepted period.').waitFor();
      // Saving again replaces the stored series rather than adding a second copy.
      await section.getByRole('button', { name: 'Reject A' }).click();
      await section.getByRole('button', { name: 'Save to this room' }).click();
      await section.getByText('Saved room-logger.csv with this room, 1 accepted period.').waitFor();
      expect(await axeViolations(page, '#section-logger')).toEqual([]);

      await page.getByRole('link', { name: 'Findings', exact: true }).click();
      await page.getByRole('heading', { name: `Findings: ${room.name}` }).waitFor();
      const measured = page.locator('li.item').filter({ hasText: 'Decay from the logger file' });
      await measured.waitFor({ timeout: 30_000 });
      await expect(measured.innerText()).resolves.toMatch(/Outdoor air: \d[\d.]* L\/s/);
      await expect(measured.count()).resolves.toBe(1);
      expect(problems).toEqual([]);
    } finally {
      await context.setOffline(false);
      await close();
    }
  });

  it('says why a file cannot be read, asks the date order when the file cannot tell, takes column changes and keeps an outdoor logger', async () => {
    const { context, page, close, problems } = await openWatchedPhone();
    try {
      await page.goto(baseURL);
      await page.getByRole('button', { name: 'Load the demo surveys (invented data)' }).click();
      await page.getByText(`Loaded ${demo.surveys.length} demo surveys (invented data).`).waitFor();
      const doc = demo.surveys[0]!;
      const room = doc.rooms[1] ?? doc.rooms[0]!;
      await page.goto(`${baseURL}#/survey/${doc.survey.id}/room/${room.id}`);
      await page.getByRole('heading', { name: room.name, exact: true }).waitFor();
      const section = page.locator('#section-logger');
      const choose = page.getByLabel(/Choose (another )?logger file/);

      await choose.setInputFiles({ name: 'photo.csv', mimeType: 'text/csv', buffer: Buffer.from([0, 1, 2, 255, 0, 3, 0, 0, 9]) });
      await section.getByRole('alert').getByText('photo.csv could not be read.').waitFor();
      await expect(section.getByRole('alert').innerText()).resolves.toContain('binary data');

      // One date throughout, so day-first and month-first both fit: the file cannot tell.
      const rows = ['Time,CO2'];
      for (let k = 0; k < 30; k++) rows.push(`03/04/2026 10:${String(k * 2).padStart(2, '0')},${800 - k}`);
      await choose.setInputFiles({ name: 'one-day.csv', mimeType: 'text/csv', buffer: Buffer.from(rows.join('\n')) });
      await section.getByText('Day first or month first?').waitFor();
      await expect(section.getByRole('cell', { name: '2026-03-04' }).count()).resolves.toBeGreaterThan(0);
      expect(await axeViolations(page, '#section-logger')).toEqual([]);
      await section.getByRole('button', { name: 'Day first' }).click();
      await section.getByTestId('column-co2').getByText('“CO2”', { exact: false }).waitFor();
      await expect(section.getByText(/day-first dates/).count()).resolves.toBe(1);

      await section.getByRole('group', { name: 'CO₂ (ppm)' }).getByRole('button', { name: 'None' }).click();
      // With no value column left the file cannot be read: it says so and keeps the column choices.
      await section.getByRole('alert').getByText('No column of CO2, temperature or humidity', { exact: false }).waitFor();
      await expect(section.getByTestId('column-co2').innerText()).resolves.toContain('Not chosen');
      await section.getByRole('group', { name: 'CO₂ (ppm)' }).getByRole('button', { name: 'CO2' }).click();
      await section.getByTestId('column-co2').getByText('“CO2”', { exact: false }).waitFor();

      await section.getByLabel(/This is the outdoor logger/).check();
      await section.getByRole('button', { name: 'Save as the outdoor logger' }).click();
      await section.getByText('Saved one-day.csv as the outdoor logger.').waitFor();
      expect(problems).toEqual([]);
    } finally {
      await close();
    }
  });
});
