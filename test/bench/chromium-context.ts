/**
 * Chromium mode for `npm run bench`: builds the app, serves it on 127.0.0.1 and opens it in a
 * phone-sized page. Returns undefined (after saying why) when no Chromium is installed.
 */
import { fileURLToPath } from 'node:url';
import { build, preview } from 'vite';
import type { BenchContext } from './bench-context.ts';
import { findChromium, INSTALL_HINT, openPhone } from '../support/browser.ts';

const configFile = fileURLToPath(new URL('../../vite.config.ts', import.meta.url));

export async function openChromiumContext(
  report: BenchContext['report'],
): Promise<{ ctx: BenchContext; close: () => Promise<void> } | undefined> {
  if (!findChromium()) {
    console.log(`  skipped: ${INSTALL_HINT}`);
    return undefined;
  }
  process.env.NODE_ENV = 'production';
  await build({ configFile, mode: 'production', logLevel: 'warn' });
  const server = await preview({ configFile, logLevel: 'warn', preview: { port: 4181, strictPort: false } });
  const url = server.resolvedUrls?.local[0];
  if (!url) throw new Error('The preview server did not report an address');
  const phone = await openPhone();
  const page = phone.context.pages()[0] ?? (await phone.context.newPage());
  await page.goto(url);
  return {
    ctx: { report, page },
    close: async () => {
      await phone.close();
      await server.close();
    },
  };
}
