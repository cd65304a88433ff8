/**
 * Thin a long series for drawing without losing its peaks: for each horizontal bucket (about one
 * per pixel) keep the first, lowest, highest and last point, in time order. A week of one-minute
 * logger readings (10,080 points) drawn 320 px wide keeps at most 1,280 points and every extreme.
 *
 * Input: times (any unit, ascending) and values of equal length; `buckets` > 0.
 * Example: decimateMinMax([0,1,2,3], [5,9,1,5], 1) keeps all four (first, max, min, last).
 * Source: min/max bucket decimation is common practice (no published source) in plotting.
 */
export function decimateMinMax(times: ArrayLike<number>, values: ArrayLike<number>, buckets: number): { t: number[]; v: number[] } {
  const n = Math.min(times.length, values.length);
  if (n <= buckets * 4 || buckets < 1) return { t: Array.from({ length: n }, (_, i) => times[i]!), v: Array.from({ length: n }, (_, i) => values[i]!) };
  const t0 = times[0]!;
  const width = (times[n - 1]! - t0) / buckets || 1;
  const outT: number[] = [];
  const outV: number[] = [];
  let i = 0;
  while (i < n) {
    const bucket = Math.min(buckets - 1, Math.floor((times[i]! - t0) / width));
    const first = i;
    let lo = i;
    let hi = i;
    while (i < n && Math.min(buckets - 1, Math.floor((times[i]! - t0) / width)) === bucket) {
      if (values[i]! < values[lo]!) lo = i;
      if (values[i]! > values[hi]!) hi = i;
      i += 1;
    }
    const last = i - 1;
    for (const k of [...new Set([first, lo, hi, last])].sort((a, b) => a - b)) {
      outT.push(times[k]!);
      outV.push(values[k]!);
    }
  }
  return { t: outT, v: outV };
}
