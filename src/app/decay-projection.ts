/**
 * What ten more minutes of a decay would buy: readings are added every interval for ten minutes
 * along the decay as fitted so far (outdoor + excess·e^(−λt)), the room is analysed again in the
 * worker, and the test's new interval is returned beside the present one. A projection, said to
 * be one: it assumes the decay carries on as fitted.
 *
 * Example: a decay fitted at 1.0 h⁻¹ read every 3 min gains three readings.
 */
import type { MeasuredEstimate, Ranged } from '../analysis/results.ts';
import type { Reading } from '../model/reading.ts';
import type { SurveyDocument } from '../model/survey-document.ts';
import { analyseInWorker } from './analysis-client.ts';
import { localIso } from './local-time.ts';

export const PROJECTION_S = 600;

export async function projectTenMoreMinutes(
  document: SurveyDocument,
  roomId: string,
  testId: string,
  fit: MeasuredEstimate,
  interval_s: number,
): Promise<Ranged | null> {
  const room = document.rooms.find((r) => r.id === roomId);
  const test = room?.tests.find((t) => t.id === testId);
  const rate = fit.airChangeRate_perSecond.value;
  if (!room || !test || rate === null) return null;
  const inTest = room.readings.filter((r) => test.readingIds.includes(r.id)).sort((a, b) => Date.parse(a.time) - Date.parse(b.time));
  const last = inTest.at(-1);
  if (!last || last.co2_ppm === undefined) return null;
  const outdoor = fit.outdoor.value_ppm;
  const extra: Reading[] = [];
  for (let k = 1; k * interval_s <= PROJECTION_S; k += 1) {
    const t = k * interval_s;
    const level = outdoor + (last.co2_ppm - outdoor) * Math.exp(-rate * t);
    extra.push({ ...last, id: crypto.randomUUID(), time: localIso(new Date(Date.parse(last.time) + t * 1000)), co2_ppm: Math.round(level) });
  }
  const projected: SurveyDocument = {
    ...document,
    rooms: [{ ...room, readings: [...room.readings, ...extra], tests: room.tests.map((t) => (t.id === testId ? { ...t, readingIds: [...t.readingIds, ...extra.map((r) => r.id)] } : t)) }],
  };
  const results = await analyseInWorker({ document: projected });
  return results.rooms[0]?.measured.find((m) => m.setId === testId)?.supply_m3s ?? null;
}
