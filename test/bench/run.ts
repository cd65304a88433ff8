/**
 * `npm run bench [-- node|chromium|lighthouse] [name…]`: runs the benchmarks (all node and
 * chromium ones, or those whose file name contains a given word) and prints their figures and
 * ratios. Lighthouse (test/bench/lighthouse/) runs only when asked for: it takes minutes.
 *
 * Benchmarks measure; they never pass or fail on time (a busy machine would make that flaky).
 * Each file in test/bench/node/ or test/bench/chromium/ exports `default` an async function
 * that receives a `BenchContext` and prints its own figures through `ctx.report`.
 * Chromium benchmarks get a page of the built app served on 127.0.0.1 (see chromium-context.ts);
 * Lighthouse benchmarks get the served app's address and drive their own Chromium.
 */
import { readdirSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { join } from 'node:path';
import type { BenchContext } from './bench-context.ts';

const here = fileURLToPath(new URL('.', import.meta.url));
const args = process.argv.slice(2);
const MODES = ['node', 'chromium', 'lighthouse'];
const modes = args.filter((a) => MODES.includes(a));
const wanted = modes.length > 0 ? modes : ['node', 'chromium'];
/** Other words pick benchmarks by file name: `npm run bench -- node analysis`. */
const names = args.filter((a) => !MODES.includes(a));

function report(name: string, figures: Record<string, string | number>): void {
  const parts = Object.entries(figures).map(([k, v]) => `${k}=${typeof v === 'number' ? formatNumber(v) : v}`);
  console.log(`  ${name}: ${parts.join('  ')}`);
}

function formatNumber(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  const abs = Math.abs(v);
  if (abs !== 0 && (abs < 1e-3 || abs >= 1e7)) return v.toExponential(3);
  return Number(v.toPrecision(4)).toString();
}

for (const mode of wanted) {
  const dir = join(here, mode);
  const files = readdirSync(dir)
    .filter((f) => f.endsWith('.bench.ts') && (names.length === 0 || names.some((n) => f.includes(n))))
    .sort();
  console.log(`\n[bench: ${mode}]`);
  if (files.length === 0) {
    console.log('  no benchmarks yet');
    continue;
  }
  let ctx: BenchContext = { report };
  let close: (() => Promise<void>) | undefined;
  if (mode === 'chromium') {
    const { openChromiumContext } = await import('./chromium-context.ts');
    const opened = await openChromiumContext(report);
    if (!opened) continue;
    ctx = opened.ctx;
    close = opened.close;
  }
  if (mode === 'lighthouse') {
    const { findChromium, INSTALL_HINT } = await import('../support/browser.ts');
    if (!findChromium()) {
      console.log(`  skipped: ${INSTALL_HINT}`);
      continue;
    }
    const { serveBuiltApp } = await import('./built-app.ts');
    const app = await serveBuiltApp();
    ctx = { report, baseURL: app.url };
    close = app.close;
  }
  try {
    for (const file of files) {
      console.log(` ${file}`);
      const mod = (await import(pathToFileURL(join(dir, file)).href)) as { default: (c: BenchContext) => Promise<void> };
      await mod.default(ctx);
    }
  } finally {
    await close?.();
  }
}
