/**
 * Air supply from an occupied level thought to be near steady (references.md §2.2, corrected by
 * practice.md §1.8). The steady-state form Q_ss = 1e6·N·G/(C − C_out) is only an upper bound, and
 * only when the room was still rising at constant occupancy: a room still rising has a higher
 * steady level, so less supply. The time constant V/Q is unknown, so the lowest supply consistent
 * with the reading is found by solving the exact build-up from outdoor level over the occupied
 * time (bracketed root finding: buildup-two-point's supplyBetweenLevels). If that lowest supply
 * already gives three time constants, the room is at steady state and Q_ss is an estimate.
 * If the history is unknown (a break with windows open, people coming and going), the start may
 * have been above the reading, so the reading gives only a lower bound: a range open above.
 */
import { supplyBetweenLevels } from './build-up-two-point.ts';
import { linearisedFigures, monteCarloFigures, nominalInputs, trueLevel, type TrueInputs } from './supply-uncertainty.ts';
import { NO_FIGURES, type Figure, type Reading, type SupplyEstimate, type UncertaintyInputs } from './supply-estimate.ts';
import { PPM_PER_VOLUME_FRACTION } from './units.ts';
import { warn, type EngineWarning } from './warnings.ts';

/** What is known of the room before the reading. */
export type OccupiedHistory = 'rising-at-constant-occupancy' | 'unknown';

/** Input of the near-steady method. */
export interface NearSteadyInput<C> {
  reading: Reading;
  /** When the present occupancy began, s (same clock as the reading). */
  occupiedSince_s: number;
  history: OccupiedHistory;
  /** Must include occupants. */
  uncertainty: UncertaintyInputs;
  conditions: C;
  seed: number;
  draws?: number;
}

function steadySupply(x: TrueInputs, level: number): number | null {
  const excess = level - x.outdoor_ppm;
  return excess > 0 ? (PPM_PER_VOLUME_FRACTION * x.count * x.perPerson_m3s) / excess : null;
}

/**
 * Lowest supply consistent with the reading: the room started at outdoor level. If even a sealed
 * room could not rise that far in the time, the start was above outdoor and no supply is ruled
 * out: 0.
 */
function lowestSupply(x: TrueInputs, level: number, duration: number): number | null {
  const q = supplyBetweenLevels(x, x.outdoor_ppm, level, duration);
  return typeof q === 'number' ? q : q === 'above-sealed' ? 0 : null;
}

/**
 * Near-steady estimate: an estimate when even the lowest consistent supply gives three time
 * constants of occupancy; otherwise an upper bound (rising history) or an open range (unknown).
 * Example: §7.2 classroom, 1316 ppm after 3 hours of the same 31 people, rising → estimate
 * ≈ 0.1 m³/s; the same reading after 20 minutes → upper bound 0.1 m³/s, range down to 0 (a
 * sealed room starting at outdoor level could not have reached 1316 ppm in 20 minutes).
 */
export function estimateNearSteady<C>(input: NearSteadyInput<C>): SupplyEstimate<C> {
  const u = input.uncertainty;
  const draws = input.draws ?? 1000;
  const duration = input.reading.time_s - input.occupiedSince_s;
  const raw = input.reading.level_ppm;
  const warnings: EngineWarning[] = [...u.outdoor.warnings];
  const assumed = { ...u, confidence: 0.95 as const, interval: { kind: 'monte-carlo' as const, draws, seed: input.seed } };
  const nominal = nominalInputs(u, 1);
  const level = trueLevel(nominal, raw);
  const upper = u.occupants && u.occupants.count > 0 ? steadySupply(nominal, level) : null;
  if (upper === null || !(duration > 0)) {
    warnings.push(
      warn('reading-at-or-below-outdoor', 'This method needs occupants, a time since they arrived, and a reading above outdoor.'),
    );
    return { ...NO_FIGURES, method: 'near-steady', kind: 'none', conditions: input.conditions, warnings, assumed, details: {} };
  }
  const options = { draws, seed: input.seed, statDof: 0, noiseSd_ppm: [u.meter.noiseSd_ppm] };
  const high = monteCarloFigures(u, (x) => steadySupply(x, trueLevel(x, raw, 0)), options);
  // The lowest consistent supply needs a root search per evaluation, so its interval is propagated
  // linearly (GUM §5.1, central differences on a log scale) rather than by a thousand root searches.
  const lowest = lowestSupply(nominal, level, duration);
  // When even a sealed room could not have risen that far, no supply is ruled out: the lower limit is 0.
  const zero = { value: 0, low: 0, high: 0 };
  const low =
    lowest === 0
      ? { supply_m3s: zero, airChangeRate_perSecond: zero, supplyPerPerson_m3s: zero, steadyLevel_ppm: { value: null, low: null, high: null }, failedShare: 0 }
      : linearisedFigures(u, (x) => lowestSupply(x, trueLevel(x, raw, 0), duration), options);
  const timeConstants = lowest ? (lowest / nominal.volume_m3) * duration : 0;
  const steady = timeConstants >= 3;
  const details = { steadyStateSupply_m3s: upper, lowestSupply_m3s: lowest, timeConstantsAtLowest: timeConstants };
  const { failedShare, ...steadyFigures } = high;
  const finalAssumed = { ...assumed, interval: { ...assumed.interval, failedShare } };
  if (steady && input.history === 'rising-at-constant-occupancy') {
    return { ...steadyFigures, method: 'near-steady', kind: 'estimate', conditions: input.conditions, warnings, assumed: finalAssumed, details };
  }
  const join = (a: Figure, b: Figure, openAbove: boolean): Figure => ({
    value: openAbove ? null : a.value,
    low: b.low,
    high: openAbove ? null : a.high,
  });
  const open = input.history === 'unknown';
  warnings.push(
    open
      ? warn(
          'history-unknown',
          'Without a reading at the start of this occupied period the room may have been falling from a higher level, so the reading gives only a lower limit on the supply. Take a start reading (then use the two-point build-up).',
        )
      : warn(
          'not-steady',
          `The room has not been occupied long enough to be sure it reached steady state (${timeConstants.toFixed(1)} time constants at the lowest consistent supply); the steady-state figure is an upper limit.`,
        ),
  );
  return {
    supply_m3s: join(steadyFigures.supply_m3s, low.supply_m3s, open),
    airChangeRate_perSecond: join(steadyFigures.airChangeRate_perSecond, low.airChangeRate_perSecond, open),
    supplyPerPerson_m3s: join(steadyFigures.supplyPerPerson_m3s, low.supplyPerPerson_m3s, open),
    // Lower supply means a higher steady level: the steady level's range runs the other way.
    steadyLevel_ppm: {
      value: open ? null : steadyFigures.steadyLevel_ppm.value,
      low: open ? null : steadyFigures.steadyLevel_ppm.low,
      high: low.steadyLevel_ppm.high,
    },
    method: 'near-steady',
    kind: open ? 'range' : 'upper-bound',
    conditions: input.conditions,
    warnings,
    assumed: finalAssumed,
    details,
  };
}
