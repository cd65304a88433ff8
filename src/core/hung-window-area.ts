/**
 * Open area of a top-hung or bottom-hung sash by the CEN/TR 16798-8 (DIN SPEC 32739-8:2018)
 * opening coefficient, for sashes with height : width between 1:1 and 2:1 (implemented in the
 * open Modelica library AixLib, `coeffOpeningAreaDIN16798`; references.md §3.4):
 *
 *     C_w(α) = 2.6e-7·α³ − 1.19e-4·α² + 1.86e-2·α     α in degrees, ≤ 90
 *     A      = C_w(α) · A_clr
 */

/**
 * The CEN/TR 16798-8 opening coefficient (dimensionless) at angle_deg (clamped to 0–90°).
 * Source: CEN/TR 16798-8 via AixLib (references.md §3.4).
 * Example: hungWindowCoefficient(30) = 0.4579.
 */
export function hungWindowCoefficient(angle_deg: number): number {
  const a = Math.min(90, Math.max(0, angle_deg));
  return 2.6e-7 * a ** 3 - 1.19e-4 * a ** 2 + 1.86e-2 * a;
}

/**
 * Open area, m², of a top- or bottom-hung sash of clear area clearArea_m2 (m²) opened angle_deg.
 * Source: CEN/TR 16798-8 via AixLib (references.md §3.4).
 * Example: hungWindowArea(0.6, 30) = 0.2747 m².
 */
export function hungWindowArea(clearArea_m2: number, angle_deg: number): number {
  return hungWindowCoefficient(angle_deg) * Math.max(0, clearArea_m2);
}
