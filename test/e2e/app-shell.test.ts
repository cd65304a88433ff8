/**
 * The installable shell in real Chromium at phone size: loads, installs its service worker,
 * starts offline, keeps a survey across reloads, passes axe, and talks to no other origin.
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import { readFileSync } from 'node:fs';
import type { BrowserContext, Page } from 'playwright-core';
import { expectOfflineStart, openPhone } from '../support/browser.ts';
import { axeViolations } from '../support/axe.ts';

const baseURL = inject('baseURL');

describe.skipIf(!baseURL)('app shell in Chromium (phone)', () => {
  let context: BrowserContext;
  let page: Page;
  let close: () => Promise<void>;
  const requests: string[] = [];

  beforeAll(async () => {
    ({ context, close } = await openPhone());
    context.on('request', (r) => requests.push(r.url()));
    page = context.pages()[0] ?? (await context.newPage());
    await page.goto(baseURL);
  });

  afterAll(async () => {
    await close?.();
  });

  it('loads the start screen and fits a 390 px phone without sideways scrolling', async () => {
    await expect(page.getByRole('heading', { name: 'Start a survey' }).isVisible()).resolves.toBe(true);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
  });

  it('says it is ready to work offline once installed', async () => {
    await page.getByText('Ready to work offline').waitFor({ timeout: 20_000 });
  });

  it('hands control to its service worker on the next load', async () => {
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await page.reload();
    const controlled = await page.evaluate(() => navigator.serviceWorker.controller !== null);
    expect(controlled).toBe(true);
  });

  it('starts with no network at all', async () => {
    await expectOfflineStart(context, page);
  });

  it('keeps a new survey across a reload, offline', async () => {
    await context.setOffline(true);
    try {
      await page.getByLabel('Survey title').fill('Termly walk-round, Block C (invented)');
      await page.getByLabel(/^Site/).fill('Hollowmere Academy (invented)');
      await page.getByText('Homes (houses and flats)').click();
      await page.getByRole('button', { name: 'Start survey' }).click();
      await page.getByRole('heading', { name: 'Termly walk-round, Block C (invented)' }).waitFor(); // the new survey opens
      await page.getByRole('link', { name: '← All surveys' }).click();
      const item = page.getByRole('listitem').filter({ hasText: 'Termly walk-round, Block C (invented)' });
      await item.waitFor();
      await page.reload();
      await item.waitFor();
      await expect(item.innerText()).resolves.toMatch(/Hollowmere Academy \(invented\) · Homes/);
    } finally {
      await context.setOffline(false);
    }
  });

  it('says what is wrong when the title is empty, and saves nothing', async () => {
    const before = await page.getByRole('listitem').count();
    await page.getByLabel('Survey title').fill('   ');
    await page.getByRole('button', { name: 'Start survey' }).click();
    await page.getByText('Survey title is empty').waitFor();
    expect(await page.getByRole('listitem').count()).toBe(before);
  });

  it('has no WCAG 2 A/AA violations on the start screen', async () => {
    expect(await axeViolations(page)).toEqual([]);
  });

  it('shows version, installation and storage facts in settings, with no WCAG 2 A/AA violations', async () => {
    await page.getByRole('link', { name: 'Settings' }).click();
    await page.getByRole('heading', { name: 'Settings' }).waitFor();
    const version = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')).version as string;
    await expect(page.getByTestId('app-version').innerText()).resolves.toBe(version);
    await expect(page.getByTestId('running-as').innerText()).resolves.toBe('Browser tab');
    // Headless Chromium always refuses persist(): "not protected" is the honest answer.
    await page.getByTestId('storage-protection').getByText(/Not protected/).waitFor();
    await expect(page.getByTestId('storage-use').innerText()).resolves.toMatch(/of .* available/);
    expect(await axeViolations(page)).toEqual([]);
  });

  it('makes no request to any origin but its own', () => {
    const origin = new URL(baseURL).origin;
    const foreign = requests.filter((u) => !u.startsWith(origin) && !u.startsWith('data:') && !u.startsWith('blob:'));
    expect(requests.length).toBeGreaterThan(0);
    expect(foreign).toEqual([]);
  });
});
