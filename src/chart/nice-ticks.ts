/**
 * Tick values for a numeric axis: round steps of 1, 2 or 5 × 10ⁿ covering [min, max] with about
 * `target` ticks. Example: niceTicks(412, 1316, 5) = { step: 200, values: [400, 600, …, 1400] }.
 *
 * Source: the 1-2-5 step sequence is common practice (no published source) in chart axes.
 */
export interface Ticks {
  step: number;
  values: number[];
  /** The axis domain widened to whole steps. */
  domain: [number, number];
}

export function niceStep(span: number, target: number): number {
  if (!(span > 0) || !(target > 0)) return 1;
  const raw = span / target;
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  const fraction = raw / magnitude;
  const nice = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
  return nice * magnitude;
}

export function niceTicks(min: number, max: number, target = 5): Ticks {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return { step: 1, values: [], domain: [0, 1] };
  if (min === max) {
    const pad = Math.abs(min) > 0 ? Math.abs(min) * 0.1 : 1;
    return niceTicks(min - pad, max + pad, target);
  }
  const lo = Math.min(min, max);
  const hi = Math.max(min, max);
  const step = niceStep(hi - lo, target);
  const start = Math.floor(lo / step) * step;
  const end = Math.ceil(hi / step) * step;
  const values: number[] = [];
  // Count steps as integers so binary fractions never add up to a stray extra tick.
  const n = Math.round((end - start) / step);
  const decimals = Math.max(0, -Math.floor(Math.log10(step)));
  for (let i = 0; i <= n; i += 1) values.push(Number((start + i * step).toFixed(Math.min(decimals, 12))));
  return { step, values, domain: [values[0]!, values[values.length - 1]!] };
}
