/**
 * Infiltration by the LBL (Sherman–Grimsrud) "basic" stack-and-wind model, as given in the
 * ASHRAE Handbook of Fundamentals infiltration chapter (ch. 26 in 2001, ch. 27 in 2005) and the
 * EnergyPlus Input-Output Reference (ZoneInfiltration:EffectiveLeakageArea; references.md §4.3):
 *
 *     Q [L/s] = A_L [cm²] · sqrt(C_s · ΔT + C_w · U²)
 *
 * A_L effective leakage area at 4 Pa (C_D = 1 convention), ΔT inside − outside in K, U local wind
 * in m/s. The engine takes and returns SI (m², m³/s); the coefficients keep their published units.
 */
import { AIR_DENSITY_KG_M3 } from './air-constants.ts';
import { orificeFlow } from './orifice-flow.ts';
import { fromCubicMetresPerHour, fromLitresPerSecond } from './units.ts';

/** Storeys for which the LBL coefficients are tabulated (taller buildings: use 3). */
export type LblStoreys = 1 | 2 | 3;
/** LBL shelter class: 1 no obstructions … 5 buildings immediately adjacent. */
export type LblShelterClass = 1 | 2 | 3 | 4 | 5;

/** Stack coefficient C_s, (L/s)²/(cm⁴·K), by storeys (ASHRAE HoF via EnergyPlus I/O Reference). */
export const LBL_STACK_COEFFICIENT: Readonly<Record<LblStoreys, number>> = Object.freeze({
  1: 0.000145,
  2: 0.00029,
  3: 0.000435,
});

/** Wind coefficient C_w, (L/s)²/(cm⁴·(m/s)²), by shelter class and storeys (same source). */
export const LBL_WIND_COEFFICIENT: Readonly<Record<LblShelterClass, Readonly<Record<LblStoreys, number>>>> = Object.freeze({
  1: { 1: 0.000319, 2: 0.00042, 3: 0.000494 },
  2: { 1: 0.000246, 2: 0.000325, 3: 0.000382 },
  3: { 1: 0.000174, 2: 0.000231, 3: 0.000271 },
  4: { 1: 0.000104, 2: 0.000137, 3: 0.000161 },
  5: { 1: 0.000032, 2: 0.000042, 3: 0.000049 },
});

/** Square centimetres in a square metre. */
const CM2_PER_M2 = 1e4;

/**
 * LBL infiltration, m³/s, from effective leakage area (m², at 4 Pa), storeys, shelter class,
 * inside − outside temperature difference (K) and wind speed (m/s).
 * Source: ASHRAE HoF infiltration chapter, basic model (via EnergyPlus I/O Reference).
 * Example: lblInfiltration(0.05, 2, 3, 20, 4) = 0.04872 m³/s (500 cm², 48.72 L/s).
 */
export function lblInfiltration(
  leakageArea_m2: number,
  storeys: LblStoreys,
  shelterClass: LblShelterClass,
  deltaT_K: number,
  wind_ms: number,
): number {
  const cs = LBL_STACK_COEFFICIENT[storeys];
  const cw = LBL_WIND_COEFFICIENT[shelterClass][storeys];
  const litresPerSecond = Math.max(0, leakageArea_m2) * CM2_PER_M2 * Math.sqrt(cs * Math.abs(deltaT_K) + cw * wind_ms ** 2);
  return fromLitresPerSecond(litresPerSecond);
}

/** Flow exponent of a typical envelope between 4 and 50 Pa (from memory; references.md §4.3). */
export const ENVELOPE_FLOW_EXPONENT = 0.65;

/**
 * Effective leakage area at 4 Pa (m², C_D = 1) of envelope area envelope_m2 (m²) with air
 * permeability q50 (m³/(h·m²) at 50 Pa): Q_4 = Q_50·(4/50)^n, then A_L is the orifice of C_D = 1
 * passing Q_4 at 4 Pa, A_L = Q_4·sqrt(ρ/(2·4 Pa)).
 * Source: the standard extrapolation to 4 Pa (from memory; references.md §4.3).
 * Example: leakageAreaFromAirPermeability(10, 250) = 0.05208 m² (520.8 cm²).
 */
export function leakageAreaFromAirPermeability(
  q50_m3hm2: number,
  envelope_m2: number,
  exponent = ENVELOPE_FLOW_EXPONENT,
  density_kgm3 = AIR_DENSITY_KG_M3,
): number {
  const q50 = fromCubicMetresPerHour(Math.max(0, q50_m3hm2) * Math.max(0, envelope_m2));
  const q4 = q50 * (4 / 50) ** exponent;
  return q4 / orificeFlow(1, 4, 1, density_kgm3);
}
