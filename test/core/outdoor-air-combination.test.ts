import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { COMBINATION_RULE, combineFlows, combineRanges } from '../../src/core/outdoor-air-combination.ts';

describe('outdoor-air combination (src/core/outdoor-air-combination.ts)', () => {
  it('balanced flow adds; unbalanced and natural combine in quadrature', () => {
    // ASHRAE Handbook of Fundamentals superposition rule, from memory.
    approxEqual(combineFlows(0, 0.01, 0.01), Math.SQRT2 * 0.01, { rel: 1e-12 });
    approxEqual(combineFlows(0.02, 0.02, 0.01), 0.03, { rel: 1e-12 });
    approxEqual(combineFlows(0.03, 0.01, 0), 0.03, { rel: 1e-12 });
    approxEqual(combineFlows(0, 0, 0.01), 0.01, { rel: 1e-12 });
    expect(COMBINATION_RULE).toMatch(/from memory/);
  });

  it('property: never falls when an input rises, so range ends stay ordered', () => {
    const q = fc.double({ min: 0, max: 1, noNaN: true });
    fc.assert(
      fc.property(q, q, q, q, (s, e, n, extra) => {
        const base = combineFlows(s, e, n);
        expect(combineFlows(s + extra, e, n)).toBeGreaterThanOrEqual(base * (1 - 1e-12));
        expect(combineFlows(s, e + extra, n)).toBeGreaterThanOrEqual(base * (1 - 1e-12));
        expect(combineFlows(s, e, n + extra)).toBeGreaterThanOrEqual(base * (1 - 1e-12));
        const r = combineRanges({ low: s, central: s + extra, high: s + 2 * extra }, { low: e, central: e, high: e }, { low: n, central: n, high: n + extra });
        expect(r.low).toBeLessThanOrEqual(r.central * (1 + 1e-12));
        expect(r.central).toBeLessThanOrEqual(r.high * (1 + 1e-12));
      }),
    );
  });
});
