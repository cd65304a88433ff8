/**
 * analyseSurvey over 5,000 rooms: the invented demo surveys (test/fixtures/demo-survey.json)
 * copied with fresh room ids until they hold 5,000 rooms between them, each copy analysed as a
 * survey of its own (an estates team batching many sites), with every scenario and weather case.
 * Rooms per second, single thread, at the default Monte Carlo draws (1000) and reduced ones.
 */
import type { BenchContext } from '../bench-context.ts';
import { analyseSurvey, DEFAULT_DRAWS } from '../../../src/analysis/analyse-survey.ts';
import type { SurveyDocument } from '../../../src/model/survey-document.ts';
import { demoFile } from '../../support/fixtures.ts';

const ROOMS = 5000;

/** Copies of the demo surveys with fresh room ids (the copy number in the id), 5,000 rooms in all. */
function copies(): SurveyDocument[] {
  const demos = demoFile().surveys as SurveyDocument[];
  const out: SurveyDocument[] = [];
  let rooms = 0;
  for (let copy = 0; rooms < ROOMS; copy++) {
    for (const doc of demos) {
      if (rooms >= ROOMS) break;
      const take = doc.rooms.slice(0, ROOMS - rooms);
      out.push({ ...doc, rooms: take.map((r) => ({ ...r, id: `${r.id.slice(0, 24)}${copy.toString(16).padStart(6, '0')}${r.id.slice(30)}` })) });
      rooms += take.length;
    }
  }
  return out;
}

export default async function analysisBench(ctx: BenchContext): Promise<void> {
  const surveys = copies();
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
