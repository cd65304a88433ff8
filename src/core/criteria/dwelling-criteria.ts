/**
 * Dwelling criteria (England). Two regimes that must not be confused (practice.md §1.11, §4):
 *
 * - NEW WORK: Approved Document F 2021 Volume 1 (statutory guidance for building work): whole-
 *   dwelling and extract rates, background ventilators, purge, undercuts. For an existing home
 *   these are shown only as a labelled benchmark ("below what current guidance sets for new
 *   homes"), never as pass or fail — see select-criteria.ts.
 * - EXISTING AND RENTED HOMES: a risk-based test without a CO2 number — the housing health and
 *   safety rating system's damp and mould hazard, fitness for habitation for rented homes, the
 *   social-landlord damp and mould duties — with BS 5250 for diagnosis.
 *
 * Bedroom and living-room CO2 benchmarks: EN 16798-1 residential bands (from memory).
 * Confidence of each value follows references.md §5.1 (secondary summaries of ADF 2021; table
 * numbers and continuous-extract, purge and undercut values from memory).
 */
import { fromLitresPerSecond, fromSquareMillimetres, perSecond } from '../units.ts';
import type { Criterion, CriterionConfidence, CriterionCoverage } from './criterion.ts';
import { en16798Co2Bands } from './en-16798-bands.ts';
import { legalDuty } from './legal-duty.ts';

const ADF_V1 = { document: 'Approved Document F, Volume 1: dwellings', edition: '2021 (in force 15 June 2022)' };
const ALL_SITUATIONS = ['existing', 'refurbished', 'new'] as const;
const HABITABLE = ['bedroom', 'living-room'] as const;

function adfRow(
  row: Pick<Criterion, 'id' | 'group' | 'title' | 'metric' | 'period' | 'limit'> & {
    confidence: CriterionConfidence;
    clause?: string;
    roomUses: readonly string[];
    situations?: CriterionCoverage['situations'];
    ventilation?: CriterionCoverage['ventilation'];
    bedrooms?: number;
    note?: string;
  },
): Criterion {
  const { clause, roomUses, situations, ventilation, ...rest } = row;
  return {
    ...rest,
    source: clause ? { ...ADF_V1, clause } : ADF_V1,
    status: 'statutory-guidance',
    direction: 'at-least',
    covers: { buildingUses: ['dwelling'], roomUses, situations: situations ?? ['new'], ventilation: ventilation ?? 'any' },
  };
}

const WHOLE_DWELLING_LS = [19, 25, 31, 37, 43] as const;

/** [id key, room use, L/s, what it is for]. */
const INTERMITTENT_EXTRACT: readonly [string, string, number, string][] = [
  ['kitchen-hood', 'kitchen', 30, 'kitchen, cooker hood extracting to outside'],
  ['kitchen', 'kitchen', 60, 'kitchen, extract other than a cooker hood'],
  ['utility', 'utility', 30, 'utility room'],
  ['bathroom', 'wet-room', 15, 'bathroom'],
  ['toilet', 'toilet', 6, 'toilet'],
];

const CONTINUOUS_EXTRACT: readonly [string, string, number][] = [
  ['kitchen', 'kitchen', 13],
  ['utility', 'utility', 8],
  ['bathroom', 'wet-room', 8],
  ['toilet', 'toilet', 6],
];

const BACKGROUND_VENTS: readonly [string, readonly string[], number][] = [
  ['habitable', HABITABLE, 8000],
  ['kitchen', ['kitchen'], 8000],
  ['bathroom', ['wet-room'], 4000],
];

