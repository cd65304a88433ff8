/**
 * Lighthouse mobile scores of the built app (`npm run bench -- lighthouse`): the start screen on
 * a first visit (empty profile), then — with the demo surveys loaded into IndexedDB through the
 * start screen's own button — the invented school's overview, its first room and that room's
 * findings. Prints per page the performance, accessibility and best-practices scores, each as a
 * ratio of the 95 target, the main timings, the audits that did not pass, and any request that
 * left 127.0.0.1. Set LIGHTHOUSE_RUNS=3 to take the median of three runs per page (Lighthouse's
 * performance score varies from run to run, more so on a busy machine: its simulated 4× CPU
 * slowdown multiplies whatever the host's other work adds, so the host's benchmark index and load
 * average are printed beside the timings).
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import type { BenchContext } from '../bench-context.ts';
import { CHROMIUM_ARGS, findChromium } from '../../support/browser.ts';
import { demoFile } from '../../support/fixtures.ts';
import { auditPage, CATEGORIES, openAuditBrowser, type PageAudit } from './audit-page.ts';

/** The issue's target for each of the three categories. */
const TARGET = 95;

/** Loads the demo surveys into `profile`'s IndexedDB as a surveyor would: the start screen's button. */
async function loadDemoInto(profile: string, baseURL: string, executablePath: string): Promise<void> {
  const context = await chromium.launchPersistentContext(profile, { executablePath, headless: true, args: CHROMIUM_ARGS });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    await page.goto(baseURL);
    await page.getByRole('button', { name: 'Load the demo surveys (invented data)' }).click();
    await page.getByText(/^Loaded \d+ demo surveys/).waitFor({ timeout: 60_000 });
  } finally {
    await context.close();
  }
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)]!;
}

async function auditPages(ctx: BenchContext, pages: [string, string][], profile: string, executablePath: string, runs: number): Promise<boolean[]> {
  const browser = await openAuditBrowser(executablePath, profile);
  const met: boolean[] = [];
  try {
    for (const [name, url] of pages) {
      const audits: PageAudit[] = [];
      for (let i = 0; i < runs; i += 1) audits.push(await auditPage(url, browser.port));
      // The run with the median performance score speaks for the page's timings and audits.
      const perf = median(audits.map((a) => a.scores.performance));
      const typical = audits.find((a) => a.scores.performance === perf)!;
      const scores = Object.fromEntries(CATEGORIES.map((c) => [c, median(audits.map((a) => a.scores[c]))]));
      ctx.report(name, {
        ...Object.fromEntries(CATEGORIES.map((c) => [c, scores[c]!])),
        ...Object.fromEntries(CATEGORIES.map((c) => [`${c}/${TARGET}`, scores[c]! / TARGET])),
        ...(runs > 1 ? { runs, performance_runs: audits.map((a) => a.scores.performance).join('/') } : {}),
      });
      ctx.report(`${name}, timings`, { ...typical.metrics, benchmarkIndex: typical.benchmarkIndex, load_1min: loadavg()[0]!, offHost_requests: typical.offHost.length });
      for (const f of typical.failing) {
        console.log(`    not passed (${f.category}): ${f.id} — ${f.title}${f.display ? ` (${f.display})` : ''}`);
        for (const n of f.nodes) console.log(`      at ${n}`);
      }
      if (typical.errored.length > 0) console.log(`    could not run (not scored): ${typical.errored.map((e) => e.id).join(', ')} — ${typical.errored[0]!.message.slice(0, 100)}`);
      for (const u of typical.offHost) console.log(`    request off 127.0.0.1: ${u}`);
      for (const w of typical.warnings) console.log(`    Lighthouse warning: ${w}`);
      met.push(CATEGORIES.every((c) => scores[c]! >= TARGET));
    }
  } finally {
    await browser.close();
  }
  return met;
}

export default async function lighthouseBench(ctx: BenchContext): Promise<void> {
  const executablePath = findChromium();
  if (!ctx.baseURL || !executablePath) return;
  const base = ctx.baseURL.replace(/\/$/, '/');
  const runs = Math.max(1, Number(process.env.LIGHTHOUSE_RUNS ?? 1) || 1);
  const school = demoFile().surveys[0]!;
  const room = school.rooms[0]!;
  const survey = `${base}#/survey/${school.survey.id}`;

  const first = mkdtempSync(join(tmpdir(), 'ventwalk-lh-'));
  const stored = mkdtempSync(join(tmpdir(), 'ventwalk-lh-demo-'));
  try {
    const met = await auditPages(ctx, [['start screen, first visit', base]], first, executablePath, runs);
    await loadDemoInto(stored, base, executablePath);
    met.push(
      ...(await auditPages(
        ctx,
        [
          [`overview (${school.rooms.length} rooms, demo)`, survey],
          [`room “${room.name}”`, `${survey}/room/${room.id}`],
          [`findings of “${room.name}”`, `${survey}/room/${room.id}/findings`],
        ],
        stored,
        executablePath,
        runs,
      )),
    );
    ctx.report('pages at the target in all three categories', { met: met.filter(Boolean).length, of: met.length, target: TARGET });
  } finally {
    rmSync(first, { recursive: true, force: true });
    rmSync(stored, { recursive: true, force: true });
  }
}
