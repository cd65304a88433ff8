/**
 * How a logger file writes its times. Numbers alone are epoch seconds (2000–2200: 9.5e8–7.3e9),
 * epoch milliseconds (9.5e11–7.3e12) or spreadsheet serial days (36 526–109 574: days since
 * 1899-12-30, local time; the common spreadsheet date system). Written dates are year-first
 * (ISO 8601), day-first or month-first; the order is settled over the whole column:
 * - a first number above 12 anywhere means day-first, a second number above 12 month-first;
 * - otherwise, when the file spans several dates, the order whose dates lie closer together
 *   (a logger's readings run on from day to day, not month to month) is taken, with a note;
 * - otherwise it is ambiguous and the surveyor is asked.
 *
 * Example: resolveDateOrder over one row written '27/10/2024' =
 * { status: 'resolved', order: 'day-first', how: 'values' }.
 */
import { calendarDay } from './calendar-day.ts';
import type { DateTimeColumns } from './date-time-text.ts';

export type DateOrder = 'year-first' | 'day-first' | 'month-first';
export type NumericTimeKind = 'epoch-seconds' | 'epoch-milliseconds' | 'spreadsheet-days';

/** Days from 1899-12-30 (spreadsheet day 0) to 1970-01-01. */
export const SPREADSHEET_EPOCH_DAYS = 25569;

const RANGES: ReadonlyArray<[NumericTimeKind, number, number]> = [
  ['epoch-seconds', 946_684_800, 7_258_118_400],
  ['epoch-milliseconds', 946_684_800_000, 7_258_118_400_000],
  ['spreadsheet-days', 36_526, 109_574],
];

/**
 * The kind of a column of numeric times: the one range holding every finite value (at least half
 * the values must be numbers), else null.
 * Example: numericTimeKind([1729989000, 1729989060]) = 'epoch-seconds'; numericTimeKind([45592.5]) = 'spreadsheet-days'.
 */
export function numericTimeKind(values: ArrayLike<number>): NumericTimeKind | null {
  let lo = Infinity;
  let hi = -Infinity;
  let finite = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i]!;
    if (!Number.isFinite(v)) continue;
    finite++;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (finite === 0 || finite < values.length / 2) return null;
  for (const [kind, min, max] of RANGES) if (lo >= min && hi <= max) return kind;
  return null;
}

/** Local epoch seconds of a numeric time (epoch kinds are UTC already; serial days are local). */
export function numericTimeSeconds(kind: NumericTimeKind, value: number): number {
  if (kind === 'epoch-seconds') return value;
  if (kind === 'epoch-milliseconds') return value / 1000;
  return Math.round((value - SPREADSHEET_EPOCH_DAYS) * 86400 * 1000) / 1000;
}

export type DateOrderResolution =
  | { status: 'resolved'; order: DateOrder; how: 'year-first' | 'values' | 'sequence' | 'given' }
  | { status: 'ambiguous' }
  | { status: 'inconsistent' };

/** Day number of written date parts in a given order (NaN if no such date). */
export function dayOfDate(first: number, second: number, third: number, order: DateOrder): number {
  if (order === 'year-first') return calendarDay(first, second, third);
  if (order === 'day-first') return calendarDay(third, second, first);
  return calendarDay(third, first, second);
}

/** Settle the date order over the first `count` rows of a column of written dates. */
export function resolveDateOrder(dates: DateTimeColumns, count: number, given?: DateOrder): DateOrderResolution {
  if (given) return { status: 'resolved', order: given, how: 'given' };
  let yearFirst = count > 0;
  let firstHigh = false;
  let secondHigh = false;
  for (let i = 0; i < count; i++) {
    if (dates.firstDigits[i] !== 4) yearFirst = false;
    if (dates.first[i]! > 12) firstHigh = true;
    if (dates.second[i]! > 12) secondHigh = true;
  }
  if (yearFirst) return { status: 'resolved', order: 'year-first', how: 'year-first' };
  if (firstHigh && secondHigh) return { status: 'inconsistent' };
  if (firstHigh) return { status: 'resolved', order: 'day-first', how: 'values' };
  if (secondHigh) return { status: 'resolved', order: 'month-first', how: 'values' };
  const spread = (order: DateOrder) => {
    const days = new Set<number>();
    for (let i = 0; i < count; i++) days.add(dayOfDate(dates.first[i]!, dates.second[i]!, dates.third[i]!, order));
    let lo = Infinity;
    let hi = -Infinity;
    for (const day of days) {
      if (day < lo) lo = day;
      if (day > hi) hi = day;
    }
    return { distinct: days.size, span: hi - lo + 1 };
  };
  const dayFirst = spread('day-first');
  if (dayFirst.distinct < 2) return { status: 'ambiguous' };
  const monthFirst = spread('month-first');
  if (dayFirst.span * 3 <= monthFirst.span) return { status: 'resolved', order: 'day-first', how: 'sequence' };
  if (monthFirst.span * 3 <= dayFirst.span) return { status: 'resolved', order: 'month-first', how: 'sequence' };
  return { status: 'ambiguous' };
}

/** A label for the report, e.g. "day-first dates (27/10/2024)". */
export function dateOrderLabel(order: DateOrder): string {
  return order === 'year-first' ? 'year-first dates (2024-10-27)' : order === 'day-first' ? 'day-first dates (27/10/2024)' : 'month-first dates (10/27/2024)';
}
