/**
 * A room's CO2 over a day: the schedule is a list of intervals of constant conditions, and the
 * profile chains the exact solution of the mass balance (balance.ts) from one interval to the
 * next, so every level it reports is exact for the stated schedule (no time-stepping error).
 * Times are seconds from midnight of the survey day (a night may run past 86 400 s).
 */
import { levelAfter, meanLevelOver, type BalanceConditions } from './balance.ts';
import { occupantCo2Output, type AirState, type OccupantGroup } from './co2-generation.ts';
import { warn, type EngineWarning } from './warnings.ts';

/** A CO2 source other than people (gas hob, unflued heater, candles). */
export interface OtherCo2Source {
  label: string;
  /** CO2 emitted, m³/s at room conditions. */
  co2_m3s: number;
}

/** One interval of the schedule, with constant conditions. */
export interface ScheduleInterval {
  /** Start and end, s from midnight (end > start). */
  start_s: number;
  end_s: number;
  /** Occupant groups present (empty: nobody). */
  occupants: readonly OccupantGroup[];
  /** Outdoor air supply during the interval, m³/s. */
  supply_m3s: number;
  /** Outdoor CO2, ppm. */
  outdoor_ppm: number;
  /** Other CO2 sources in use. */
  otherSources?: readonly OtherCo2Source[];
  /** A short description (e.g. 'lesson', 'break'). */
  label?: string;
}

/** What the profile needs about the room. */
export interface DayProfileInput {
  /** Room volume, m³. */
  volume_m3: number;
  /** CO2 at the start of the first interval, ppm. */
  startLevel_ppm: number;
  /** Room air state (for the occupants' CO2 output). */
  air: AirState;
  schedule: readonly ScheduleInterval[];
}

/** One exact piece of the profile. */
export interface ProfilePiece {
  start_s: number;
  end_s: number;
  startLevel_ppm: number;
  endLevel_ppm: number;
  conditions: BalanceConditions;
  /** Number of people present. */
  occupants: number;
  /** Exact integral of the level from the profile start to this piece's start, ppm·s. */
  integralBefore_ppms: number;
  label?: string;
}

/** The chained profile. */
export interface DayProfile {
  pieces: ProfilePiece[];
  warnings: EngineWarning[];
}

/**
 * Chain the exact solution over the schedule (sorted by start). A gap between intervals is filled
 * with the previous supply and outdoor level and nobody present, with a warning; overlapping
 * intervals are cut at the next start, with a warning.
 * Example: 151.2 m³ from 450 ppm, one interval of 3600 s with 30 pupils 6–11 (mixed, 1.2 met)
 * and a teacher, 0.1 m³/s, outdoor 420 → one piece ending at ≈ 1240 ppm.
 */
export function buildDayProfile(input: DayProfileInput): DayProfile {
  const warnings: EngineWarning[] = [];
  const sorted = [...input.schedule].sort((a, b) => a.start_s - b.start_s);
  const pieces: ProfilePiece[] = [];
  let level = input.startLevel_ppm;
  let integral = 0;
  const push = (start: number, end: number, c: BalanceConditions, occupants: number, label?: string): void => {
    const endLevel = levelAfter(c, level, end - start);
    pieces.push({
      start_s: start,
      end_s: end,
      startLevel_ppm: level,
      endLevel_ppm: endLevel,
      conditions: c,
      occupants,
      integralBefore_ppms: integral,
      label,
    });
    integral += meanLevelOver(c, level, end - start) * (end - start);
    level = endLevel;
  };
  for (let i = 0; i < sorted.length; i++) {
    const interval = sorted[i]!;
    const previous = pieces[pieces.length - 1];
    if (previous && interval.start_s > previous.end_s) {
      warnings.push(
        warn(
          'schedule-gap',
          `Nothing is scheduled from ${previous.end_s} s to ${interval.start_s} s; the room is taken as empty with the previous air supply.`,
        ),
      );
      push(previous.end_s, interval.start_s, { ...previous.conditions, source_m3s: 0 }, 0, 'gap');
    }
    const start = previous ? Math.max(interval.start_s, previous.end_s) : interval.start_s;
    const next = sorted[i + 1];
    let end = interval.end_s;
    if (next && next.start_s < end) {
      warnings.push(warn('schedule-overlap', `Two schedule entries overlap at ${next.start_s} s; the earlier one is cut short.`));
      end = next.start_s;
    }
    if (!(end > start)) continue;
    const people = occupantCo2Output(interval.occupants, input.air);
    const other = (interval.otherSources ?? []).reduce((sum, s) => sum + s.co2_m3s, 0);
    push(
      start,
      end,
      {
        volume_m3: input.volume_m3,
        supply_m3s: interval.supply_m3s,
        outdoor_ppm: interval.outdoor_ppm,
        source_m3s: people.total_m3s + other,
      },
      people.count,
      interval.label,
    );
  }
  return { pieces, warnings };
}

