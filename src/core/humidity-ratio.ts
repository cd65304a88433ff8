/**
 * Humidity ratio W (kg of water vapour per kg of dry air) and vapour pressure, ASHRAE HoF 2017
 * ch. 1 eqn 20: W = 0.621945·p_w/(p − p_w), where 0.621945 is the ratio of the molar masses of
 * water and dry air and p the total (barometric) pressure in Pa.
 */
import { vapourPressureFromRelativeHumidity, relativeHumidityFromVapourPressure } from './vapour-pressure.ts';
import { STANDARD_PRESSURE_PA } from './units.ts';

/** Ratio of the molar masses of water vapour and dry air (ASHRAE HoF 2017 ch. 1). */
export const MOLAR_MASS_RATIO_WATER_AIR = 0.621945;

/**
 * Humidity ratio W (kg/kg dry air) from vapour pressure p_w (Pa) at total pressure p (Pa).
 * Example: humidityRatioFromVapourPressure(1403.3) = 8.734e-3 kg/kg (8.73 g/kg) at 101325 Pa.
 */
export function humidityRatioFromVapourPressure(vapour_Pa: number, pressure_Pa = STANDARD_PRESSURE_PA): number {
  return (MOLAR_MASS_RATIO_WATER_AIR * vapour_Pa) / (pressure_Pa - vapour_Pa);
}

/**
 * Vapour pressure p_w (Pa) from humidity ratio W (kg/kg) at total pressure p (Pa), the inverse:
 * p_w = p·W/(0.621945 + W). Example: vapourPressureFromHumidityRatio(8.734e-3) = 1403.3 Pa.
 */
export function vapourPressureFromHumidityRatio(ratio_kgkg: number, pressure_Pa = STANDARD_PRESSURE_PA): number {
  return (pressure_Pa * ratio_kgkg) / (MOLAR_MASS_RATIO_WATER_AIR + ratio_kgkg);
}

/**
 * Humidity ratio (kg/kg) of air at t_C (°C), rh_pct (%) and pressure p (Pa).
 * Example: humidityRatioFromRelativeHumidity(5, 85) = 4.586e-3 kg/kg.
 */
export function humidityRatioFromRelativeHumidity(t_C: number, rh_pct: number, pressure_Pa = STANDARD_PRESSURE_PA): number {
  return humidityRatioFromVapourPressure(vapourPressureFromRelativeHumidity(t_C, rh_pct), pressure_Pa);
}

/**
 * Relative humidity (%) of air at t_C (°C) with humidity ratio W (kg/kg) at pressure p (Pa).
 * Example: relativeHumidityFromHumidityRatio(20, 8.734e-3) = 60.0 %.
 */
export function relativeHumidityFromHumidityRatio(t_C: number, ratio_kgkg: number, pressure_Pa = STANDARD_PRESSURE_PA): number {
  return relativeHumidityFromVapourPressure(t_C, vapourPressureFromHumidityRatio(ratio_kgkg, pressure_Pa));
}
