/**
 * Constants of air and openings used by the airflow predictions (SI).
 *
 * - Air density 1.2 kg/m³: the value behind the equivalent-area table of references.md §3.1
 *   (0.61·sqrt(2/1.2) = 0.787 L/s per 1000 mm² at 1 Pa).
 * - Standard gravity rounded to 9.81 m/s², as in the BS 5925 stack forms (references.md §7.4).
 * - Discharge coefficient 0.61 of a sharp-edged opening (BS 5925:1991 cl. 9; the default of the
 *   Warren–Parkins single-sided model, references.md §3.1).
 *
 * Example: AIR_DENSITY_KG_M3 = 1.2.
 */

/** Density of room air used for flows through openings, kg/m³. */
export const AIR_DENSITY_KG_M3 = 1.2;
/** Acceleration due to gravity, m/s². */
export const GRAVITY_M_S2 = 9.81;
/** Discharge coefficient of a sharp-edged opening (dimensionless). */
export const SHARP_EDGE_DISCHARGE_COEFFICIENT = 0.61;