/** Index of the piece holding time t (the last piece whose start ≤ t), by bisection. */
export function pieceIndexAt(profile: DayProfile, t_s: number): number {
  const pieces = profile.pieces;
  let lo = 0;
  let hi = pieces.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (pieces[mid]!.start_s <= t_s) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/**
 * Exact level (ppm) at time t_s (s from midnight). Before the first piece: the start level;
 * after the last: the end level. Example: the one-hour lesson above at t = start + 900 s → ≈ 840 ppm.
 */
export function levelAt(profile: DayProfile, t_s: number): number {
  const first = profile.pieces[0];
  if (!first) return Number.NaN;
  if (t_s <= first.start_s) return first.startLevel_ppm;
  const piece = profile.pieces[pieceIndexAt(profile, t_s)]!;
  return levelAfter(piece.conditions, piece.startLevel_ppm, Math.min(t_s, piece.end_s) - piece.start_s);
}

/**
 * Exact integral of the level (ppm·s) from the profile start to t_s, by the closed-form mean of
 * each piece. Example: a single piece of 3600 s with mean 985.9 ppm → 3.549e6 ppm·s at its end.
 */
export function levelIntegralTo(profile: DayProfile, t_s: number): number {
  const first = profile.pieces[0];
  if (!first || t_s <= first.start_s) return 0;
  const piece = profile.pieces[pieceIndexAt(profile, t_s)]!;
  const span = Math.min(t_s, piece.end_s) - piece.start_s;
  return piece.integralBefore_ppms + meanLevelOver(piece.conditions, piece.startLevel_ppm, span) * span;
}

/** Samples of a profile at a fixed step. */
export interface ProfileSamples {
  time_s: number[];
  level_ppm: number[];
}

/**
 * Sample the profile every step_s seconds from its start to its end (the end always included).
 * Example: sampleProfile(profile, 60) on a 3600 s profile gives 61 samples.
 */
export function sampleProfile(profile: DayProfile, step_s: number): ProfileSamples {
  const first = profile.pieces[0];
  const last = profile.pieces[profile.pieces.length - 1];
  const time_s: number[] = [];
  const level_ppm: number[] = [];
  if (!first || !last || !(step_s > 0)) return { time_s, level_ppm };
  let index = 0;
  for (let k = 0; ; k++) {
    const t = Math.min(first.start_s + k * step_s, last.end_s);
    while (index < profile.pieces.length - 1 && profile.pieces[index]!.end_s < t) index++;
    const piece = profile.pieces[index]!;
    time_s.push(t);
    level_ppm.push(levelAfter(piece.conditions, piece.startLevel_ppm, t - piece.start_s));
    if (t >= last.end_s) break;
  }
  return { time_s, level_ppm };
}

/**
 * Sample the profile every step_s seconds from its start and at every change of conditions
 * (each piece's start and end), so the peaks at the end of an occupied piece are drawn exactly.
 * Times are sorted and unique. Example: a 3600 s profile of one piece from 08:00 and a second
 * piece 09:00–09:10, step 1800 s → times 08:00, 08:30, 09:00, 09:10.
 */
export function sampleProfileWithChanges(profile: DayProfile, step_s: number): ProfileSamples {
  const grid = sampleProfile(profile, step_s).time_s;
  const changes = profile.pieces.flatMap((p) => [p.start_s, p.end_s]);
  const time_s = [...new Set([...grid, ...changes])].sort((a, b) => a - b);
  return { time_s, level_ppm: time_s.map((t) => levelAt(profile, t)) };
}
