/**
 * The project's one tolerance check. Passes when |actual - expected| <= abs OR
 * |actual - expected| <= rel * |expected|. Give the tolerance that the source of the
 * reference value justifies (printed decimals, stated accuracy), not whatever makes it pass.
 *
 * Example: approxEqual(0.0048, 0.004783, { abs: 1e-4 }) passes.
 */
import { expect } from 'vitest';

export interface Tolerance {
  /** Absolute tolerance, in the units of the value. */
  abs?: number;
  /** Relative tolerance, as a fraction of |expected|. */
  rel?: number;
}

export function isApproxEqual(actual: number, expected: number, tol: Tolerance): boolean {
  if (!Number.isFinite(actual) || !Number.isFinite(expected)) return actual === expected;
  const diff = Math.abs(actual - expected);
  if (tol.abs !== undefined && diff <= tol.abs) return true;
  if (tol.rel !== undefined && diff <= tol.rel * Math.abs(expected)) return true;
  return false;
}

export function approxEqual(actual: number, expected: number, tol: Tolerance, label = ''): void {
  if (tol.abs === undefined && tol.rel === undefined) {
    throw new Error('approxEqual needs an abs or rel tolerance');
  }
  const ok = isApproxEqual(actual, expected, tol);
  expect(
    ok,
    `${label ? label + ': ' : ''}expected ${expected} within ${JSON.stringify(tol)}, got ${actual} (diff ${Math.abs(actual - expected)})`,
  ).toBe(true);
}
