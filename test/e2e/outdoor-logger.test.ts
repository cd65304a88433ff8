/**
 * The outdoor logger on the visit screen in Chromium at phone size: an invented outdoor logger
 * file is brought in on the demo school's visit screen (the outdoor choice already made), kept,
 * listed with its file, times and median CO₂, and the findings' outdoor level then says it came
 * from the logger, on the visit screen and in a room's measurements; removing it brings back the
 * spot readings. axe finds no WCAG 2 A/AA violation in the section.
 *
 * The file is our own invented shape (comma-separated, ISO local times, our own column names):
 * one point a minute from 07:30 to 17:00 on the visit day at about 428 ppm, with every 9th point
 * 300 ppm higher (a delivery van idling beside it), −2 °C and 90 % relative humidity.
 */
import { describe, it, expect, inject } from 'vitest';
import { mkdirSync } from 'node:fs';
import { openWatchedPhone } from '../support/browser.ts';
import { axeViolations } from '../support/axe.ts';
import { demoFile } from '../support/fixtures.ts';

const baseURL = inject('baseURL');
const demo = demoFile();
const school = demo.surveys[0]!;
const shots = new URL('../../test-results/walk/', import.meta.url).pathname;

function outdoorCsv(): string {
  const lines = ['Logged at,Carbon dioxide (ppm),Outside temp (°C),Humidity (%)'];
  const pad = (n: number) => String(n).padStart(2, '0');
  for (let k = 0; k <= 570; k++) {
    const minutes = 7 * 60 + 30 + k;
    const co2 = 428 + ((k * 7) % 5) - 2 + (k % 9 === 0 ? 300 : 0);
    lines.push(`2026-01-14 ${pad(Math.floor(minutes / 60))}:${pad(minutes % 60)},${co2},${(-2 + ((k % 3) - 1) * 0.1).toFixed(1)},${90 + (k % 2)}`);
  }
  return lines.join('\n') + '\n';
}

describe.skipIf(!baseURL)('outdoor logger on the visit screen (phone)', () => {
  it('imports an outdoor logger file, and the findings’ outdoor level comes from it', async () => {
    mkdirSync(shots, { recursive: true });
    const { page, close, problems } = await openWatchedPhone();
    try {
      await page.goto(baseURL);
      await page.getByRole('button', { name: 'Load the demo surveys (invented data)' }).click();
      await page.getByText(`Loaded ${demo.surveys.length} demo surveys (invented data).`).waitFor();
      await page.goto(`${baseURL}#/survey/${school.survey.id}/visit`);
      await page.getByRole('heading', { name: 'Start of visit' }).waitFor();
      const section = page.locator('#section-outdoor-logger');
      await section.getByRole('heading', { name: 'Outdoor logger', exact: true }).waitFor();
      const used = section.getByText(/^Outdoor CO₂ used in the findings:/);
      await expect(used.innerText({ timeout: 30_000 })).resolves.toContain('2 outdoor readings on another meter');
      expect(await axeViolations(page, '#section-outdoor-logger')).toEqual([]);

      await section.getByLabel('Choose outdoor logger file').setInputFiles({ name: 'outdoor-roof.csv', mimeType: 'text/csv', buffer: Buffer.from(outdoorCsv(), 'utf8') });
      await section.getByTestId('column-co2').getByText('“Carbon dioxide (ppm)”', { exact: false }).waitFor({ timeout: 30_000 });
      await expect(section.getByText('571 kept of 571 rows').count()).resolves.toBe(1);
      // The outdoor choice is already made: no room periods to judge, no "where it stood" question.
      await expect(section.getByText('This is the outdoor logger', { exact: false }).count()).resolves.toBe(0);
      await expect(section.getByLabel('Which meter is this logger').inputValue()).resolves.toBe('');
      expect(await axeViolations(page, '#section-outdoor-logger')).toEqual([]);
      await section.getByRole('button', { name: 'Save as the outdoor logger' }).click();
      await section.getByText('Saved outdoor-roof.csv as the outdoor logger.').waitFor();

      const listed = section.getByRole('list', { name: 'Outdoor loggers on this survey' }).getByRole('listitem');
      await expect(listed.count()).resolves.toBe(1);
      await expect(listed.innerText()).resolves.toMatch(/outdoor-roof\.csv[\s\S]*571 points from 07:30 to 17:00 · median CO₂ 430 ppm · -2 °C · 90%/);
      // The findings re-run: the van's spikes do not lift the level, and it names the logger.
      await section.getByText(/Outdoor CO₂ used in the findings: 430 ppm .*outdoor logger “outdoor-roof\.csv”: median of \d+ points/).waitFor({ timeout: 30_000 });
      expect(await axeViolations(page, '#section-outdoor-logger')).toEqual([]);
      await section.screenshot({ path: `${shots}outdoor-logger-section.png` });

      // A room whose own logger is not the handheld: its measurements use the outdoor logger.
      const b3 = school.rooms.find((r) => school.series.some((s) => s.roomId === r.id))!;
      await page.goto(`${baseURL}#/survey/${school.survey.id}/room/${b3.id}/findings`);
      await page.locator('[data-testid="analysis-status"][data-state="done"]').waitFor({ timeout: 30_000 });
      const measured = page.locator('#measured-heading + *');
      await expect(measured.innerText({ timeout: 30_000 })).resolves.toContain('outdoor logger “outdoor-roof.csv”');

      await page.goto(`${baseURL}#/survey/${school.survey.id}/visit`);
      await section.getByRole('button', { name: 'Remove the outdoor logger outdoor-roof.csv' }).click();
      await section.getByRole('button', { name: 'Yes, remove it' }).click();
      await section.getByRole('list', { name: 'Outdoor loggers on this survey' }).waitFor({ state: 'detached' });
      await section.getByText(/Outdoor CO₂ used in the findings: .*2 outdoor readings on another meter\.$/).waitFor({ timeout: 30_000 });
      expect(problems).toEqual([]);
    } finally {
      await close();
    }
  });
});
