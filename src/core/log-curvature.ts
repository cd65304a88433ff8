/**
 * Does the log of a decaying excess bend? A quadratic y = a + b·t + c·t² fitted by least squares
 * to y = ln(excess); a rate that changes part-way (people coming back, a window opened or
 * closed, a background above outdoor) shows as a curvature c that is both statistically clear
 * (|c|/SE(c) above the two-sided 99 % t quantile) and large enough to matter (the fitted rate
 * changes by more than 25 % from the first to the last reading). Regression formulas: Draper &
 * Smith, Applied Regression Analysis, 3rd ed. 1998, ch. 5; thresholds are ours (common practice
 * (no published source)).
 */
import { invertMatrix } from './linear-system.ts';
import { studentTQuantile } from './student-t.ts';

/** The curvature test's figures. */
export interface LogCurvature {
  /** Fitted rate −dy/dt at the first and last reading, 1/(unit of t). */
  rateAtStart: number;
  rateAtEnd: number;
  /** |c| / SE(c). */
  tStatistic: number;
  /** True when the bend is both clear and large. */
  curved: boolean;
}

/**
 * Test for curvature in y(t) (needs at least 5 points; fewer: never curved).
 * Example: y = −0.001·t for t ≤ 1800 and −1.8 − 0.002·(t − 1800) after, 13 points over 3600 s
 * → rateAtStart ≈ 0.0007, rateAtEnd ≈ 0.0023, curved true.
 */
export function logCurvature(t: readonly number[], y: readonly number[]): LogCurvature {
  const n = t.length;
  const none: LogCurvature = { rateAtStart: Number.NaN, rateAtEnd: Number.NaN, tStatistic: 0, curved: false };
  if (n < 5) return none;
  const t0 = t[0]!;
  const span = t[n - 1]! - t0;
  if (!(span > 0)) return none;
  // Scaled time u in [0, 1] keeps the normal equations well conditioned.
  const s = [0, 0, 0, 0, 0];
  const r = [0, 0, 0];
  for (let i = 0; i < n; i++) {
    const u = (t[i]! - t0) / span;
    let p = 1;
    for (let k = 0; k < 5; k++) {
      s[k]! += p;
      if (k < 3) r[k]! += p * y[i]!;
      p *= u;
    }
  }
  const xtx = [
    [s[0]!, s[1]!, s[2]!],
    [s[1]!, s[2]!, s[3]!],
    [s[2]!, s[3]!, s[4]!],
  ];
  const inv = invertMatrix(xtx);
  if (!inv) return none;
  const coef = inv.map((row) => row[0]! * r[0]! + row[1]! * r[1]! + row[2]! * r[2]!);
  const [a, b, c] = coef as [number, number, number];
  let rss = 0;
  for (let i = 0; i < n; i++) {
    const u = (t[i]! - t0) / span;
    rss += (y[i]! - a - b * u - c * u * u) ** 2;
  }
  const seC = Math.sqrt((rss / (n - 3)) * inv[2]![2]!);
  const tStatistic = seC > 0 ? Math.abs(c) / seC : Number.POSITIVE_INFINITY;
  const rateAtStart = -b / span;
  const rateAtEnd = -(b + 2 * c) / span;
  const mean = 0.5 * (Math.abs(rateAtStart) + Math.abs(rateAtEnd));
  const change = mean > 0 ? Math.abs(rateAtEnd - rateAtStart) / mean : 0;
  const curved = tStatistic > studentTQuantile(0.995, n - 3) && change > 0.25;
  return { rateAtStart, rateAtEnd, tStatistic, curved };
}
