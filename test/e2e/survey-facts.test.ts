/**
 * The survey's facts at phone size, in real Chromium, on the invented demo school: the details
 * screen's folded parts (the building; about the survey) open, keep what is typed, refuse a bad
 * year by name, save, and the findings follow a change of shelter; the visit screen changes an
 * instrument's stated accuracy (the findings' "accuracy assumed" note comes and goes with it) and
 * an outdoor reading (its time kept unless changed). Every new control is reached by Tab; axe
 * finds no WCAG 2 A/AA violation with the new parts open; nothing overflows at 360 px or in landscape.
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import { mkdirSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { openWatchedPhone } from '../support/browser.ts';
import { axeViolations } from '../support/axe.ts';
import { demoFile } from '../support/fixtures.ts';
import { tabTo } from '../support/keyboard.ts';

const baseURL = inject('baseURL');
const school = demoFile().surveys[0]!;
const handheld = school.instruments[0]!;
const b1 = school.rooms.find((r) => r.name === 'Classroom B1')!;
const b2 = school.rooms.find((r) => r.name === 'Classroom B2')!;
const at = (path: string) => `${baseURL}#/survey/${school.survey.id}${path}`;
const shots = new URL('../../test-results/survey-facts/', import.meta.url).pathname;

describe.skipIf(!baseURL)('survey facts in Chromium (phone)', () => {
  let page: Page;
  let close: () => Promise<void>;
  let problems: string[] = [];

  /** A room's findings once the analysis is current: the headline and the "everything shut" scenario. */
  async function findings(roomId: string): Promise<string> {
    await page.goto(at(`/room/${roomId}/findings`));
    await page.getByTestId('headline').waitFor({ timeout: 30_000 });
    await page.locator('[data-testid="analysis-status"][data-state="done"]').waitFor({ timeout: 30_000 });
    return page.locator('main').innerText();
  }
  const shot = (name: string) => page.screenshot({ path: `${shots}${name}.png`, fullPage: true });
  /** Open a folded part of the details screen (whatever state an earlier test left it in). */
  async function openPart(name: string): Promise<void> {
    const toggle = page.getByRole('button', { name });
    if ((await toggle.getAttribute('aria-expanded')) !== 'true') await toggle.click();
    await expect(toggle.getAttribute('aria-expanded')).resolves.toBe('true');
  }
  const focused = (page: Page) => page.evaluate(() => document.activeElement?.id ?? '');

  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    ({ page, close, problems } = await openWatchedPhone());
    await page.goto(baseURL);
    await page.getByRole('button', { name: 'Load the demo surveys (invented data)' }).click();
    await page.getByText(/Loaded \d+ demo surveys/).waitFor();
  });

  afterAll(async () => {
    await close?.();
  });

  it('opens the building part by keyboard, shows the stored facts, refuses a bad year by name and keeps the text', async () => {
    await page.goto(at('/details'));
    await page.getByRole('heading', { name: 'Survey details' }).waitFor();
    const toggle = page.getByRole('button', { name: 'The building' });
    await expect(toggle.getAttribute('aria-expanded')).resolves.toBe('false');
    await tabTo(page, toggle);
    await page.keyboard.press('Enter');
    await expect(toggle.getAttribute('aria-expanded')).resolves.toBe('true');
    await expect(page.getByLabel('Construction').inputValue()).resolves.toBe(school.survey.construction);
    await expect(page.getByLabel(/^Year built/).inputValue()).resolves.toBe('1968');
    await expect(page.getByLabel('Storeys', { exact: true }).inputValue()).resolves.toBe('2');
    await expect(page.getByRole('radio', { name: 'Town or suburb' }).isChecked()).resolves.toBe(true);
    await page.getByText(/infiltration/).first().waitFor();

    for (const control of [page.getByLabel('Construction'), page.getByLabel(/^Year built/), page.getByRole('button', { name: 'Storeys: one more' }), page.getByRole('radio', { name: 'Town or suburb' }), page.getByRole('radio', { name: /^Some shelter/ })]) {
      await tabTo(page, control);
    }

    const year = page.getByLabel(/^Year built/);
    await year.fill('19x8');
    await page.getByText('Year built: type a number such as 2.4 or 2,4').waitFor();
    await expect(year.inputValue()).resolves.toBe('19x8');
    await year.fill('3000');
    await page.getByText('Year built must be between 1,000 and 2,200').first().waitFor();
    await page.getByTestId('building-save-status').getByText('NOT SAVED').waitFor();
    await year.fill('1968');
    await page.getByTestId('building-save-status').getByText(/Saved on this device/).waitFor();
  });

  it('a change of shelter, chosen by keyboard, is saved and changes the predicted room’s findings', async () => {
    const shut = () => page.getByRole('listitem').filter({ has: page.getByRole('heading', { name: 'Everything shut' }) }).innerText();
    await findings(b2.id);
    const before = await shut();
    expect(before).toMatch(/L\/s/);
    await page.goto(at('/details'));
    await openPart('The building');
    await page.getByRole('radio', { name: /^Some shelter/ }).focus();
    await page.keyboard.press('ArrowUp'); // radio groups move by arrow keys: up from "some shelter" is "exposed"
    await expect(page.getByRole('radio', { name: /^Exposed/ }).isChecked()).resolves.toBe(true);
    await page.getByTestId('building-save-status').getByText(/Saved on this device/).waitFor();
    await findings(b2.id);
    const after = await shut();
    expect(after).not.toBe(before);
    // Stored, not only shown: a fresh load has it.
    await page.goto(at('/details'));
    await page.reload();
    await openPart('The building');
    await expect(page.getByRole('radio', { name: /^Exposed/ }).isChecked()).resolves.toBe(true);
  });

  it('adds a surveyor and a scope by keyboard, removes a surveyor in two taps, and keeps them after a reload', async () => {
    await page.goto(at('/details'));
    const toggle = page.getByRole('button', { name: 'About the survey' });
    await tabTo(page, toggle);
    await page.keyboard.press('Space');
    await expect(toggle.getAttribute('aria-expanded')).resolves.toBe('true');
    await expect(page.getByLabel('Surveyor 1: name').inputValue()).resolves.toBe(school.survey.surveyors[0]!.name);
    await tabTo(page, page.getByLabel('Name of a surveyor to add'));
    await page.keyboard.type('Second Surveyor (invented)');
    await page.keyboard.press('Tab');
    await page.keyboard.type('Ventilation inspector (invented)');
    await tabTo(page, page.getByRole('button', { name: 'Add surveyor' }));
    await page.keyboard.press('Enter');
    await expect(page.getByLabel('Surveyor 2: name').inputValue()).resolves.toBe('Second Surveyor (invented)');
    await tabTo(page, page.getByLabel('Scope'));
    await page.keyboard.press('End');
    await page.keyboard.type(' Roof void not entered.');
    await page.getByRole('button', { name: 'Add surveyor' }).click();
    await page.getByText('Surveyor name is empty: fill it in').waitFor();
    await page.getByRole('button', { name: `Remove surveyor ${school.survey.surveyors[0]!.name}` }).click();
    await page.getByRole('button', { name: 'Yes, remove it' }).click();
    await expect(page.getByLabel('Surveyor 1: name').inputValue()).resolves.toBe('Second Surveyor (invented)');
    await page.getByTestId('about-save-status').getByText(/Saved on this device/).waitFor();

    await page.reload();
    await openPart('About the survey');
    await expect(page.getByLabel('Surveyor 1: qualifications').inputValue()).resolves.toBe('Ventilation inspector (invented)');
    await expect(page.getByLabel('Surveyor 2: name').count()).resolves.toBe(0);
    await expect(page.getByLabel('Scope').inputValue()).resolves.toMatch(/Roof void not entered\.$/);
  });

  it('has no WCAG 2 A/AA violation on the details screen with both parts open, and fits 360 px and landscape', async () => {
    await page.goto(at('/details'));
    await openPart('The building');
    await openPart('About the survey');
    expect(await axeViolations(page)).toEqual([]);
    await shot('details-open');
    for (const size of [{ width: 360, height: 740 }, { width: 844, height: 390 }]) {
      await page.setViewportSize(size);
      await expect(page.evaluate(() => document.documentElement.scrollWidth)).resolves.toBeLessThanOrEqual(size.width);
    }
    await page.setViewportSize({ width: 390, height: 844 });
  });

  it('changes an instrument’s stated accuracy: the findings’ “accuracy assumed” note comes and goes with it', async () => {
    await page.goto(at('/visit'));
    const change = page.getByRole('button', { name: `Change details of ${handheld.model}` });
    await tabTo(page, change);
    await page.keyboard.press('Enter');
    const form = page.getByRole('form', { name: `Change ${handheld.model}` });
    await expect(focused(page)).resolves.toBe(`instrument-${handheld.id}-model`);
    const fixed = form.getByRole('group', { name: /^CO₂: ±\(ppm/ }).getByLabel('Fixed part');
    const percent = form.getByRole('group', { name: /^CO₂: ±\(ppm/ }).getByLabel('Percent of reading');
    await expect(fixed.inputValue()).resolves.toBe('50');
    await expect(percent.inputValue()).resolves.toBe('3');
    await expect(form.getByRole('radio', { name: 'Yes' }).isChecked()).resolves.toBe(true); // baseline correction off
    await tabTo(page, fixed);
    await fixed.fill('');
    await form.getByRole('button', { name: 'Save changes' }).click();
    await form.getByText('CO₂ accuracy: the fixed part (ppm) is empty — type 0 if the maker states none').waitFor();
    await expect(percent.inputValue()).resolves.toBe('3');
    await percent.fill('');
    await form.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText('Accuracy: Temperature ±0.5 °C; Relative humidity ±3 % RH').first().waitFor();
    await expect(focused(page)).resolves.toBe(`change-${handheld.id}`);
    expect(await findings(b1.id)).toContain(`${handheld.model}: no CO₂ accuracy stated`);

    await page.goto(at('/visit'));
    await page.getByRole('button', { name: `Change details of ${handheld.model}` }).click();
    await form.getByRole('group', { name: /^CO₂: ±\(ppm/ }).getByLabel('Fixed part').fill('50');
    await form.getByRole('group', { name: /^CO₂: ±\(ppm/ }).getByLabel('Percent of reading').fill('3');
    await form.getByLabel('Last calibrated').fill('2025-10-01');
    await form.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText('Accuracy: CO₂ ±(50 ppm + 3 % of reading); Temperature ±0.5 °C; Relative humidity ±3 % RH').first().waitFor();
    await page.getByText(/calibrated 2025-10-01/).waitFor();
    expect(await findings(b1.id)).not.toContain('no CO₂ accuracy stated');
  });

  it('changes an outdoor reading, keeping its time unless the time is changed, and removes one in two taps', async () => {
    await page.goto(at('/visit'));
    await page.getByText('Start of visit, 08:05: 428 ppm CO₂').waitFor();
    await tabTo(page, page.getByRole('button', { name: 'Change the 08:05 outdoor reading' }));
    await page.keyboard.press('Enter');
    const form = page.getByRole('form', { name: 'Change the 08:05 outdoor reading' });
    await expect(form.getByLabel('Time taken').inputValue()).resolves.toBe('08:05');
    const co2 = form.getByLabel('Outdoor CO₂');
    await co2.fill('4x0');
    await form.getByText('Outdoor CO₂: type a number such as 2.4 or 2,4').waitFor();
    await co2.fill('43000');
    await form.getByRole('button', { name: 'Save changes' }).click();
    await form.getByText(/CO₂ must be between 250 and 10,000 ppm/).waitFor();
    await expect(co2.inputValue()).resolves.toBe('43000');
    await co2.fill('430');
    await form.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText('Start of visit, 08:05: 430 ppm CO₂').waitFor();

    await page.getByRole('button', { name: 'Change the 08:05 outdoor reading' }).click();
    await form.getByLabel('Time taken').fill('08:20');
    await form.getByText('During', { exact: true }).click();
    expect(await axeViolations(page)).toEqual([]); // the visit screen with an outdoor reading open for changing
    await form.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText('During, 08:20: 430 ppm CO₂').waitFor();

    await page.getByRole('button', { name: 'Remove the 15:50 outdoor reading' }).click();
    await page.getByRole('button', { name: 'Yes, remove it' }).click();
    await expect.poll(() => page.getByText(/End of visit, 15:50/).count()).toBe(0);
    await page.getByTestId('save-status').getByText(/Saved on this device/).waitFor();
    await page.reload();
    await page.getByText('During, 08:20: 430 ppm CO₂ · 4.2 °C · 87% RH').waitFor();
    await expect(page.getByText(/End of visit, 15:50/).count()).resolves.toBe(0);
  });

  it('has no WCAG 2 A/AA violation on the visit screen with an instrument open for changing', async () => {
    await page.goto(at('/visit'));
    await page.getByRole('button', { name: `Change details of ${handheld.model}` }).click();
    await page.getByRole('form', { name: `Change ${handheld.model}` }).waitFor();
    expect(await axeViolations(page)).toEqual([]);
    await shot('visit-instrument-change');
  });

  it('removes an instrument added by mistake in two taps; one the readings name says why it stays', async () => {
    await page.goto(at('/visit'));
    await page.getByText(new RegExp(`^Named by \\d+ readings.*, so it stays on the survey\\.$`)).first().waitFor();
    await expect(page.getByRole('button', { name: `Remove ${handheld.model}` }).count()).resolves.toBe(0);
    const add = page.getByRole('form', { name: 'Add an instrument' });
    await add.getByLabel('Make and model').fill('Spare meter (invented)');
    await add.getByText('CO₂', { exact: true }).click();
    await add.getByRole('button', { name: 'Add instrument' }).click();
    await page.getByRole('button', { name: 'Remove Spare meter (invented)' }).click();
    await page.getByRole('button', { name: 'Yes, remove it' }).click();
    await expect.poll(() => page.getByText('Spare meter (invented)').count()).toBe(0);
    await page.reload();
    await page.getByRole('heading', { name: 'Start of visit' }).waitFor();
    await page.getByRole('button', { name: `Change details of ${handheld.model}` }).waitFor();
    await expect(page.getByText('Spare meter (invented)').count()).resolves.toBe(0);
  });

  it('records an edit to a criterion in the unit the findings show it in, and lists it so', async () => {
    await page.goto(at('/details'));
    await page.getByRole('heading', { name: 'Survey details' }).waitFor();
    await page.getByRole('group', { name: 'Criteria to judge against' }).getByRole('radio').first().check();
    const select = page.getByLabel('Threshold to change');
    const option = await select.locator('option', { hasText: /L\/s per person\)$/ }).first();
    const label = (await option.textContent())!;
    await select.selectOption({ label });
    await expect(page.locator('#edit-value').locator('xpath=..').locator('.unit').innerText()).resolves.toBe('L/s per person');
    await page.getByLabel(/^New value/).fill('10');
    await page.getByLabel('Reason for the change').fill('Client brief asks for 10 L/s per person (invented)');
    await page.getByRole('button', { name: 'Record this edit' }).click();
    await page.getByText(/: 10 L\/s per person — Client brief asks for 10 L\/s per person \(invented\)/).waitFor();
  });

  it('raised no error in the page throughout', () => {
    expect(problems).toEqual([]);
  });
});
