/**
 * Temperature factor at the internal surface, f_Rsi = (θ_si − θ_e)/(θ_i − θ_e): the share of
 * the inside–outside temperature difference that the inner surface keeps (ISO 13788; BS 5250).
 * For a plain element of thermal transmittance U (W/(m²·K)) it is f_Rsi = 1 − U·R_si, with the
 * internal surface resistance R_si taken as 0.25 m²·K/W for mould checks (furniture and
 * corners slow the air at the surface) and 0.13 m²·K/W for glazing (formula sure; both R_si
 * values from memory, not yet confirmed against ISO 13788:2012 and BS EN ISO 6946).
 *
 * A factor measured on site (surface, inside and outside temperatures) is indicative only: it
 * needs hours of steady heating and a large inside–outside difference (about 10 K or more),
 * and an infrared spot reading has its own error.
 */
import { moistureWarning, type MoistureWarning } from './moisture-warnings.ts';

/** R_si for mould checks on walls, ceilings and floors, m²·K/W (from memory). */
export const SURFACE_RESISTANCE_MOULD_M2K_W = 0.25;
/** R_si for condensation checks on glazing and frames, m²·K/W (from memory). */
export const SURFACE_RESISTANCE_GLAZING_M2K_W = 0.13;
/** Smallest inside–outside difference, K, for a measured factor to mean much (common practice (no published source)). */
export const MEASURED_FACTOR_MIN_DIFFERENCE_K = 10;

/** How a temperature factor was obtained, which decides how far it can be trusted. */
export type TemperatureFactorBasis = 'measured' | 'construction' | 'design-minimum';

/** A temperature factor with where it came from. */
export interface TemperatureFactorEstimate {
  /** f_Rsi, dimensionless (0…1 for real surfaces). */
  value: number;
  basis: TemperatureFactorBasis;
  /** What it was taken from, in words (a construction, a measurement, a design figure). */
  label: string;
}

/**
 * f_Rsi of a plain element from its U-value (W/(m²·K)) and R_si (m²·K/W, default 0.25).
 * Example: temperatureFactorFromU(2.1) = 0.475 (solid brick wall).
 */
export function temperatureFactorFromU(uValue_Wm2K: number, surfaceResistance_m2KW = SURFACE_RESISTANCE_MOULD_M2K_W): number {
  return 1 - uValue_Wm2K * surfaceResistance_m2KW;
}

/**
 * Internal surface temperature (°C) from f_Rsi and the inside and outside temperatures (°C):
 * θ_si = θ_e + f·(θ_i − θ_e). Example: surfaceTemperature(0.75, 20, 5) = 16.25 °C.
 */
export function surfaceTemperature(factor: number, inside_C: number, outside_C: number): number {
  return outside_C + factor * (inside_C - outside_C);
}

/** A factor measured on site: value (null when it cannot be computed), method and warnings. */
export interface MeasuredFactorResult {
  value: number | null;
  method: string;
  warnings: MoistureWarning[];
}

/**
 * f_Rsi from a measured surface temperature and the inside and outside air temperatures (°C),
 * labelled indicative; warns when θ_i − θ_e is under 10 K or the result is outside 0…1.
 * Example: measuredTemperatureFactor(12.4, 20, 4) = { value: 0.525, … } (indicative).
 */
export function measuredTemperatureFactor(surface_C: number, inside_C: number, outside_C: number): MeasuredFactorResult {
  const method = 'measured f_Rsi = (θ_si − θ_e)/(θ_i − θ_e), indicative: one reading after steady heating';
  const difference = inside_C - outside_C;
  const warnings: MoistureWarning[] = [
    moistureWarning(
      'not-steady-heating',
      'A measured surface factor is indicative only: it holds if the room had been heated steadily for several hours and the outside temperature was steady.',
    ),
  ];
  if (!(difference > 0)) {
    warnings.push(
      moistureWarning(
        'small-temperature-difference',
        'Inside is not warmer than outside, so no surface factor can be worked out from these readings.',
      ),
    );
    return { value: null, method, warnings };
  }
  if (difference < MEASURED_FACTOR_MIN_DIFFERENCE_K) {
    warnings.push(
      moistureWarning(
        'small-temperature-difference',
        `Inside is only ${difference.toFixed(1)} K warmer than outside; below about ${MEASURED_FACTOR_MIN_DIFFERENCE_K} K small reading errors change the factor a lot.`,
      ),
    );
  }
  const value = (surface_C - outside_C) / difference;
  if (value < 0 || value > 1) {
    warnings.push(
      moistureWarning(
        'factor-out-of-range',
        'The surface reading lies outside the inside and outside temperatures, so the readings are not consistent (sun, a heat source or a reading error).',
      ),
    );
  }
  return { value, method, warnings };
}
