/**
 * The built app served under a sub-path, as on a shared static host (https://host/ventwalk/):
 * a tiny static server maps /ventwalk/ to dist/ and nothing else. The app loads there, its
 * manifest's start URL and scope and its service worker's scope are the sub-path, the worker
 * takes control, and with the network off — and the server stopped — a reload still shows it.
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import { createServer, type Server } from 'node:http';
import { readFile } from 'node:fs/promises';
import { extname, join, normalize } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { BrowserContext, Page } from 'playwright-core';
import { expectOfflineStart, openPhone } from '../support/browser.ts';

const baseURL = inject('baseURL');
const DIST = fileURLToPath(new URL('../../dist/', import.meta.url));
const PREFIX = '/ventwalk/';
const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.webmanifest': 'application/manifest+json',
  '.json': 'application/json',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
};

/** Serve dist/ at /ventwalk/ only; /ventwalk redirects to /ventwalk/ (as most web servers do). */
function subPathServer(): Server {
  return createServer((request, response) => {
    const path = decodeURIComponent(new URL(request.url ?? '/', 'http://x').pathname);
    if (path === PREFIX.slice(0, -1)) {
      response.writeHead(301, { Location: PREFIX }).end();
      return;
    }
    const inside = path.startsWith(PREFIX) ? normalize(path.slice(PREFIX.length)) : null;
    if (inside === null || inside.startsWith('..')) {
      response.writeHead(404).end('Not here');
      return;
    }
    const file = join(DIST, inside === '.' || inside === '' ? 'index.html' : inside);
    readFile(file).then(
      (body) => response.writeHead(200, { 'Content-Type': TYPES[extname(file)] ?? 'application/octet-stream', 'Cache-Control': 'no-cache' }).end(body),
      () => response.writeHead(404).end('Not found'),
    );
  });
}

describe.skipIf(!baseURL)('the built app under a sub-path', () => {
  let server: Server;
  let origin: string;
  let context: BrowserContext;
  let page: Page;
  let close: () => Promise<void>;
  const requested: string[] = [];

  beforeAll(async () => {
    server = subPathServer();
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const address = server.address();
    origin = `http://127.0.0.1:${typeof address === 'object' && address ? address.port : 0}`;
    ({ context, close } = await openPhone());
    context.on('request', (r) => requested.push(r.url()));
    page = context.pages()[0] ?? (await context.newPage());
  });

  afterAll(async () => {
    await close?.();
    if (server.listening) await new Promise((resolve) => server.close(resolve));
  });

  it('loads at /ventwalk (redirected to /ventwalk/) and installs for offline use', async () => {
    await page.goto(`${origin}/ventwalk`);
    expect(page.url()).toBe(`${origin}${PREFIX}`);
    await page.getByRole('heading', { name: 'Start a survey' }).waitFor();
    await page.getByText('Ready to work offline').waitFor({ timeout: 20_000 });
  });

  it('has its manifest start URL and scope, and its service worker scope, at the sub-path', async () => {
    const found = await page.evaluate(async () => {
      const link = document.querySelector<HTMLLinkElement>('link[rel="manifest"]')!;
      const manifest = (await (await fetch(link.href)).json()) as { start_url: string; scope: string };
      const registration = await navigator.serviceWorker.ready;
      return {
        startUrl: new URL(manifest.start_url, link.href).href,
        scope: new URL(manifest.scope, link.href).href,
        workerScope: registration.scope,
        worker: registration.active?.scriptURL,
      };
    });
    expect(found).toEqual({
      startUrl: `${origin}${PREFIX}`,
      scope: `${origin}${PREFIX}`,
      workerScope: `${origin}${PREFIX}`,
      worker: `${origin}${PREFIX}sw.js`,
    });
  });

  it('is controlled by its service worker from the next load', async () => {
    await page.reload();
    await expect(page.evaluate(() => navigator.serviceWorker.controller !== null)).resolves.toBe(true);
  });

  it('starts with the network off and the server gone', async () => {
    await new Promise((resolve) => server.close(resolve));
    server.closeAllConnections();
    await expectOfflineStart(context, page);
  });

  it('asked for nothing outside the sub-path', () => {
    const outside = requested.filter((u) => u.startsWith(origin) && !u.startsWith(`${origin}${PREFIX}`) && u !== `${origin}/ventwalk`);
    expect(requested.length).toBeGreaterThan(0);
    expect(outside).toEqual([]);
  });
});
