/**
 * Ordinary least-squares straight line y = a + b·x with the standard errors of the textbook
 * formulas (e.g. Draper & Smith, Applied Regression Analysis, 3rd ed. 1998, ch. 1):
 * b = Sxy/Sxx, a = ȳ − b·x̄, s² = RSS/(n − 2), SE(b) = s/√Sxx, SE(a) = s·√(1/n + x̄²/Sxx).
 * ASTM E741 uses this regression on ln(excess) for the decay method.
 */

/** The fitted line and the sums behind it (kept so Monte Carlo draws can reuse Sxx and x̄). */
export interface StraightLineFit {
  /** Number of points. */
  n: number;
  /** Slope b (units of y per unit of x). */
  slope: number;
  /** Intercept a (units of y). */
  intercept: number;
  /** Standard error of the slope; Infinity when n < 3 (no residual degrees of freedom). */
  slopeSe: number;
  /** Standard error of the intercept; Infinity when n < 3. */
  interceptSe: number;
  /** Residual standard deviation s = √(RSS/(n − 2)); Infinity when n < 3. */
  residualSd: number;
  /** Residual degrees of freedom, n − 2. */
  dof: number;
  /** Mean of x. */
  xMean: number;
  /** Σ(x − x̄)². */
  sxx: number;
  /** Residual sum of squares. */
  rss: number;
}

/**
 * Fit y = a + b·x by ordinary least squares. x and y have the same length n ≥ 2 and x is not
 * constant. Units: slope in y-units per x-unit.
 * Example: fitStraightLine([0, 1, 2, 3], [1, 3, 5, 7.5]) gives slope 2.15, intercept 0.9,
 * slopeSe 0.0866.
 */
export function fitStraightLine(x: readonly number[], y: readonly number[]): StraightLineFit {
  const n = x.length;
  let sumX = 0;
  let sumY = 0;
  for (let i = 0; i < n; i++) {
    sumX += x[i]!;
    sumY += y[i]!;
  }
  const xMean = sumX / n;
  const yMean = sumY / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i]! - xMean;
    sxx += dx * dx;
    sxy += dx * (y[i]! - yMean);
  }
  const slope = sxy / sxx;
  const intercept = yMean - slope * xMean;
  let rss = 0;
  for (let i = 0; i < n; i++) {
    const r = y[i]! - intercept - slope * x[i]!;
    rss += r * r;
  }
  const dof = n - 2;
  const residualSd = dof > 0 ? Math.sqrt(rss / dof) : Number.POSITIVE_INFINITY;
  return {
    n,
    slope,
    intercept,
    slopeSe: residualSd / Math.sqrt(sxx),
    interceptSe: residualSd * Math.sqrt(1 / n + (xMean * xMean) / sxx),
    residualSd,
    dof,
    xMean,
    sxx,
    rss,
  };
}

/**
 * Slope only, for many y vectors on the same x (Monte Carlo draws): Σ(x − x̄)·y / Sxx, with
 * x̄ and Sxx taken from an earlier fit on the same x.
 * Example: slopeOnSameX([0, 1, 2, 3], [1, 3, 5, 7.5], 1.5, 5) = 2.15.
 */
export function slopeOnSameX(x: ArrayLike<number>, y: ArrayLike<number>, xMean: number, sxx: number): number {
  let sxy = 0;
  for (let i = 0; i < x.length; i++) sxy += (x[i]! - xMean) * y[i]!;
  return sxy / sxx;
}
