/**
 * Design minimum temperature factors (f_CRsi) that junctions in NEW work should reach, by
 * building use, from BRE Information Paper IP 1/06. These are design targets for new details,
 * NOT the factor of existing fabric: a solid brick wall has f ≈ 0.48, far below 0.75 (practice.md
 * §1.3). The engine never uses them as a default for a surveyed surface.
 *
 * 0.75 for dwellings, residential buildings and schools is confirmed in a BBA thermal report
 * quoting IP 1/06 (references.md §6.3); the other uses are from memory (practice.md §1.6).
 */
import type { BuildingUse } from './building-uses.ts';

/** The use classes of IP 1/06. */
export type CriticalFactorUse =
  | 'storage'
  | 'offices-retail'
  | 'dwellings-residential-schools'
  | 'humid-buildings'
  | 'very-humid-buildings';

/** One row: the use class, what it covers, f_CRsi and its source. */
export interface CriticalFactor {
  use: CriticalFactorUse;
  covers: string;
  factor: number;
  confidence: 'confirmed' | 'from memory';
  source: string;
}

const IP_1_06 = 'BRE IP 1/06, Assessing the effects of thermal bridging at junctions and around openings';

const ROWS: readonly CriticalFactor[] = [
  { use: 'storage', covers: 'storage buildings', factor: 0.3, confidence: 'from memory', source: IP_1_06 },
  { use: 'offices-retail', covers: 'offices and retail premises', factor: 0.5, confidence: 'from memory', source: IP_1_06 },
  {
    use: 'dwellings-residential-schools',
    covers: 'dwellings, residential buildings and schools',
    factor: 0.75,
    confidence: 'confirmed',
    source: `${IP_1_06} (quoted in a BBA thermal assessment report)`,
  },
  {
    use: 'humid-buildings',
    covers: 'sports halls, kitchens, canteens and buildings heated by unflued gas heaters',
    factor: 0.8,
    confidence: 'from memory',
    source: IP_1_06,
  },
  {
    use: 'very-humid-buildings',
    covers: 'swimming pools, laundries and breweries',
    factor: 0.9,
    confidence: 'from memory',
    source: IP_1_06,
  },
];

/** All IP 1/06 rows. */
export const CRITICAL_FACTORS: readonly CriticalFactor[] = ROWS;

/**
 * The IP 1/06 design minimum f_CRsi for a use class. Example: criticalTemperatureFactor('storage').factor = 0.3.
 */
export function criticalTemperatureFactor(use: CriticalFactorUse): CriticalFactor {
  return ROWS.find((r) => r.use === use) as CriticalFactor;
}

/**
 * The IP 1/06 use class for one of the app's building uses; undefined for 'other' (choose the
 * class by what the building holds). Example: criticalFactorUseFor('office') = 'offices-retail'.
 */
export function criticalFactorUseFor(use: BuildingUse): CriticalFactorUse | undefined {
  if (use === 'dwelling' || use === 'school') return 'dwellings-residential-schools';
  if (use === 'office') return 'offices-retail';
  return undefined;
}
