/**
 * Natural infiltration from a pressure test by the divide-by-20 rule, in the form the UK SAP
 * worksheet uses (boxes (18)–(22b); references.md §4.1–4.2, confirmed in public SAP worksheet code):
 *
 *     (18)  infiltration = q50/20 + openings              [ach; SAP reads q50/20 directly as ach]
 *     (20)  shelter factor = 1 − 0.075 × sheltered sides (0–4)
 *     (21)  = (18) × (20)
 *     (22b) = (21) × U/4                                  [monthly wind U at 10 m, m/s]
 *     natural ventilation effective rate = (22b) if ≥ 1, else 0.5 + 0.5·(22b)²
 *
 * The rule gives a *seasonal whole-dwelling average*: at any moment ×0.5–×2, and a flat's q50
 * includes leakage to neighbours (practice.md §1 item 9a). For a room we use the same factors on
 * the room's share of envelope: Q = q50 · A_exposed / 20 × shelter × U/4 (m³/h), and not the
 * effective-rate step, which stands for window opening by occupants.
 */
import { fromCubicMetresPerHour } from './units.ts';

/** The divisor of the divide-by-20 rule (Kronvall–Persily attribution from memory). */
export const DIVIDE_BY_20_DIVISOR = 20;

/** UK average monthly wind speed at 10 m, Jan … Dec, m/s (SAP table; references.md §4.2 [C]). */
export const SAP_UK_MONTHLY_WIND_MS: readonly number[] = Object.freeze([5.1, 5.0, 4.9, 4.4, 4.3, 3.8, 3.8, 3.7, 4.0, 4.3, 4.5, 4.7]);

/**
 * SAP shelter factor (20) from the number of sheltered sides (clamped to 0–4).
 * Source: SAP worksheet box (20).
 * Example: sapShelterFactor(2) = 0.85.
 */
export function sapShelterFactor(shelteredSides: number): number {
  return 1 - 0.075 * Math.min(4, Math.max(0, shelteredSides));
}

/**
 * SAP wind factor (22a) = U/4 from wind speed at 10 m (m/s).
 * Source: SAP worksheet box (22a).
 * Example: sapWindFactor(5.1) = 1.275.
 */
export function sapWindFactor(wind_ms: number): number {
  return Math.max(0, wind_ms) / 4;
}

/** The SAP worksheet boxes, all in air changes per hour except the two factors. */
export interface SapInfiltration {
  infiltration_ach: number;
  shelterFactor: number;
  sheltered_ach: number;
  windFactor: number;
  windAdjusted_ach: number;
  /** Natural ventilation effective rate (includes occupants' window opening; whole dwelling only). */
  naturalVentilationEffective_ach: number;
}

/**
 * SAP whole-dwelling infiltration from a pressure test: q50 (m³/(h·m²) at 50 Pa), openings
 * allowance (ach, box (8)), sheltered sides and the month's wind at 10 m (m/s).
 * Source: SAP worksheet boxes (18)–(22b) and the natural-ventilation rule (references.md §4.2).
 * Example: sapInfiltration(10, 0, 2, 5.1) = { infiltration_ach: 0.5, shelterFactor: 0.85, sheltered_ach: 0.425,
 *   windFactor: 1.275, windAdjusted_ach: 0.5419, naturalVentilationEffective_ach: 0.6468 }.
 */
export function sapInfiltration(
  q50_m3hm2: number,
  openings_ach: number,
  shelteredSides: number,
  wind_ms: number,
): SapInfiltration {
  const infiltration = Math.max(0, q50_m3hm2) / DIVIDE_BY_20_DIVISOR + Math.max(0, openings_ach);
  const shelterFactor = sapShelterFactor(shelteredSides);
  const sheltered = infiltration * shelterFactor;
  const windFactor = sapWindFactor(wind_ms);
  const adjusted = sheltered * windFactor;
  return {
    infiltration_ach: infiltration,
    shelterFactor,
    sheltered_ach: sheltered,
    windFactor,
    windAdjusted_ach: adjusted,
    naturalVentilationEffective_ach: adjusted >= 1 ? adjusted : 0.5 + 0.5 * adjusted ** 2,
  };
}

/**
 * Infiltration through a room's exposed envelope by divide-by-20 with SAP's shelter and wind
 * factors, m³/s: q50 (m³/(h·m²) at 50 Pa) · A_exposed (m²) / 20 × shelter × U/4, U wind at 10 m (m/s).
 * Source: divide-by-20 rule in SAP's form (references.md §4.1–4.2).
 * Example: leakageDivideBy20(10, 20, 2, 4) = 10·20/20·0.85·1 m³/h = 8.5 m³/h = 0.002361 m³/s.
 */
export function leakageDivideBy20(
  q50_m3hm2: number,
  exposedEnvelope_m2: number,
  shelteredSides: number,
  windAt10m_ms: number,
): number {
  const perHour = (Math.max(0, q50_m3hm2) * Math.max(0, exposedEnvelope_m2)) / DIVIDE_BY_20_DIVISOR;
  return fromCubicMetresPerHour(perHour * sapShelterFactor(shelteredSides) * sapWindFactor(windAt10m_ms));
}
