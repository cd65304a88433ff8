/**
 * Density and specific volume of moist air, ASHRAE HoF 2017 ch. 1 eqns 26 and 11, with the gas
 * constant of dry air R_da = 287.042 J/(kg·K) (same chapter, eqn 1):
 *
 *     v = R_da·T·(1 + 1.607858·W)/p     (m³ per kg of dry air)
 *     ρ = (1 + W)/v                      (kg of moist air per m³)
 *
 * 1/v is the mass of dry air per m³ of moist air, (p − p_w)/(R_da·T): the quantity a moisture
 * balance multiplies a volume flow by to get the dry-air mass flow.
 */
import { kelvin, STANDARD_PRESSURE_PA } from './units.ts';

/** Gas constant of dry air, J/(kg·K) (ASHRAE HoF 2017 ch. 1). */
export const DRY_AIR_GAS_CONSTANT = 287.042;

/**
 * Specific volume v (m³ per kg dry air) of air at t_C (°C), humidity ratio W (kg/kg), pressure p (Pa).
 * Example: moistAirSpecificVolume(20, 8.734e-3) = 0.8421 m³/kg at 101325 Pa.
 */
export function moistAirSpecificVolume(t_C: number, ratio_kgkg: number, pressure_Pa = STANDARD_PRESSURE_PA): number {
  return (DRY_AIR_GAS_CONSTANT * kelvin(t_C) * (1 + 1.607858 * ratio_kgkg)) / pressure_Pa;
}

/**
 * Mass of dry air per m³ of moist air (kg/m³) = 1/v.
 * Example: dryAirPerCubicMetre(18, 4.586e-3) = 1.2035 kg/m³ (5 °C, 85 % outdoor air warmed to 18 °C).
 */
export function dryAirPerCubicMetre(t_C: number, ratio_kgkg: number, pressure_Pa = STANDARD_PRESSURE_PA): number {
  return 1 / moistAirSpecificVolume(t_C, ratio_kgkg, pressure_Pa);
}

/**
 * Density of moist air (kg/m³) = (1 + W)/v. Example: moistAirDensity(20, 8.734e-3) = 1.1978 kg/m³.
 */
export function moistAirDensity(t_C: number, ratio_kgkg: number, pressure_Pa = STANDARD_PRESSURE_PA): number {
  return (1 + ratio_kgkg) / moistAirSpecificVolume(t_C, ratio_kgkg, pressure_Pa);
}
