/**
 * A figure of the analysis as the report prints it: rounded by the display rules of
 * src/core/units.ts (CO2 to 10 ppm, L/s to 0.5, per person to 0.1, air changes to 0.1 per hour),
 * its range in words and its basis named. The report never recomputes a figure: it converts the
 * analysis's SI numbers to display units and rounds them, nothing else.
 *
 * Example: reportFigure('Supply', { value: 0.0523, low: 0.041, high: 0.0617, basis: 'measured',
 * method: 'decay' }, 'flow').text = 'about 52.5 L/s (range 41–61.5), measured'.
 */
import type { Basis, Bounds, Ranged } from '../analysis/results.ts';
import { displayQuantity, perHour, type QuantityKind } from '../core/units.ts';

export interface ReportFigure {
  label: string;
  kind: QuantityKind;
  /** Display units, rounded by displayQuantity; null where the analysis gives none. */
  value: number | null;
  low: number | null;
  high: number | null;
  unit: string;
  basis: Basis | null;
  method: string;
  /** The whole figure in words: value, range, unit and basis. */
  text: string;
}

/** Words for each basis, as printed beside a value. */
export const BASIS_WORDS: Record<Basis, string> = {
  measured: 'measured',
  'estimated-from-measurements': 'estimated from measurements',
  predicted: 'predicted',
  assumed: 'assumed',
};

/** The report writes air changes as "ACH" (the trade's abbreviation), never h⁻¹. */
function unitOf(kind: QuantityKind): string {
  return kind === 'airChanges' ? 'ACH' : displayQuantity(0, kind).unit;
}

/** One SI number in display units, rounded; air change rates are given per second. */
export function displayNumber(si: number | null, kind: QuantityKind): number | null {
  if (si === null || !Number.isFinite(si)) return null;
  return displayQuantity(kind === 'airChanges' ? perHour(si) : si, kind).value;
}

/** A number as text, with a thousands separator from 10,000 up. Example: numberText(12500) = '12,500'. */
export function numberText(x: number): string {
  const [whole, fraction] = String(Math.abs(x)).split('.');
  const grouped = whole!.length > 4 ? whole!.replace(/\B(?=(\d{3})+(?!\d))/g, ',') : whole!;
  return `${x < 0 ? '−' : ''}${grouped}${fraction ? `.${fraction}` : ''}`;
}

/** Value, range and unit in words (no basis). Example: rangeText(4.1, 3.2, 5, 'L/s per person') = 'about 4.1 L/s per person (range 3.2–5)'. */
export function rangeText(value: number | null, low: number | null, high: number | null, unit: string): string {
  const u = unit === '%' ? '%' : ` ${unit}`;
  if (value !== null) {
    if (low === null && high === null) return `${numberText(value)}${u}`;
    if (low !== null && high !== null && low === high) return `${numberText(value)}${u}`;
    if (low !== null && high !== null) return `about ${numberText(value)}${u} (range ${numberText(low)}–${numberText(high)})`;
    return high !== null ? `about ${numberText(value)}${u} (at most ${numberText(high)})` : `about ${numberText(value)}${u} (at least ${numberText(low!)})`;
  }
  if (low !== null && high !== null) return low === high ? `${numberText(low)}${u}` : `between ${numberText(low)} and ${numberText(high)}${u}`;
  if (high !== null) return `at most ${numberText(high)}${u}`;
  if (low !== null) return `at least ${numberText(low)}${u}`;
  return 'not available';
}

/**
 * A ranged SI value as the report prints it, with its basis (null when it has none of its own).
 * Example: reportFigure('Steady CO2', { value: 1316.47, low: 1100, high: 1580, basis: 'predicted', method: '' }, 'co2').value = 1320.
 */
export function reportFigure(label: string, figure: Ranged & { basis?: Basis; method?: string }, kind: QuantityKind): ReportFigure {
  const value = displayNumber(figure.value, kind);
  const low = displayNumber(figure.low, kind);
  const high = displayNumber(figure.high, kind);
  const unit = unitOf(kind);
  const basis = figure.basis ?? null;
  const range = rangeText(value, low, high, unit);
  return {
    label,
    kind,
    value,
    low,
    high,
    unit,
    basis,
    method: figure.method ?? '',
    text: basis && range !== 'not available' ? `${range}, ${BASIS_WORDS[basis]}` : range,
  };
}

/** Day-profile bounds (favourable and unfavourable ends) as a figure without a central value. */
export function boundsFigure(label: string, bounds: Bounds, kind: QuantityKind, basis: Basis): ReportFigure {
  return reportFigure(label, { value: null, low: bounds.low, high: bounds.high, basis, method: '' }, kind);
}
