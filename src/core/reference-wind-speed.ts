/**
 * Wind speed at building height from the meteorological wind at 10 m, by the BS 5925 power law
 * with its terrain factors:
 *
 *     U_r = U_10 · K · H^a
 *
 * U_10 in m/s (open-country wind at 10 m), H in m (building height, or the opening's height for
 * a single opening), U_r in m/s. Terrain factors K and a (BS 5925:1991, from memory; references.md §3.2):
 * open flat country 0.68, 0.17; country with scattered wind breaks 0.52, 0.20; urban 0.35, 0.25;
 * city 0.21, 0.33.
 */

/** Terrain around the building, in the four BS 5925 classes. */
export type TerrainKind = 'open-flat-country' | 'country-scattered-windbreaks' | 'urban' | 'city';

/** BS 5925 terrain factors K and a (from memory). */
export const BS5925_TERRAIN_FACTORS: Readonly<Record<TerrainKind, { K: number; a: number }>> = Object.freeze({
  'open-flat-country': { K: 0.68, a: 0.17 },
  'country-scattered-windbreaks': { K: 0.52, a: 0.2 },
  urban: { K: 0.35, a: 0.25 },
  city: { K: 0.21, a: 0.33 },
});

/**
 * Reference wind speed at height H, m/s, from the 10 m wind (m/s), terrain and height (m).
 * Heights below 1 m are taken as 1 m (the power law is not meant for ground level).
 * Source: BS 5925:1991 terrain factors (from memory).
 * Example: referenceWindSpeed(4, 'urban', 6) = 4 · 0.35 · 6^0.25 = 2.1911 m/s.
 */
export function referenceWindSpeed(windAt10m_ms: number, terrain: TerrainKind, height_m: number): number {
  const { K, a } = BS5925_TERRAIN_FACTORS[terrain];
  return Math.max(0, windAt10m_ms) * K * Math.max(1, height_m) ** a;
}
