/**
 * Survey records in real Chromium at phone size: typing survives an immediate reload, offline;
 * the app reopens on the last survey; a backup downloads as a valid survey file; restoring from
 * a backup works on an empty device and a bad file changes nothing.
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import { readFileSync, writeFileSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { openPhone } from '../support/browser.ts';
import { axeViolations } from '../support/axe.ts';
import { readSurveyFile } from '../../src/model/survey-file.ts';

const baseURL = inject('baseURL');
const demoPath = new URL('../fixtures/demo-survey.json', import.meta.url).pathname;

describe.skipIf(!baseURL)('survey records in Chromium (phone)', () => {
  let context: BrowserContext;
  let page: Page;
  let close: () => Promise<void>;
  const pageErrors: string[] = [];

  beforeAll(async () => {
    ({ context, close } = await openPhone());
    page = context.pages()[0] ?? (await context.newPage());
    page.on('pageerror', (error) => pageErrors.push(error.message));
    await page.goto(baseURL);
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await page.reload(); // from here the service worker serves the app: it works offline
  });

  afterAll(async () => {
    await close?.();
  });

  it('offers to restore from a backup on an empty device, and refuses a bad file without changing anything', async () => {
    await page.getByText('No surveys on this device yet').waitFor();
    const bad = join(mkdtempSync(join(tmpdir(), 'ventwalk-bad-')), 'not-a-backup.json');
    writeFileSync(bad, '{"format":"ventwalk-survey","version":1,"surveys":[{"survey":{"title":"<img src=x onerror=alert(1)>"}}]');
    await page.getByLabel('Restore from a backup file…').setInputFiles(bad);
    await page.getByText('Backup not restored: the file has problems').waitFor();
    await page.getByText(/not a complete JSON file/).waitFor();
    await page.getByRole('button', { name: 'OK' }).click();
    await expect(page.getByRole('listitem').count()).resolves.toBe(0);
  });

  it('restores the demo backup through the screen', async () => {
    await page.getByLabel('Restore from a backup file…').setInputFiles(demoPath);
    await page.getByText('Backup restored').waitFor();
    const items = page.locator('ul.surveys > li');
    await expect(items.count()).resolves.toBe(3);
    await items.getByText('Termly walk-round, Block B (demo, invented)').waitFor();
  });

  it('keeps what was typed across an immediate reload, offline throughout', async () => {
    await context.setOffline(true);
    try {
      await page.getByRole('link', { name: /Damp and mould inspection/ }).click();
      await page.getByRole('link', { name: 'Survey settings' }).click();
      await page.getByRole('heading', { name: 'Survey details' }).waitFor();
      const site = page.getByLabel('Site');
      await site.fill('Calder Rise, Larkhill Road, block A (invented)');
      await page.reload();
      await page.getByRole('heading', { name: 'Survey details' }).waitFor();
      await expect(page.getByLabel('Site').inputValue()).resolves.toBe('Calder Rise, Larkhill Road, block A (invented)');
      await page.getByText('Offline — working on this device').waitFor();
    } finally {
      await context.setOffline(false);
    }
  });

  it('shows the save state, and NOT SAVED with the reason for an empty title', async () => {
    const title = page.getByLabel('Survey title');
    await title.fill('');
    await page.getByTestId('save-status').getByText('NOT SAVED').waitFor();
    await page.getByText('Survey title is empty: give the survey a name').first().waitFor();
    await title.fill('Damp and mould inspection, flats 3 and 7 (demo, invented), revisited');
    await page.getByLabel('Mechanical').check();
    await page.getByTestId('save-status').getByText(/Saved on this device/).waitFor();
    expect(await axeViolations(page)).toEqual([]);
  });

  it('downloads a file of this survey alone from its details screen', async () => {
    await page.getByRole('button', { name: 'Prepare a file of this survey' }).click();
    await page.getByRole('status').filter({ hasText: 'Backup ready: 1 survey' }).waitFor();
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download backup' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^ventwalk-survey-\d{4}-\d\d-\d\d-\d{4}\.json$/);
    const result = readSurveyFile(readFileSync((await download.path())!, 'utf8'));
    expect(result.ok && result.file.surveys.map((s) => s.survey.title)).toEqual(['Damp and mould inspection, flats 3 and 7 (demo, invented), revisited']);
  });

  it('reopens on the last survey after a cold start at the start address', async () => {
    await page.goto(baseURL);
    await page.getByRole('link', { name: 'Survey settings' }).click(); // reopened on the survey's overview
    await page.getByRole('heading', { name: 'Survey details' }).waitFor();
    await expect(page.getByLabel('Survey title').inputValue()).resolves.toMatch(/revisited$/);
    await expect(page.getByLabel('Mechanical').isChecked()).resolves.toBe(true);
  });

  it('downloads a backup that is a valid survey file, and remembers when', async () => {
    await page.getByRole('link', { name: '← Back to the survey' }).click();
    await page.getByRole('link', { name: '← All surveys' }).click();
    await page.getByText('No backup made on this device yet.').waitFor(); // a one-survey file is not a backup of everything
    await page.getByRole('button', { name: 'Prepare a backup of all surveys' }).click();
    const ready = page.getByRole('status').filter({ hasText: 'Backup ready' });
    await ready.waitFor();
    await expect(ready.innerText()).resolves.toMatch(/^Backup ready: 3 surveys, with photos, \d+ kB\.$/);
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download backup' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^ventwalk-backup-\d{4}-\d\d-\d\d-\d{4}\.json$/);
    const text = readFileSync((await download.path())!, 'utf8');
    const result = readSurveyFile(text);
    expect(result.ok).toBe(true);
    expect(result.ok && result.file.surveys.map((s) => s.survey.site)).toContain('Calder Rise, Larkhill Road, block A (invented)');
    await expect(page.getByTestId('last-backup-list').innerText()).resolves.toMatch(/^Last backup: .*\(0 days ago\)\.$/);
    expect(await axeViolations(page)).toEqual([]);
    await page.getByRole('link', { name: 'Settings' }).click();
    await expect(page.getByTestId('last-backup').innerText()).resolves.toMatch(/0 days ago/);
  });

  it('raised no error in the page throughout', () => {
    expect(pageErrors).toEqual([]);
  });
});
