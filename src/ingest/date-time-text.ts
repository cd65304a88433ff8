/**
 * The parts of a date and time as a logger writes them, before the date order is known:
 * "27/10/2024 01:30:15", "10/27/24 1:30 AM", "2024-10-27T01:30:15.250+01:00", "27.10.2024",
 * or a time of day alone ("13:05", "1:05:00 pm") from a separate time column. Numbers only; the
 * order of day, month and year is settled over the whole column (time-format-detection.ts).
 *
 * Example: readDateTimeText('10/27/24 1:30 PM') = { first: 10, second: 27, third: 24,
 * firstDigits: 2, seconds: 48600, hasTime: true, twelveHour: true, offset_s: NaN }.
 */

export interface DateTimeText {
  /** The three date numbers in written order. */
  first: number;
  second: number;
  third: number;
  /** Digits of the first number (4 means the year comes first). */
  firstDigits: number;
  /** Seconds since local midnight (0 when the text has no time). */
  seconds: number;
  hasTime: boolean;
  /** True when the time carried AM or PM. */
  twelveHour: boolean;
  /** Offset from UTC written in the text, s (east positive); NaN when none was written. */
  offset_s: number;
}

const DATE_TIME =
  /^\s*(\d{1,4})[-/.](\d{1,2})[-/.](\d{1,4})(?:(?:T|\s+|,\s*)(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?\s*(?:([AaPp])\.?[Mm]\.?)?)?\s*(Z|[+-]\d{2}(?::?\d{2})?)?\s*$/;
const TIME_OF_DAY = /^\s*(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?\s*(?:([AaPp])\.?[Mm]\.?)?\s*$/;

/** Seconds since midnight from clock parts; NaN for an impossible time. */
function clockSeconds(h: string, m: string, s: string | undefined, frac: string | undefined, meridiem: string | undefined): number {
  let hour = Number(h);
  const minute = Number(m);
  const second = s === undefined ? 0 : Number(s) + (frac ? Number(`0.${frac}`) : 0);
  if (meridiem) {
    if (hour < 1 || hour > 12) return NaN;
    hour = (hour % 12) + (meridiem === 'p' || meridiem === 'P' ? 12 : 0);
  }
  if (hour > 24 || minute > 59 || second >= 61 || (hour === 24 && (minute > 0 || second > 0))) return NaN;
  return hour * 3600 + minute * 60 + Math.min(second, 59.999);
}

function offsetSeconds(text: string | undefined): number {
  if (text === undefined) return NaN;
  if (text === 'Z') return 0;
  const digits = text.slice(1).replace(':', '');
  const value = Number(digits.slice(0, 2)) * 3600 + Number(digits.slice(2) || '0') * 60;
  return text[0] === '-' ? -value : value;
}

/** Parts of a date with an optional time; null when the text is not one. */
export function readDateTimeText(text: string): DateTimeText | null {
  const m = DATE_TIME.exec(text);
  if (!m) return null;
  const hasTime = m[4] !== undefined;
  const seconds = hasTime ? clockSeconds(m[4]!, m[5]!, m[6], m[7], m[8]) : 0;
  if (Number.isNaN(seconds)) return null;
  return {
    first: Number(m[1]),
    second: Number(m[2]),
    third: Number(m[3]),
    firstDigits: m[1]!.length,
    seconds,
    hasTime,
    twelveHour: m[8] !== undefined,
    offset_s: offsetSeconds(m[9]),
  };
}

/** Seconds since midnight of a time of day written alone, with whether it carried AM/PM; null when not one. */
export function readTimeOfDayText(text: string): { seconds: number; twelveHour: boolean } | null {
  const m = TIME_OF_DAY.exec(text);
  if (!m) return null;
  const seconds = clockSeconds(m[1]!, m[2]!, m[3], m[4], m[5]);
  return Number.isNaN(seconds) ? null : { seconds, twelveHour: m[5] !== undefined };
}
