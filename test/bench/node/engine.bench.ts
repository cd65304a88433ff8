/**
 * Engine speed: (a) the exact day profile against the odex solver on the same day, (b) many rooms,
 * each a day profile plus a decay fit with a 1000-draw Monte Carlo interval, split over the
 * machine's cores with worker threads (the engine itself stays single-threaded and pure).
 */
import type { BenchContext } from '../bench-context.ts';
import { buildDayProfile, sampleProfile } from '../../../src/core/day-profile.ts';
import { odexLevels } from '../../support/odex-day-profile.ts';
import { busyDay } from '../../support/invented-days.ts';
import { runRooms } from './engine-rooms.ts';
import { runInWorkers } from './worker-pool.ts';

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
  t0 = performance.now();
  const single = runRooms(0, 500);
  const singleMs = performance.now() - t0;
  const run = await runInWorkers(new URL('./engine-rooms-worker.ts', import.meta.url), (w, n) => ({
    from: Math.floor((w * rooms) / n),
    to: Math.floor(((w + 1) * rooms) / n),
  }));
  const totalMs = run.work_s * 1000;
  const startupMs = run.startup_s * 1000;
  const shares = run.results;
  const workers = run.workers;
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
