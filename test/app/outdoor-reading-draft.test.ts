/**
 * The outdoor reading form's rules (src/app/outdoor-reading-draft.ts): a changed reading keeps its
 * id and recorded time unless its time of day is changed, a changed time keeps the date and
 * offset, the schema's messages come back by field, and a saved change replaces the old reading.
 */
import { describe, it, expect } from 'vitest';
import {
  nextOutdoorMoment,
  outdoorDraft,
  outdoorReadingFromDraft,
  withClockTime,
  withOutdoorReading,
  type OutdoorReading,
} from '../../src/app/outdoor-reading-draft.ts';

const start: OutdoorReading = {
  id: '0f0f0002-0000-4000-8000-000000000001',
  time: '2026-01-14T08:05:30+01:00',
  moment: 'start',
  co2_ppm: 428,
  temp_C: 4.2,
  location: 'Playground, upwind (invented)',
};
const NOW = new Date('2026-01-14T15:00:00Z');
const fail = () => {
  throw new Error('no new id expected');
};

describe('outdoor reading form rules', () => {
  it('an unchanged reading comes back exactly as stored, seconds and offset included', () => {
    expect(outdoorReadingFromDraft(outdoorDraft(start), start, NOW, fail)).toEqual({ ok: true, reading: start });
  });

  it('changed values keep the id and the recorded time', () => {
    const d = { ...outdoorDraft(start), co2_ppm: 431, rh_pct: 88, moment: 'during' as const, temp_C: undefined };
    const result = outdoorReadingFromDraft(d, start, NOW, fail);
    expect(result).toEqual({ ok: true, reading: { id: start.id, time: start.time, moment: 'during', co2_ppm: 431, rh_pct: 88, location: start.location } });
  });

  it('a changed time of day keeps the date and the offset from UTC', () => {
    const result = outdoorReadingFromDraft({ ...outdoorDraft(start), clock: '08:20' }, start, NOW, fail);
    expect(result.ok && result.reading.time).toBe('2026-01-14T08:20:00+01:00');
    expect(withClockTime('2026-01-14T23:59:59.5Z', '00:10')).toBe('2026-01-14T00:10:00Z');
  });

  it('refuses an empty or impossible time, and a reading with no value, naming the problem', () => {
    const empty = outdoorReadingFromDraft({ ...outdoorDraft(start), clock: '' }, start, NOW, fail);
    expect(!empty.ok && empty.problems).toEqual([{ field: 'time', message: 'Time taken is empty: fill it in', value: '' }]);
    const noValues = outdoorReadingFromDraft({ ...outdoorDraft(start), co2_ppm: undefined, temp_C: undefined }, start, NOW, fail);
    expect(!noValues.ok && noValues.problems.map((p) => p.message)).toEqual(['An outdoor reading needs at least one value (CO₂, temperature or humidity)']);
    const high = outdoorReadingFromDraft({ ...outdoorDraft(start), co2_ppm: 42_800 }, start, NOW, fail);
    expect(!high.ok && high.problems.map((p) => `${p.field}: ${p.message}`)).toEqual(['co2_ppm: CO₂ must be between 250 and 10,000 ppm (check the meter and the units it shows)']);
  });

  it('a new reading is stamped now with a new id, offered as the start and then the end', () => {
    expect(nextOutdoorMoment([])).toBe('start');
    expect(nextOutdoorMoment([start])).toBe('end');
    const result = outdoorReadingFromDraft({ ...outdoorDraft(undefined, 'end'), co2_ppm: 433 }, undefined, NOW, () => '0f0f0002-0000-4000-8000-000000000002');
    expect(result.ok && result.reading).toMatchObject({ id: '0f0f0002-0000-4000-8000-000000000002', moment: 'end', co2_ppm: 433 });
    expect(result.ok && Date.parse(result.reading.time)).toBe(NOW.getTime());
  });

  it('a saved change replaces the reading in place; a new one goes last', () => {
    const end: OutdoorReading = { ...start, id: '0f0f0002-0000-4000-8000-000000000003', moment: 'end', time: '2026-01-14T15:50:00+01:00' };
    const changed = { ...start, co2_ppm: 430 };
    expect(withOutdoorReading([start, end], changed)).toEqual([changed, end]);
    expect(withOutdoorReading([start], end)).toEqual([start, end]);
  });
});
