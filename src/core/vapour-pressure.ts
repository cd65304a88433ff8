/**
 * Water vapour pressure, relative humidity and vapour density of moist air.
 *
 * Relative humidity is the ratio of the vapour pressure to the saturation pressure at the same
 * temperature (ASHRAE HoF 2017 ch. 1, eqn 22; the definition also used by ISO 13788). The
 * engine carries it in per cent, as stored. Vapour density follows from the ideal-gas law with
 * the gas constant of water vapour R_w = 461.524 J/(kg·K) (ASHRAE HoF 2017 ch. 1, eqn 1).
 */
import { saturationPressure } from './saturation-pressure.ts';
import { kelvin } from './units.ts';

/** Gas constant of water vapour, J/(kg·K) (ASHRAE HoF 2017 ch. 1). */
export const WATER_VAPOUR_GAS_CONSTANT = 461.524;

/**
 * Vapour pressure p_w (Pa) of air at t_C (°C) and relative humidity rh_pct (%).
 * Example: vapourPressureFromRelativeHumidity(20, 60) = 1403.3 Pa.
 */
export function vapourPressureFromRelativeHumidity(t_C: number, rh_pct: number): number {
  return (rh_pct / 100) * saturationPressure(t_C);
}

/**
 * Relative humidity (%) of air at t_C (°C) holding vapour at pressure p_w (Pa). Values above
 * 100 % mean the vapour would condense at that temperature (used for surface checks).
 * Example: relativeHumidityFromVapourPressure(16.25, 1403.3) = 75.9 %.
 */
export function relativeHumidityFromVapourPressure(t_C: number, vapour_Pa: number): number {
  return (100 * vapour_Pa) / saturationPressure(t_C);
}

/**
 * Vapour density (absolute humidity) in kg/m³ of vapour at pressure p_w (Pa) and t_C (°C):
 * ρ_v = p_w / (R_w·T). Example: vapourDensity(1403.3, 20) = 0.010372 kg/m³ (10.37 g/m³).
 */
export function vapourDensity(vapour_Pa: number, t_C: number): number {
  return vapour_Pa / (WATER_VAPOUR_GAS_CONSTANT * kelvin(t_C));
}

/**
 * Vapour pressure (Pa) from a vapour density (kg/m³) at t_C (°C), the inverse of vapourDensity.
 * Example: vapourPressureFromDensity(0.010372, 20) = 1403.3 Pa.
 */
export function vapourPressureFromDensity(density_kgm3: number, t_C: number): number {
  return density_kgm3 * WATER_VAPOUR_GAS_CONSTANT * kelvin(t_C);
}
