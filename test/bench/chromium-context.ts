/**
 * Chromium mode for `npm run bench`: builds the app, serves it on 127.0.0.1 and opens it in a
 * phone-sized page. Returns undefined (after saying why) when no Chromium is installed.
 */
import type { BenchContext } from './bench-context.ts';
import { serveBuiltApp } from './built-app.ts';
import { findChromium, INSTALL_HINT, openPhone } from '../support/browser.ts';

export async function openChromiumContext(
  report: BenchContext['report'],
): Promise<{ ctx: BenchContext; close: () => Promise<void> } | undefined> {
  if (!findChromium()) {
    console.log(`  skipped: ${INSTALL_HINT}`);
    return undefined;
  }
  const app = await serveBuiltApp();
  const phone = await openPhone();
  const page = phone.context.pages()[0] ?? (await phone.context.newPage());
  await page.goto(app.url);
  return {
    ctx: { report, page, baseURL: app.url },
    close: async () => {
      await phone.close();
      await app.close();
    },
  };
}
