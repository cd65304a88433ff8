import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { hungWindowArea, hungWindowCoefficient } from '../../src/core/hung-window-area.ts';

describe('top- and bottom-hung window coefficient (src/core/hung-window-area.ts)', () => {
  it('reproduces the CEN/TR 16798-8 coefficient table', () => {
    // CEN/TR 16798-8 (DIN SPEC 32739-8:2018) via AixLib coeffOpeningAreaDIN16798 (references.md §3.4 [C]),
    // table printed to 3 decimals.
    const table: [number, number][] = [
      [5, 0.09],
      [10, 0.174],
      [15, 0.253],
      [20, 0.327],
      [30, 0.458],
      [45, 0.62],
      [60, 0.744],
      [90, 0.9],
    ];
    for (const [angle, cw] of table) approxEqual(hungWindowCoefficient(angle), cw, { abs: 6e-4 }, `${angle}°`);
  });

  it('gives 0.275 m² for a 0.6 m² sash at 30°', () => {
    // references.md §7.4 [D], derived (our computation from CEN/TR 16798-8's coefficient): 0.4579·0.6 = 0.2747.
    approxEqual(hungWindowArea(0.6, 30), 0.275, { abs: 5e-4 });
    expect(hungWindowArea(0.6, 0)).toBe(0);
    expect(hungWindowArea(0.6, 135)).toBe(hungWindowArea(0.6, 90));
  });

  it('property: the coefficient never falls as the sash opens (0–90°)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 90, noNaN: true }), fc.double({ min: 0, max: 90, noNaN: true }), (x, y) => {
        const [lo, hi] = x < y ? [x, y] : [y, x];
        // Within rounding: angles a hair apart may round the cubic either way (the polynomial's
        // derivative is positive everywhere on 0–90°, its discriminant being negative).
        expect(hungWindowCoefficient(hi)).toBeGreaterThanOrEqual(hungWindowCoefficient(lo) - 1e-12);
      }),
    );
  });
});
