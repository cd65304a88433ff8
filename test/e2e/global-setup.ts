/**
 * Browser-test setup: build the app for production into dist/ and serve it with Vite's preview
 * on 127.0.0.1. Tests receive the address through `inject('baseURL')`.
 *
 * Without Chromium the browser tests are skipped with a loud line (and counted as skipped);
 * with REQUIRE_BROWSER=1 a missing browser fails the run.
 */
import { fileURLToPath } from 'node:url';
import { build, preview } from 'vite';
import type { TestProject } from 'vitest/node';
import { findChromium, INSTALL_HINT } from '../support/browser.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    /** Address of the served production build, or '' when browser tests are skipped. */
    baseURL: string;
  }
}

const configFile = fileURLToPath(new URL('../../vite.config.ts', import.meta.url));

export default async function setup(project: TestProject): Promise<(() => Promise<void>) | undefined> {
  if (!findChromium()) {
    if (process.env.REQUIRE_BROWSER === '1') throw new Error(`${INSTALL_HINT} (REQUIRE_BROWSER=1 makes this a failure)`);
    const line = '!'.repeat(100);
    console.warn(`\n${line}\n!! BROWSER TESTS SKIPPED. ${INSTALL_HINT}\n${line}\n`);
    project.provide('baseURL', '');
    return undefined;
  }
  // Vitest sets NODE_ENV=test; the app under test must be the production build.
  const previous = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  try {
    await build({ configFile, mode: 'production', logLevel: 'warn' });
  } finally {
    process.env.NODE_ENV = previous;
  }
  const server = await preview({ configFile, logLevel: 'warn', preview: { port: 4180, strictPort: false } });
  const url = server.resolvedUrls?.local[0];
  if (!url) throw new Error('The preview server did not report an address');
  project.provide('baseURL', url);
  return async () => {
    await server.close();
  };
}
