/**
 * Judging one room against one selected criterion WITHOUT MISUSE (practice.md §4 "misuses to
 * block", §1.7 and §1.11). The judge is given the evidence the analysis has for the room, each
 * figure with the metric and averaging period it can stand for, and refuses what the data
 * cannot show:
 *
 * 1. A metric is judged only by data that can show its period. A spot reading ('instant') never
 *    meets a daily mean, a 20-minute cap or "consistently"; the day profile's occupied mean and
 *    highest 20-minute rolling mean can, and the check says which figure it used and why.
 * 2. A band defined ABOVE OUTDOOR is applied to the excess (reading − outdoor), never to an
 *    absolute reading; without an outdoor level it is not assessed.
 * 3. A band that assumes an adult's CO2 output is rescaled for the people actually in the room
 *    (rescale-co2-band.ts): children and sleepers are not held to adult bands.
 * 4. An interval that straddles the limit is "uncertain", with the measurement that would
 *    settle it (interval-outcome.ts).
 * 5. Guidance for new work on an existing building is a BENCHMARK (select-criteria.ts): its
 *    statement reads "below what current guidance sets for new …", never "fails".
 *
 * Units: SI as in criterion.ts (ppm, m³/s, m³/s per person, s⁻¹, m², %).
 */
import type { CriterionEdit } from '../criteria/criterion-edits.ts';
import type { AveragingPeriod, Criterion, CriterionMetric } from '../criteria/criterion.ts';
import { rescaleCriterionForOccupants } from '../criteria/rescale-co2-band.ts';
import type { CriterionRole, SelectedCriterion } from '../criteria/select-criteria.ts';
import { intervalOutcome, type CheckMargin, type CheckOutcome, type JudgedInterval } from './interval-outcome.ts';

/** Where a figure comes from (results.ts Basis, plus what was seen). */
export type EvidenceBasis = 'measured' | 'estimated-from-measurements' | 'predicted' | 'assumed' | 'observed';

/** Metrics the evidence can carry: a criterion metric, or the room's whole outdoor-air supply (m³/s). */
export type EvidenceMetric = CriterionMetric | 'outdoor-air-flow';

/** One figure the analysis offers the judge. */
export interface MetricEvidence extends JudgedInterval {
  metric: EvidenceMetric;
  /** The period the figure stands for ('instant' for a spot reading, 'continuous' for a supply rate). */
  period: AveragingPeriod;
  basis: EvidenceBasis;
  /** What the figure is, in words, for the report. */
  describe: string;
}

/** The room facts the conversions need. */
export interface JudgeContext {
  evidence: readonly MetricEvidence[];
  /** Outdoor CO2, ppm; null when not known. */
  outdoor_ppm: number | null;
  /** People the figures assume, with their CO2 output per person (m³/s); null when none. */
  occupants: { count: number; outputPerPerson_m3s: number; label: string } | null;
  floorArea_m2: number;
  /** The measurement that would settle an uncertain result here, in words. */
  settleBy: string;
}

/** One check of a room against one criterion. */
export interface CriterionCheck {
  criterionId: string;
  /** Criteria sharing a group are alternatives (EN 16798-1 categories, BB101 rows). */
  group: string;
  title: string;
  /** The label of the selection (says "Benchmark: …" for benchmarks). */
  label: string;
  /** Document, edition and clause. */
  source: string;
  confidence: Criterion['confidence'];
  /** "not yet confirmed against …" for values from memory; empty when confirmed. */
  caveat: string;
  status: Criterion['status'];
  role: CriterionRole;
  metric: CriterionMetric;
  period: AveragingPeriod;
  direction: Criterion['direction'];
  /** The limit used, SI (after any rescaling or per-person conversion); null for duties. */
  limit: number | null;
  /** The figure judged, with its basis and what it is; null when not assessed. */
  value: (JudgedInterval & { basis: EvidenceBasis; describe: string }) | null;
  outcome: CheckOutcome;
  /** The outcome in plain words. */
  statement: string;
  /** Why this outcome (which figure was used, what was refused and why). */
  why: string;
  margin: CheckMargin | null;
  /** For an uncertain or unassessed result: the measurement that would settle it. */
  settleBy: string | null;
  /** Edits recorded for this survey. */
  edits: readonly CriterionEdit[];
}

