import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { orificeFlow } from '../../src/core/orifice-flow.ts';
import { fromSquareMillimetres, litresPerSecond } from '../../src/core/units.ts';

describe('orificeFlow (src/core/orifice-flow.ts)', () => {
  it('reproduces the equivalent-area table at 1 Pa and 4 Pa', () => {
    // derived (our computation from BS 5925:1991 cl. 9 eq. (2), C_d 0.61, ρ 1.2): references.md §3.1 table [D],
    // printed to 0.01 L/s.
    const table: [number, number, number][] = [
      [2500, 1.97, 3.94],
      [4000, 3.15, 6.3],
      [5000, 3.94, 7.88],
      [8000, 6.3, 12.6],
    ];
    for (const [mm2, at1, at4] of table) {
      approxEqual(litresPerSecond(orificeFlow(fromSquareMillimetres(mm2), 1)), at1, { abs: 0.005 }, `${mm2} mm² at 1 Pa`);
      approxEqual(litresPerSecond(orificeFlow(fromSquareMillimetres(mm2), 4)), at4, { abs: 0.005 }, `${mm2} mm² at 4 Pa`);
    }
  });

  it('an 8000 mm² trickle vent passes about 6 L/s at 1 Pa', () => {
    // practice.md §5: "an 8000 mm² trickle vent passes ≈6 L/s at 1 Pa" (common practice (no published source)).
    approxEqual(litresPerSecond(orificeFlow(0.008, 1)), 6, { rel: 0.1 });
    approxEqual(litresPerSecond(orificeFlow(0.008, 1)), 6.3, { abs: 0.005 });
  });

  it('is the Bernoulli velocity sqrt(2Δp/ρ) times C_d·A (definition of the orifice equation, BS 5925 cl. 9)', () => {
    // 12 Pa in air of 1.2 kg/m³ gives v = sqrt(20) m/s exactly.
    approxEqual(orificeFlow(0.1, 12, 1, 1.2), 0.1 * Math.sqrt(20), { rel: 1e-12 });
  });

  it('gives a magnitude for either sign of Δp and nothing through no area', () => {
    expect(orificeFlow(0.01, -4)).toBe(orificeFlow(0.01, 4));
    expect(orificeFlow(0, 4)).toBe(0);
    expect(orificeFlow(-1, 4)).toBe(0);
  });

  it('property: flow never falls as area or pressure rises, and is never NaN', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        (a, extra, dp) => {
          const q = orificeFlow(a, dp);
          expect(Number.isNaN(q)).toBe(false);
          expect(orificeFlow(a + extra, dp)).toBeGreaterThanOrEqual(q);
          expect(orificeFlow(a, dp + extra)).toBeGreaterThanOrEqual(q);
        },
      ),
    );
  });
});
