/**
 * The CO₂ meter a new reading starts with, so the side-by-side offset is applied and the outdoor
 * level cancels without a tap each time: the meter of this room's last reading; else the meter of
 * the survey's latest reading anywhere (a room or outdoors); else the survey's only CO₂ meter;
 * else none ("Not recorded"). A meter no longer on the survey is never offered.
 *
 * Example: two CO₂ meters, the outdoor reading at 09:02 on A-1001 and no room readings yet: a new
 * room reading starts on A-1001.
 */
import type { SurveyDocument, DocumentRoom } from '../model/survey-document.ts';

export function usualMeter(doc: Pick<SurveyDocument, 'survey' | 'instruments' | 'rooms'>, room?: { readings: readonly Pick<DocumentRoom['readings'][number], 'instrumentId'>[] }): string | undefined {
  const known = new Set(doc.instruments.filter((i) => i.measures.includes('co2')).map((i) => i.id));
  const own = room?.readings.at(-1)?.instrumentId;
  if (own && known.has(own)) return own;
  const used = [...doc.rooms.flatMap((r) => r.readings), ...doc.survey.outdoorReadings]
    .filter((r): r is typeof r & { instrumentId: string } => r.instrumentId !== undefined && known.has(r.instrumentId))
    .sort((a, b) => Date.parse(a.time) - Date.parse(b.time));
  const latest = used.at(-1)?.instrumentId;
  if (latest) return latest;
  return known.size === 1 ? [...known][0] : undefined;
}
