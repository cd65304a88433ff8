/**
 * Single-sided ventilation by the BS 5925:1991 forms (CIBSE Guide A and AM10 give the same;
 * they come from Warren & Parkins 1984 and are implemented in AixLib `WarrenParkins.mo`;
 * references.md §3.2). A in m² (open area), U_r in m/s, Δθ in K, θ̄ in °C, H in m, Q in m³/s.
 *
 *     wind:                 Q = 0.025 · A · U_r
 *     stack, one opening:   Q = C_d · (A/3) · sqrt(Δθ · g · H / (θ̄ + 273))
 *     stack, two openings:  Q = C_d · A · [ε√2 / ((1+ε)·sqrt(1+ε²))] · sqrt(Δθ · g · H_1 / (θ̄ + 273)),
 *                           ε = A_1/A_2, A = A_1 + A_2, H_1 their vertical separation
 *     combined:             Q = max(wind, stack)   (Warren–Parkins, as implemented in AixLib)
 *
 * With several openings on one side, the stack part is the larger of the one-opening forms summed
 * and the two-opening form over the low/high divisions of opening-height-splits.ts (our
 * application of the published forms to more than two openings).
 */
import { GRAVITY_M_S2, SHARP_EDGE_DISCHARGE_COEFFICIENT } from './air-constants.ts';
import { heightSplits, type LevelledArea } from './opening-height-splits.ts';
import { kelvin } from './units.ts';

/** BS 5925 single-sided wind coefficient (dimensionless). */
export const SINGLE_SIDED_WIND_COEFFICIENT = 0.025;

/**
 * Single-sided wind-driven flow, m³/s, from open area (m²) and wind at building height (m/s).
 * Source: BS 5925:1991 (Warren & Parkins form; references.md §3.2).
 * Example: singleSidedWindFlow(0.5, 4) = 0.050 m³/s.
 */
export function singleSidedWindFlow(area_m2: number, windAtHeight_ms: number): number {
  return SINGLE_SIDED_WIND_COEFFICIENT * Math.max(0, area_m2) * Math.max(0, windAtHeight_ms);
}

/**
 * sqrt(Δθ·g·H/(θ̄ + 273.15)), m/s: the stack velocity scale of the BS 5925 forms (Δθ in K, H in m, θ̄ in °C).
 * Source: BS 5925:1991 stack forms (references.md §3.2).
 * Example: stackVelocity(16, 1.2, 13) = 0.8113 m/s.
 */
export function stackVelocity(deltaT_K: number, height_m: number, meanTemp_C: number): number {
  return Math.sqrt((Math.abs(deltaT_K) * GRAVITY_M_S2 * Math.max(0, height_m)) / kelvin(meanTemp_C));
}

/**
 * Single-sided stack flow through one opening of area A (m²) and height H (m), m³/s.
 * Δθ in K, θ̄ (mean of inside and outside) in °C.
 * Source: BS 5925:1991 (references.md §3.2).
 * Example: singleOpeningStackFlow(0.5, 1.2, 16, 13) = 0.0825 m³/s.
 */
export function singleOpeningStackFlow(area_m2: number, height_m: number, deltaT_K: number, meanTemp_C: number): number {
  return SHARP_EDGE_DISCHARGE_COEFFICIENT * (Math.max(0, area_m2) / 3) * stackVelocity(deltaT_K, height_m, meanTemp_C);
}

/**
 * Single-sided stack flow through two openings A_1, A_2 (m²) a vertical distance H_1 (m) apart, m³/s.
 * Source: BS 5925:1991 (references.md §3.2).
 * Example: twoOpeningStackFlow(0.2, 0.2, 1.5, 16, 13) = 0.1107 m³/s.
 */
export function twoOpeningStackFlow(
  lowArea_m2: number,
  highArea_m2: number,
  separation_m: number,
  deltaT_K: number,
  meanTemp_C: number,
): number {
  const a1 = Math.max(0, lowArea_m2);
  const a2 = Math.max(0, highArea_m2);
  if (a1 === 0 || a2 === 0) return 0;
  // (A_1 + A_2)·ε√2/((1+ε)·sqrt(1+ε²)) simplifies to √2·A_1·A_2/sqrt(A_1² + A_2²), which stays finite for any areas.
  const areaTerm = Math.SQRT2 * (a1 / Math.hypot(a1, a2)) * a2;
  return SHARP_EDGE_DISCHARGE_COEFFICIENT * areaTerm * stackVelocity(deltaT_K, separation_m, meanTemp_C);
}

/** One open area on the side of the room: area (m²), centre height (m) and vertical extent (m). */
export interface SideOpening extends LevelledArea {
  openingHeight_m: number;
}

/** Single-sided result, m³/s. */
export interface SingleSidedFlow {
  wind: number;
  stack: number;
  /** Which form gave the stack part. */
  stackForm: 'one-opening' | 'two-opening';
  governing: 'wind' | 'stack';
  flow: number;
}

/**
 * Single-sided flow through the openings on one side of a room, m³/s: max(wind, stack).
 * U_r in m/s at building height, Δθ in K, θ̄ in °C.
 * Source: BS 5925:1991 forms and the Warren–Parkins combination (references.md §3.2).
 * Example: singleSidedFlow([{ area_m2: 0.5, openingHeight_m: 1.2, centreHeight_m: 1.5 }], 4, 16, 13)
 *   = { wind: 0.050, stack: 0.0825, stackForm: 'one-opening', governing: 'stack', flow: 0.0825 }.
 */
export function singleSidedFlow(
  openings: readonly SideOpening[],
  windAtHeight_ms: number,
  deltaT_K: number,
  meanTemp_C: number,
): SingleSidedFlow {
  const totalArea = openings.reduce((s, o) => s + Math.max(0, o.area_m2), 0);
  const wind = singleSidedWindFlow(totalArea, windAtHeight_ms);
  const oneOpening = openings.reduce(
    (s, o) => s + singleOpeningStackFlow(o.area_m2, o.openingHeight_m, deltaT_K, meanTemp_C),
    0,
  );
  const twoOpening = Math.max(
    0,
    ...heightSplits(openings).map((s) =>
      twoOpeningStackFlow(s.lowArea_m2, s.highArea_m2, s.separation_m, deltaT_K, meanTemp_C),
    ),
  );
  const stack = Math.max(oneOpening, twoOpening);
  const stackForm = twoOpening > oneOpening ? 'two-opening' : 'one-opening';
  return { wind, stack, stackForm, governing: stack > wind ? 'stack' : 'wind', flow: Math.max(wind, stack) };
}
