/**
 * The compile hint, checked against the real build: the entry and the screens' chunks start with
 * V8's whole-file compile hint (so a screen's code is compiled off the page's thread as it
 * streams in); the report's PDF renderer and jspdf's optional chunks do not.
 */
import { describe, it, expect, inject } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { EAGER_COMPILE_HINT } from '../../src/pwa/eager-compile.ts';
import { optionalJspdfChunks } from '../../src/pwa/precache-rule.ts';

const assets = fileURLToPath(new URL('../../dist/assets/', import.meta.url));
const baseURL = inject('baseURL');

describe.skipIf(!baseURL)('compile hint in the production build', () => {
  const scripts = readdirSync(assets).filter((f) => f.endsWith('.js'));
  const hinted = (prefix: string) => scripts.filter((f) => f.startsWith(prefix)).map((f) => readFileSync(join(assets, f), 'utf8').startsWith(EAGER_COMPILE_HINT));

  it('starts the entry and the walk screens’ chunks with the hint', () => {
    const html = readFileSync(join(assets, '..', 'index.html'), 'utf8');
    const entry = /<script type="module"[^>]*src="\.\/assets\/([^"]+\.js)"/.exec(html)?.[1];
    expect(entry).toBeDefined();
    expect(readFileSync(join(assets, entry!), 'utf8').startsWith(EAGER_COMPILE_HINT)).toBe(true);
    for (const screen of ['SurveyShell-', 'OverviewScreen-', 'RoomScreen-', 'FindingsScreen-', 'LoggerImport-']) expect(hinted(screen), screen).toEqual([true]);
  });

  it('leaves the report’s PDF renderer and jspdf’s optional chunks as they are', () => {
    for (const prefix of ['render-report-pdf-', ...optionalJspdfChunks]) {
      const found = hinted(prefix);
      expect(found.length, prefix).toBeGreaterThan(0);
      expect(found.every((h) => !h), prefix).toBe(true);
    }
  });
});
