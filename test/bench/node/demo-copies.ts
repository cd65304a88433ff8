/**
 * The invented demo surveys (test/fixtures/demo-survey.json) copied with fresh room ids (the copy
 * number in the id) until they hold `rooms` rooms between them: many sites batched by one team.
 */
import type { SurveyDocument } from '../../../src/model/survey-document.ts';
import { demoFile } from '../../support/fixtures.ts';

export function demoCopies(rooms: number): SurveyDocument[] {
  const demos = demoFile().surveys as SurveyDocument[];
  const out: SurveyDocument[] = [];
  let count = 0;
  for (let copy = 0; count < rooms; copy++) {
    for (const doc of demos) {
      if (count >= rooms) break;
      const take = doc.rooms.slice(0, rooms - count);
      out.push({ ...doc, rooms: take.map((r) => ({ ...r, id: `${r.id.slice(0, 24)}${copy.toString(16).padStart(6, '0')}${r.id.slice(30)}` })) });
      count += take.length;
    }
  }
  return out;
}
