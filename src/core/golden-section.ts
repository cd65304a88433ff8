/**
 * Minimum of a one-dimensional function on an interval by golden-section search (Kiefer 1953,
 * Proc. AMS 4:502): each step keeps the part of the interval that must hold a minimum of a
 * unimodal function, shrinking it by (√5 − 1)/2.
 */

const GOLDEN = (Math.sqrt(5) - 1) / 2;

/**
 * x in [lo, hi] where f is least (assuming one minimum there), to within `tolerance` in x.
 * Example: minimizeByGoldenSection((x) => (x - 2) ** 2, 0, 5, 1e-9) ≈ 2.
 */
export function minimizeByGoldenSection(f: (x: number) => number, lo: number, hi: number, tolerance: number): number {
  let a = lo;
  let b = hi;
  let x1 = b - GOLDEN * (b - a);
  let x2 = a + GOLDEN * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  while (b - a > tolerance) {
    if (f1 < f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - GOLDEN * (b - a);
      f1 = f(x1);
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + GOLDEN * (b - a);
      f2 = f(x2);
    }
  }
  return 0.5 * (a + b);
}
