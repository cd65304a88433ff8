/**
 * Vapour-pressure excess (inside − outside vapour pressure, Pa) from logged temperature and RH,
 * by day, compared with the ISO 13788 humidity classes. The excess measures how much moisture
 * the room adds for the ventilation it gets, independently of how warm it is kept; 1–2 weeks of
 * winter logging gives a usable picture (practice.md §2.3).
 *
 * Each reading's vapour pressure comes from its temperature and RH (Hyland–Wexler), then the
 * readings are averaged by day: excess = mean inside p_w − mean outside p_w for that day.
 */
import { humidityClassLimit, humidityClassOf, type HumidityClass } from './humidity-classes.ts';
import { moistureWarning, type MoistureWarning } from './moisture-warnings.ts';
import { vapourPressureFromRelativeHumidity } from './vapour-pressure.ts';

/** Which day each reading belongs to: a day number per reading, or times in seconds and a day length. */
export type DayAssignment =
  | { kind: 'index'; days: readonly number[] }
  | { kind: 'time'; times_s: readonly number[]; dayLength_s?: number; dayStart_s?: number };

/** Logged pairs inside and outside, one entry per reading time, all arrays of equal length. */
export interface LoggedHumidity {
  insideTemp_C: readonly number[];
  insideRh_pct: readonly number[];
  outsideTemp_C: readonly number[];
  outsideRh_pct: readonly number[];
  day: DayAssignment;
  /** The class expected for the room's use (e.g. 3 for a dwelling with low occupancy), optional. */
  expectedClass?: HumidityClass;
}

/** One day's means. */
export interface DailyExcess {
  day: number;
  readings: number;
  insideVapour_Pa: number;
  outsideVapour_Pa: number;
  excess_Pa: number;
  outsideTemp_C: number;
  /** Class the day's excess falls in (null on days with outdoor mean ≥ 20 °C). */
  humidityClass: HumidityClass | 'above-5' | null;
  /** Limit of the expected class at the day's outdoor mean, Pa (undefined without one). */
  expectedLimit_Pa: number | undefined;
  aboveExpected: boolean | undefined;
}

/** The whole record: days, the mean over the days, and warnings. */
export interface VapourPressureExcessResult {
  days: DailyExcess[];
  /** Mean of the daily excesses, Pa (0 when there are no days). */
  meanExcess_Pa: number;
  /** Mean of the daily outdoor temperatures, °C. */
  meanOutsideTemp_C: number;
  /** Class of the mean excess at the mean outdoor temperature. */
  humidityClass: HumidityClass | 'above-5' | null;
  /** Days whose excess is above the expected class (undefined without one). */
  daysAboveExpected: number | undefined;
  method: string;
  warnings: MoistureWarning[];
}

/** Fewest days for a usable picture (practice.md §2.3 asks for one to two weeks). */
export const MIN_DAYS_FOR_EXCESS = 7;
/** Days with an outdoor mean at or above this (°C) say little: the class limits shrink towards 0 at 20 °C (common practice (no published source)). */
export const MILD_DAY_C = 10;
const DAY_S = 86400;

function dayOf(assign: DayAssignment, i: number): number | undefined {
  if (assign.kind === 'index') return assign.days[i];
  const t = assign.times_s[i];
  if (t === undefined) return undefined;
  return Math.floor((t - (assign.dayStart_s ?? 0)) / (assign.dayLength_s ?? DAY_S));
}

function dayCount(assign: DayAssignment): number {
  return assign.kind === 'index' ? assign.days.length : assign.times_s.length;
}

interface Sums {
  n: number;
  inside: number;
  outside: number;
  outsideTemp: number;
}

/**
 * Daily vapour-pressure excess from logged pairs, with the ISO 13788 class of each day.
 * Readings with a missing or non-finite value are skipped. Arrays of unequal length give no
 * days and an 'unequal-series' warning.
 * Example: two days of readings at 20 °C / 60 % inside and 5 °C / 85 % outside, expected class 3
 * → each day excess 661.6 Pa (class 4; class 3 allows 607.5 Pa), daysAboveExpected 2.
 */
