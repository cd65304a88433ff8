/**
 * A fitted exponential approach C(t) = B + A·e^(−λ(t − t0)) sampled for drawing over the
 * readings: B is the level approached (the background for a decay, the steady level for a
 * build-up), λ the fitted rate; A is the least-squares amplitude through the readings given
 * B and λ, so the curve sits on the readings as the fit saw them.
 *
 * Units: times s, levels ppm, rate s⁻¹.
 *
 * Example: readings of 420 + 1000·e^(−t/3600) at t = 0…3600 s, rate 1/3600, approached 420,
 * 3 samples → times [0, 1800, 3600], values [1420, 1026.5, 787.9].
 */
import type { Reading } from '../core/supply-estimate.ts';

export interface SampledCurve {
  times_s: number[];
  values: number[];
}

export function fittedCurve(readings: readonly Reading[], t0: number, rate_perSecond: number, approached_ppm: number, samples = 60): SampledCurve | null {
  if (readings.length === 0 || !(rate_perSecond > 0) || !Number.isFinite(approached_ppm)) return null;
  let num = 0;
  let den = 0;
  for (const r of readings) {
    const e = Math.exp(-rate_perSecond * (r.time_s - t0));
    num += (r.level_ppm - approached_ppm) * e;
    den += e * e;
  }
  const amplitude = num / den;
  const from = readings[0]!.time_s;
  const to = readings[readings.length - 1]!.time_s;
  const times_s: number[] = [];
  const values: number[] = [];
  for (let k = 0; k < samples; k++) {
    const t = samples === 1 ? from : from + ((to - from) * k) / (samples - 1);
    times_s.push(t);
    values.push(approached_ppm + amplitude * Math.exp(-rate_perSecond * (t - t0)));
  }
  return { times_s, values };
}
