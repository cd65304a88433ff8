/**
 * analyseSurvey over 5,000 rooms: the invented demo surveys (test/fixtures/demo-survey.json)
 * copied with fresh room ids until they hold 5,000 rooms between them, each copy analysed as a
 * survey of its own (an estates team batching many sites), with every scenario and weather case
 * and Engine III's judgement (judgement.bench.ts measures that part alone). The demo rooms are
 * measurement-heavy (several tests, spot readings and a logger each), so they are a hard case.
 * Printed: one thread, and the surveys split over the machine's cores; at the default Monte Carlo
 * draws (1000) and at 200.
 */
import type { BenchContext } from '../bench-context.ts';
import { analyseSurvey, DEFAULT_DRAWS } from '../../../src/analysis/analyse-survey.ts';
import { demoCopies } from './demo-copies.ts';
import { runInWorkers } from './worker-pool.ts';

const ROOMS = 5000;

export default async function analysisBench(ctx: BenchContext): Promise<void> {
  const sample = demoCopies(500);
  for (const draws of [DEFAULT_DRAWS, 200]) {
    analyseSurvey(sample[0]!, { draws }); // warm-up
    const start = performance.now();
    let rooms = 0;
    for (const doc of sample) rooms += analyseSurvey(doc, { draws }).rooms.length;
    const single = rooms / ((performance.now() - start) / 1000);
    const run = await runInWorkers(new URL('./analysis-worker.ts', import.meta.url), (worker, workers) => ({ rooms: ROOMS, worker, workers, draws }));
    const analysed = run.results.reduce((a, b) => a + b, 0);
    ctx.report(`analyseSurvey with judgement (${analysed} rooms, 5 scenarios × 3 weather cases, ${draws} draws)`, {
      single_thread_rooms_per_s: single,
      workers: run.workers,
      worker_startup_s: run.startup_s,
      total_s: run.work_s,
      rooms_per_s: analysed / run.work_s,
      target_s: 3,
    });
  }
}
