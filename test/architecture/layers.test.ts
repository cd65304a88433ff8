/**
 * Dependency rules between src/ folders (DEVELOPERS.md, "Layers"). Arrows point down only.
 * Each source file's relative imports are resolved to the folder they land in and checked
 * against the allowed list; only src/store may import idb; only src/report may import jspdf.
 */
import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';

const srcDir = new URL('../../src/', import.meta.url).pathname;

/** Which layers each layer may import (besides itself). */
const allowed: Record<string, string[]> = {
  core: [],
  model: ['core'],
  analysis: ['core', 'model'],
  store: ['model', 'core'],
  ingest: ['core', 'model'],
  chart: ['core'],
  report: ['analysis', 'chart', 'core', 'model'],
  pwa: [],
  app: ['store', 'analysis', 'report', 'ingest', 'pwa', 'model', 'core', 'chart'],
  ui: ['app', 'core', 'model', 'chart', 'pwa'],
  cli: ['analysis', 'report', 'ingest', 'model', 'core'],
  '': ['ui', 'app', 'pwa'], // src/main.ts, the entry
};

/** Packages only one layer may import. */
const packageOwners: Record<string, string[]> = {
  idb: ['store'],
  jspdf: ['report'],
  'jspdf-autotable': ['report'],
  papaparse: ['ingest'],
};

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return files(path);
    return /\.(ts|svelte)$/.test(name) ? [path] : [];
  });
}

function layerOf(path: string): string {
  const rel = relative(srcDir, path);
  return rel.includes(sep) ? rel.split(sep)[0]! : '';
}

const importPattern = /(?:import|export)\s[^'"]*?from\s+['"]([^'"]+)['"]|import\s*\(\s*['"]([^'"]+)['"]\s*\)|import\s+['"]([^'"]+)['"]/g;

describe('layer rules', () => {
  it('every src/ folder is a known layer', () => {
    const folders = readdirSync(srcDir).filter((n) => statSync(join(srcDir, n)).isDirectory());
    expect(folders.filter((f) => !(f in allowed))).toEqual([]);
  });

  it('imports point down only, and owned packages stay with their owner', () => {
    const offences: string[] = [];
    for (const file of files(srcDir)) {
      const from = layerOf(file);
      const text = readFileSync(file, 'utf8');
      for (const m of text.matchAll(importPattern)) {
        const spec = m[1] ?? m[2] ?? m[3] ?? '';
        if (spec.startsWith('.')) {
          const to = layerOf(resolve(dirname(file), spec));
          if (to !== from && !allowed[from]!.includes(to)) {
            offences.push(`${relative(srcDir, file)} (${from || 'entry'}) imports ${spec} (${to || 'entry'})`);
          }
        } else {
          const pkg = spec.startsWith('@') ? spec.split('/').slice(0, 2).join('/') : spec.split('/')[0]!;
          const owners = packageOwners[pkg];
          if (owners && !owners.includes(from)) offences.push(`${relative(srcDir, file)} imports ${pkg}`);
        }
      }
    }
    expect(offences, offences.join('\n')).toEqual([]);
  });

  it('each src/ folder states its rule in a README', () => {
    const folders = readdirSync(srcDir).filter((n) => statSync(join(srcDir, n)).isDirectory());
    const missing = folders.filter((f) => {
      try {
        return readFileSync(join(srcDir, f, 'README.md'), 'utf8').trim().length < 40;
      } catch {
        return true;
      }
    });
    expect(missing).toEqual([]);
  });
});
