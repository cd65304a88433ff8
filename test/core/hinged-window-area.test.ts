import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { hingedAngleFromStroke, hingedGeometry, hingedWindowArea } from '../../src/core/hinged-window-area.ts';

describe('hinged window geometry (src/core/hinged-window-area.ts)', () => {
  it('reproduces the worked side-hung sash: a 1.0 m, b 0.6 m, 30°', () => {
    // derived (our computation from the geometric method of AixLib OpeningAreaHinged, references.md §3.4 [C]):
    // references.md §7.4 [D] gives s 0.3106, A_geo 0.4906, A_clr 0.6, A_eq 0.3798 (printed to 4 decimals).
    const g = hingedGeometry(1.0, 0.6, 30);
    approxEqual(g.freeEdgeOpening_m, 0.3106, { abs: 5e-5 });
    approxEqual(g.geometricArea_m2, 0.4906, { abs: 5e-5 });
    approxEqual(g.clearArea_m2, 0.6, { abs: 1e-12 });
    approxEqual(g.seriesArea_m2, 0.3798, { abs: 5e-5 });
  });

  it('effective area is A_eq(α)/A_eq(90°)·A_clr, equal to the clear area at 90°', () => {
    // derived (our computation from the same method): 0.37979/0.53741·0.6 = 0.42402 m².
    approxEqual(hingedWindowArea(1.0, 0.6, 30), 0.42402, { abs: 5e-5 });
    approxEqual(hingedWindowArea(1.0, 0.6, 90), 0.6, { rel: 1e-12 });
    expect(hingedWindowArea(1.0, 0.6, 0)).toBe(0);
    expect(hingedWindowArea(1.0, 0.6, 120)).toBe(hingedWindowArea(1.0, 0.6, 90));
  });

  it('recovers the angle from the free-edge stroke (s = 2 b sin(α/2))', () => {
    approxEqual(hingedAngleFromStroke(0.6, 0.31058285), 30, { abs: 1e-6 });
    expect(hingedAngleFromStroke(0.6, 0)).toBe(0);
    approxEqual(hingedAngleFromStroke(0.6, 5), 90, { abs: 1e-9 });
  });

  it('property: a wider angle never gives less area, and never more than the clear area', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 3, noNaN: true }),
        fc.double({ min: 0.1, max: 3, noNaN: true }),
        fc.double({ min: 0, max: 90, noNaN: true }),
        fc.double({ min: 0, max: 90, noNaN: true }),
        (a, b, x, y) => {
          const [lo, hi] = x < y ? [x, y] : [y, x];
          expect(hingedWindowArea(a, b, hi)).toBeGreaterThanOrEqual(hingedWindowArea(a, b, lo) - 1e-15);
          expect(hingedWindowArea(a, b, hi)).toBeLessThanOrEqual(a * b * (1 + 1e-12));
        },
      ),
    );
  });
});
