/**
 * Predicted flows are ranges, never single numbers: { low, central, high } in m³/s.
 *
 * Model uncertainty carried by every prediction (practice.md §1 item 9):
 * - opening formulas (windows, vents) are ±30–50 % at best: we carry ±50 %;
 * - leakage from air permeability is a seasonal whole-dwelling average, ×0.5–×2 at any moment:
 *   we carry a factor of two either way.
 *
 * Example: rangeAboutCentral(0.05, OPENING_MODEL_UNCERTAINTY) = { low: 0.025, central: 0.05, high: 0.075 }.
 */

/** A predicted flow, m³/s: low ≤ central ≤ high. */
export interface FlowRange {
  low: number;
  central: number;
  high: number;
}

/** Relative model uncertainty of opening formulas (±50 %, practice.md §1 item 9c). */
export const OPENING_MODEL_UNCERTAINTY = 0.5;
/** Multiplicative model uncertainty of leakage predictions (×/÷2, practice.md §1 item 9a). */
export const LEAKAGE_MODEL_FACTOR = 2;

/** No flow. */
export const NO_FLOW: FlowRange = Object.freeze({ low: 0, central: 0, high: 0 });

/**
 * central·(1 − rel) … central·(1 + rel), m³/s. rel is a fraction (0.5 = ±50 %), at most 1.
 * Source: interval arithmetic on non-negative flows (no published method).
 * Example: rangeAboutCentral(0.1, 0.5) = { low: 0.05, central: 0.1, high: 0.15 }.
 */
export function rangeAboutCentral(central_m3s: number, rel: number): FlowRange {
  return { low: central_m3s * (1 - rel), central: central_m3s, high: central_m3s * (1 + rel) };
}

/**
 * central/factor … central·factor, m³/s (factor ≥ 1).
 * Source: interval arithmetic on non-negative flows (no published method).
 * Example: rangeByFactor(0.01, 2) = { low: 0.005, central: 0.01, high: 0.02 }.
 */
export function rangeByFactor(central_m3s: number, factor: number): FlowRange {
  return { low: central_m3s / factor, central: central_m3s, high: central_m3s * factor };
}

/**
 * Widen a range so that it also covers every value in `others` (m³/s), e.g. an alternative
 * published model evaluated in the same conditions.
 * Source: interval arithmetic on non-negative flows (no published method).
 * Example: coverValues({ low: 1, central: 2, high: 3 }, [0.5, 4]) = { low: 0.5, central: 2, high: 4 }.
 */
export function coverValues(range: FlowRange, others: readonly number[]): FlowRange {
  return {
    low: Math.min(range.low, ...others),
    central: range.central,
    high: Math.max(range.high, ...others),
  };
}

/**
 * Sum of ranges, end by end (m³/s).
 * Source: interval arithmetic on non-negative flows (no published method).
 * Example: addRanges([{ low: 1, central: 2, high: 3 }, { low: 1, central: 1, high: 1 }]) = { low: 2, central: 3, high: 4 }.
 */
export function addRanges(ranges: readonly FlowRange[]): FlowRange {
  return ranges.reduce(
    (sum, r) => ({ low: sum.low + r.low, central: sum.central + r.central, high: sum.high + r.high }),
    NO_FLOW,
  );
}

/**
 * Each end multiplied by a non-negative share.
 * Source: interval arithmetic on non-negative flows (no published method).
 * Example: scaleRange({ low: 1, central: 2, high: 3 }, 0.5) = { low: 0.5, central: 1, high: 1.5 }.
 */
export function scaleRange(range: FlowRange, share: number): FlowRange {
  return { low: range.low * share, central: range.central * share, high: range.high * share };
}
