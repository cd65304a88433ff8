import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { plainNumber } from '../../src/app/plain-number.ts';

/** The formatter plainNumber stands in for (Node carries the full ICU data). */
const INTL = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 6 });

describe('plainNumber', () => {
  it('writes figures as en-GB does: grouped thousands, up to six decimals', () => {
    expect(plainNumber(1234.5)).toBe('1,234.5');
    expect(plainNumber(0.1 + 0.2)).toBe('0.3');
    expect(plainNumber(1_000_000)).toBe('1,000,000');
    expect(plainNumber(999.9999996)).toBe('1,000');
    expect(plainNumber(-2.5)).toBe('-2.5');
    expect(plainNumber(0)).toBe('0');
    expect(plainNumber(-0.0000004)).toBe('-0');
    expect(plainNumber(0.0000005)).toBe('0.000001');
    expect(plainNumber(0.5998135)).toBe('0.599814');
    expect(plainNumber(1e-7)).toBe('0');
    expect(plainNumber(1.5e21)).toBe('1,500,000,000,000,000,000,000');
  });

  it('agrees with Intl.NumberFormat for any finite double', () => {
    fc.assert(fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (v) => plainNumber(v) === INTL.format(v)), { numRuns: 20_000 });
  });

  it('agrees with Intl.NumberFormat on figures as the app shows them (steps, halves, display units)', () => {
    const figure = fc.tuple(fc.integer({ min: -2_000_000, max: 20_000_000 }), fc.constantFrom(1, 0.5, 0.1, 0.01, 0.05, 1e-3, 1e-6, 1e-7, 10)).map(([n, step]) => n * step);
    fc.assert(fc.property(figure, (v) => plainNumber(v) === INTL.format(v)), { numRuns: 20_000 });
  });

  it('agrees with Intl.NumberFormat at the far ends and for the infinities', () => {
    for (const v of [1e21, 1.2345e25, Number.MAX_VALUE, Number.MIN_VALUE, -5e-7, 5e-7, 4.5e-7, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) expect(plainNumber(v), String(v)).toBe(INTL.format(v));
  });
});
