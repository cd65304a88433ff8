/**
 * Surface condensation at an instant, for glazing, frames and other thin, light elements that
 * follow the air temperature quickly: water forms when the surface is at or below the room
 * air's dew point, i.e. surface RH 100 % (ISO 13788 criterion for low-inertia elements, from
 * memory). Unlike mould, this is judged on instantaneous conditions.
 */
import { dewPointFromVapourPressure } from './dew-point.ts';
import { surfaceTemperature, type TemperatureFactorEstimate } from './surface-temperature-factor.ts';
import { relativeHumidityFromVapourPressure, vapourPressureFromRelativeHumidity } from './vapour-pressure.ts';

/** A surface condensation check. */
export interface CondensationResult {
  surfaceTemp_C: number;
  surfaceRh_pct: number;
  /** Dew point of the room air, °C. */
  dewPoint_C: number;
  /** Surface temperature minus dew point, K (zero or less: condensing). */
  marginAboveDewPoint_K: number;
  condenses: boolean;
  method: string;
}

/**
 * Whether room air at insideTemp_C (°C) and insideRh_pct (%) condenses on a surface of factor
 * f when it is outsideTemp_C (°C) outside, at that instant.
 * Example: single glazing (f 0.26), 20 °C / 60 % inside, 0 °C outside → surface 5.2 °C, dew
 * point 12.0 °C, margin −6.8 K, condenses.
 */
export function surfaceCondensation(
  insideTemp_C: number,
  insideRh_pct: number,
  outsideTemp_C: number,
  factor: TemperatureFactorEstimate,
): CondensationResult {
  const vapour = vapourPressureFromRelativeHumidity(insideTemp_C, insideRh_pct);
  const surface = surfaceTemperature(factor.value, insideTemp_C, outsideTemp_C);
  const dew = dewPointFromVapourPressure(vapour);
  return {
    surfaceTemp_C: surface,
    surfaceRh_pct: relativeHumidityFromVapourPressure(surface, vapour),
    dewPoint_C: dew,
    marginAboveDewPoint_K: surface - dew,
    condenses: surface <= dew,
    method: 'instantaneous check: surface at θ_e + f·(θ_i − θ_e) against the dew point of the room air (surface RH 100 %)',
  };
}
