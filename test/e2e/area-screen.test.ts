/**
 * The area screen in real Chromium at phone size: reached from the overview by keyboard, a flat's
 * floor area, bedrooms and whole-dwelling system with one extract terminal typed in L/s; the
 * dwelling's findings follow each change (the check by bedrooms appears, the system's balance
 * appears); a bad or empty flow keeps its text and names the field; everything is still there
 * after a reload; no WCAG 2 A/AA violations; nothing wider than the screen at 360 px or in
 * landscape; and removing the flat moves its room to the floor it sat in, as the screen says.
 * The survey, its flat and rooms are invented.
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import { mkdirSync } from 'node:fs';
import type { BrowserContext, Page } from 'playwright-core';
import { openWatchedPhone } from '../support/browser.ts';
import { axeViolations } from '../support/axe.ts';

const baseURL = inject('baseURL');
const shots = new URL('../../test-results/walk/', import.meta.url).pathname;
const TITLE = 'Larch Court walk-round (invented)';

describe.skipIf(!baseURL)('the area screen in Chromium (phone)', () => {
  let context: BrowserContext;
  let page: Page;
  let close: () => Promise<void>;
  let problems: string[];
  const saved = () => page.getByTestId('save-status').getByText(/Saved on this device/).waitFor();
  const findings = () => page.getByTestId('dwelling-findings');
  const shot = (name: string) => page.screenshot({ path: `${shots}${name}.png`, fullPage: true });

  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    ({ context, page, close, problems } = await openWatchedPhone());
    await page.goto(baseURL);
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await page.reload();
  });

  afterAll(async () => {
    await close?.();
  });

  it('sets up a homes survey with a flow instrument, a floor, a flat on it and a bedroom', async () => {
    await page.getByLabel('Survey title').fill(TITLE);
    await page.getByText('Homes (houses and flats)').click();
    await page.getByText('Natural', { exact: true }).click();
    await page.getByRole('button', { name: 'Start survey' }).click();
    await page.getByRole('heading', { name: TITLE }).waitFor();

    await page.getByRole('link', { name: /Start of visit/ }).click();
    const form = page.getByRole('form', { name: 'Add an instrument' });
    await form.getByLabel('Make and model').fill('Flow hood H2');
    for (const q of ['CO₂', 'Temperature', 'Relative humidity']) await form.getByLabel(q, { exact: true }).uncheck();
    await form.getByLabel('Airflow (fan flow)').check();
    await form.getByRole('button', { name: 'Add instrument' }).click();
    await page.getByRole('strong').filter({ hasText: 'Flow hood H2' }).waitFor();
    await page.getByRole('link', { name: 'Go to the rooms' }).click();

    // A homes survey starts a new area as a flat.
    await expect(page.getByRole('group', { name: 'Kind of area' }).getByRole('radio', { name: 'Flat' }).isChecked()).resolves.toBe(true);
    for (const [name, kind] of [['First floor', 'Floor'], ['Flat 12', 'Flat']] as const) {
      await page.getByLabel('Area name').fill(name);
      await page.getByRole('group', { name: 'Kind of area' }).getByText(kind, { exact: true }).click();
      // The flat goes on the floor at once (the area screen's test moves it otherwise).
      if (name === 'Flat 12') await page.getByLabel('Sits in').selectOption({ label: 'First floor' });
      await page.getByRole('button', { name: 'Add area' }).click();
      await page.getByRole('heading', { name }).waitFor();
    }
    await page.getByLabel('Room name').fill('Bedroom 1');
    await page.getByLabel('Used as').selectOption({ label: 'Bedroom' });
    await page.getByLabel('In area').selectOption({ label: 'Flat 12' });
    await page.getByLabel('Length', { exact: true }).fill('3,6');
    await page.getByLabel('Width', { exact: true }).fill('3,2');
    await page.getByLabel('Height', { exact: true }).fill('2,4');
    await page.getByRole('button', { name: 'Add room and open it' }).click();
    await page.getByRole('heading', { name: 'Bedroom 1', exact: true }).waitFor();
    await page.getByRole('link', { name: `← ${TITLE}` }).click();
  });

  it('opens the flat’s area details from the overview with the keyboard alone', async () => {
    const link = page.getByRole('link', { name: 'Area details: Flat 12' });
    await link.waitFor();
    await page.locator('body').focus();
    let focused = '';
    for (let i = 0; i < 80 && focused !== 'Area details: Flat 12'; i++) {
      await page.keyboard.press('Tab');
      focused = await page.evaluate(() => document.activeElement?.getAttribute('aria-label') ?? '');
    }
    expect(focused).toBe('Area details: Flat 12');
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: 'Flat 12', level: 1 }).waitFor();
    expect(page.url()).toMatch(/#\/survey\/[0-9a-f-]+\/area\/[0-9a-f-]+$/);
    // The parent choice offers the floor, never the flat itself.
    const parents = await page.getByLabel('Sits in').locator('option').allInnerTexts();
    expect(parents).toEqual(['Not inside another area', 'First floor']);
    await page.getByLabel('Sits in').selectOption({ label: 'First floor' });
    await saved();
  });

  it('records the floor area from the rooms, then bedrooms: the check by bedrooms appears in the findings', async () => {
    await page.getByRole('button', { name: 'Use its rooms’ floor areas added: 11.5 m²' }).click(); // 3.6 × 3.2 = 11.52 m²
    await expect(page.getByLabel('Dwelling floor area').inputValue()).resolves.toBe('11.5');
    await saved();
    await findings().getByText('The number of bedrooms is not recorded').waitFor({ timeout: 30_000 });
    await expect(findings().getByText(/whole-dwelling ventilation rate, \d bedroom/).count()).resolves.toBe(0);
    await page.getByRole('button', { name: 'Bedrooms: one more' }).click();
    await page.getByRole('button', { name: 'Bedrooms: one more' }).click();
    await expect(page.getByLabel('Bedrooms', { exact: true }).inputValue()).resolves.toBe('2');
    await saved();
    await findings().getByText('ADF whole-dwelling ventilation rate, 2 bedrooms', { exact: true }).waitFor({ timeout: 30_000 });
    await expect(findings().getByText('The number of bedrooms is not recorded').count()).resolves.toBe(0);
    await page.getByRole('button', { name: 'Usual occupants: one more' }).click();
    await saved();
  });

  it('records a continuous extract system with one terminal; a bad flow keeps its text; the balance appears', async () => {
    const before = await page.getByTestId('area-findings').innerText();
    await page.getByRole('group', { name: 'What kind of system' }).getByText('Continuous extract').click();
    await page.getByLabel('Mode as found').fill('Normal, boost on the pull cord');
    await page.getByRole('group', { name: 'Running when you arrived' }).getByText('Yes').click();
    await page.getByRole('button', { name: 'Add an extract terminal' }).click();
    // No flow yet: not saved, and the field says why.
    await page.getByTestId('save-status').getByText('NOT SAVED').waitFor();
    await page.getByText('Terminal flow is empty: type the measured flow in L/s', { exact: true }).waitFor();
    await page.getByLabel('Where it is').fill('Kitchen ceiling');
    const flow = page.getByLabel('Measured flow');
    await flow.fill('13 l');
    await page.getByText(/Measured flow: type a number/).waitFor();
    await expect(flow.inputValue()).resolves.toBe('13 l');
    await flow.fill('2500');
    await page.getByText('Terminal flow must be between 0 and 2,000 L/s', { exact: true }).waitFor();
    await flow.fill('13');
    await page.getByLabel('Measured with').selectOption({ label: 'Flow hood H2' });
    await saved();
    await findings().getByText(/Dwelling system: supply 0 L\/s, extract 13 L\/s/).waitFor({ timeout: 30_000 });
    await page.getByTestId('area-findings').getByText(/system supply 0 L\/s, extract 13 L\/s/).waitFor();
    expect(await page.getByTestId('area-findings').innerText()).not.toBe(before);
    await shot('area');
  });

  it('has no WCAG 2 A/AA violations and fits 360 px and landscape', async () => {
    expect(await axeViolations(page)).toEqual([]);
    for (const size of [{ width: 360, height: 740 }, { width: 844, height: 390 }]) {
      await page.setViewportSize(size);
      const wider = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(wider, `${size.width} × ${size.height}`).toBeLessThanOrEqual(0);
    }
    await page.setViewportSize({ width: 390, height: 844 });
  });

  it('keeps everything across a reload', async () => {
    await page.reload();
    await page.getByRole('heading', { name: 'Flat 12', level: 1 }).waitFor();
    await expect(page.getByLabel('Sits in').inputValue()).resolves.not.toBe('');
    await expect(page.getByLabel('Bedrooms', { exact: true }).inputValue()).resolves.toBe('2');
    await expect(page.getByLabel('Usual occupants', { exact: true }).inputValue()).resolves.toBe('1');
    await expect(page.getByLabel('Dwelling floor area').inputValue()).resolves.toBe('11.5');
    await expect(page.getByLabel('Mode as found').inputValue()).resolves.toBe('Normal, boost on the pull cord');
    await expect(page.getByLabel('Where it is').inputValue()).resolves.toBe('Kitchen ceiling');
    await expect(page.getByLabel('Measured flow').inputValue()).resolves.toBe('13');
    await findings().getByText('ADF whole-dwelling ventilation rate, 2 bedrooms', { exact: true }).waitFor({ timeout: 30_000 });
  });

  it('reopens on the flat after a cold start at the start address', async () => {
    const here = page.url();
    await page.goto(baseURL);
    await page.getByRole('heading', { name: 'Flat 12', level: 1 }).waitFor();
    expect(page.url()).toBe(here);
  });

  it('moves a room to another area from the room screen, and back', async () => {
    const flat = page.url();
    await page.goto(flat.replace(/\/area\/.*$/, ''));
    const inArea = (area: string) => page.locator('section').filter({ has: page.getByRole('heading', { name: area, exact: true }) });
    await inArea('Flat 12').getByRole('link', { name: 'Bedroom 1' }).click();
    await page.getByLabel('In area').selectOption({ label: 'First floor' });
    await saved();
    await page.getByRole('link', { name: `← ${TITLE}` }).click();
    await inArea('First floor').getByRole('link', { name: 'Bedroom 1' }).waitFor();
    await expect(inArea('Flat 12').getByRole('link', { name: 'Bedroom 1' }).count()).resolves.toBe(0);
    await inArea('First floor').getByRole('link', { name: 'Bedroom 1' }).click();
    await expect(page.getByLabel('In area').inputValue()).resolves.not.toBe('');
    await page.getByLabel('In area').selectOption({ label: 'Flat 12' });
    await saved();
    await page.goto(flat);
    await page.getByRole('heading', { name: 'Flat 12', level: 1 }).waitFor();
  });

  it('removes the flat: the screen says where its room goes, and it goes there', async () => {
    await page.getByText('Its 1 room(s) move to First floor, with their readings, photos and logger files. Its dwelling facts and system go with it.').waitFor();
    await page.getByRole('button', { name: 'Remove this area' }).click();
    await page.getByRole('button', { name: 'Yes, remove it' }).click();
    await page.getByRole('heading', { name: TITLE }).waitFor();
    await expect(page.getByRole('heading', { name: 'Flat 12' }).count()).resolves.toBe(0);
    const floor = page.locator('section').filter({ has: page.getByRole('heading', { name: 'First floor' }) });
    await floor.getByText('Bedroom 1').waitFor();
    await page.reload();
    await page.locator('section').filter({ has: page.getByRole('heading', { name: 'First floor' }) }).getByText('Bedroom 1').waitFor();
    expect(problems).toEqual([]);
  });
});
