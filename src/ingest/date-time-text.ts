/**
 * The parts of a date and time as a logger writes them, before the date order is known:
 * "27/10/2024 01:30:15", "10/27/24 1:30 AM", "2024-10-27T01:30:15.250+01:00", "27.10.2024",
 * or a time of day alone ("13:05", "1:05:00 pm") from a separate time column. Numbers only; the
 * order of day, month and year is settled over the whole column (time-format-detection.ts).
 * A hand-written scanner (no regular expression, no substrings, no allocation per cell) that
 * writes into columns of typed arrays: it runs once per row of files of 100,000 rows.
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

/** The same parts for a whole column, one entry per row. */
export interface DateTimeColumns {
  first: Float64Array;
  second: Float64Array;
  third: Float64Array;
  firstDigits: Uint8Array;
  seconds: Float64Array;
  offset_s: Float64Array;
  /** Bit 1: has a time; bit 2: AM/PM written. */
  flags: Uint8Array;
}

/** Empty columns for n rows. */
export function dateTimeColumns(n: number): DateTimeColumns {
  return {
    first: new Float64Array(n),
    second: new Float64Array(n),
    third: new Float64Array(n),
    firstDigits: new Uint8Array(n),
    seconds: new Float64Array(n),
    offset_s: new Float64Array(n),
    flags: new Uint8Array(n),
  };
}

export const HAS_TIME = 1;
export const TWELVE_HOUR = 2;

// Scanner state: one cell at a time, so plain module variables (no object per cell).
let text = '';
let pos = 0;
let digits = 0;
let clockSeconds = 0;
let clockTwelve = false;

const isDigit = (c: number) => c >= 48 && c <= 57;
const peek = () => (pos < text.length ? text.charCodeAt(pos) : -1);
function skipSpaces(): void {
  while (peek() === 32 || peek() === 9) pos++;
}
function int(max: number): number {
  let v = 0;
  digits = 0;
  while (digits < max && isDigit(peek())) {
    v = v * 10 + peek() - 48;
    pos++;
    digits++;
  }
  return digits === 0 ? NaN : v;
}
const atEnd = () => {
  skipSpaces();
  return pos === text.length;
};

/** h:mm[:ss[.fff]] [AM|PM] at the cursor into clockSeconds / clockTwelve; false when not one. */
function clock(): boolean {
  let hour = int(2);
  if (Number.isNaN(hour) || peek() !== 58) return false;
  pos++;
  const minute = int(2);
  if (digits !== 2) return false;
  let second = 0;
  if (peek() === 58) {
    pos++;
    second = int(2);
    if (digits !== 2) return false;
    const mark = peek();
    if ((mark === 46 || mark === 44) && isDigit(text.charCodeAt(pos + 1))) {
      pos++;
      let scale = 0.1;
      while (isDigit(peek())) {
        second += (peek() - 48) * scale;
        scale /= 10;
        pos++;
      }
    }
  }
  const at = pos;
  skipSpaces();
  const m = peek() | 32; // lower case
  clockTwelve = false;
  if (m === 97 || m === 112) {
    // a or p, an optional '.', m, an optional '.'
    pos++;
    if (peek() === 46) pos++;
    if ((peek() | 32) !== 109) return false;
    pos++;
    if (peek() === 46) pos++;
    if (hour < 1 || hour > 12) return false;
    hour = (hour % 12) + (m === 112 ? 12 : 0);
    clockTwelve = true;
  } else pos = at;
  if (hour > 24 || minute > 59 || second >= 61 || (hour === 24 && (minute > 0 || second > 0))) return false;
  clockSeconds = hour * 3600 + minute * 60 + Math.min(second, 59.999);
  return true;
}

/** Z or ±hh[:mm] at the cursor, s; NaN when none; null when malformed. */
function offset(): number | null {
  skipSpaces();
  const c = peek();
  if (c === 90) {
    pos++;
    return 0;
  }
  if (c !== 43 && c !== 45) return NaN;
  pos++;
  const h = int(2);
  if (digits !== 2) return null;
  if (peek() === 58) pos++;
  const m = isDigit(peek()) ? int(2) : 0;
  return (c === 45 ? -1 : 1) * (h * 3600 + m * 60);
}

const isDateMark = (c: number) => c === 45 || c === 47 || c === 46;

/** Read a date with an optional time into row `i` of the columns; false when the text is not one. */
export function readDateTimeInto(cell: string, out: DateTimeColumns, i: number): boolean {
  text = cell;
  pos = 0;
  skipSpaces();
  const first = int(4);
  const firstDigits = digits;
  if (Number.isNaN(first) || !isDateMark(peek())) return false;
  pos++;
  const second = int(2);
  if (Number.isNaN(second) || !isDateMark(peek())) return false;
  pos++;
  const third = int(4);
  if (Number.isNaN(third)) return false;
  let hasTime = false;
  const c = peek();
  if (c === 84 || c === 116 || c === 32 || c === 9 || c === 44) {
    pos++;
    skipSpaces();
    if (isDigit(peek())) {
      if (!clock()) return false;
      hasTime = true;
    }
  }
  const off = offset();
  if (off === null || !atEnd()) return false;
  out.first[i] = first;
  out.second[i] = second;
  out.third[i] = third;
  out.firstDigits[i] = firstDigits;
  out.seconds[i] = hasTime ? clockSeconds : 0;
  out.offset_s[i] = off;
  out.flags[i] = (hasTime ? HAS_TIME : 0) | (hasTime && clockTwelve ? TWELVE_HOUR : 0);
  return true;
}

/** Parts of a date with an optional time; null when the text is not one. */
export function readDateTimeText(cell: string): DateTimeText | null {
  const one = dateTimeColumns(1);
  if (!readDateTimeInto(cell, one, 0)) return null;
  return {
    first: one.first[0]!,
    second: one.second[0]!,
    third: one.third[0]!,
    firstDigits: one.firstDigits[0]!,
    seconds: one.seconds[0]!,
    hasTime: (one.flags[0]! & HAS_TIME) !== 0,
    twelveHour: (one.flags[0]! & TWELVE_HOUR) !== 0,
    offset_s: one.offset_s[0]!,
  };
}

/** Seconds since midnight of a time of day written alone, with whether it carried AM/PM; null when not one. */
export function readTimeOfDayText(cell: string): { seconds: number; twelveHour: boolean } | null {
  text = cell;
  pos = 0;
  skipSpaces();
  return clock() && atEnd() ? { seconds: clockSeconds, twelveHour: clockTwelve } : null;
}
