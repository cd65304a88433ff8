/**
 * Air supply from two levels of an occupied period at constant occupancy: a start level and a
 * later reading. The exact solution C(T) = C_ss(Q) + (C0 − C_ss(Q))·e^(−QT/V) falls steadily as Q
 * grows (for C0 ≥ C_out), so Q is found by bracketed root finding (Brent 1973) — the transient
 * mass-balance inversion of references.md §2.5. Two uses:
 * - estimateBuildUpTwoPoint: start and end readings on the same meter (two-point build-up);
 * - estimateSpotReading: one reading with a start level known otherwise (e.g. the room was aired
 *   to outdoor), given with its own uncertainty.
 * Intervals: seeded Monte Carlo over both levels, the meter, outdoor, volume and occupants.
 */
import { levelAfter } from './balance.ts';
import { findRootInBracket } from './bracketed-root.ts';
import { monteCarloFigures, nominalInputs, trueLevel, type TrueInputs } from './supply-uncertainty.ts';
import { NO_FIGURES, toSupplyEstimate, type Reading, type SupplyEstimate, type SupplyMethod, type UncertaintyInputs } from './supply-estimate.ts';
import { PPM_PER_VOLUME_FRACTION } from './units.ts';
import { warn, type EngineWarning } from './warnings.ts';

/** Why no supply fits two levels, or null when one does. */
type NoSolution = 'above-sealed' | 'below-outdoor' | null;

/**
 * Supply (m³/s) that takes the room from start_ppm to end_ppm in duration_s with the occupants'
 * output, under true inputs x; or the reason there is none.
 */
export function supplyBetweenLevels(x: TrueInputs, start_ppm: number, end_ppm: number, duration_s: number): number | NoSolution {
  const source = x.count * x.perPerson_m3s;
  const sealedEnd = start_ppm + (PPM_PER_VOLUME_FRACTION * source * duration_s) / x.volume_m3;
  if (end_ppm >= sealedEnd) return 'above-sealed';
  if (end_ppm <= x.outdoor_ppm) return 'below-outdoor';
  // One conditions object, updated in place: Monte Carlo calls this a thousand times per reading.
  const conditions = { volume_m3: x.volume_m3, supply_m3s: 0, outdoor_ppm: x.outdoor_ppm, source_m3s: source };
  const gap = (lnRate: number): number => {
    conditions.supply_m3s = Math.exp(lnRate) * x.volume_m3;
    return levelAfter(conditions, start_ppm, duration_s) - end_ppm;
  };
  // From almost sealed (λT = 1e-9) to a room at its steady level within e^(−60). A tolerance of
  // 1e-9 in ln(rate) is a relative 1e-9 in supply, far inside any interval the draws give.
  const root = findRootInBracket(gap, Math.log(1e-9 / duration_s), Math.log(60 / duration_s), 1e-9);
  return root === null ? 'below-outdoor' : Math.exp(root) * x.volume_m3;
}

/** Start and end of an occupied period. */
export interface TwoLevelInput<C> {
  /** Start of constant occupancy. */
  start: Reading;
  /** Later reading, same occupancy throughout. */
  end: Reading;
  /** Must include occupants. */
  uncertainty: UncertaintyInputs;
  conditions: C;
  seed: number;
  draws?: number;
}

/** A spot reading with a start level known from elsewhere (true ppm, with its sd). */
export interface SpotReadingInput<C> {
  reading: Reading;
  /** Start of constant occupancy (s) and the level then, true ppm, with its standard uncertainty. */
  startTime_s: number;
  startLevel_ppm: number;
  startLevelSd_ppm: number;
  uncertainty: UncertaintyInputs;
  conditions: C;
  seed: number;
  draws?: number;
}

function solve<C>(
  method: SupplyMethod,
  u: UncertaintyInputs,
  conditions: C,
  seed: number,
  draws: number,
  duration: number,
  startOf: (x: TrueInputs) => number,
  end_raw: number,
  noiseSd: number[],
): SupplyEstimate<C> {
  const warnings: EngineWarning[] = [...u.outdoor.warnings];
  const assumed = { ...u, confidence: 0.95 as const, interval: { kind: 'monte-carlo' as const, draws, seed } };
  const nominal = nominalInputs(u, 2);
  const nominalSupply =
    u.occupants && u.occupants.count > 0 && duration > 0
      ? supplyBetweenLevels(nominal, startOf(nominal), trueLevel(nominal, end_raw, 1), duration)
      : null;
  if (typeof nominalSupply !== 'number') {
    if (nominalSupply === 'above-sealed') {
      warnings.push(
        warn(
          'reading-above-sealed-room',
          'The level rose faster than the stated occupants could make it rise even with no air supply: check the head count, activity, other CO2 sources and the start level.',
        ),
      );
    } else if (nominalSupply === 'below-outdoor') {
      warnings.push(warn('reading-at-or-below-outdoor', 'The reading is at or below the outdoor level: it cannot give a supply.'));
    } else {
      warnings.push(warn('too-few-readings', 'This method needs occupants, and a reading after the start of the period.'));
    }
    return { ...NO_FIGURES, method, kind: 'none', conditions, warnings, assumed, details: {} };
  }
  const figures = monteCarloFigures(
    u,
    (x) => {
      const q = supplyBetweenLevels(x, startOf(x), trueLevel(x, end_raw, 1), duration);
      return typeof q === 'number' ? q : null;
    },
    { draws, seed, statDof: 0, noiseSd_ppm: noiseSd },
  );
  if (figures.failedShare > 0.025) {
    warnings.push(
      warn(
        'not-steady',
        'Within the uncertainty of the inputs the readings are also consistent with almost no air supply or a very large one; treat the range as open-ended.',
      ),
    );
  }
  return toSupplyEstimate(figures, { method, conditions, warnings, uncertainty: u, interval: assumed.interval, details: { duration_s: duration } });
}

/**
 * Two-point build-up: a start and an end reading of an occupied period on the same meter.
 * Example: §7.2 classroom (151.2 m³, N·G 0.0896 L/s, outdoor 420), 450 ppm at the start and
 * 1052.7 ppm 30 minutes later → supply ≈ 0.1 m³/s.
 */
export function estimateBuildUpTwoPoint<C>(input: TwoLevelInput<C>): SupplyEstimate<C> {
  const u = input.uncertainty;
  const noise = u.meter.noiseSd_ppm;
  const startRaw = input.start.level_ppm;
  return solve(
    'build-up-two-point',
    u,
    input.conditions,
    input.seed,
    input.draws ?? 1000,
    input.end.time_s - input.start.time_s,
    (x) => trueLevel(x, startRaw, 0),
    input.end.level_ppm,
    [noise, noise],
  );
}

/**
 * Single spot reading with a known start level and time (bracketed root finding).
 * Example: start 430 ± 20 ppm at 08:40, reading 1052.7 ppm half an hour later in the same room
 * → supply ≈ 0.1 m³/s with a wider range than the two-point build-up.
 */
export function estimateSpotReading<C>(input: SpotReadingInput<C>): SupplyEstimate<C> {
  const u = input.uncertainty;
  return solve(
    'spot-reading',
    u,
    input.conditions,
    input.seed,
    input.draws ?? 1000,
    input.reading.time_s - input.startTime_s,
    (x) => input.startLevel_ppm + x.noise[0]!,
    input.reading.level_ppm,
    [input.startLevelSd_ppm, u.meter.noiseSd_ppm],
  );
}
