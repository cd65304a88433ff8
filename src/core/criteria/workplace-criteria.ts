/**
 * Workplace criteria (Great Britain), which also cover the staff of schools and other buildings:
 *
 * - HSE guidance on CO2 monitoring: a reading consistently below 800 ppm likely means a
 *   well-ventilated space; consistently above 1500 ppm means poor ventilation and action is
 *   needed (confirmed on hse.gov.uk; references.md §5.4). Guidance, not a safe threshold.
 * - Workplace (Health, Safety and Welfare) Regulations 1992, regulation 6 and its Approved Code
 *   of Practice: fresh air normally not less than 5–8 L/s per person (from memory).
 * - Approved Document F 2021 Volume 2: 10 L/s per person outdoor air in new offices (from memory).
 * - EN 16798-1:2019 non-residential ΔCO2 bands (confirmed) and rates (from memory), see en-16798-bands.ts.
 */
import { fromLitresPerSecond } from '../units.ts';
import type { Criterion } from './criterion.ts';
import { en16798Co2Bands, en16798FlowRates } from './en-16798-bands.ts';

const WORKPLACES = ['office', 'school', 'other'] as const;
const HSE = {
  document: 'HSE guidance: Ventilation in the workplace, identifying poorly ventilated areas (CO2 monitoring)',
  edition: 'hse.gov.uk web guidance, as read 2023–2024',
};
const ALL_SITUATIONS = ['new', 'refurbished', 'existing'] as const;

/** The workplace set. */
export const WORKPLACE_CRITERIA: readonly Criterion[] = [
  {
    id: 'hse-co2-well-ventilated',
    group: 'hse-co2',
    title: 'HSE: consistently below 800 ppm likely indicates a well-ventilated space',
    source: HSE,
    confidence: 'confirmed',
    metric: 'co2-absolute',
    period: 'consistently',
    status: 'benchmark',
    limit: 800,
    direction: 'at-most',
    covers: { buildingUses: WORKPLACES, roomUses: 'any', situations: ALL_SITUATIONS, ventilation: 'any' },
    note: 'Aim below 800 ppm where there is continuous talking, singing or physical activity. Less useful in briefly or variably occupied rooms, with air cleaners, in small rooms with few people, or where processes emit CO2.',
  },
  {
    id: 'hse-co2-action',
    group: 'hse-co2',
    title: 'HSE: consistently above 1500 ppm indicates poor ventilation; take action',
    source: HSE,
    confidence: 'confirmed',
    metric: 'co2-absolute',
    period: 'consistently',
    status: 'guidance',
    limit: 1500,
    direction: 'at-most',
    covers: { buildingUses: WORKPLACES, roomUses: 'any', situations: ALL_SITUATIONS, ventilation: 'any' },
    note: 'Judged on readings that stay above the level, not on a single peak.',
  },
  {
    id: 'workplace-regs-acop-fresh-air',
    group: 'workplace-fresh-air',
    title: 'Workplace Regulations ACoP: fresh air normally 5–8 L/s per person (lower end shown)',
    source: {
      document: 'Workplace (Health, Safety and Welfare) Regulations 1992, Approved Code of Practice L24',
      edition: '2013 (from memory)',
      clause: 'regulation 6, ventilation',
    },
    confidence: 'from memory',
    metric: 'flow-per-person',
    period: 'occupied-day-mean',
    status: 'approved-code-of-practice',
    limit: fromLitresPerSecond(5),
    direction: 'at-least',
    covers: { buildingUses: WORKPLACES, roomUses: 'any', situations: ALL_SITUATIONS, ventilation: 'any' },
    note: 'The code gives a range, 5–8 L/s per person, depending on the space and activity.',
  },
  {
    id: 'adf-2021-v2-office-rate',
    group: 'adf-v2-office-rate',
    title: 'Approved Document F Volume 2: outdoor air in new offices',
    source: { document: 'Approved Document F, Volume 2: buildings other than dwellings', edition: '2021 (in force 15 June 2022)' },
    confidence: 'from memory',
    metric: 'flow-per-person',
    period: 'continuous',
    status: 'statutory-guidance',
    limit: fromLitresPerSecond(10),
    direction: 'at-least',
    covers: { buildingUses: ['office'], roomUses: ['office', 'meeting-room'], situations: ['new'], ventilation: 'any' },
  },
  ...en16798Co2Bands({
    idPrefix: 'en16798-nonres-co2',
    limits_ppm: [550, 800, 1350],
    confidence: 'confirmed',
    clause: 'Annex B, default design CO2 above outdoor, non-residential',
    buildingUses: WORKPLACES,
    roomUses: 'any',
    note: 'Bands above outdoor: never compare an absolute reading with them. They assume adult output; rescale for children.',
  }),
  ...en16798FlowRates(WORKPLACES),
];
