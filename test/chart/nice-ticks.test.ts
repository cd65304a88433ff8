import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { niceTicks, niceStep } from '../../src/chart/nice-ticks.ts';

describe('niceTicks', () => {
  it('covers a CO2 range with round 1-2-5 steps (common practice (no published source))', () => {
    expect(niceTicks(412, 1316, 5)).toEqual({ step: 200, values: [400, 600, 800, 1000, 1200, 1400], domain: [400, 1400] });
    expect(niceStep(0.9, 4)).toBe(0.2);
    expect(niceStep(2.4, 4)).toBe(0.5);
  });

  it('handles a flat series and decimal steps without binary noise', () => {
    const flat = niceTicks(420, 420, 4);
    expect(flat.domain[0]).toBeLessThan(420);
    expect(flat.domain[1]).toBeGreaterThan(420);
    expect(niceTicks(0.1, 0.7, 6).values).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7]);
  });

  it('always contains the data range and rises strictly', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e5, max: 1e5, noNaN: true }).filter((x) => x === 0 || Math.abs(x) > 1e-9), fc.double({ min: 1e-3, max: 1e5, noNaN: true }), fc.integer({ min: 2, max: 12 }), (lo, span, target) => {
        const { values, domain } = niceTicks(lo, lo + span, target);
        expect(domain[0]).toBeLessThanOrEqual(lo + 1e-9 * Math.max(1, Math.abs(lo)));
        expect(domain[1]).toBeGreaterThanOrEqual(lo + span - 1e-9 * Math.abs(lo + span));
        for (let i = 1; i < values.length; i += 1) expect(values[i]!).toBeGreaterThan(values[i - 1]!);
      }),
    );
  });
});
