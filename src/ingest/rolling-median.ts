/**
 * Running median of a series over a window of 2·half + 1 points (shrinking at the ends). It
 * follows steps and slopes but ignores excursions of up to `half` points, so a door opened for
 * a few minutes does not move it. Non-finite values are skipped inside each window. The window
 * is kept sorted as it slides (binary search, one shift in and one out), so each point costs
 * O(half) rather than a sort.
 *
 * Example: rollingMedian(Float64Array.of(800, 805, 560, 810, 815), 2) = [800, 802.5, 805, 807.5, 810].
 */

/** First position in sorted[0..m) whose value is not below v. */
function lowerBound(sorted: Float64Array, m: number, v: number): number {
  let lo = 0;
  let hi = m;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid]! < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

export function rollingMedian(values: ArrayLike<number>, half: number): Float64Array {
  const n = values.length;
  const out = new Float64Array(n);
  const sorted = new Float64Array(2 * half + 2);
  let m = 0;
  const add = (v: number) => {
    if (!Number.isFinite(v)) return;
    const at = lowerBound(sorted, m, v);
    sorted.copyWithin(at + 1, at, m);
    sorted[at] = v;
    m++;
  };
  const remove = (v: number) => {
    if (!Number.isFinite(v)) return;
    const at = lowerBound(sorted, m, v);
    sorted.copyWithin(at, at + 1, m);
    m--;
  };
  for (let j = 0; j < Math.min(n, half); j++) add(values[j]!);
  for (let i = 0; i < n; i++) {
    if (i + half < n) add(values[i + half]!);
    if (i - half - 1 >= 0) remove(values[i - half - 1]!);
    out[i] = m === 0 ? NaN : m % 2 ? sorted[(m - 1) / 2]! : (sorted[m / 2 - 1]! + sorted[m / 2]!) / 2;
  }
  return out;
}