/** Which evidence periods can show a criterion's period. */
const CAN_SHOW: Readonly<Record<AveragingPeriod, readonly AveragingPeriod[]>> = {
  instant: ['instant'],
  '20-consecutive-minutes': ['20-consecutive-minutes'],
  'occupied-day-mean': ['occupied-day-mean', 'occupied-period-mean', 'continuous'],
  'occupied-period-mean': ['occupied-period-mean', 'occupied-day-mean', 'continuous'],
  '8-hours': ['8-hours'],
  '24-hours': ['24-hours'],
  // "Consistently above" is a level held over the occupied time: an occupied mean can show it, a single reading cannot.
  consistently: ['occupied-day-mean', 'occupied-period-mean'],
  'monthly-mean': ['monthly-mean'],
  'when-running': ['when-running'],
  continuous: ['continuous'],
  'design-provision': ['design-provision'],
  'not-applicable': [],
};

const PERIOD_WORDS: Readonly<Record<AveragingPeriod, string>> = {
  instant: 'a single reading',
  '20-consecutive-minutes': 'a level held for 20 consecutive minutes',
  'occupied-day-mean': 'a mean over the occupied day',
  'occupied-period-mean': 'a mean over the hours the room is in use',
  '8-hours': 'an 8-hour mean',
  '24-hours': 'a 24-hour mean',
  consistently: 'a level held consistently over the occupied time',
  'monthly-mean': 'a monthly mean',
  'when-running': 'a capacity when switched on',
  continuous: 'a continuous rate',
  'design-provision': 'a provision the room must have',
  'not-applicable': 'no period',
};

/** Evidence metrics that can be turned into a criterion's metric. */
const SOURCES: Readonly<Partial<Record<CriterionMetric, readonly EvidenceMetric[]>>> = {
  'co2-above-outdoor': ['co2-above-outdoor', 'co2-absolute'],
  'flow-per-person': ['flow-per-person', 'outdoor-air-flow'],
  'flow-per-person-and-area': ['outdoor-air-flow'],
  // Air change rates in the sets are fan capacities (purge by fan): never taken from a window-opening flow.
  'air-change-rate': ['air-change-rate'],
};

function sourceText(c: Criterion): string {
  return `${c.source.document}, ${c.source.edition}${c.source.clause ? `, ${c.source.clause}` : ''}`;
}

const mapEnds = (x: JudgedInterval, f: (v: number) => number): JudgedInterval => ({
  favourable: x.favourable === null ? null : f(x.favourable),
  central: x.central === null ? null : f(x.central),
  unfavourable: x.unfavourable === null ? null : f(x.unfavourable),
});

/** Plain words of an outcome for a role. */
function statementOf(outcome: CheckOutcome, role: CriterionRole, label: string, title: string): string {
  if (role === 'benchmark') {
    const phrase = label.replace(/^Benchmark:\s*/, '');
    switch (outcome) {
      case 'meets':
        return `At or better than ${phrase}`;
      case 'does-not-meet':
        return `Below ${phrase}`;
      case 'uncertain':
        return `Uncertain against ${phrase}: the range spans it`;
      default:
        return `Not assessed against ${phrase}`;
    }
  }
  switch (outcome) {
    case 'meets':
      return `Meets ${title}`;
    case 'does-not-meet':
      return `Does not meet ${title}`;
    case 'uncertain':
      return `Uncertain against ${title}: the range spans the limit`;
    default:
      return `Not assessed against ${title}`;
  }
}

/**
 * Judge a room against one selected criterion (see the file note).
 * Example: BB101 refurbishment daily mean (1750 ppm, occupied-day mean) with a spot reading of
 * 1320 ppm and a day-profile occupied mean of 1220–2180 ppm → outcome 'uncertain', why "Judged on
 * the day profile's mean … a single reading cannot show a mean over the occupied day", settleBy
 * the room's suggested measurement.
 */
