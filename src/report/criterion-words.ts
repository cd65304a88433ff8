/**
 * Criteria in the report's words: a status, an averaging period and a source as a reader needs
 * them beside a finding (practice.md §3: name the criterion, its source, averaging period and
 * status), and the display kind of each metric's unit.
 *
 * Example: statusWords('design-guidance-new-work') = 'design guidance for new work'.
 */
import { metricQuantityKind } from '../core/criteria/metric-quantity.ts';
import type { AveragingPeriod, CriterionMetric, CriterionSource, CriterionStatus } from '../core/criteria/criterion.ts';
import type { QuantityKind } from '../core/units.ts';

const STATUS: Record<CriterionStatus, string> = {
  law: 'law',
  'approved-code-of-practice': 'approved code of practice',
  'statutory-guidance': 'statutory guidance (building work)',
  'design-guidance-new-work': 'design guidance for new work',
  guidance: 'guidance',
  benchmark: 'benchmark only',
};

const PERIOD: Record<AveragingPeriod, string> = {
  instant: 'at any moment',
  '20-consecutive-minutes': 'over any 20 minutes in a row',
  'occupied-day-mean': 'mean over the occupied day',
  'occupied-period-mean': 'mean over the hours in use',
  '8-hours': 'over 8 hours',
  '24-hours': 'over 24 hours',
  consistently: 'consistently (not one reading)',
  'monthly-mean': 'monthly mean',
  'when-running': 'when running or boosted',
  continuous: 'all the time',
  'design-provision': 'provision in the building',
  'not-applicable': 'no averaging (a duty)',
};


export function statusWords(status: CriterionStatus): string {
  return STATUS[status];
}

export function periodWords(period: AveragingPeriod): string {
  return PERIOD[period];
}

/** The display kind of a metric's unit, or null for a fraction or a duty without a number. */
export function metricKind(metric: CriterionMetric): QuantityKind | null {
  return metricQuantityKind(metric);
}

/** 'BB101 (2018), Table 3'. */
export function sourceWords(source: CriterionSource): string {
  return `${source.document} (${source.edition})${source.clause ? `, ${source.clause}` : ''}`;
}
