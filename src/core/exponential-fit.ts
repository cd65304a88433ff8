/**
 * Least-squares fit of curves that are exponential in time with one unknown rate λ and a few
 * coefficients that enter linearly: y(t) = f(λ, t) + Σ c_j·g_j(λ, t). For a fixed λ the c_j
 * follow from linear least squares, so the search is over λ alone (variable projection, Golub &
 * Pereyra 1973, SIAM J. Numer. Anal. 10:413); a log-spaced scan and golden-section search
 * bracket the best λ, then Gauss–Newton steps on all parameters polish it and give the
 * covariance s²(JᵀJ)⁻¹ (Bates & Watts, Nonlinear Regression Analysis, 1988, §2.3).
 */
import { minimizeByGoldenSection } from './golden-section.ts';
import { invertMatrix, solveLinearSystem } from './linear-system.ts';

/** A value and its derivative with respect to λ. */
export type WithRateDerivative = readonly [value: number, dValue_dRate: number];

/** The curve: a fixed part and linear basis functions, each with its derivative in λ. */
export interface SeparableExponentialModel {
  /** Number of linear coefficients c_j (1 to 3). */
  basisCount: number;
  /** Fixed part f(λ, t) and ∂f/∂λ. */
  fixed(rate: number, t: number): WithRateDerivative;
  /** Basis g_j(λ, t) and ∂g_j/∂λ. */
  basis(j: number, rate: number, t: number): WithRateDerivative;
}

/** The fitted rate and coefficients with their standard errors. */
export interface ExponentialFit {
  /** Rate λ in 1/(unit of t). */
  rate: number;
  /** Standard error of λ (Infinity when there are no residual degrees of freedom). */
  rateSe: number;
  /** Linear coefficients c_j. */
  coefficients: number[];
  /** Standard errors of c_j. */
  coefficientSe: number[];
  /** Covariance matrix of [λ, c_1, …] (null when singular). */
  covariance: number[][] | null;
  /** Residual sum of squares. */
  rss: number;
  /** Residual degrees of freedom n − (1 + basisCount). */
  dof: number;
  /** True when the best λ sits at an end of the search range (the data do not pin λ down). */
  atSearchLimit: boolean;
}

/**
 * Linear least squares for the c_j at a fixed λ. The residual sum comes from the same pass
 * (Σr² − cᵀGᵀr), which is enough to compare λ values during the search; the polish recomputes it.
 */
function linearCoefficients(
  model: SeparableExponentialModel,
  rate: number,
  t: readonly number[],
  y: readonly number[],
): { c: number[]; rss: number } | null {
  const m = model.basisCount;
  const ata = Array.from({ length: m }, () => new Array<number>(m).fill(0));
  const atr = new Array<number>(m).fill(0);
  const g = new Array<number>(m);
  let rr = 0;
  for (let i = 0; i < t.length; i++) {
    const r = y[i]! - model.fixed(rate, t[i]!)[0];
    rr += r * r;
    for (let j = 0; j < m; j++) g[j] = model.basis(j, rate, t[i]!)[0];
    for (let j = 0; j < m; j++) {
      atr[j]! += g[j]! * r;
      for (let k = j; k < m; k++) ata[j]![k]! += g[j]! * g[k]!;
    }
  }
  for (let j = 0; j < m; j++) for (let k = 0; k < j; k++) ata[j]![k] = ata[k]![j]!;
  const c = solveLinearSystem(ata, atr);
  if (!c) return null;
  let explained = 0;
  for (let j = 0; j < m; j++) explained += c[j]! * atr[j]!;
  return { c, rss: Math.max(0, rr - explained) };
}

function residualSumOfSquares(
  model: SeparableExponentialModel,
  rate: number,
  c: readonly number[],
  t: readonly number[],
  y: readonly number[],
): number {
  let rss = 0;
  for (let i = 0; i < t.length; i++) {
    let v = model.fixed(rate, t[i]!)[0];
    for (let j = 0; j < c.length; j++) v += c[j]! * model.basis(j, rate, t[i]!)[0];
    const r = y[i]! - v;
    rss += r * r;
  }
  return rss;
}

/** C(t) = B + A·e^(−λt) (a level approached exponentially): bases 1 and e^(−λt), nothing fixed. */
export const EXPONENTIAL_APPROACH_MODEL: SeparableExponentialModel = {
  basisCount: 2,
  fixed: () => [0, 0],
  basis: (j, rate, t) => {
    if (j === 0) return [1, 0];
    const e = Math.exp(-rate * t);
    return [e, -t * e];
  },
};

/**
 * Fit the model to (t, y) with λ searched in [rateMin, rateMax] (both > 0, 1/(unit of t)).
 * With startRate (a λ known to be close, e.g. from a fit to slightly different data) the search
 * is skipped and Gauss–Newton starts there. Returns null when no λ in the range gives a
 * solvable linear problem.
 * Example: with basisCount 2, fixed 0, bases 1 and e^(−λt), data y = 500 + 1000·e^(−0.0002·t)
 * at t = 0, 300, …, 3600 s, fitSeparableExponential(…, 1e-6, 1e-2) gives rate 0.0002 s⁻¹ and
 * coefficients [500, 1000].
 */