export function vapourPressureExcess(log: LoggedHumidity): VapourPressureExcessResult {
  const method = 'daily means of inside and outside vapour pressure from logged temperature and RH (Hyland–Wexler); ISO 13788 Annex A classes';
  const warnings: MoistureWarning[] = [];
  const n = log.insideTemp_C.length;
  const lengths = [log.insideRh_pct.length, log.outsideTemp_C.length, log.outsideRh_pct.length, dayCount(log.day)];
  const paired = lengths.every((l) => l === n);
  const byDay = new Map<number, Sums>();
  if (!paired) {
    warnings.push(
      moistureWarning('unequal-series', 'The inside, outside and time columns have different lengths, so the readings cannot be paired.'),
    );
  } else {
    for (let i = 0; i < n; i++) {
      const day = dayOf(log.day, i);
      const ti = log.insideTemp_C[i] as number;
      const ri = log.insideRh_pct[i] as number;
      const te = log.outsideTemp_C[i] as number;
      const re = log.outsideRh_pct[i] as number;
      if (day === undefined || ![day, ti, ri, te, re].every(Number.isFinite)) continue;
      const sums = byDay.get(day) ?? { n: 0, inside: 0, outside: 0, outsideTemp: 0 };
      sums.n += 1;
      sums.inside += vapourPressureFromRelativeHumidity(ti, ri);
      sums.outside += vapourPressureFromRelativeHumidity(te, re);
      sums.outsideTemp += te;
      byDay.set(day, sums);
    }
  }
  const expected = log.expectedClass;
  const days: DailyExcess[] = [...byDay.entries()]
    .sort((a, b) => a[0] - b[0])
    .map(([day, s]) => {
      const inside = s.inside / s.n;
      const outside = s.outside / s.n;
      const outsideTemp = s.outsideTemp / s.n;
      const limit = expected === undefined ? undefined : humidityClassLimit(expected, outsideTemp);
      return {
        day,
        readings: s.n,
        insideVapour_Pa: inside,
        outsideVapour_Pa: outside,
        excess_Pa: inside - outside,
        outsideTemp_C: outsideTemp,
        humidityClass: humidityClassOf(inside - outside, outsideTemp),
        expectedLimit_Pa: limit,
        aboveExpected: limit === undefined ? undefined : inside - outside > limit,
      };
    });
  const mean = (pick: (d: DailyExcess) => number) => (days.length ? days.reduce((a, d) => a + pick(d), 0) / days.length : 0);
  const meanExcess = mean((d) => d.excess_Pa);
  const meanOutside = mean((d) => d.outsideTemp_C);
  if (paired && days.length < MIN_DAYS_FOR_EXCESS) {
    warnings.push(
      moistureWarning('too-few-days', `Only ${days.length} day(s) of readings: one to two weeks of winter logging gives a fairer picture.`),
    );
  }
  if (days.length > 0 && days.every((d) => d.outsideTemp_C >= MILD_DAY_C)) {
    warnings.push(
      moistureWarning('mild-days-only', 'Every logged day was mild outside; the excess of a cold month may differ and the class limits are small in mild weather.'),
    );
  }
  if (days.some((d) => d.excess_Pa < 0)) {
    warnings.push(
      moistureWarning('outdoor-above-indoor', 'On some days the outside air held more vapour than the inside: check that the outdoor logger was shaded and dry.'),
    );
  }
  return {
    days,
    meanExcess_Pa: meanExcess,
    meanOutsideTemp_C: meanOutside,
    humidityClass: days.length ? humidityClassOf(meanExcess, meanOutside) : null,
    daysAboveExpected: expected === undefined ? undefined : days.filter((d) => d.aboveExpected).length,
    method,
    warnings,
  };
}
