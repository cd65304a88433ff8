/**
 * Real Chromium for browser tests, benchmarks and the icon renderer: Debian's /usr/bin/chromium
 * (or CHROME_PATH) driven by playwright-core. Never downloads a browser.
 */
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

/** Flags proven on this machine as root, without network (toolchain notes). */
export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** A phone: 390 × 844 CSS px at 2× with touch (a common mid-size handset). */
export const PHONE = {
  viewport: { width: 390, height: 844 },
  deviceScaleFactor: 2,
  isMobile: true,
  hasTouch: true,
} as const;

export const INSTALL_HINT =
  'Chromium not found: browser tests need it. Install it (on Debian: apt-get install chromium) or set CHROME_PATH.';

/** Where Chromium is, or undefined. */
export function findChromium(): string | undefined {
  const candidates = [process.env.CHROME_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser'];
  return candidates.find((p): p is string => !!p && existsSync(p));
}

export async function launchBrowser(): Promise<Browser | undefined> {
  const executablePath = findChromium();
  if (!executablePath) return undefined;
  return chromium.launch({ executablePath, headless: true, args: CHROMIUM_ARGS });
}

/** A fresh phone profile (its own storage and service workers); close() removes it. */
export async function openPhone(): Promise<{ context: BrowserContext; close: () => Promise<void> }> {
  const executablePath = findChromium();
  if (!executablePath) throw new Error(INSTALL_HINT);
  const profile = mkdtempSync(join(tmpdir(), 'ventwalk-phone-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath,
    headless: true,
    args: CHROMIUM_ARGS,
    ...PHONE,
    serviceWorkers: 'allow',
  });
  return {
    context,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** With the network off, reload the page and wait for the start screen and the offline notice. */
export async function expectOfflineStart(context: BrowserContext, page: Page): Promise<void> {
  await context.setOffline(true);
  try {
    await page.reload();
    await page.getByRole('heading', { name: 'Start a survey' }).waitFor();
    await page.getByText('Offline — working on this device').waitFor();
  } finally {
    await context.setOffline(false);
  }
}

/**
 * A fresh phone with its first page, collecting every page error and console error into
 * `problems`, so a test can end by asserting the page raised none.
 */
export async function openWatchedPhone(): Promise<{ context: BrowserContext; page: Page; close: () => Promise<void>; problems: string[] }> {
  const { context, close } = await openPhone();
  const page = context.pages()[0] ?? (await context.newPage());
  const problems: string[] = [];
  page.on('pageerror', (error) => problems.push(error.message));
  page.on('console', (m) => void (m.type() === 'error' && problems.push(m.text())));
  return { context, page, close, problems };
}

/** Wait until no part of the screen is still being built (a room mounts its parts a frame at a time). */
export async function screenBuilt(page: Page): Promise<void> {
  await page.waitForFunction(() => document.querySelector('[aria-busy="true"]') === null);
}