/** The dwelling set. */
export const DWELLING_CRITERIA: readonly Criterion[] = [
  ...WHOLE_DWELLING_LS.map((ls, i) =>
    adfRow({
      id: `adf-2021-whole-dwelling-${i + 1}-bed`,
      group: 'adf-2021-whole-dwelling',
      title: `ADF whole-dwelling ventilation rate, ${i + 1} bedroom${i ? 's' : ''}`,
      confidence: 'secondary',
      clause: 'whole-dwelling rates table (Table 1.1, number from memory)',
      metric: 'whole-dwelling-flow',
      period: 'continuous',
      limit: fromLitresPerSecond(ls),
      roomUses: ['whole-dwelling'],
      bedrooms: i + 1,
      note: 'Add 6 L/s for each further bedroom; use the greater of this and 0.3 L/s per m² of floor.',
    }),
  ),
  adfRow({
    id: 'adf-2021-whole-dwelling-per-area',
    group: 'adf-2021-whole-dwelling-area',
    title: 'ADF whole-dwelling ventilation rate per m² of internal floor',
    confidence: 'secondary',
    metric: 'flow-per-floor-area',
    period: 'continuous',
    limit: fromLitresPerSecond(0.3),
    roomUses: ['whole-dwelling'],
  }),
  ...INTERMITTENT_EXTRACT.map(([key, room, ls, what]) =>
    adfRow({
      id: `adf-2021-intermittent-extract-${key}`,
      group: `adf-2021-intermittent-extract-${room}`,
      title: `ADF intermittent extract, ${what}`,
      confidence: 'secondary',
      clause: 'intermittent extract rates table (Table 1.2, number from memory)',
      metric: 'extract-flow',
      period: 'when-running',
      limit: fromLitresPerSecond(ls),
      roomUses: [room],
    }),
  ),
  ...CONTINUOUS_EXTRACT.map(([key, room, ls]) =>
    adfRow({
      id: `adf-2021-continuous-extract-${key}`,
      group: `adf-2021-continuous-extract-${room}`,
      title: `ADF continuous extract, high rate, ${key}`,
      confidence: 'from memory',
      metric: 'extract-flow',
      period: 'when-running',
      limit: fromLitresPerSecond(ls),
      roomUses: [room],
      ventilation: ['mechanical'],
    }),
  ),
  ...BACKGROUND_VENTS.map(([key, rooms, mm2]) =>
    adfRow({
      id: `adf-2021-background-vent-${key}`,
      group: 'adf-2021-background-vent',
      title: `ADF background ventilator with replacement windows, ${key} room`,
      confidence: 'secondary',
      clause: 'replacement windows (para 3.15 family, from memory)',
      metric: 'ventilator-equivalent-area',
      period: 'design-provision',
      limit: fromSquareMillimetres(mm2),
      roomUses: rooms,
      situations: ['refurbished'],
      note: 'Equivalent area, not free area. Replacement vents must not be smaller than the originals and must be controllable; smaller vents apply with continuous mechanical extract (5000 mm² habitable, from memory).',
    }),
  ),
  adfRow({
    id: 'adf-2021-purge-window',
    group: 'adf-2021-purge',
    title: 'ADF purge ventilation: openable window area (hinged at 30° or more, or sash)',
    confidence: 'from memory',
    metric: 'opening-area-fraction',
    period: 'design-provision',
    limit: 1 / 20,
    roomUses: HABITABLE,
    note: 'Hinged or pivot windows opening 15–30° need 1/10 of the floor area; under 15° they do not count.',
  }),
  adfRow({
    id: 'adf-2021-purge-mechanical',
    group: 'adf-2021-purge',
    title: 'ADF purge ventilation by fan',
    confidence: 'from memory',
    metric: 'air-change-rate',
    period: 'when-running',
    limit: perSecond(4),
    roomUses: HABITABLE,
  }),
  adfRow({
    id: 'adf-2021-door-undercut',
    group: 'adf-2021-undercut',
    title: 'ADF internal door undercut (about 10 mm on a standard door)',
    confidence: 'from memory',
    metric: 'door-undercut-area',
    period: 'design-provision',
    limit: fromSquareMillimetres(7600),
    roomUses: ['bedroom', 'living-room', 'kitchen', 'wet-room', 'toilet', 'utility'],
    note: 'Never undercut or wedge fire doors (flat entrance doors).',
  }),
  legalDuty({
    id: 'hhsrs-damp-mould',
    group: 'housing-hazard',
    title: 'Housing health and safety rating: damp and mould growth hazard',
    source: { document: 'Housing Act 2004 Part 1; Housing Health and Safety Rating System (England) Regulations 2005', edition: 'as amended' },
    confidence: 'secondary',
    covers: { buildingUses: ['dwelling'], roomUses: 'any', situations: ALL_SITUATIONS, ventilation: 'any' },
    note: 'A risk-based assessment of the hazard, with no CO2 or airflow number. Excess cold, carbon monoxide and radon are hazards of the same system.',
  }),
  legalDuty({
    id: 'fitness-for-habitation',
    group: 'fitness-for-habitation',
    title: 'Rented homes must be fit for human habitation (including ventilation, damp and mould)',
    source: { document: 'Homes (Fitness for Human Habitation) Act 2018', edition: '2018' },
    confidence: 'secondary',
    covers: { buildingUses: ['dwelling'], roomUses: 'any', situations: ALL_SITUATIONS, ventilation: 'any', tenures: ['private-rented', 'social-rented'] },
  }),
  legalDuty({
    id: 'social-landlord-damp-mould-timescales',
    group: 'social-landlord-damp-mould',
    title: 'Social landlords: damp and mould hazards investigated and fixed within set timescales',
    source: { document: 'Social Housing (Regulation) Act 2023 and its regulations on hazards', edition: 'in force from late 2025 (from memory)' },
    confidence: 'from memory',
    covers: { buildingUses: ['dwelling'], roomUses: 'any', situations: ALL_SITUATIONS, ventilation: 'any', tenures: ['social-rented'] },
  }),
  {
    id: 'bs5250-surface-rh',
    group: 'surface-rh',
    title: 'Surface RH below 80 % as a monthly mean (mould criterion)',
    source: { document: 'BS 5250 (Annex D) and ISO 13788', edition: 'BS 5250:2011 read; 2021 edition and ISO 13788:2012 not yet', clause: 'Annex D' },
    confidence: 'secondary',
    metric: 'surface-rh',
    period: 'monthly-mean',
    status: 'guidance',
    limit: 80,
    direction: 'at-most',
    covers: { buildingUses: ['dwelling', 'school', 'office', 'other'], roomUses: 'any', situations: ALL_SITUATIONS, ventilation: 'any' },
    note: 'A monthly mean: a spot reading cannot establish mould risk. Glazing is checked at 100 % at any instant.',
  },
  ...en16798Co2Bands({
    idPrefix: 'en16798-res-co2',
    limits_ppm: [380, 550, 950],
    confidence: 'from memory',
    clause: 'residential CO2 above outdoor, living rooms and bedrooms (from memory)',
    buildingUses: ['dwelling'],
    roomUses: HABITABLE,
    note: 'No UK law sets a CO2 limit for homes; a benchmark for bedrooms and living rooms. Bands above outdoor; they assume adult output, rescale for children or sleepers.',
  }),
];
