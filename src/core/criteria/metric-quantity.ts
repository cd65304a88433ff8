/**
 * The display quantity of each criterion metric, for screens and the report: which unit a
 * check's value and limit are shown in. Null for a share of floor area (shown as a percentage)
 * and for duties without a number.
 *
 * 'flow-per-person-and-area' is judged as the room's whole outdoor air against
 * q_p × people + q_B × floor area, so it shows as a flow. Air change rates are SI (s⁻¹) inside;
 * the 'airChanges' display kind is per hour, so callers convert with units.perHour first.
 *
 * Example: metricQuantityKind('co2-above-outdoor') = 'co2'.
 */
import type { QuantityKind } from '../units.ts';
import type { CriterionMetric } from './criterion.ts';

const METRIC_KIND: Record<CriterionMetric, QuantityKind | null> = {
  'co2-absolute': 'co2',
  'co2-above-outdoor': 'co2',
  'flow-per-person': 'flowPerPerson',
  'flow-per-person-and-area': 'flow',
  'flow-per-floor-area': 'flowPerArea',
  'whole-dwelling-flow': 'flow',
  'extract-flow': 'flow',
  'air-change-rate': 'airChanges',
  'ventilator-equivalent-area': 'ventArea',
  'door-undercut-area': 'ventArea',
  'opening-area-fraction': null,
  'surface-rh': 'relativeHumidity',
  'qualitative-duty': null,
};

export function metricQuantityKind(metric: CriterionMetric): QuantityKind | null {
  return METRIC_KIND[metric];
}
