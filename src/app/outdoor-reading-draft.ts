/**
 * The outdoor reading form's data: a new reading (stamped when saved) or one being changed,
 * turned into the model's record and checked with its schema. A reading being changed keeps its
 * id and its recorded time unless the surveyor changes the clock time; a changed clock time keeps
 * the recorded date and offset from UTC (the surveyor corrects the time of day, not the day).
 *
 * Example: changing '2026-01-14T08:05:00Z' to 08:20 gives '2026-01-14T08:20:00Z'; left at 08:05 it
 * stays '2026-01-14T08:05:00Z' (seconds included).
 */
import { clockTimeOf } from '../model/field-rules.ts';
import { outdoorReadingSchema, type Survey } from '../model/survey.ts';
import { validationProblems, type ValidationProblem } from '../model/validation-problem.ts';
import { clockOf, localIso } from './local-time.ts';

export type OutdoorReading = Survey['outdoorReadings'][number];
export type OutdoorMoment = OutdoorReading['moment'];

export interface OutdoorDraft {
  moment: OutdoorMoment;
  co2_ppm: number | undefined;
  temp_C: number | undefined;
  rh_pct: number | undefined;
  /** The meter's id, or '' when not recorded. */
  instrumentId: string;
  location: string;
  /** The time of day as typed (08:05); used only for a reading being changed. */
  clock: string;
}

export type OutdoorFromDraft = { ok: true; reading: OutdoorReading } | { ok: false; problems: ValidationProblem[] };

/** The form's starting values: a reading's own, or an empty one at `moment`. */
export function outdoorDraft(reading: OutdoorReading | undefined, moment: OutdoorMoment = 'start'): OutdoorDraft {
  return {
    moment: reading?.moment ?? moment,
    co2_ppm: reading?.co2_ppm,
    temp_C: reading?.temp_C,
    rh_pct: reading?.rh_pct,
    instrumentId: reading?.instrumentId ?? '',
    location: reading?.location ?? '',
    clock: reading ? clockOf(reading.time) : '',
  };
}

/**
 * The same moment with its time of day replaced (seconds to 0), date and offset kept.
 * Example: withClockTime('2026-01-14T08:05:30+01:00', '08:20') = '2026-01-14T08:20:00+01:00'.
 */
export function withClockTime(iso: string, clock: string): string {
  return iso.replace(/T\d{2}:\d{2}(?::\d{2}(?:\.\d+)?)?/, `T${clock}:00`);
}

/** The first outdoor reading's moment to offer next: the start, then the end. */
export function nextOutdoorMoment(readings: readonly OutdoorReading[]): OutdoorMoment {
  return readings.some((r) => r.moment === 'start') ? 'end' : 'start';
}

/**
 * The record for a draft: `original` is the reading being changed, or undefined for a new one
 * (stamped at `now`, id from `newId`).
 */
export function outdoorReadingFromDraft(draft: OutdoorDraft, original: OutdoorReading | undefined, now: Date, newId: () => string): OutdoorFromDraft {
  let time = localIso(now);
  if (original) {
    if (draft.clock === clockOf(original.time)) time = original.time;
    else if (!clockTimeOf('Time taken').safeParse(draft.clock).success) {
      return { ok: false, problems: [{ field: 'time', message: `Time taken ${draft.clock ? 'must be a time of day such as 08:40' : 'is empty: fill it in'}`, value: draft.clock }] };
    } else time = withClockTime(original.time, draft.clock);
  }
  const reading = {
    id: original?.id ?? newId(),
    time,
    moment: draft.moment,
    ...(draft.co2_ppm !== undefined ? { co2_ppm: draft.co2_ppm } : {}),
    ...(draft.temp_C !== undefined ? { temp_C: draft.temp_C } : {}),
    ...(draft.rh_pct !== undefined ? { rh_pct: draft.rh_pct } : {}),
    ...(draft.instrumentId ? { instrumentId: draft.instrumentId } : {}),
    location: draft.location,
  };
  const parsed = outdoorReadingSchema.safeParse(reading);
  return parsed.success ? { ok: true, reading: parsed.data } : { ok: false, problems: validationProblems(parsed.error, reading) };
}

/** The survey's outdoor readings with `reading` in place of the one with its id (or added last). */
export function withOutdoorReading(readings: readonly OutdoorReading[], reading: OutdoorReading): OutdoorReading[] {
  const i = readings.findIndex((r) => r.id === reading.id);
  return i === -1 ? [...readings, reading] : readings.map((r, k) => (k === i ? reading : r));
}
