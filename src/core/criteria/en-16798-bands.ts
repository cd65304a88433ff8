/**
 * EN 16798-1:2019 design CO2 bands above outdoor and the per-person and per-area outdoor-air
 * rates, shared by the workplace and dwelling sets. Categories I–III are limits; IV is "worse
 * than III", so it needs no row.
 *
 * - Non-residential ΔCO2 550 / 800 / 1350 ppm: confirmed (public research code citing DIN EN
 *   16798-1:2019, Annex B, p. 55; references.md §5.3).
 * - Residential ΔCO2 380 / 550 / 950 ppm: from memory.
 * - Assumed CO2 output behind the bands, 20 L/h (5.56e-6 m³/s) per person: from memory
 *   (practice.md §1.7).
 * - Per-person rates q_p 10 / 7 / 4 L/s and the building term q_B for low-polluting buildings
 *   1.0 / 0.7 / 0.4 L/s per m² (very low-polluting 0.5 / 0.35 / 0.2; not low-polluting
 *   2.0 / 1.4 / 0.8): from memory (references.md §5.3). Do not leave q_B out (practice.md §4).
 */
import type { BuildingUse } from '../building-uses.ts';
import { fromLitresPerSecond, SECONDS_PER_HOUR } from '../units.ts';
import type { Criterion, CriterionConfidence } from './criterion.ts';

const EN_16798 = { document: 'EN 16798-1', edition: '2019' };
/** CO2 output per person the EN 16798-1 bands assume, m³/s (20 L/h; from memory). */
export const EN_16798_ASSUMED_CO2_OUTPUT_M3S = 0.02 / SECONDS_PER_HOUR;

const CATEGORIES = ['I', 'II', 'III'] as const;

/**
 * The ΔCO2 band rows (categories I–III, ppm above outdoor) for a list of building and room uses.
 * Example: en16798Co2Bands({ idPrefix: 'en16798-nonres-co2', limits_ppm: [550, 800, 1350], … })
 * → three criteria, the second with id 'en16798-nonres-co2-ii' and limit 800 ppm.
 */
export function en16798Co2Bands(options: {
  idPrefix: string;
  limits_ppm: readonly [number, number, number];
  confidence: CriterionConfidence;
  clause: string;
  buildingUses: readonly BuildingUse[];
  roomUses: readonly string[] | 'any';
  note: string;
}): Criterion[] {
  return CATEGORIES.map((category, i) => ({
    id: `${options.idPrefix}-${category.toLowerCase()}`,
    group: options.idPrefix,
    title: `EN 16798-1 category ${category}: CO2 above outdoor`,
    source: { ...EN_16798, clause: options.clause },
    confidence: options.confidence,
    metric: 'co2-above-outdoor',
    period: 'occupied-period-mean',
    status: 'benchmark',
    limit: options.limits_ppm[i] as number,
    direction: 'at-most',
    assumedCo2Output_m3s: EN_16798_ASSUMED_CO2_OUTPUT_M3S,
    covers: { buildingUses: options.buildingUses, roomUses: options.roomUses, situations: ['new', 'refurbished', 'existing'], ventilation: 'any' },
    note: options.note,
  }));
}

const PER_PERSON_LS = [10, 7, 4] as const;
const LOW_POLLUTING_LS_M2 = [1.0, 0.7, 0.4] as const;

/**
 * The per-person plus per-area outdoor-air rows (non-residential, low-polluting building), m³/s.
 * Example: en16798FlowRates(['office'])[1] → category II, limit 7e-3 m³/s per person plus
 * areaTerm_m3s_m2 7e-4 (7 L/s per person + 0.7 L/s per m²).
 */
export function en16798FlowRates(buildingUses: readonly BuildingUse[]): Criterion[] {
  return CATEGORIES.map((category, i) => ({
    id: `en16798-rate-${category.toLowerCase()}`,
    group: 'en16798-rate',
    title: `EN 16798-1 category ${category}: outdoor air per person plus per m² of floor`,
    source: { ...EN_16798, clause: 'method 1, per person and building-emission rates (from memory)' },
    confidence: 'from memory',
    metric: 'flow-per-person-and-area',
    period: 'occupied-period-mean',
    status: 'benchmark',
    limit: fromLitresPerSecond(PER_PERSON_LS[i] as number),
    direction: 'at-least',
    areaTerm_m3s_m2: fromLitresPerSecond(LOW_POLLUTING_LS_M2[i] as number),
    covers: { buildingUses, roomUses: 'any', situations: ['new', 'refurbished', 'existing'], ventilation: 'any' },
    note: 'Area term for a low-polluting building; very low-polluting 0.5/0.35/0.2 and not low-polluting 2.0/1.4/0.8 L/s per m² (from memory).',
  }));
}
