/**
 * The survey overview with 300 rooms, in Chromium on the built app: a survey file of 300 rooms
 * (copies of the demo's classrooms, in three areas, with their readings) is restored through the
 * start screen; then the overview is opened (stored survey read from IndexedDB, every room card
 * drawn) and the time until the 300th card is on screen is taken, with every long task (over
 * 50 ms) the page reported meanwhile — including when the worker's findings arrive and the
 * cards redraw with their headlines. Also prints the start-up JavaScript's gzip size (the entry
 * and the chunks index.html preloads).
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { BenchContext } from '../bench-context.ts';
import { demoFile } from '../../support/fixtures.ts';
import { withFreshIds } from '../../../src/model/fresh-ids.ts';

const ROOMS = 300;

const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/g;

/** A copy of a room whose own record ids (room, readings, openings, groups…) are all new. */
function copyRoom<T>(room: T, outside: ReadonlySet<string>): T {
  const fresh = new Map<string, string>();
  const text = JSON.stringify(room).replace(UUID, (id) => {
    if (outside.has(id)) return id;
    if (!fresh.has(id)) fresh.set(id, crypto.randomUUID());
    return fresh.get(id)!;
  });
  return JSON.parse(text) as T;
}

function bigSurvey() {
  const file = demoFile();
  const school = withFreshIds({ ...file.surveys[0]!, photos: [], series: [] }, () => crypto.randomUUID());
  const outside = new Set([school.survey.id, ...school.areas.map((a) => a.id), ...school.instruments.map((i) => i.id)]);
  const rooms = Array.from({ length: ROOMS }, (_, i) => ({
    ...copyRoom(school.rooms[i % school.rooms.length]!, outside),
    name: `Room ${i + 1}`,
    areaId: school.areas[1 + (i % 2)]!.id,
  }));
  return { ...file, surveys: [{ ...school, survey: { ...school.survey, title: 'Overview bench: 300 rooms (invented)' }, rooms }] };
}

function startupGzip(): { files: number; kB: number } {
  const dist = new URL('../../../dist/', import.meta.url).pathname;
  const html = readFileSync(join(dist, 'index.html'), 'utf8');
  const scripts = [...html.matchAll(/<(?:script[^>]*src|link[^>]*rel="modulepreload"[^>]*href)="\.\/([^"]+\.js)"/g)].map((m) => m[1]!);
  const bytes = scripts.reduce((sum, f) => sum + gzipSync(readFileSync(join(dist, f)), { level: 9 }).length, 0);
  return { files: scripts.length, kB: bytes / 1024 };
}

export default async function overviewBench(ctx: BenchContext): Promise<void> {
  const page = ctx.page;
  if (!page) return;
  const startup = startupGzip();
  ctx.report('start-up JavaScript', { files: startup.files, gzip_kB: startup.kB });

  const path = join(mkdtempSync(join(tmpdir(), 'ventwalk-bench-')), 'overview-300.json');
  const file = bigSurvey();
  writeFileSync(path, JSON.stringify(file));
  await page.getByLabel('Restore from a backup file…').setInputFiles(path);
  await page.getByText('Backup restored').waitFor({ timeout: 120_000 });
  const surveyId = file.surveys[0]!.survey.id;

  await page.evaluate(`window.longTasks = [];
    new PerformanceObserver((list) => { for (const e of list.getEntries()) window.longTasks.push(e.duration); }).observe({ type: 'longtask' });`);

  for (const run of ['first open', 'second open']) {
    await page.evaluate('window.longTasks.length = 0');
    // A string, not a function: the bench runner's transform would add helpers the page lacks.
    const render_ms = (await page.evaluate(`new Promise((resolve) => {
      const start = performance.now();
      location.hash = '#/survey/${surveyId}';
      const poll = () => document.querySelectorAll('ul.rooms > li').length >= ${ROOMS}
        ? requestAnimationFrame(() => resolve(performance.now() - start))
        : requestAnimationFrame(poll);
      poll();
    })`)) as number;
    // Polled cheaply: a text search of 300 cards would itself make long tasks in the page.
    await page.waitForFunction("document.querySelector('[data-testid=analysis-status]')?.dataset.state === 'done'", undefined, { polling: 250, timeout: 300_000 });
    await page.waitForTimeout(300);
    const longTasks = (await page.evaluate('window.longTasks')) as number[];
    ctx.report(`overview of ${ROOMS} rooms, ${run}`, {
      render_ms,
      longTasks_over50ms: longTasks.length,
      longestTask_ms: longTasks.length ? Math.max(...longTasks) : 0,
    });
    await page.evaluate("location.hash = '#/surveys'");
    await page.waitForFunction("document.querySelector('#new-survey-heading') !== null", undefined, { polling: 100 });
  }
}
