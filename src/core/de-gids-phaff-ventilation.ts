/**
 * Single-sided ventilation through an open window by de Gids & Phaff (1982, Air Infiltration
 * Review 4(1):4–5; implemented in AixLib `GidsPhaff.mo`; references.md §3.3), fitted to
 * measurements and used here as a published cross-check of the BS 5925 forms:
 *
 *     Q = (A/2) · sqrt(0.001·U_10² + 0.0035·H·|Δθ| + 0.01)
 *
 * A open area in m², U_10 meteorological wind at 10 m in m/s, H window height in m, Δθ in K, Q in m³/s.
 */

/**
 * de Gids & Phaff single-sided flow, m³/s.
 * Source: de Gids & Phaff 1982 (references.md §3.3).
 * Example: deGidsPhaffFlow(1, 3, 1.2, 16) = 0.1468 m³/s.
 */
export function deGidsPhaffFlow(area_m2: number, windAt10m_ms: number, height_m: number, deltaT_K: number): number {
  const a = Math.max(0, area_m2);
  return (a / 2) * Math.sqrt(0.001 * windAt10m_ms ** 2 + 0.0035 * Math.max(0, height_m) * Math.abs(deltaT_K) + 0.01);
}
