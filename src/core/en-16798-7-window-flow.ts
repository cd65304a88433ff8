/**
 * Single-sided window airing by the EN 16798-7:2017 form (implemented in AixLib `DIN16798.mo`;
 * references.md §3.3), a second published cross-check of the BS 5925 forms:
 *
 *     q = (ρ_ref/ρ_e) · (A/2) · sqrt(max(0.001·U_10², 0.0035·H·|Δθ|))
 *
 * ρ_ref = 1.204 kg/m³ at 293 K; ρ_e outdoor density, so ρ_ref/ρ_e = T_e / 293.15 K at equal pressure.
 * A in m², U_10 in m/s, H in m, Δθ in K, q in m³/s. The occupant-behaviour factor of CEN/TR
 * 16798-8 is not applied: the window state is recorded, not guessed.
 */
import { kelvin } from './units.ts';

/** Reference temperature of EN 16798-7's reference density, K. */
export const EN16798_REFERENCE_TEMPERATURE_K = 293.15;

/**
 * EN 16798-7 single-sided window flow, m³/s; outdoor temperature in °C sets the density ratio.
 * Source: EN 16798-7:2017 via AixLib (references.md §3.3).
 * Example: en16798WindowFlow(1, 3, 1.2, 16, 20) = 0.1296 m³/s (density ratio 1 at 20 °C outdoors).
 */
export function en16798WindowFlow(
  area_m2: number,
  windAt10m_ms: number,
  height_m: number,
  deltaT_K: number,
  outdoor_C: number,
): number {
  const densityRatio = kelvin(outdoor_C) / EN16798_REFERENCE_TEMPERATURE_K;
  const drive = Math.max(0.001 * windAt10m_ms ** 2, 0.0035 * Math.max(0, height_m) * Math.abs(deltaT_K));
  return densityRatio * (Math.max(0, area_m2) / 2) * Math.sqrt(drive);
}
