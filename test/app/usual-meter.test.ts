/**
 * Tests of src/app/usual-meter.ts: a new reading starts on the meter in use, so a side-by-side
 * offset is applied without a tap; a meter removed from the survey is never offered.
 */
import { describe, expect, it } from 'vitest';
import { usualMeter } from '../../src/app/usual-meter.ts';
import type { SurveyDocument } from '../../src/model/survey-document.ts';

const meter = (id: string, measures: string[] = ['co2', 'temperature']) => ({ id, measures });
const reading = (time: string, instrumentId?: string) => ({ time, ...(instrumentId ? { instrumentId } : {}) });
const doc = (over: { instruments?: object[]; rooms?: object[]; outdoor?: object[] }) =>
  ({ survey: { outdoorReadings: over.outdoor ?? [] }, instruments: over.instruments ?? [], rooms: over.rooms ?? [] }) as unknown as SurveyDocument;

describe('usual meter', () => {
  it('is the meter of the outdoor reading when no room has a reading yet', () => {
    const d = doc({ instruments: [meter('a'), meter('b')], outdoor: [reading('2026-12-02T09:02:00', 'a')] });
    expect(usualMeter(d, { readings: [] })).toBe('a');
  });

  it("prefers the room's own last meter, then the latest reading anywhere", () => {
    const rooms = [{ readings: [reading('2026-12-02T09:30:00', 'b')] }];
    const d = doc({ instruments: [meter('a'), meter('b')], outdoor: [reading('2026-12-02T09:02:00', 'a')], rooms });
    expect(usualMeter(d, { readings: [] })).toBe('b');
    expect(usualMeter(d, { readings: [reading('2026-12-02T09:10:00', 'a')] })).toBe('a');
  });

  it('is the only CO₂ meter when none was named yet, and none when there are two', () => {
    expect(usualMeter(doc({ instruments: [meter('a'), meter('v', ['airflow'])] }))).toBe('a');
    expect(usualMeter(doc({ instruments: [meter('a'), meter('b')] }))).toBeUndefined();
  });

  it('never offers a meter no longer on the survey, or one that does not read CO₂', () => {
    const d = doc({ instruments: [meter('a'), meter('b'), meter('v', ['airflow'])], outdoor: [reading('2026-12-02T09:02:00', 'gone'), reading('2026-12-02T09:05:00', 'v')] });
    expect(usualMeter(d, { readings: [reading('2026-12-02T09:10:00', 'gone')] })).toBeUndefined();
  });
});
