import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { BS5925_TERRAIN_FACTORS, referenceWindSpeed } from '../../src/core/reference-wind-speed.ts';

describe('referenceWindSpeed (src/core/reference-wind-speed.ts)', () => {
  it('carries the BS 5925 terrain factors', () => {
    // BS 5925:1991 terrain factors, from memory (references.md §3.2 [M]).
    expect(BS5925_TERRAIN_FACTORS).toEqual({
      'open-flat-country': { K: 0.68, a: 0.17 },
      'country-scattered-windbreaks': { K: 0.52, a: 0.2 },
      urban: { K: 0.35, a: 0.25 },
      city: { K: 0.21, a: 0.33 },
    });
  });

  it('applies U_r = U_10·K·H^a', () => {
    // derived (our computation from the BS 5925 power law, from memory): 4·0.35·6^0.25 = 2.1911 m/s.
    approxEqual(referenceWindSpeed(4, 'urban', 6), 2.1911, { abs: 1e-4 });
    // At H = 1 m the height term is 1: U_r = K·U_10.
    approxEqual(referenceWindSpeed(5, 'city', 1), 1.05, { rel: 1e-12 });
  });

  it('slows with rougher terrain and quickens with height', () => {
    const order = (['open-flat-country', 'country-scattered-windbreaks', 'urban', 'city'] as const).map((t) =>
      referenceWindSpeed(5, t, 10),
    );
    for (let i = 1; i < order.length; i++) expect(order[i]!).toBeLessThan(order[i - 1]!);
    expect(referenceWindSpeed(5, 'urban', 20)).toBeGreaterThan(referenceWindSpeed(5, 'urban', 5));
    expect(referenceWindSpeed(-3, 'urban', 5)).toBe(0);
  });
});
