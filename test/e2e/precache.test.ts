/**
 * The precache rule, checked against the real build: every emitted JS, CSS, font and worker
 * file is in the service worker's precache, except jspdf's optional html2canvas / canvg /
 * dompurify chunks, which must stay out. Later chunks are covered without editing this test.
 */
import { describe, it, expect, inject } from 'vitest';
import { readdirSync, readFileSync, statSync, existsSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { optionalJspdfChunks } from '../../src/pwa/precache-rule.ts';

const dist = fileURLToPath(new URL('../../dist/', import.meta.url));
const baseURL = inject('baseURL');

function emitted(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? emitted(path) : [relative(dist, path)];
  });
}

function precached(): Set<string> {
  const sw = readFileSync(join(dist, 'sw.js'), 'utf8');
  return new Set([...sw.matchAll(/url:"([^"]+)"/g)].map((m) => m[1]!));
}

describe.skipIf(!baseURL)('production build', () => {
  it('lands in dist/ at the top level with index.html, a service worker and a manifest', () => {
    for (const file of ['index.html', 'sw.js', 'manifest.webmanifest']) expect(existsSync(join(dist, file)), file).toBe(true);
    const manifest = JSON.parse(readFileSync(join(dist, 'manifest.webmanifest'), 'utf8'));
    expect(manifest.short_name).toBe('Ventwalk');
    const sizes = manifest.icons.map((i: { sizes: string; purpose?: string }) => `${i.sizes}:${i.purpose ?? 'any'}`);
    expect(sizes).toEqual(expect.arrayContaining(['192x192:any', '512x512:any', '512x512:maskable']));
    for (const icon of manifest.icons) expect(existsSync(join(dist, icon.src)), icon.src).toBe(true);
  });

  it('precaches every emitted script, style, font and worker except jspdf’s optional chunks', () => {
    const cached = precached();
    const isOptional = (f: string) => optionalJspdfChunks.some((name) => f.includes(name));
    const needed = emitted(dist).filter(
      (f) => /\.(m?js|css|woff2?|ttf|otf|html)$/.test(f) && !isOptional(f) && !/^(sw|workbox-[\w-]+)\.js$/.test(f),
    );
    expect(needed.length).toBeGreaterThan(2);
    expect(needed.filter((f) => !cached.has(f))).toEqual([]);
    expect([...cached].filter(isOptional)).toEqual([]);
    // By content too: canvg's own module is index.es.js, so a chunk named after it would slip through.
    const holdsOptional = (f: string) => f.endsWith('.js') && /\bas Canvg\b|data-html2canvas-debug|DOMPurify\.sanitize/.test(readFileSync(join(dist, f), 'utf8'));
    expect([...cached].filter(holdsOptional)).toEqual([]);
  });
});
