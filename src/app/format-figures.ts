/**
 * Numbers as a practitioner writes them: converted to the survey's display units and rounded to
 * the reporting step by src/core/units.ts (CO₂ to 10 ppm, L/s to 0.5, ACH to 0.1), with the unit,
 * and a range written "low–high". Missing values say so in words, never 0 or NaN.
 *
 * Examples: quantity(0.0523, 'flow') = '52.5 L/s'; range({ value: 0.01, low: 0.008, high: 0.013 },
 * 'flow') = '10 L/s (8–13 L/s)'.
 */
import { displayQuantity, perHour, roundToStep, toDisplayUnits, type QuantityKind, type UnitSystem } from '../core/units.ts';
import { metricQuantityKind } from '../core/criteria/metric-quantity.ts';
import type { CriterionMetric } from '../core/criteria/criterion.ts';
import type { Basis, Ranged } from '../analysis/results.ts';
import { plainNumber } from './plain-number.ts';

function number(si: number, kind: QuantityKind, units: UnitSystem): { text: string; unit: string } {
  const shown = displayQuantity(si, kind, units);
  return { text: plainNumber(shown.value), unit: shown.unit };
}

/** One value with its unit. */
export function quantity(si: number | null | undefined, kind: QuantityKind, units: UnitSystem = 'si'): string {
  if (si === null || si === undefined || !Number.isFinite(si)) return 'not known';
  const { text, unit } = number(si, kind, units);
  return unit === '%' ? `${text}%` : `${text} ${unit}`;
}

/** The range alone: "8–13 L/s". */
export function bounds(low: number | null, high: number | null, kind: QuantityKind, units: UnitSystem = 'si'): string {
  if (low === null || high === null) return 'range not known';
  const lo = number(low, kind, units);
  const hi = number(high, kind, units);
  return `${lo.text}–${hi.text} ${hi.unit}`;
}

/** A value with its range: "10 L/s (8–13 L/s)". */
export function range(figure: Ranged, kind: QuantityKind, units: UnitSystem = 'si'): string {
  const main = quantity(figure.value, kind, units);
  return figure.low === null || figure.high === null ? main : `${main} (${bounds(figure.low, figure.high, kind, units)})`;
}

export const BASIS_WORDS: Record<Basis, string> = {
  measured: 'measured',
  'estimated-from-measurements': 'estimated from measurements',
  predicted: 'predicted from the openings',
  assumed: 'assumed',
};

/** Seconds as "12 min" or "1 h 05 min". */
export function duration(seconds: number | null): string {
  if (seconds === null || !Number.isFinite(seconds)) return 'not known';
  const minutes = Math.round(seconds / 60);
  if (minutes < 60) return `${minutes} min`;
  return `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, '0')} min`;
}

/** An air change rate stored per second, as air changes per hour: "0.9 h⁻¹ (0.6–1.3 h⁻¹)". */
export function airChanges(perSecond: Ranged, units: UnitSystem = 'si'): string {
  const h = (v: number | null) => (v === null ? null : v * 3600);
  return range({ value: h(perSecond.value), low: h(perSecond.low), high: h(perSecond.high) }, 'airChanges', units);
}

/**
 * A criterion check's figure (its value or limit, SI in the metric's unit) as people read it.
 * Example: criterionFigure('co2-above-outdoor', 800) = '800 ppm'; ('air-change-rate', 1/900) = '4 h⁻¹'.
 */
export function criterionFigure(metric: CriterionMetric, si: number | null, units: UnitSystem = 'si', limit?: number | null): string {
  if (si === null || !Number.isFinite(si)) return 'not known';
  if (metric === 'opening-area-fraction') return `${roundToStep(si * 100, 0.1)}% of floor area`;
  const kind = metricQuantityKind(metric);
  if (!kind) return String(si);
  const shown = kind === 'airChanges' ? perHour(si) : si;
  const text = quantity(shown, kind, units);
  // Beside its limit, a value that rounds to the limit's own figure but is not the limit keeps
  // a finer step, so "79.6 %" never reads as "80 %" next to "limit 80 %".
  if (limit === undefined || limit === null || si === limit || text !== criterionFigure(metric, limit, units)) return text;
  const { step, unit } = displayQuantity(shown, kind, units);
  const fine = plainNumber(roundToStep(toDisplayUnits(shown, kind, units), step / 10));
  return unit === '%' ? `${fine}%` : `${fine} ${unit}`;
}
