/**
 * Cross ventilation by the BS 5925:1991 forms (CIBSE Guide A / AM10; references.md §3.2), for
 * openings on two facades joined by an open internal path. Openings, and any internal doorway on
 * the path, act in series. A in m², U_r in m/s, Δθ in K, θ̄ in °C, H_1 in m, Q in m³/s.
 *
 *     wind:   Q_w = C_d · A_w · U_r · sqrt(ΔC_p),  1/A_w² = 1/(A_1+A_2)² + 1/(A_3+A_4)² [+ 1/A_door²]
 *     stack:  Q_b = C_d · A_b · sqrt(2 Δθ g H_1 / (θ̄ + 273)),  1/A_b² = 1/(A_1+A_3)² + 1/(A_2+A_4)² [+ 1/A_door²]
 *     which:  stack if U_r/√Δθ < 0.26 · sqrt(A_b/A_w) · sqrt(H_1/ΔC_p), otherwise wind
 *
 * (windward pair 1, 2; leeward pair 3, 4; low pair 1, 3; high pair 2, 4.) The printed rule is
 * meant to pick the larger mechanism (references.md §3.2); equating Q_b and Q_w gives the same
 * threshold with A_b/A_w in place of its square root, so where the two readings differ we use the
 * larger flow and report what the printed rule says.
 *
 * Wind direction is not known on a survey, so ΔC_p is a stated assumption (see CROSS_PRESSURE_COEFFICIENT).
 */
import { GRAVITY_M_S2, SHARP_EDGE_DISCHARGE_COEFFICIENT } from './air-constants.ts';
import { heightSplits, type LevelledArea } from './opening-height-splits.ts';
import { stackVelocity } from './single-sided-ventilation.ts';

/**
 * Difference of wind pressure coefficients between the two facades (dimensionless): 0.9 with the
 * wind square to the facades, falling towards 0.1 when it runs along them or the building is
 * sheltered. Central 0.5. Our stated screening assumption, from memory.
 */
export const CROSS_PRESSURE_COEFFICIENT = Object.freeze({ low: 0.1, central: 0.5, high: 0.9 });

/**
 * Areas (m²) in series: (Σ A⁻²)^(−1/2); zero if any is zero.
 * Source: BS 5925:1991 series rule (references.md §3.2).
 * Example: seriesArea([0.6, 0.6]) = 0.4243 m².
 */
export function seriesArea(areas: readonly number[]): number {
  if (areas.length === 0 || areas.some((a) => !(a > 0))) return 0;
  return areas.reduce((s, a) => s + a ** -2, 0) ** -0.5;
}

/**
 * Cross wind-driven flow, m³/s, from the series area A_w (m²), U_r (m/s) and ΔC_p.
 * Source: BS 5925:1991 (references.md §3.2).
 * Example: crossWindFlow(0.4243, 4, 0.9) = 0.982 m³/s.
 */
export function crossWindFlow(seriesArea_m2: number, windAtHeight_ms: number, deltaCp: number): number {
  return SHARP_EDGE_DISCHARGE_COEFFICIENT * seriesArea_m2 * Math.max(0, windAtHeight_ms) * Math.sqrt(Math.max(0, deltaCp));
}

/**
 * Cross stack-driven flow, m³/s, from the series area A_b (m²), separation H_1 (m), Δθ (K), θ̄ (°C).
 * Source: BS 5925:1991 (references.md §3.2).
 * Example: crossStackFlow(0.4243, 1.5, 16, 13) = 0.332 m³/s.
 */
export function crossStackFlow(seriesArea_m2: number, separation_m: number, deltaT_K: number, meanTemp_C: number): number {
  return SHARP_EDGE_DISCHARGE_COEFFICIENT * seriesArea_m2 * Math.SQRT2 * stackVelocity(deltaT_K, separation_m, meanTemp_C);
}

/**
 * The printed BS 5925 rule: true when stack governs (U_r/√Δθ below 0.26·sqrt(A_b/A_w)·sqrt(H_1/ΔC_p)).
 * Source: BS 5925:1991 (references.md §3.2).
 * Example: printedRuleSaysStack(4, 16, 0.4243, 0.4243, 1.5, 0.9) = false (1.0 > 0.336: wind governs).
 */
export function printedRuleSaysStack(
  windAtHeight_ms: number,
  deltaT_K: number,
  stackSeriesArea_m2: number,
  windSeriesArea_m2: number,
  separation_m: number,
  deltaCp: number,
): boolean {
  if (!(windSeriesArea_m2 > 0) || !(deltaCp > 0)) return true;
  if (!(Math.abs(deltaT_K) > 0)) return false;
  const threshold = 0.26 * Math.sqrt(stackSeriesArea_m2 / windSeriesArea_m2) * Math.sqrt(Math.max(0, separation_m) / deltaCp);
  return Math.max(0, windAtHeight_ms) / Math.sqrt(Math.abs(deltaT_K)) < threshold;
}

/** Cross ventilation result, m³/s. */
export interface CrossFlow {
  wind: number;
  stack: number;
  /** The larger mechanism. */
  governing: 'wind' | 'stack';
  /** What the printed switching rule picks (may differ near the crossover). */
  printedRule: 'wind' | 'stack';
  flow: number;
}

/**
 * Cross ventilation between two facades' openings (each: open area m², centre height m) with
 * internal doorways on the path in series (m²), under U_r (m/s), Δθ (K), θ̄ (°C) and ΔC_p.
 * Source: BS 5925:1991 cross forms (references.md §3.2).
 * Example: crossFlow(four 0.3 m² openings, two per facade at 0.5 m and 2.0 m; no door; U_r 4, Δθ 16,
 *   θ̄ 13, ΔC_p 0.9) = { wind: 0.982, stack: 0.332, governing: 'wind', printedRule: 'wind', flow: 0.982 }.
 */
export function crossFlow(
  facadeA: readonly LevelledArea[],
  facadeB: readonly LevelledArea[],
  internalDoorways_m2: readonly number[],
  windAtHeight_ms: number,
  deltaT_K: number,
  meanTemp_C: number,
  deltaCp: number,
): CrossFlow {
  const total = (side: readonly LevelledArea[]) => side.reduce((s, o) => s + Math.max(0, o.area_m2), 0);
  const windArea = seriesArea([total(facadeA), total(facadeB), ...internalDoorways_m2]);
  const wind = crossWindFlow(windArea, windAtHeight_ms, deltaCp);
  let stack = 0;
  let stackArea = 0;
  let separation = 0;
  for (const split of heightSplits([...facadeA, ...facadeB])) {
    const area = seriesArea([split.lowArea_m2, split.highArea_m2, ...internalDoorways_m2]);
    const q = crossStackFlow(area, split.separation_m, deltaT_K, meanTemp_C);
    if (q > stack) [stack, stackArea, separation] = [q, area, split.separation_m];
  }
  const printed = printedRuleSaysStack(windAtHeight_ms, deltaT_K, stackArea, windArea, separation, deltaCp);
  return {
    wind,
    stack,
    governing: stack > wind ? 'stack' : 'wind',
    printedRule: printed ? 'stack' : 'wind',
    flow: Math.max(wind, stack),
  };
}
