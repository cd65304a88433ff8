/**
 * The geometry of a time chart, shared by the screens (drawn as SVG) and the report (drawn with
 * the PDF library): plot box, axes with ticks, series as polylines in pixel space (thinned to the
 * plot width, broken at gaps), horizontal limit lines, shaded periods and point markers.
 * Renderers only draw what this returns, so a chart on screen and on paper show the same thing.
 *
 * Units: times in seconds, values in the unit the caller states in `yLabel`; output in the
 * renderer's units (CSS px or PDF points) given by `width` and `height`.
 *
 * Example: a 320 × 180 chart of a classroom day from 08:00 to 16:00 with a 1500 ppm limit line
 * gives x ticks every 2 h and a limit line at the y of 1500 on a 400-1600 ppm axis.
 */
import { niceTicks } from './nice-ticks.ts';
import { timeTicks } from './time-ticks.ts';
import { decimateMinMax } from './decimate.ts';

export interface ChartSeries {
  id: string;
  label: string;
  times_s: ArrayLike<number>;
  values: ArrayLike<number>;
  /** Draw as a line (default) or as separate points (spot readings). */
  style?: 'line' | 'points';
}

export interface ChartLimit {
  value: number;
  label: string;
}

export interface ChartPeriod {
  from_s: number;
  to_s: number;
  label: string;
}

export interface TimeChartInput {
  width: number;
  height: number;
  series: ChartSeries[];
  limits?: ChartLimit[];
  periods?: ChartPeriod[];
  yLabel: string;
  /** Fixed time range; default: the data's. */
  timeRange_s?: [number, number];
  /** Include these values in the y axis (e.g. 0 or the outdoor level). */
  yInclude?: number[];
  /** A gap longer than this breaks a line (seconds); default 3 × the median spacing. */
  gap_s?: number;
  margin?: { top: number; right: number; bottom: number; left: number };
}

export interface Point {
  x: number;
  y: number;
}

export interface TimeChartGeometry {
  plot: { x: number; y: number; width: number; height: number };
  xTicks: Array<{ x: number; label: string }>;
  yTicks: Array<{ y: number; label: string }>;
  yLabel: string;
  series: Array<{ id: string; label: string; style: 'line' | 'points'; segments: Point[][] }>;
  limits: Array<{ y: number; label: string; value: number }>;
  periods: Array<{ x0: number; x1: number; label: string }>;
}

const DEFAULT_MARGIN = { top: 12, right: 12, bottom: 28, left: 48 };

function extent(values: Iterable<number>): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}

function medianSpacing(times: ArrayLike<number>): number {
  const gaps: number[] = [];
  for (let i = 1; i < times.length; i += 1) gaps.push(times[i]! - times[i - 1]!);
  gaps.sort((a, b) => a - b);
  return gaps.length ? gaps[Math.floor(gaps.length / 2)]! : 0;
}

export function timeChart(input: TimeChartInput): TimeChartGeometry {
  const margin = input.margin ?? DEFAULT_MARGIN;
  const plot = {
    x: margin.left,
    y: margin.top,
    width: Math.max(1, input.width - margin.left - margin.right),
    height: Math.max(1, input.height - margin.top - margin.bottom),
  };
  const allTimes = input.series.flatMap((s) => Array.from(s.times_s));
  const [t0, t1] = input.timeRange_s ?? extent(allTimes);
  const timeSpan = t1 > t0 ? t1 - t0 : 1;
  const yValues = [
    ...input.series.flatMap((s) => Array.from(s.values)),
    ...(input.limits ?? []).map((l) => l.value),
    ...(input.yInclude ?? []),
  ];
  const [v0, v1] = extent(yValues);
  const yTicksRaw = Number.isFinite(v0) ? niceTicks(v0, v1, Math.max(3, Math.round(plot.height / 30))) : niceTicks(0, 1);
  const [y0, y1] = yTicksRaw.domain;
  const xOf = (t: number) => plot.x + ((t - t0) / timeSpan) * plot.width;
  const yOf = (v: number) => plot.y + plot.height - ((v - y0) / (y1 - y0)) * plot.height;

  const series = input.series.map((s) => {
    const style = s.style ?? 'line';
    const thin = style === 'line' ? decimateMinMax(s.times_s, s.values, Math.ceil(plot.width)) : { t: Array.from(s.times_s), v: Array.from(s.values) };
    const gap = input.gap_s ?? 3 * medianSpacing(thin.t);
    const segments: Point[][] = [];
    let current: Point[] = [];
    for (let i = 0; i < thin.t.length; i += 1) {
      const t = thin.t[i]!;
      const v = thin.v[i]!;
      const breaks = !Number.isFinite(v) || (style === 'line' && gap > 0 && i > 0 && t - thin.t[i - 1]! > gap);
      if (breaks && current.length) {
        segments.push(current);
        current = [];
      }
      if (Number.isFinite(v) && t >= t0 && t <= t1) current.push({ x: xOf(t), y: yOf(v) });
    }
    if (current.length) segments.push(current);
    return { id: s.id, label: s.label, style, segments };
  });

  return {
    plot,
    xTicks: timeTicks(t0, t1, Math.max(2, Math.round(plot.width / 70))).map((tick) => ({ x: xOf(tick.t_s), label: tick.label })),
    yTicks: yTicksRaw.values.map((v) => ({ y: yOf(v), label: String(v) })),
    yLabel: input.yLabel,
    series,
    limits: (input.limits ?? []).map((l) => ({ y: yOf(l.value), label: l.label, value: l.value })),
    periods: (input.periods ?? [])
      .map((p) => ({ x0: xOf(Math.max(p.from_s, t0)), x1: xOf(Math.min(p.to_s, t1)), label: p.label }))
      .filter((p) => p.x1 > p.x0),
  };
}

/** An SVG path ("M x y L x y …") for one segment, rounded to 0.1 px. */
export function svgPath(points: Point[]): string {
  return points.map((p, i) => `${i === 0 ? 'M' : 'L'}${p.x.toFixed(1)} ${p.y.toFixed(1)}`).join(' ');
}