export function judgeCriterion(selected: SelectedCriterion & { criterion: Criterion & { edits?: readonly CriterionEdit[] } }, ctx: JudgeContext): CriterionCheck {
  let c = selected.criterion;
  const notes: string[] = [];
  const base = {
    criterionId: c.id,
    group: c.group,
    title: c.title,
    label: selected.label,
    source: sourceText(c),
    confidence: c.confidence,
    caveat: selected.caveat,
    status: c.status,
    role: selected.role,
    metric: c.metric,
    period: c.period,
    direction: c.direction,
    edits: c.edits ?? [],
  };
  const notAssessed = (why: string, settle: string | null = ctx.settleBy): CriterionCheck => ({
    ...base,
    limit: c.limit,
    value: null,
    outcome: 'not-assessed',
    statement: statementOf('not-assessed', selected.role, selected.label, c.title),
    why,
    margin: null,
    settleBy: settle,
  });
  if (c.metric === 'qualitative-duty' || c.limit === null || c.direction === 'none') {
    return notAssessed('A duty without a number: a competent person assesses it; the findings of this survey inform that assessment.', null);
  }

  // 1. Evidence of the right metric (or one convertible to it) and a period that can show the criterion's.
  const metrics = SOURCES[c.metric] ?? [c.metric];
  const sameMetric = ctx.evidence.filter((e) => metrics.includes(e.metric));
  const usable = sameMetric.filter((e) => CAN_SHOW[c.period].includes(e.period));
  const refused = sameMetric.filter((e) => !CAN_SHOW[c.period].includes(e.period));
  const refusedWords = [...new Set(refused.map((e) => PERIOD_WORDS[e.period]))];
  const evidence = usable[0];
  if (!evidence) {
    if (refused.length > 0) {
      return notAssessed(
        `The criterion is ${PERIOD_WORDS[c.period]}; the data here (${refusedWords.join(', ')}) cannot show that, so it is not judged on them.`,
      );
    }
    return notAssessed(`No figure of this room can show ${PERIOD_WORDS[c.period]} for this metric.`);
  }
  if (refused.some((e) => e.period === 'instant')) {
    notes.push(`a single reading cannot show ${PERIOD_WORDS[c.period]}, so it was not used`);
  }

  // 2. Conversions: excess above outdoor, per person, per person and area, air changes.
  let x: JudgedInterval = evidence;
  let limit = c.limit;
  if (c.metric === 'co2-above-outdoor' && evidence.metric === 'co2-absolute') {
    if (ctx.outdoor_ppm === null) return notAssessed('The band is CO2 above outdoor and no outdoor level is known, so an absolute reading cannot be judged against it.');
    const outdoor = ctx.outdoor_ppm;
    x = mapEnds(evidence, (v) => v - outdoor);
    notes.push(`the band is above outdoor, so the outdoor level (${Math.round(outdoor)} ppm) was taken off the figure; an absolute reading is never compared with it`);
  }
  const people = ctx.occupants && ctx.occupants.count > 0 ? ctx.occupants : null;
  if ((c.metric === 'flow-per-person' || c.metric === 'flow-per-person-and-area') && evidence.metric === 'outdoor-air-flow') {
    if (!people) return notAssessed('Nobody is recorded as using the room, so a per-person rate cannot be judged.');
    if (c.metric === 'flow-per-person') {
      x = mapEnds(evidence, (v) => v / people.count);
    } else {
      limit = c.limit * people.count + (c.areaTerm_m3s_m2 ?? 0) * ctx.floorArea_m2;
      notes.push(`the limit is per person plus per m² of floor: ${people.count} people and ${ctx.floorArea_m2.toFixed(1)} m² give a total compared with the room's whole supply`);
    }
  }

  // 3. Adult-output bands rescaled for the people in the room.
  if (c.metric === 'co2-above-outdoor' && c.assumedCo2Output_m3s !== undefined && people) {
    const ratio = people.outputPerPerson_m3s / c.assumedCo2Output_m3s;
    if (Math.abs(ratio - 1) > 0.05) {
      const rescaled = rescaleCriterionForOccupants(c, people.outputPerPerson_m3s, people.label);
      c = { ...rescaled.criterion };
      limit = c.limit ?? limit;
      notes.push(`the band assumes an adult's CO2 output; for ${people.label} it was rescaled to ${Math.round(limit)} ppm, the same outdoor air per person`);
    }
  }

  // 4. Outcome at both ends; a straddle is uncertain.
  const { outcome, margin } = intervalOutcome(x, limit, c.direction === 'at-least' ? 'at-least' : 'at-most');
  const used = `Judged on ${evidence.describe} (${evidence.basis})`;
  return {
    ...base,
    limit,
    value: { ...x, basis: evidence.basis, describe: evidence.describe },
    outcome,
    statement: statementOf(outcome, selected.role, selected.label, c.title),
    why: [used, ...notes].join('; ') + '.',
    margin,
    settleBy: outcome === 'uncertain' ? ctx.settleBy : null,
  };
}
