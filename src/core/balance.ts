/**
 * The single-zone, well-mixed CO2 mass balance and its exact solution for constant conditions.
 *
 *     V·dC/dt = Q·(C_out − C) + 1e6·G        (C in ppm, V in m³, Q and G in m³/s)
 *
 * Standard form (ASTM D6245; Batterman 2017, IJERPH 14(2):145, §2.1). With λ = Q/V and the
 * source rate s = 1e6·G/V (ppm/s), the exact solution over a piece of constant conditions is
 *
 *     C(t) = C0 + (s + λ·(C_out − C0))·t·φ(λt),   φ(x) = (1 − e^(−x))/x,  φ(0) = 1
 *
 * which is C_ss + (C0 − C_ss)·e^(−λt) for Q > 0 and the linear rise C0 + s·t for Q = 0, without
 * a separate branch and without loss of precision for small λt (expm1).
 */
import { PPM_PER_VOLUME_FRACTION } from './units.ts';

/** Constant conditions of one piece of time. SI units. */
export interface BalanceConditions {
  /** Room volume, m³ (> 0). */
  volume_m3: number;
  /** Outdoor air supply (all routes: fans, windows, leakage), m³/s (≥ 0). */
  supply_m3s: number;
  /** CO2 level of the supply air, ppm. */
  outdoor_ppm: number;
  /** CO2 emitted in the room (people, flames), m³/s at room conditions (≥ 0). */
  source_m3s: number;
}

/** φ(x) = (1 − e^(−x))/x with φ(0) = 1. */
function phi(x: number): number {
  return x < 1e-12 ? 1 - x / 2 : -Math.expm1(-x) / x;
}

/** ψ(x) = (x − 1 + e^(−x))/x² with ψ(0) = 1/2: the time-mean of t·φ(λt) over [0, T], divided by T. */
function psi(x: number): number {
  if (x < 1e-3) return 0.5 - x / 6 + (x * x) / 24 - (x * x * x) / 120;
  return (x + Math.expm1(-x)) / (x * x);
}

/**
 * Air change rate λ = Q/V, s⁻¹. Example: airChangeRate({ volume_m3: 151.2, supply_m3s: 0.1, … })
 * = 6.614e-4 s⁻¹ (2.381 h⁻¹).
 */
export function airChangeRate(c: BalanceConditions): number {
  return c.supply_m3s / c.volume_m3;
}

/** Source rate s = 1e6·G/V in ppm/s. Example: G = 8.96e-5 m³/s in 151.2 m³ → 0.5926 ppm/s. */
export function sourceRate(c: BalanceConditions): number {
  return (PPM_PER_VOLUME_FRACTION * c.source_m3s) / c.volume_m3;
}

/**
 * Rate of change dC/dt (ppm/s) at level `level_ppm` under conditions c (mass balance above).
 * Example: 151.2 m³, Q 0.1 m³/s, outdoor 420, G 8.96e-5 m³/s, at 450 ppm → +0.5728 ppm/s.
 */
export function co2RateOfChange(c: BalanceConditions, level_ppm: number): number {
  return sourceRate(c) + airChangeRate(c) * (c.outdoor_ppm - level_ppm);
}

/**
 * Steady level C_ss = C_out + 1e6·G/Q (ppm). A sealed room (Q = 0) with a source rises without
 * limit: Infinity. A sealed room without a source stays at whatever level it holds: NaN (no
 * single steady level; callers pass a start level to levelAfter instead).
 * Example: classroom with N·G = 8.96e-5 m³/s, Q = 0.1 m³/s, outdoor 420 → 1316 ppm
 * (references.md §7.2).
 */
export function steadyLevel(c: BalanceConditions): number {
  if (c.supply_m3s > 0) return c.outdoor_ppm + (PPM_PER_VOLUME_FRACTION * c.source_m3s) / c.supply_m3s;
  return c.source_m3s > 0 ? Number.POSITIVE_INFINITY : Number.NaN;
}

/**
 * Exact level after t_s seconds of constant conditions, from start_ppm (ppm).
 * Example: classroom above from 450 ppm, t = 900 s → 838.5 ppm (references.md §7.2).
 */
export function levelAfter(c: BalanceConditions, start_ppm: number, t_s: number): number {
  const lambda = airChangeRate(c);
  return start_ppm + (sourceRate(c) + lambda * (c.outdoor_ppm - start_ppm)) * t_s * phi(lambda * t_s);
}

/**
 * Closed-form mean level over [0, duration_s] of a piece starting at start_ppm (ppm):
 * C0 + (s + λ(C_out − C0))·T·ψ(λT). A zero duration gives the start level.
 * Example: classroom above from 450 ppm over 3600 s → 985.9 ppm.
 */
export function meanLevelOver(c: BalanceConditions, start_ppm: number, duration_s: number): number {
  const lambda = airChangeRate(c);
  return start_ppm + (sourceRate(c) + lambda * (c.outdoor_ppm - start_ppm)) * duration_s * psi(lambda * duration_s);
}

/**
 * Time (s) for the level to go from start_ppm to target_ppm under constant conditions.
 * 0 when already there; Infinity ("never") when the target lies beyond the steady level or on
 * the other side of the start from where the level is heading.
 * Example: classroom above from 450 ppm to 1000 ppm → 1524 s (25.4 min).
 */
export function timeToReach(c: BalanceConditions, start_ppm: number, target_ppm: number): number {
  if (target_ppm === start_ppm) return 0;
  const lambda = airChangeRate(c);
  const s = sourceRate(c);
  if (!(lambda > 0)) return s > 0 && target_ppm > start_ppm ? (target_ppm - start_ppm) / s : Number.POSITIVE_INFINITY;
  const steady = c.outdoor_ppm + s / lambda;
  const ratio = (start_ppm - steady) / (target_ppm - steady);
  // The target must lie strictly between the start and the steady level.
  if (!(ratio > 1) || !Number.isFinite(ratio)) return Number.POSITIVE_INFINITY;
  return Math.log(ratio) / lambda;
}
