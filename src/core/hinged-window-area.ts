/**
 * Open area of a hinged sash from its size and opening angle, by the published geometric method
 * (implemented in the open Modelica library AixLib, `OpeningAreaHinged`, 2024; references.md §3.4):
 *
 *     s     = 2 b sin(α/2)                        opening width at the free edge (α ≤ 90°)
 *     A_geo = s·a + 2·(½·s·b·cos(α/2))            front gap plus the two triangular side gaps
 *     A_clr = a·b                                 clear frame opening
 *     A_ser = (A_clr⁻² + A_geo⁻²)^(−1/2)          the two areas in series
 *     A_eff = (A_ser(α) / A_ser(90°)) · A_clr     open area to use in the flow formulas
 *
 * a = length of the hinged side (m), b = sash dimension across the opening, hinge to free edge (m).
 * For a side-hung casement a is the height and b the width.
 */

/** Degrees to radians. */
const RAD_PER_DEG = Math.PI / 180;

/** The geometry of a hinged sash at one angle; lengths in m, areas in m². */
export interface HingedGeometry {
  freeEdgeOpening_m: number;
  geometricArea_m2: number;
  clearArea_m2: number;
  /** Clear and geometric areas in series (the A_eq of the published method). */
  seriesArea_m2: number;
}

/**
 * Geometry of a hinged sash opened by angle_deg (clamped to 0–90°).
 * Source: geometric method of references.md §3.4 (AixLib OpeningAreaHinged).
 * Example: hingedGeometry(1.0, 0.6, 30) = { freeEdgeOpening_m: 0.3106, geometricArea_m2: 0.4906,
 *   clearArea_m2: 0.6, seriesArea_m2: 0.3798 }.
 */
export function hingedGeometry(hingeSide_m: number, across_m: number, angle_deg: number): HingedGeometry {
  const a = Math.max(0, hingeSide_m);
  const b = Math.max(0, across_m);
  const half = (Math.min(90, Math.max(0, angle_deg)) * RAD_PER_DEG) / 2;
  const s = 2 * b * Math.sin(half);
  const geometric = s * a + s * b * Math.cos(half);
  const clear = a * b;
  const series = clear > 0 && geometric > 0 ? (clear ** -2 + geometric ** -2) ** -0.5 : 0;
  return { freeEdgeOpening_m: s, geometricArea_m2: geometric, clearArea_m2: clear, seriesArea_m2: series };
}

/**
 * Effective open area of a hinged sash, m² (equals the clear area at 90°).
 * Source: geometric method of references.md §3.4 (AixLib OpeningAreaHinged).
 * Example: hingedWindowArea(1.0, 0.6, 30) = 0.3798 / 0.5374 · 0.6 = 0.4240 m².
 */
export function hingedWindowArea(hingeSide_m: number, across_m: number, angle_deg: number): number {
  const at = hingedGeometry(hingeSide_m, across_m, angle_deg);
  const full = hingedGeometry(hingeSide_m, across_m, 90);
  return full.seriesArea_m2 > 0 ? (at.seriesArea_m2 / full.seriesArea_m2) * at.clearArea_m2 : 0;
}

/**
 * Opening angle (degrees, 0–90) of a hinged sash whose free edge stands stroke_m out, from s = 2 b sin(α/2).
 * Source: same geometry (references.md §3.4).
 * Example: hingedAngleFromStroke(0.6, 0.3106) = 30.0°.
 */
export function hingedAngleFromStroke(across_m: number, stroke_m: number): number {
  if (!(across_m > 0) || !(stroke_m > 0)) return 0;
  const maxStroke = 2 * across_m * Math.sin(45 * RAD_PER_DEG);
  return (2 * Math.asin(Math.min(stroke_m, maxStroke) / (2 * across_m))) / RAD_PER_DEG;
}