export function fitSeparableExponential(
  model: SeparableExponentialModel,
  t: readonly number[],
  y: readonly number[],
  rateMin: number,
  rateMax: number,
  startRate?: number,
): ExponentialFit | null {
  const searched = startRate === undefined ? searchRate(model, t, y, rateMin, rateMax) : { rate: startRate, atSearchLimit: false };
  if (!searched) return null;
  return polish(model, t, y, searched.rate, searched.atSearchLimit);
}

/** Log-spaced scan of the profile residual over λ, then golden-section search. */
function searchRate(
  model: SeparableExponentialModel,
  t: readonly number[],
  y: readonly number[],
  rateMin: number,
  rateMax: number,
): { rate: number; atSearchLimit: boolean } | null {
  const lnMin = Math.log(rateMin);
  const lnMax = Math.log(rateMax);
  const profile = (lnRate: number): number => linearCoefficients(model, Math.exp(lnRate), t, y)?.rss ?? Infinity;

  // Coarse scan on ln λ, then golden-section search between the neighbours of the best point.
  const steps = 24;
  let best = 0;
  let bestValue = Infinity;
  for (let i = 0; i <= steps; i++) {
    const v = profile(lnMin + ((lnMax - lnMin) * i) / steps);
    if (v < bestValue) {
      bestValue = v;
      best = i;
    }
  }
  if (!Number.isFinite(bestValue)) return null;
  const a = lnMin + ((lnMax - lnMin) * Math.max(0, best - 1)) / steps;
  const b = lnMin + ((lnMax - lnMin) * Math.min(steps, best + 1)) / steps;
  return { rate: Math.exp(minimizeByGoldenSection(profile, a, b, 1e-3)), atSearchLimit: best === 0 || best === steps };
}

/** Gauss–Newton on [λ, c…] from a starting λ, and the covariance at the end. */
function polish(
  model: SeparableExponentialModel,
  t: readonly number[],
  y: readonly number[],
  startRate: number,
  atSearchLimit: boolean,
): ExponentialFit | null {
  let rate = startRate;
  const start = linearCoefficients(model, rate, t, y);
  if (!start) return null;
  let c = start.c;
  let rss = residualSumOfSquares(model, rate, c, t, y);

  // Gauss–Newton polish on [λ, c…] with step halving; also gives JᵀJ for the covariance.
  const p = 1 + model.basisCount;
  let jtj: number[][] = [];
  for (let iter = 0; iter < 30; iter++) {
    jtj = Array.from({ length: p }, () => new Array<number>(p).fill(0));
    const jtr = new Array<number>(p).fill(0);
    const row = new Array<number>(p);
    for (let i = 0; i < t.length; i++) {
      const [f, df] = model.fixed(rate, t[i]!);
      let v = f;
      let dv = df;
      for (let j = 0; j < model.basisCount; j++) {
        const [g, dg] = model.basis(j, rate, t[i]!);
        v += c[j]! * g;
        dv += c[j]! * dg;
        row[j + 1] = g;
      }
      row[0] = dv;
      const r = y[i]! - v;
      for (let j = 0; j < p; j++) {
        jtr[j]! += row[j]! * r;
        for (let k = 0; k < p; k++) jtj[j]![k]! += row[j]! * row[k]!;
      }
    }
    const step = solveLinearSystem(jtj, jtr);
    if (!step) break;
    let scale = 1;
    let improved = false;
    for (let h = 0; h < 20; h++) {
      const trialRate = rate + scale * step[0]!;
      if (trialRate > 0) {
        const trialC = c.map((cj, j) => cj + scale * step[j + 1]!);
        const trialRss = residualSumOfSquares(model, trialRate, trialC, t, y);
        if (trialRss <= rss) {
          const gain = rss - trialRss;
          rate = trialRate;
          c = trialC;
          rss = trialRss;
          improved = gain > 1e-14 * (rss + 1e-300);
          break;
        }
      }
      scale /= 2;
    }
    if (!improved) break;
  }

  const dof = t.length - p;
  const s2 = dof > 0 ? rss / dof : Infinity;
  const inverse = dof > 0 ? invertMatrix(jtj) : null;
  const covariance = inverse ? inverse.map((r) => r.map((v) => v * s2)) : null;
  const se = (k: number): number => (covariance ? Math.sqrt(Math.max(0, covariance[k]![k]!)) : Infinity);
  return {
    rate,
    rateSe: se(0),
    coefficients: c,
    coefficientSe: c.map((_, j) => se(j + 1)),
    covariance,
    rss,
    dof,
    atSearchLimit,
  };
}
