/**
 * The shared rules for stored fields: ids, dates and times, free text, and bounded SI numbers,
 * each with a message that names the field and the rule in a surveyor's words.
 *
 * Stored values only: numbers arrive here as numbers (the form layer parses typed text first),
 * so nothing here turns "" into 0. Every number is finite (zod rejects NaN and ±Infinity).
 *
 * Example: measure('CO₂', 'ppm', 250, 10_000) rejects 12000 with
 * "CO₂ must be between 250 and 10,000 ppm".
 */
import { z } from 'zod';

/** Longest title, site or other name accepted, in characters. */
export const MAX_NAME_LENGTH = 200;
/** Longest note or free-text answer accepted, in characters. */
export const MAX_NOTE_LENGTH = 20_000;

/** 10000 -> "10,000", 0.05 -> "0.05": limits in messages, the same on every device. */
export function formatLimit(value: number): string {
  const [whole, fraction] = String(value).split('.');
  const grouped = whole!.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return fraction === undefined ? grouped : `${grouped}.${fraction}`;
}

/** The id of any stored record: a UUID. */
export const recordId = z.uuid({ error: 'is not a record id (a UUID)' });

/** A date and time with its offset from UTC (ISO 8601), as 2026-11-30T09:15:00+00:00. */
export const dateTime = z.iso.datetime({ offset: true, error: 'must be a date and time such as 2026-11-30T09:15:00Z' });

/** A calendar date (ISO 8601), as 2026-11-30. */
export const calendarDate = z.iso.date({ error: 'must be a date such as 2026-11-30' });

/**
 * A time of day on the 24-hour clock, as 08:40, with the field named in its message:
 * clockTimeOf('Period start') rejects "8.40" with "Period start must be a time of day such as 08:40".
 */
export function clockTimeOf(label: string) {
  const message = `${label} must be a time of day such as 08:40`;
  return z.string({ error: message }).regex(/^(?:[01]\d|2[0-3]):[0-5]\d$/, { error: message });
}

/** Free text that may be empty (""). */
export function text(label: string, max = MAX_NAME_LENGTH) {
  return z
    .string({ error: `${label} must be text` })
    .trim()
    .max(max, { error: `${label} is longer than ${formatLimit(max)} characters` });
}

/** Free text that must not be empty. */
export function requiredText(label: string, max = MAX_NAME_LENGTH) {
  return text(label, max).min(1, { error: `${label} is empty: fill it in` });
}

export interface MeasureOptions {
  /** Whole numbers only (counts). */
  integer?: boolean;
  /** The lower limit itself is not allowed (sizes that must be more than zero). */
  aboveMin?: boolean;
  /** A hint after the rule, e.g. "check the meter". */
  hint?: string;
}

/**
 * A number in SI units within [min, max], with one message for every way it can be wrong.
 * Example: measure('Room height', 'm', 1.5, 30) → "Room height must be between 1.5 and 30 m".
 */
export function measure(label: string, unit: string, min: number, max: number, options: MeasureOptions = {}) {
  const units = unit ? ` ${unit}` : '';
  const lower = options.aboveMin ? `more than ${formatLimit(min)}` : `between ${formatLimit(min)}`;
  const rule = options.aboveMin
    ? `${label} must be ${lower}${units} and at most ${formatLimit(max)}${units}`
    : `${label} must be ${lower} and ${formatLimit(max)}${units}`;
  const message = options.hint ? `${rule} (${options.hint})` : rule;
  const base = options.integer
    ? z.int({ error: `${label} must be a whole number${units ? ` of${units}` : ''}` })
    : z.number({ error: `${label} must be a number${units ? ` in${units}` : ''}` });
  return (options.aboveMin ? base.gt(min, { error: message }) : base.min(min, { error: message })).max(max, {
    error: message,
  });
}

/** A choice from a fixed list, with the field named when the value is not on it. */
export function choice<const T extends readonly [string, ...string[]]>(label: string, values: T) {
  return z.enum(values, { error: `${label} is not one of: ${values.join(', ')}` });
}

/** Yes, no, or not checked: for checks made on site (alarm tested, vent clear). */
export const CHECK_ANSWERS = ['yes', 'no', 'not-checked'] as const;
export function check(label: string) {
  return choice(label, CHECK_ANSWERS);
}

/** Compass points, for the way a wall or opening faces. */
export const FACINGS = ['N', 'NE', 'E', 'SE', 'S', 'SW', 'W', 'NW'] as const;
export const facing = choice('Facing', FACINGS);

/** Physical limits shared by several records. */
export const co2Ppm = measure('CO₂', 'ppm', 250, 10_000, { hint: 'check the meter and the units it shows' });
export const indoorTempC = measure('Temperature', '°C', -30, 60);
export const outdoorTempC = measure('Outdoor temperature', '°C', -50, 50);
export const relativeHumidity = measure('Relative humidity', '%', 0, 100);
export const surfaceTempC = measure('Surface temperature', '°C', -50, 80);
