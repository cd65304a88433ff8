/**
 * The findings report on a phone, offline: the demo surveys load from the start screen, the app
 * goes offline (the service worker serves it from its second load), a demo survey's overview
 * makes the PDF (its renderer chunk comes from the precache) and offers it through the share
 * sheet. navigator.share and canShare are stubbed so the test sees what would be shared, and
 * that the share starts straight from the tap (the page still has the tap's user activation).
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openWatchedPhone } from '../support/browser.ts';
import { demoFile } from '../support/fixtures.ts';

const baseURL = inject('baseURL');
const demo = demoFile();

declare global {
  interface Window {
    sharedFiles?: { name: string; type: string; size: number; head: string; activeTap: boolean }[];
  }
}

describe.skipIf(!baseURL)('the report, offline, on a phone', () => {
  let context: BrowserContext;
  let page: Page;
  let close: () => Promise<void>;
  let problems: string[] = [];

  beforeAll(async () => {
    ({ context, page, close, problems } = await openWatchedPhone());
    await page.addInitScript(() => {
      window.sharedFiles = [];
      navigator.canShare = (data?: ShareData) => !!data?.files?.length;
      navigator.share = async (data?: ShareData) => {
        const activeTap = navigator.userActivation.isActive;
        for (const file of data?.files ?? []) {
          const head = new TextDecoder().decode(await file.slice(0, 5).arrayBuffer());
          window.sharedFiles!.push({ name: file.name, type: file.type, size: file.size, head, activeTap });
        }
      };
    });
    await page.goto(baseURL);
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await page.reload();
  });

  afterAll(async () => {
    await close?.();
  });

  it('makes the PDF offline and shares it from the tap', async () => {
    await page.getByRole('button', { name: 'Load the demo surveys (invented data)' }).click();
    await page.getByText(`Loaded ${demo.surveys.length} demo surveys (invented data).`).waitFor();
    await context.setOffline(true);
    const survey = demo.surveys[0]!.survey;
    await page.getByRole('link', { name: survey.title }).click();
    await page.getByRole('heading', { name: 'Report', exact: true }).waitFor();
    await page.getByRole('button', { name: 'Create report' }).click();
    await page.getByText(/^Report ready: .*\.pdf/).waitFor({ timeout: 60_000 });
    await page.getByRole('button', { name: 'Share report…' }).click();
    await page.waitForFunction(() => (window.sharedFiles?.length ?? 0) > 0);
    const [shared] = await page.evaluate(() => window.sharedFiles!);
    expect(shared).toMatchObject({ type: 'application/pdf', head: '%PDF-', activeTap: true });
    expect(shared!.name).toMatch(/\.pdf$/);
    expect(shared!.size).toBeGreaterThan(10_000);
    await expect(page.getByRole('button', { name: 'Download report' }).isVisible()).resolves.toBe(true);
    expect(problems).toEqual([]);
  });
});
