/**
 * What the shared time chart (src/chart/time-chart.ts, timeChart) needs to draw a logger series
 * with its periods: the readings, each period as a shaded span with a short label, each fitted
 * curve as a line to overlay, limit lines and values to keep on the axis. The shapes match the
 * chart's ChartSeries, ChartPeriod and ChartLimit (ingest may not import chart; the app passes
 * this object, plus a width and height, to timeChart). The chart thins the readings itself.
 *
 * Units: times s (epoch UTC); values in the quantity's unit (ppm, °C or %), named in yLabel.
 *
 * Example: a CO2 series with one accepted decay at 0.5 h⁻¹ → series [readings, decay curve],
 * periods [{ label: 'decay 0.50 ACH' }], yLabel 'CO2 (ppm)', yInclude [outdoor level].
 */
import { perHour } from '../core/units.ts';
import type { FittedPeriod } from './fit-periods.ts';
import type { LoggerSeriesData } from './parse-logger-file.ts';

export type LoggerQuantity = 'co2' | 'temperature' | 'relative-humidity';

export interface LoggerChartData {
  series: Array<{ id: string; label: string; times_s: ArrayLike<number>; values: ArrayLike<number>; style: 'line' | 'points' }>;
  periods: Array<{ from_s: number; to_s: number; label: string }>;
  limits: Array<{ value: number; label: string }>;
  yLabel: string;
  yInclude: number[];
}

const LABELS: Record<LoggerQuantity, string> = { co2: 'CO2 (ppm)', temperature: 'Temperature (°C)', 'relative-humidity': 'Relative humidity (%)' };

function periodLabel(p: FittedPeriod): string {
  if (p.kind === 'excluded') return `left out: ${p.exclusion ?? 'excluded'}`;
  const rate = p.fit?.airChangeRate_perSecond.value;
  return rate ? `${p.kind} ${perHour(rate).toFixed(2)} ACH` : p.kind;
}

export function loggerChartData(
  series: LoggerSeriesData,
  quantity: LoggerQuantity,
  periods: readonly FittedPeriod[] = [],
  options: { outdoor_ppm?: number; limits?: Array<{ value: number; label: string }> } = {},
): LoggerChartData {
  const values = quantity === 'co2' ? series.co2_ppm : quantity === 'temperature' ? series.temp_C : series.rh_pct;
  const out: LoggerChartData = { series: [], periods: [], limits: options.limits ?? [], yLabel: LABELS[quantity], yInclude: [] };
  if (!values) return out;
  out.series.push({ id: quantity, label: LABELS[quantity], times_s: series.times_s, values, style: 'line' });
  if (quantity !== 'co2') return out;
  if (options.outdoor_ppm !== undefined) out.yInclude.push(options.outdoor_ppm);
  for (const [k, p] of periods.entries()) {
    out.periods.push({ from_s: p.start_s, to_s: p.end_s, label: periodLabel(p) });
    if (p.curve) out.series.push({ id: `fit-${k}`, label: `fitted ${p.kind}`, times_s: p.curve.times_s, values: p.curve.values, style: 'line' });
  }
  return out;
}
