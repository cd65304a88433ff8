/**
 * Day number (days since 1970-01-01) of a calendar date in the proleptic Gregorian calendar, or
 * NaN when the date does not exist. Two-digit years are read as 2000–2069 and 1970–1999.
 * Counting local wall-clock time as days × 86 400 s + seconds of the day gives the "local epoch"
 * that the time zone then turns into UTC (zone-clock.ts).
 *
 * Example: calendarDay(2024, 10, 27) = 20023; calendarDay(2023, 2, 29) = NaN; calendarDay(24, 10, 27) = 20023.
 */

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

function fullYear(year: number): number {
  if (year >= 100) return year;
  return year < 70 ? 2000 + year : 1900 + year;
}

export function calendarDay(year: number, month: number, day: number): number {
  const y = fullYear(year);
  if (!(month >= 1 && month <= 12 && day >= 1)) return NaN;
  const leap = (y % 4 === 0 && y % 100 !== 0) || y % 400 === 0;
  const days = month === 2 && leap ? 29 : DAYS_IN_MONTH[month - 1]!;
  if (day > days) return NaN;
  // Days from civil (H. Hinnant's algorithm, public domain).
  const yy = month <= 2 ? y - 1 : y;
  const era = Math.floor(yy / 400);
  const yoe = yy - era * 400;
  const doy = Math.floor((153 * (month + (month > 2 ? -3 : 9)) + 2) / 5) + day - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}
