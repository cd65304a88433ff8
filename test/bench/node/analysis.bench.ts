/**
 * analyseSurvey over 5,000 rooms: the invented demo surveys (test/fixtures/demo-survey.json)
 * copied with fresh room ids until they hold 5,000 rooms between them, each copy analysed as a
 * survey of its own (an estates team batching many sites), with every scenario and weather case,
 * and Engine III's judgement (judgement.bench.ts measures that part alone).
 * Rooms per second, single thread, at the default Monte Carlo draws (1000) and reduced ones.
 */
import type { BenchContext } from '../bench-context.ts';
import { analyseSurvey, DEFAULT_DRAWS } from '../../../src/analysis/analyse-survey.ts';
import { demoCopies } from './demo-copies.ts';

const ROOMS = 5000;

export default async function analysisBench(ctx: BenchContext): Promise<void> {
  const surveys = demoCopies(ROOMS);
  const rooms = surveys.reduce((s, d) => s + d.rooms.length, 0);
  for (const draws of [DEFAULT_DRAWS, 200, 50]) {
    analyseSurvey(surveys[0]!, { draws }); // warm-up
    let measured = 0;
    const start = performance.now();
    for (const doc of surveys) measured += analyseSurvey(doc, { draws }).rooms.filter((r) => r.bestMeasuredSetId !== null).length;
    const seconds = (performance.now() - start) / 1000;
    ctx.report(`analyseSurvey (${rooms} rooms, 5 scenarios × 3 weather cases, ${draws} draws)`, {
      rooms,
      measured_rooms: measured,
      total_s: seconds,
      rooms_per_s: rooms / seconds,
      target_s: 3,
    });
  }
}
