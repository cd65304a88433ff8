/**
 * The pressure difference across the outside wall that drives air through small openings
 * (background vents, air bricks) under a weather case. Vents are rated by their flow at a stated
 * pressure difference; this states the one we use, from the case:
 *
 *     stack:  Δp_s = ρ · g · h · Δθ / (θ̄ + 273.15)        h = half the ceiling height
 *     wind:   Δp_w = ½ · ρ · U_r² · ΔC_p                   ΔC_p = 0.3
 *     total:  Δp   = Δp_s + Δp_w
 *
 * Adding the pressures is the same as combining the stack and wind flows in quadrature,
 * Q = sqrt(Q_s² + Q_w²), the ASHRAE combination (references.md §3.3). The stack height (the
 * vent's distance from the room's neutral plane, taken as mid-height of the room) and ΔC_p
 * (a facade against the inside) are our own stated screening assumptions; a taller dwelling
 * can drive more, so the room-level height errs low.
 */
import { AIR_DENSITY_KG_M3, GRAVITY_M_S2 } from './air-constants.ts';
import { kelvin } from './units.ts';
import { meanTemperature, temperatureDifference, type WeatherCase } from './weather-cases.ts';

/** Wind pressure coefficient of one facade against the inside (assumed). */
export const FACADE_PRESSURE_COEFFICIENT = 0.3;

/** The driving pressure and its parts, Pa. */
export interface EnvelopePressure {
  stack_Pa: number;
  wind_Pa: number;
  total_Pa: number;
}

/**
 * Driving pressure across the envelope, Pa, under a weather case, with U_r at the building (m/s)
 * and the room's ceiling height (m).
 * Source: hydrostatic stack pressure and dynamic wind pressure (orifice-flow basis of BS 5925);
 * combination as ASHRAE's quadrature of flows; heights and ΔC_p our assumptions.
 * Example: envelopeDrivingPressure(COLD_CALM, 0.5, 2.4) = { stack_Pa: 0.9978, wind_Pa: 0.045, total_Pa: 1.0428 }.
 */
export function envelopeDrivingPressure(weather: WeatherCase, windAtHeight_ms: number, ceilingHeight_m: number): EnvelopePressure {
  const h = Math.max(0, ceilingHeight_m) / 2;
  const stack = (AIR_DENSITY_KG_M3 * GRAVITY_M_S2 * h * temperatureDifference(weather)) / kelvin(meanTemperature(weather));
  const wind = 0.5 * AIR_DENSITY_KG_M3 * Math.max(0, windAtHeight_ms) ** 2 * FACADE_PRESSURE_COEFFICIENT;
  return { stack_Pa: stack, wind_Pa: wind, total_Pa: stack + wind };
}
