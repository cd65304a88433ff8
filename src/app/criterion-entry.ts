/**
 * A criterion's threshold as the surveyor types it when recording an edit to the criteria: in
 * the unit the findings show it in (SI display units: ppm, L/s per person, L/s per m², L/s,
 * mm², h⁻¹, %), converted to the engine's SI unit to be stored (m³/s, m², s⁻¹…). Typing in the
 * shown unit avoids recording a limit a thousand or a million times off.
 *
 * Example: criterionEntry('flow-per-person').unit = 'L/s per person'; .toSi(10) = 0.01 (m³/s per
 * person); criterionEntry('air-change-rate').fromSi(1 / 900) = 4 (h⁻¹).
 */
import { metricQuantityKind } from '../core/criteria/metric-quantity.ts';
import type { CriterionMetric } from '../core/criteria/criterion.ts';
import { displayUnit, perHour, SECONDS_PER_HOUR, toDisplayUnits } from '../core/units.ts';

export interface CriterionEntry {
  /** The unit typed and shown ('' for a number without one). */
  unit: string;
  /** The typed value in the engine's SI unit. */
  toSi: (typed: number) => number;
  /** A stored SI value in the unit typed (unrounded). */
  fromSi: (si: number) => number;
}

export function criterionEntry(metric: CriterionMetric): CriterionEntry {
  if (metric === 'opening-area-fraction') return { unit: '% of floor area', toSi: (v) => v / 100, fromSi: (si) => si * 100 };
  const kind = metricQuantityKind(metric);
  if (kind === null) return { unit: '', toSi: (v) => v, fromSi: (si) => si };
  if (kind === 'airChanges') return { unit: displayUnit(kind, 'si'), toSi: (v) => v / SECONDS_PER_HOUR, fromSi: perHour };
  // The display conversions are proportional (no offset), so one unit's worth scales both ways.
  const perUnit = toDisplayUnits(1, kind, 'si');
  return { unit: displayUnit(kind, 'si'), toSi: (v) => v / perUnit, fromSi: (si) => si * perUnit };
}
