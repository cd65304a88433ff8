import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual, isApproxEqual } from '../support/approx-equal.ts';
import {
  airChangeRate,
  co2RateOfChange,
  levelAfter,
  meanLevelOver,
  steadyLevel,
  timeToReach,
  type BalanceConditions,
} from '../../src/core/balance.ts';
import { fromLitresPerSecond, perHour } from '../../src/core/units.ts';

/** references.md §7.2: 7 × 8 × 2.7 m classroom, N·G = 0.0896 L/s, outdoor 420 ppm. */
function classroom(supply_Ls: number): BalanceConditions {
  return { volume_m3: 151.2, supply_m3s: fromLitresPerSecond(supply_Ls), outdoor_ppm: 420, source_m3s: fromLitresPerSecond(0.0896) };
}

describe('balance: steady level', () => {
  it('matches the classroom table of references.md §7.2', () => {
    // [D] from the mass balance (ASTM D6245 form); the same numbers follow from C_ss = C_out + N·G/Q by hand.
    for (const [q, ach, css] of [
      [50, 1.19, 2212],
      [100, 2.381, 1316],
      [150, 3.571, 1017],
      [240, 5.714, 793],
    ] as const) {
      approxEqual(perHour(airChangeRate(classroom(q))), ach, { abs: 5e-4 }, `λ at ${q} L/s`);
      approxEqual(steadyLevel(classroom(q)), css, { abs: 0.5 }, `C_ss at ${q} L/s`);
    }
  });

  it('is Infinity for a sealed room with people in it', () => {
    expect(steadyLevel({ ...classroom(100), supply_m3s: 0 })).toBe(Number.POSITIVE_INFINITY);
  });
});

describe('balance: exact solution', () => {
  it('gives the build-up values of references.md §7.2', () => {
    // [D]; paired with the odex check of the day profile (day-profile.test.ts).
    const c = classroom(100);
    approxEqual(levelAfter(c, 450, 15 * 60), 838.5, { abs: 0.05 });
    approxEqual(levelAfter(c, 450, 30 * 60), 1052.7, { abs: 0.05 });
    approxEqual(levelAfter(c, 450, 60 * 60), 1235.9, { abs: 0.05 });
    approxEqual(levelAfter(c, 450, 120 * 60), 1308.6, { abs: 0.05 });
  });

  it('gives the exact decay series of references.md §7.3', () => {
    // λ = 0.8 h⁻¹, C0 = 2000, C_out = 420; any volume. [D], checked by hand from 420 + 1580·e^(−0.8t).
    const c: BalanceConditions = { volume_m3: 50, supply_m3s: (0.8 * 50) / 3600, outdoor_ppm: 420, source_m3s: 0 };
    const expected: [number, number][] = [
      [15, 1713.59],
      [30, 1479.11],
      [45, 1287.12],
      [60, 1129.94],
      [90, 895.89],
      [120, 739.0],
    ];
    for (const [min, level] of expected) approxEqual(levelAfter(c, 2000, min * 60), level, { abs: 0.005 }, `${min} min`);
  });

  it('rises linearly with zero supply', () => {
    const c = { ...classroom(100), supply_m3s: 0 };
    // 1e6·G/V = 1e6 × 8.96e-5 / 151.2 = 0.5926 ppm/s.
    approxEqual(levelAfter(c, 450, 3600), 450 + (0.0896e-3 * 1e6 * 3600) / 151.2, { rel: 1e-12 });
    approxEqual(meanLevelOver(c, 450, 3600), 450 + (0.0896e-3 * 1e6 * 1800) / 151.2, { rel: 1e-12 });
    approxEqual(timeToReach(c, 450, 1000), (550 * 151.2) / (0.0896e-3 * 1e6), { rel: 1e-12 });
    expect(timeToReach(c, 450, 400)).toBe(Number.POSITIVE_INFINITY);
  });

  it('has a rate of change equal to the derivative of the solution', () => {
    const c = classroom(100);
    const h = 1e-3;
    const numeric = (levelAfter(c, 600, 100 + h) - levelAfter(c, 600, 100 - h)) / (2 * h);
    approxEqual(co2RateOfChange(c, levelAfter(c, 600, 100)), numeric, { rel: 1e-6 });
  });

  it('gives the closed-form mean equal to a fine numerical average', () => {
    const c = classroom(100);
    const n = 20000;
    let sum = 0;
    for (let i = 0; i < n; i++) sum += levelAfter(c, 450, ((i + 0.5) * 3600) / n);
    approxEqual(meanLevelOver(c, 450, 3600), sum / n, { abs: 1e-4 });
  });

  it('gives the time to reach a level, or never', () => {
    const c = classroom(100);
    const t = timeToReach(c, 450, 1000);
    approxEqual(levelAfter(c, 450, t), 1000, { abs: 1e-9 });
    expect(timeToReach(c, 450, 1316)).toBe(Number.POSITIVE_INFINITY); // the steady level is 1316.0…, just above
    expect(timeToReach(c, 450, 1400)).toBe(Number.POSITIVE_INFINITY);
    expect(timeToReach(c, 450, 450)).toBe(0);
    expect(timeToReach(c, 1500, 1400)).toBeGreaterThan(0);
  });
});

const conditions = fc.record({
  volume_m3: fc.double({ min: 5, max: 2000, noNaN: true }),
  supply_m3s: fc.double({ min: 1e-4, max: 2, noNaN: true }),
  outdoor_ppm: fc.double({ min: 380, max: 520, noNaN: true }),
  source_m3s: fc.double({ min: 0, max: 1e-3, noNaN: true }),
});

describe('balance: properties (fast-check)', () => {
  it('stays between the start and the steady level', () => {
    fc.assert(
      fc.property(conditions, fc.double({ min: 300, max: 5000, noNaN: true }), fc.double({ min: 0, max: 1e6, noNaN: true }), (c, c0, t) => {
        const css = steadyLevel(c);
        const level = levelAfter(c, c0, t);
        const lo = Math.min(c0, css);
        const hi = Math.max(c0, css);
        const slack = 1e-9 * Math.max(1, Math.abs(hi));
        return level >= lo - slack && level <= hi + slack;
      }),
    );
  });

  it('never gives a higher steady level for more supply', () => {
    fc.assert(
      fc.property(conditions, fc.double({ min: 1, max: 10, noNaN: true }), (c, factor) => {
        return steadyLevel({ ...c, supply_m3s: c.supply_m3s * factor }) <= steadyLevel(c);
      }),
    );
  });

  it('gives a steady level that does not depend on volume', () => {
    fc.assert(
      fc.property(conditions, fc.double({ min: 1, max: 3000, noNaN: true }), (c, v) => {
        return isApproxEqual(steadyLevel({ ...c, volume_m3: v }), steadyLevel(c), { rel: 1e-12 });
      }),
    );
  });

  it('never gives NaN for valid input, including a sealed room', () => {
    fc.assert(
      fc.property(
        conditions,
        fc.boolean(),
        fc.double({ min: 300, max: 5000, noNaN: true }),
        fc.double({ min: 0, max: 1e6, noNaN: true }),
        fc.double({ min: 300, max: 5000, noNaN: true }),
        (c, sealed, c0, t, target) => {
          const room = sealed ? { ...c, supply_m3s: 0 } : c;
          const values = [levelAfter(room, c0, t), meanLevelOver(room, c0, t), timeToReach(room, c0, target), co2RateOfChange(room, c0)];
          return values.every((v) => !Number.isNaN(v));
        },
      ),
    );
  });
});
