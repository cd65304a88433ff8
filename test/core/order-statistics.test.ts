import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { percentilesInPlace } from '../../src/core/order-statistics.ts';

/** Reference: percentile by full sort and linear interpolation (Hyndman & Fan 1996, definition 7). */
function bySorting(values: number[], p: number): number {
  const s = [...values].sort((a, b) => a - b);
  const pos = p * (s.length - 1);
  const i = Math.floor(pos);
  return i + 1 < s.length ? s[i]! * (1 - (pos - i)) + s[i + 1]! * (pos - i) : s[i]!;
}

describe('percentilesInPlace', () => {
  it('gives the median and quartile of a small sample', () => {
    expect(percentilesInPlace(Float64Array.of(5, 1, 4, 2, 3), 5, [0.5, 0.25])).toEqual([3, 2]);
  });

  it('matches percentiles by sorting for any sample, including ties and sorted input', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 300 }),
        fc.constantFrom(0, 0.025, 0.5, 0.975, 1),
        (values, p) => {
          const got = percentilesInPlace(Float64Array.from(values), values.length, [p])[0]!;
          expect(got).toBeCloseTo(bySorting(values, p), 6);
        },
      ),
    );
    const sorted = Float64Array.from({ length: 1000 }, (_, i) => i);
    expect(percentilesInPlace(sorted, 1000, [0.025, 0.975])).toEqual([24.975, 974.025]);
  });

  it('only looks at the first count entries', () => {
    expect(percentilesInPlace(Float64Array.of(3, 1, 2, 100, 100), 3, [1])).toEqual([3]);
  });
});
