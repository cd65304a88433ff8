import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import {
  singleOpeningStackFlow,
  singleSidedFlow,
  singleSidedWindFlow,
  stackVelocity,
  twoOpeningStackFlow,
} from '../../src/core/single-sided-ventilation.ts';
import { deGidsPhaffFlow } from '../../src/core/de-gids-phaff-ventilation.ts';
import { en16798WindowFlow } from '../../src/core/en-16798-7-window-flow.ts';
import { referenceWindSpeed } from '../../src/core/reference-wind-speed.ts';

// references.md §7.4 conditions: inside 21 °C, outside 5 °C, Δθ 16 K, θ̄ 13 °C (286.15 K), C_d 0.61, g 9.81.
const DT = 16;
const MEAN = 13;

describe('BS 5925 single-sided forms (src/core/single-sided-ventilation.ts)', () => {
  it('wind: A 0.5 m², U_r 4 m/s gives 0.050 m³/s', () => {
    // BS 5925:1991 / Warren & Parkins form (AixLib WarrenParkins.mo, references.md §3.2 [C]); references.md §7.4 [D].
    approxEqual(singleSidedWindFlow(0.5, 4), 0.05, { rel: 1e-12 });
  });

  it('stack, one opening: A 0.5 m², H 1.2 m gives 0.0825 m³/s', () => {
    // derived (our computation from BS 5925:1991, references.md §3.2): references.md §7.4 [D].
    approxEqual(singleOpeningStackFlow(0.5, 1.2, DT, MEAN), 0.0825, { abs: 5e-5 });
    approxEqual(stackVelocity(DT, 1.2, MEAN), 0.8113, { abs: 5e-5 });
  });

  it('stack, two openings: 0.2 + 0.2 m², H_1 1.5 m gives 0.1107 m³/s', () => {
    // derived (our computation from BS 5925:1991, references.md §3.2): references.md §7.4 [D].
    approxEqual(twoOpeningStackFlow(0.2, 0.2, 1.5, DT, MEAN), 0.1107, { abs: 5e-5 });
    // The ε-term is symmetric: swapping the openings changes nothing.
    approxEqual(twoOpeningStackFlow(0.1, 0.3, 1.5, DT, MEAN), twoOpeningStackFlow(0.3, 0.1, 1.5, DT, MEAN), { rel: 1e-12 });
    expect(twoOpeningStackFlow(0.2, 0, 1.5, DT, MEAN)).toBe(0);
  });

  it('combined: the larger of wind and stack governs (Warren–Parkins, AixLib)', () => {
    const one = singleSidedFlow([{ area_m2: 0.5, openingHeight_m: 1.2, centreHeight_m: 1.5 }], 4, DT, MEAN);
    expect(one.governing).toBe('stack');
    approxEqual(one.flow, 0.0825, { abs: 5e-5 });
    const windy = singleSidedFlow([{ area_m2: 0.5, openingHeight_m: 1.2, centreHeight_m: 1.5 }], 10, DT, MEAN);
    expect(windy.governing).toBe('wind');
    approxEqual(windy.flow, 0.125, { rel: 1e-12 });
  });

  it('two openings at different heights use the two-opening form when it gives more', () => {
    const pair = singleSidedFlow(
      [
        { area_m2: 0.2, openingHeight_m: 0.3, centreHeight_m: 0.5 },
        { area_m2: 0.2, openingHeight_m: 0.3, centreHeight_m: 2.0 },
      ],
      0,
      DT,
      MEAN,
    );
    expect(pair.stackForm).toBe('two-opening');
    approxEqual(pair.flow, 0.1107, { abs: 5e-5 });
  });

  it('agrees with de Gids & Phaff and EN 16798-7 within a factor of two in the same conditions', () => {
    // Cross-check between published models (references.md §3.3): a 1 m² window 1.2 m high on a 6 m urban building.
    const cases = [
      { u10: 3, dt: 16, mean: 13, out: 5 },
      { u10: 1, dt: 5, mean: 17.5, out: 15 },
      { u10: 6, dt: 20, mean: 10, out: 0 },
    ];
    for (const c of cases) {
      const bs = singleSidedFlow(
        [{ area_m2: 1, openingHeight_m: 1.2, centreHeight_m: 1.5 }],
        referenceWindSpeed(c.u10, 'urban', 6),
        c.dt,
        c.mean,
      ).flow;
      for (const other of [deGidsPhaffFlow(1, c.u10, 1.2, c.dt), en16798WindowFlow(1, c.u10, 1.2, c.dt, c.out)]) {
        expect(bs / other, `U_10 ${c.u10}, Δθ ${c.dt}`).toBeGreaterThan(0.5);
        expect(bs / other, `U_10 ${c.u10}, Δθ ${c.dt}`).toBeLessThan(2);
      }
    }
  });

  it('property: enlarging an opening never gives less air, and the result is never NaN', () => {
    const opening = fc.record({
      area_m2: fc.double({ min: 0, max: 2, noNaN: true }),
      openingHeight_m: fc.double({ min: 0, max: 2, noNaN: true }),
      centreHeight_m: fc.double({ min: 0, max: 3, noNaN: true }),
    });
    fc.assert(
      fc.property(
        fc.array(opening, { minLength: 1, maxLength: 5 }),
        fc.nat({ max: 4 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 15, noNaN: true }),
        fc.double({ min: -30, max: 30, noNaN: true }),
        (openings, pick, extra, ur, dt) => {
          const i = pick % openings.length;
          const bigger = openings.map((o, j) => (j === i ? { ...o, area_m2: o.area_m2 + extra } : o));
          const before = singleSidedFlow(openings, ur, dt, 15).flow;
          const after = singleSidedFlow(bigger, ur, dt, 15).flow;
          expect(Number.isNaN(before)).toBe(false);
          expect(after).toBeGreaterThanOrEqual(before * (1 - 1e-12));
        },
      ),
    );
  });
});
