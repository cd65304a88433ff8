/**
 * Engine speed: (a) the exact day profile against the odex solver on the same day, (b) many rooms,
 * each a day profile plus a decay fit with a 1000-draw Monte Carlo interval, split over the
 * machine's cores with worker threads (the engine itself stays single-threaded and pure).
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { pathToFileURL } from 'node:url';
import type { BenchContext } from '../bench-context.ts';
import { buildDayProfile, sampleProfile } from '../../../src/core/day-profile.ts';
import { odexLevels } from '../../support/odex-day-profile.ts';
import { busyDay } from '../../support/invented-days.ts';
import { runRooms } from './engine-rooms.ts';

export default async function engineBench(ctx: BenchContext): Promise<void> {
  // (a) exact profile vs odex, sampled every minute over the same day.
  const input = busyDay();
  const repeats = 200;
  let t0 = performance.now();
  let exact = sampleProfile(buildDayProfile(input), 60);
  for (let i = 1; i < repeats; i++) exact = sampleProfile(buildDayProfile(input), 60);
  const exactMs = (performance.now() - t0) / repeats;
  const profile = buildDayProfile(input);
  t0 = performance.now();
  let reference = odexLevels(profile, 60);
  for (let i = 1; i < repeats / 10; i++) reference = odexLevels(profile, 60);
  const odexMs = (performance.now() - t0) / (repeats / 10);
  let largest = 0;
  exact.level_ppm.forEach((c, i) => (largest = Math.max(largest, Math.abs(c - reference.level_ppm[i]!))));
  ctx.report('day profile vs odex', {
    pieces: profile.pieces.length,
    samples: exact.time_s.length,
    exact_ms: exactMs,
    odex_ms: odexMs,
    speed_ratio: odexMs / exactMs,
    largest_difference_ppm: largest,
  });

  // (b) 5000 rooms: day profile + decay fit with a 1000-draw interval.
  const rooms = 5000;
  const workers = Math.max(1, Math.min(availableParallelism(), 8));
  t0 = performance.now();
  const single = runRooms(0, 500);
  const singleMs = performance.now() - t0;
  const startup0 = performance.now();
  // Workers load TypeScript through tsx's loader, registered inside each worker; loading is
  // timed separately from the work (a browser or the command line loads the engine once).
  const entry = pathToFileURL(new URL('./engine-rooms-worker.ts', import.meta.url).pathname).href;
  const bootstrap = `import('tsx/esm/api').then(({ register }) => { register(); return import(${JSON.stringify(entry)}); })`;
  const pool = await Promise.all(
    Array.from({ length: workers }, (_, w) => {
      const from = Math.floor((w * rooms) / workers);
      const to = Math.floor(((w + 1) * rooms) / workers);
      const worker = new Worker(bootstrap, { eval: true, workerData: { from, to } });
      return new Promise<Worker>((resolve, reject) => {
        worker.once('message', () => resolve(worker));
        worker.once('error', reject);
      });
    }),
  );
  const startupMs = performance.now() - startup0;
  t0 = performance.now();
  const shares = await Promise.all(
    pool.map(
      (worker) =>
        new Promise<number>((resolve, reject) => {
          worker.once('message', (done: number) => resolve(done));
          worker.once('error', reject);
          worker.postMessage('go');
        }),
    ),
  );
  const totalMs = performance.now() - t0;
  await Promise.all(pool.map((w) => w.terminate()));
  ctx.report('rooms (profile + decay, 1000 draws)', {
    rooms: shares.reduce((a, b) => a + b, 0),
    workers,
    worker_startup_s: startupMs / 1000,
    total_s: totalMs / 1000,
    target_s: 2,
    rooms_per_s: (rooms / totalMs) * 1000,
    single_thread_rooms_per_s: (single / singleMs) * 1000,
  });
}
