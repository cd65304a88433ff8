/**
 * ISO 13788 Annex A internal humidity classes: the vapour-pressure excess (inside − outside, Pa)
 * that a building of each kind is expected to reach, as a function of the monthly-mean outdoor
 * temperature θ_e. Each class limit is constant for θ_e ≤ 0 °C and falls linearly to zero at
 * 20 °C (ISO 13788:2012 Annex A; values from memory, not yet confirmed against ISO 13788):
 *
 *     class 1  270 Pa   storage areas
 *     class 2  540 Pa   offices, shops
 *     class 3  810 Pa   dwellings with low occupancy
 *     class 4  1080 Pa  dwellings with high occupancy, sports halls, kitchens, canteens
 *     class 5  1350 Pa  special buildings: laundries, breweries, swimming pools
 */

/** An ISO 13788 humidity class. */
export type HumidityClass = 1 | 2 | 3 | 4 | 5;

const EXCESS_AT_OR_BELOW_ZERO_PA: Record<HumidityClass, number> = { 1: 270, 2: 540, 3: 810, 4: 1080, 5: 1350 };

/** What each class covers, in words. */
export const HUMIDITY_CLASS_USES: Record<HumidityClass, string> = {
  1: 'storage areas',
  2: 'offices and shops',
  3: 'dwellings with low occupancy',
  4: 'dwellings with high occupancy, sports halls, kitchens and canteens',
  5: 'special buildings such as laundries, breweries and swimming pools',
};

/** Source line for reports. */
export const HUMIDITY_CLASS_SOURCE = 'ISO 13788:2012 Annex A internal humidity classes (from memory; not yet confirmed against ISO 13788)';

/**
 * Upper vapour-pressure excess (Pa) of a class at monthly-mean outdoor temperature θ_e (°C).
 * Example: humidityClassLimit(3, 5) = 607.5 Pa.
 */
export function humidityClassLimit(humidityClass: HumidityClass, outside_C: number): number {
  const scale = Math.min(1, Math.max(0, (20 - outside_C) / 20));
  return EXCESS_AT_OR_BELOW_ZERO_PA[humidityClass] * scale;
}

/**
 * The lowest class whose limit holds an excess (Pa) at θ_e (°C), or 'above-5'. At θ_e ≥ 20 °C
 * every limit is zero and the classes do not separate: the result is then null.
 * Example: humidityClassOf(700, 5) = 4 (class 3 allows 607.5 Pa, class 4 810 Pa).
 */
export function humidityClassOf(excess_Pa: number, outside_C: number): HumidityClass | 'above-5' | null {
  if (outside_C >= 20) return null;
  for (const c of [1, 2, 3, 4, 5] as const) if (excess_Pa <= humidityClassLimit(c, outside_C)) return c;
  return 'above-5';
}
