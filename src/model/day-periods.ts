/**
 * The rules of a room's own day of periods, beyond each field's own: a period must last (its end
 * differs from its start; an end before the start runs past midnight, as the engine reads it),
 * and no two periods may cover the same time of day. Times are "hh:mm" on the 24-hour clock.
 *
 * Each problem names the period by its place in the list (1 = first) and the field it is on,
 * so a screen can show it under that field.
 *
 * Example: periods [08:40–09:55, 09:30–10:15] → one problem on periods.1.start:
 * "Start of period 2 (09:30) is inside period 1 (08:40–09:55): periods must not overlap".
 */

/** The fields of a period these rules read. */
export interface ClockPeriod {
  start: string;
  end: string;
}

export interface PeriodProblem {
  /** Path inside the periods list, e.g. ['1', 'start'] for the second period's start. */
  path: [number, 'start' | 'end'];
  message: string;
}

const DAY_MIN = 24 * 60;
const CLOCK = /^(?:[01]\d|2[0-3]):[0-5]\d$/;

/** "08:40" → 520 minutes after midnight; undefined when not a time of day. */
function minutes(hhmm: string): number | undefined {
  return CLOCK.test(hhmm) ? Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3, 5)) : undefined;
}

/** [start, end) in minutes after midnight, the end past 1440 for a period over midnight. */
function span(p: ClockPeriod): [number, number] | undefined {
  const start = minutes(p.start);
  const end = minutes(p.end);
  if (start === undefined || end === undefined || start === end) return undefined;
  return [start, end > start ? end : end + DAY_MIN];
}

/** Whether a minute of the day falls inside a span (trying the next day for spans past midnight). */
function inside(minute: number, [from, to]: [number, number]): boolean {
  return (minute >= from && minute < to) || (minute + DAY_MIN >= from && minute + DAY_MIN < to);
}

/** Whether a period runs past midnight ("22:15" to "06:45"). */
export function runsPastMidnight(p: ClockPeriod): boolean {
  const s = span(p);
  return s !== undefined && s[1] > DAY_MIN;
}

/**
 * Problems with a day's periods: an end equal to its start, and each period that starts inside
 * an earlier one in the list (or contains an earlier one's start). Fields that are not times of
 * day are left to the field rules.
 */
export function dayPeriodProblems(periods: readonly ClockPeriod[]): PeriodProblem[] {
  const problems: PeriodProblem[] = [];
  const spans = periods.map(span);
  periods.forEach((p, i) => {
    if (p.start === p.end && minutes(p.start) !== undefined) {
      problems.push({ path: [i, 'end'], message: `End of period ${i + 1} (${p.end}) is the same as its start: a period must last at least a minute` });
    }
  });
  spans.forEach((mine, i) => {
    if (!mine) return;
    for (let j = 0; j < i; j += 1) {
      const theirs = spans[j];
      if (!theirs) continue;
      const other = `period ${j + 1} (${periods[j]!.start}–${periods[j]!.end})`;
      if (inside(mine[0] % DAY_MIN, theirs)) {
        problems.push({ path: [i, 'start'], message: `Start of period ${i + 1} (${periods[i]!.start}) is inside ${other}: periods must not overlap` });
        return;
      }
      if (inside(theirs[0] % DAY_MIN, mine)) {
        problems.push({ path: [i, 'end'], message: `Period ${i + 1} (${periods[i]!.start}–${periods[i]!.end}) covers the start of ${other}: periods must not overlap` });
        return;
      }
    }
  });
  return problems;
}
