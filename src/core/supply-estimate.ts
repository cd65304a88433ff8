/**
 * The shape every air-supply method returns: value and 95 % interval for the supply, the air
 * change rate, the supply per person and the steady CO2 level, the method, the room state the
 * test describes (passed through from the caller), warnings, and the inputs it assumed.
 */
import type { MeterErrorModel } from './meter-error.ts';
import type { OutdoorLevel } from './outdoor-level.ts';
import type { EngineWarning } from './warnings.ts';

/** One CO2 reading: time in s (any origin, e.g. from midnight) and the meter's reading in ppm. */
export interface Reading {
  time_s: number;
  level_ppm: number;
}

/** A value with its 95 % interval; null where it cannot be given. */
export interface Figure {
  value: number | null;
  low: number | null;
  high: number | null;
}

/** The four figures every method reports. SI: m³/s, s⁻¹, ppm. */
export interface SupplyFigures {
  supply_m3s: Figure;
  airChangeRate_perSecond: Figure;
  supplyPerPerson_m3s: Figure;
  steadyLevel_ppm: Figure;
}

/** Methods, by their published names where they have one. */
export type SupplyMethod =
  | 'decay-log-linear'
  | 'decay-with-background'
  | 'decay-two-point'
  | 'build-up-known-output'
  | 'build-up-rate-and-level'
  | 'build-up-two-point'
  | 'spot-reading'
  | 'near-steady';

/**
 * What the figures mean: an estimate with its interval, only an upper bound, a range (bounds
 * only), or nothing (see the warnings).
 */
export type EstimateKind = 'estimate' | 'upper-bound' | 'range' | 'none';

/** Occupants behind the CO2 source (for build-ups) or the per-person and steady figures. */
export interface OccupantUncertainty {
  /** People present, and its standard uncertainty. */
  count: number;
  countSd: number;
  /** CO2 output per person, m³/s (e.g. from occupantCo2Output), and its relative standard uncertainty. */
  perPerson_m3s: number;
  perPersonRelSd: number;
}

/** The uncertain inputs shared by all methods. */
export interface UncertaintyInputs {
  /** Room volume, m³, and its standard uncertainty. */
  volume_m3: number;
  volumeSd_m3: number;
  outdoor: OutdoorLevel;
  /** The room meter. */
  meter: MeterErrorModel;
  /** Occupants; needed by build-up methods, optional for decays (per-person and steady figures). */
  occupants?: OccupantUncertainty;
}

/** How the interval was found. */
export interface IntervalMethod {
  kind: 'monte-carlo' | 'linearised';
  /** Monte Carlo draws and seed. */
  draws?: number;
  seed?: number;
  /** Share of draws the method could not evaluate (excess at or below outdoor). */
  failedShare?: number;
}

/** A method's result. C: the room state recorded for the test (openings, doors, fans), passed through. */
export interface SupplyEstimate<C> extends SupplyFigures {
  method: SupplyMethod;
  kind: EstimateKind;
  conditions: C;
  warnings: EngineWarning[];
  assumed: UncertaintyInputs & { confidence: 0.95; interval: IntervalMethod };
  /** Method-specific figures (fitted background, implied output, …), SI units. */
  details: Record<string, number | null>;
}

/** A figure with nothing in it. */
export const NO_FIGURE: Figure = { value: null, low: null, high: null };

/** Figures with nothing in them. */
export const NO_FIGURES: SupplyFigures = {
  supply_m3s: NO_FIGURE,
  airChangeRate_perSecond: NO_FIGURE,
  supplyPerPerson_m3s: NO_FIGURE,
  steadyLevel_ppm: NO_FIGURE,
};

/**
 * Assemble a method's result from propagated figures: kind 'estimate' when a supply came out,
 * otherwise 'none' with empty figures; the interval method records the share of failed draws.
 * Example: toSupplyEstimate({ …NO_FIGURES, failedShare: 1 }, …).kind = 'none'.
 */
export function toSupplyEstimate<C>(
  figures: SupplyFigures & { failedShare: number },
  parts: {
    method: SupplyMethod;
    conditions: C;
    warnings: EngineWarning[];
    uncertainty: UncertaintyInputs;
    interval: IntervalMethod;
    details: Record<string, number | null>;
  },
): SupplyEstimate<C> {
  const { failedShare, ...rest } = figures;
  const ok = rest.supply_m3s.value !== null;
  return {
    ...(ok ? rest : NO_FIGURES),
    method: parts.method,
    kind: ok ? 'estimate' : 'none',
    conditions: parts.conditions,
    warnings: parts.warnings,
    assumed: { ...parts.uncertainty, confidence: 0.95, interval: { ...parts.interval, failedShare } },
    details: parts.details,
  };
}
