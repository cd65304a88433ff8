/**
 * School ventilation criteria (England): BB101 (2018) CO2 levels and ventilation rates for
 * teaching spaces, the School Premises Regulations duty, and the HSE workplace guidance for
 * the staff (in workplace-criteria.ts, which covers schools too).
 *
 * BB101 judges a teaching space on the mean CO2 over the teaching day AND a cap that must not
 * be exceeded for more than 20 consecutive minutes. The values, by situation and ventilation
 * type (references.md §5.2; practice.md §4, which recalls all of them from memory):
 *
 *     situation      ventilation   daily mean   20-minute cap   confidence
 *     new build      natural       1500 ppm     2000 ppm        mean and cap secondary (CIBSE Journal)
 *     new build      mechanical    1000 ppm     1500 ppm        mean secondary; cap from memory (sources disagree)
 *     new build      hybrid        1500 ppm     2000 ppm        from memory (treated as natural; check the table)
 *     refurbishment  natural       1750 ppm     2000 ppm        mean secondary; cap from memory
 *     refurbishment  mechanical    1350 ppm     2000 ppm        from memory
 *     refurbishment  hybrid        1750 ppm     2000 ppm        from memory (treated as natural)
 *
 * The ventilation rates (5 L/s per person minimum over the day, 8 L/s per person purge or boost
 * capacity for new teaching spaces) are secondary (references.md §5.2).
 */
import { fromLitresPerSecond } from '../units.ts';
import type { Criterion, CriterionConfidence, BuildingSituation, VentilationType } from './criterion.ts';
import { legalDuty } from './legal-duty.ts';

const BB101 = { document: 'BB101 Guidelines on ventilation, thermal comfort and indoor air quality in schools', edition: '2018 (ESFA/DfE)' };
const BB101_CO2 = { ...BB101, clause: 'CO2 performance criteria table (table number from memory: Table 3)' };
const TEACHING = ['classroom', 'hall'] as const;

interface Bb101Row {
  situation: Extract<BuildingSituation, 'new' | 'refurbished'>;
  ventilation: VentilationType;
  mean_ppm: number;
  cap_ppm: number;
  meanConfidence: CriterionConfidence;
  capConfidence: CriterionConfidence;
}

const ROWS: readonly Bb101Row[] = [
  { situation: 'new', ventilation: 'natural', mean_ppm: 1500, cap_ppm: 2000, meanConfidence: 'secondary', capConfidence: 'secondary' },
  { situation: 'new', ventilation: 'mechanical', mean_ppm: 1000, cap_ppm: 1500, meanConfidence: 'secondary', capConfidence: 'from memory' },
  { situation: 'new', ventilation: 'hybrid', mean_ppm: 1500, cap_ppm: 2000, meanConfidence: 'from memory', capConfidence: 'from memory' },
  { situation: 'refurbished', ventilation: 'natural', mean_ppm: 1750, cap_ppm: 2000, meanConfidence: 'secondary', capConfidence: 'from memory' },
  { situation: 'refurbished', ventilation: 'mechanical', mean_ppm: 1350, cap_ppm: 2000, meanConfidence: 'from memory', capConfidence: 'from memory' },
  { situation: 'refurbished', ventilation: 'hybrid', mean_ppm: 1750, cap_ppm: 2000, meanConfidence: 'from memory', capConfidence: 'from memory' },
];

const SITUATION_WORD = { new: 'new build', refurbished: 'refurbishment' } as const;

function co2Rows(row: Bb101Row): Criterion[] {
  const key = `${row.situation}-${row.ventilation}`;
  const covers = { buildingUses: ['school'] as const, roomUses: TEACHING, situations: [row.situation], ventilation: [row.ventilation] };
  const what = `${SITUATION_WORD[row.situation]}, ${row.ventilation} ventilation`;
  return [
    {
      id: `bb101-2018-co2-mean-${key}`,
      group: 'bb101-2018-co2-mean',
      title: `BB101 daily mean CO2 (${what})`,
      source: BB101_CO2,
      confidence: row.meanConfidence,
      metric: 'co2-absolute',
      period: 'occupied-day-mean',
      status: 'design-guidance-new-work',
      limit: row.mean_ppm,
      direction: 'at-most',
      covers,
      note: 'Mean over the teaching day; a spot reading cannot be judged against it.',
    },
    {
      id: `bb101-2018-co2-cap-${key}`,
      group: 'bb101-2018-co2-cap',
      title: `BB101 CO2 not above this for more than 20 consecutive minutes (${what})`,
      source: BB101_CO2,
      confidence: row.capConfidence,
      metric: 'co2-absolute',
      period: '20-consecutive-minutes',
      status: 'design-guidance-new-work',
      limit: row.cap_ppm,
      direction: 'at-most',
      covers,
      note: 'Exceeded only when the level stays above it for more than 20 minutes in a row.',
    },
  ];
}

/** The school set's own rows (HSE staff guidance is in the workplace set, which covers schools). */
export const SCHOOL_CRITERIA: readonly Criterion[] = [
  ...ROWS.flatMap(co2Rows),
  {
    id: 'bb101-2018-min-rate',
    group: 'bb101-2018-rate',
    title: 'BB101 minimum outdoor air over the day',
    source: BB101,
    confidence: 'secondary',
    metric: 'flow-per-person',
    period: 'occupied-day-mean',
    status: 'design-guidance-new-work',
    limit: fromLitresPerSecond(5),
    direction: 'at-least',
    covers: { buildingUses: ['school'], roomUses: TEACHING, situations: ['new', 'refurbished'], ventilation: 'any' },
  },
  {
    id: 'bb101-2018-purge-rate',
    group: 'bb101-2018-purge',
    title: 'BB101 purge or boost capacity of new teaching spaces',
    source: BB101,
    confidence: 'secondary',
    metric: 'flow-per-person',
    period: 'when-running',
    status: 'design-guidance-new-work',
    limit: fromLitresPerSecond(8),
    direction: 'at-least',
    covers: { buildingUses: ['school'], roomUses: TEACHING, situations: ['new'], ventilation: 'any' },
  },
  legalDuty({
    id: 'school-premises-2012-ventilation',
    group: 'school-premises-ventilation',
    title: 'School Premises Regulations: adequate ventilation of every room',
    source: { document: 'The School Premises (England) Regulations 2012', edition: 'SI 2012/1943', clause: 'ventilation regulation (number from memory)' },
    confidence: 'from memory',
    covers: { buildingUses: ['school'], roomUses: 'any', situations: ['new', 'refurbished', 'existing'], ventilation: 'any' },
    note: 'A duty without a number; BB101 is the guidance used to show it is met.',
  }),
];
