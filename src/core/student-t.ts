/**
 * Student's t distribution: cumulative probability and quantiles, for regression intervals.
 * No dependency: the regularized incomplete beta function by its continued fraction
 * (Abramowitz & Stegun 1964, 26.5.8 and 26.7.1; evaluated by the modified Lentz method,
 * Thompson & Barnett 1986, J. Comput. Phys. 64:490), ln Γ by the Lanczos approximation
 * (Lanczos 1964, SIAM J. Numer. Anal. B1:86, g = 7, 9 terms).
 */

const LANCZOS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
  12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
];

/**
 * Natural logarithm of the gamma function for x > 0 (Lanczos approximation, relative error < 1e-13).
 * Example: logGamma(5) = ln 24 = 3.1780538303479458.
 */
export function logGamma(x: number): number {
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x);
  const z = x - 1;
  let sum = LANCZOS[0]!;
  for (let i = 1; i < LANCZOS.length; i++) sum += LANCZOS[i]! / (z + i);
  const t = z + 7.5;
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(sum);
}

/** Continued fraction for the incomplete beta (A&S 26.5.8), modified Lentz evaluation. */
function betaContinuedFraction(a: number, b: number, x: number): number {
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 300; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((a + m2 - 1) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < 1e-15) break;
  }
  return h;
}

/**
 * Regularized incomplete beta function I_x(a, b) for 0 ≤ x ≤ 1, a, b > 0 (A&S 26.5.8).
 * Example: regularizedIncompleteBeta(0.5, 2, 2) = 0.5.
 */
export function regularizedIncompleteBeta(x: number, a: number, b: number): number {
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const logFront = logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log1p(-x);
  const front = Math.exp(logFront);
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(a, b, x)) / a;
  return 1 - (front * betaContinuedFraction(b, a, 1 - x)) / b;
}

/**
 * Cumulative probability P(T ≤ t) of Student's t with `dof` degrees of freedom (A&S 26.7.1).
 * Example: studentTCdf(2.200985, 11) = 0.975 (to 6 decimals).
 */
export function studentTCdf(t: number, dof: number): number {
  const tail = 0.5 * regularizedIncompleteBeta(dof / (dof + t * t), dof / 2, 0.5);
  return t >= 0 ? 1 - tail : tail;
}

/** Probability density of Student's t. Example: studentTDensity(0, 1) = 1/π = 0.3183. */
export function studentTDensity(t: number, dof: number): number {
  const logC = logGamma((dof + 1) / 2) - logGamma(dof / 2) - 0.5 * Math.log(dof * Math.PI);
  return Math.exp(logC - ((dof + 1) / 2) * Math.log1p((t * t) / dof));
}

/**
 * Quantile t_p of Student's t with `dof` degrees of freedom (0 < p < 1, dof > 0): the t with
 * P(T ≤ t) = p. Found by bisection to bracket then Newton steps on studentTCdf, to ~1e-12.
 * Example: studentTQuantile(0.975, 11) = 2.2009851600916 (the 95 % two-sided multiplier).
 */
export function studentTQuantile(p: number, dof: number): number {
  if (p === 0.5) return 0;
  if (p < 0.5) return -studentTQuantile(1 - p, dof);
  const key = `${p}:${dof}`;
  const known = quantileCache.get(key);
  if (known !== undefined) return known;
  const value = solveQuantile(p, dof);
  if (quantileCache.size < 1000) quantileCache.set(key, value);
  return value;
}

/** Quantiles already found (a pure function of its arguments, so remembering them is safe). */
const quantileCache = new Map<string, number>();

function solveQuantile(p: number, dof: number): number {
  let lo = 0;
  let hi = 1;
  while (studentTCdf(hi, dof) < p) {
    lo = hi;
    hi *= 2;
  }
  let t = 0.5 * (lo + hi);
  for (let i = 0; i < 200; i++) {
    const f = studentTCdf(t, dof) - p;
    if (f > 0) hi = t;
    else lo = t;
    const density = studentTDensity(t, dof);
    let next = density > 0 ? t - f / density : 0.5 * (lo + hi);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - t) <= 1e-13 * Math.max(1, Math.abs(t))) return next;
    t = next;
  }
  return t;
}
