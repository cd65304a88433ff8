/**
 * Barometric pressure of the standard atmosphere at an altitude, ASHRAE HoF 2017 ch. 1 eqn 3:
 * p = 101.325·(1 − 2.25577e-5·Z)^5.2559 kPa, Z in m above sea level. Used when no barometer
 * reading is available; a site at 300 m has about 3.5 % less pressure than at sea level.
 */
import { STANDARD_PRESSURE_PA } from './units.ts';

/**
 * Standard-atmosphere pressure (Pa) at altitude_m (m).
 * Example: standardAtmospherePressure(1000) = 89875 Pa (ASHRAE HoF 2017 ch. 1 Table 1: 89.875 kPa).
 */
export function standardAtmospherePressure(altitude_m: number): number {
  return STANDARD_PRESSURE_PA * (1 - 2.25577e-5 * altitude_m) ** 5.2559;
}
