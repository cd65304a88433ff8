import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { backgroundVentFlow, labelledVentFlow } from '../../src/core/background-vent-flow.ts';
import { litresPerSecond } from '../../src/core/units.ts';
import { exampleVent } from '../support/airflow-examples.ts';

describe('backgroundVentFlow (src/core/background-vent-flow.ts)', () => {
  it('8000 mm² equivalent area at 1 Pa gives 6.30 L/s, ±50 %', () => {
    // derived (our computation from the orifice equation, BS 5925:1991 cl. 9 eq. (2)): references.md §3.1 table [D];
    // practice.md §5 quotes ≈6 L/s (common practice (no published source)).
    const item = backgroundVentFlow(exampleVent(), 1);
    approxEqual(litresPerSecond(item.flow.central), 6.3, { abs: 0.005 });
    approxEqual(litresPerSecond(item.flow.low), 3.15, { abs: 0.005 });
    approxEqual(litresPerSecond(item.flow.high), 9.45, { abs: 0.005 });
    expect(item.countsAsOutdoorAir).toBe(true);
    expect(item.mechanism).toBe('background-vent');
    expect(item.method).toContain('8000 mm²');
    expect(item.warnings).toEqual([]);
  });

  it('a free-area label passes less than the same equivalent area and is flagged', () => {
    const free = backgroundVentFlow(exampleVent({ areaBasis: 'free' }), 1);
    expect(free.flow.central).toBeLessThan(backgroundVentFlow(exampleVent(), 1).flow.central);
    expect(free.warnings.map((w) => w.code)).toContain('free-area-label');
  });

  it('closed and blocked vents pass nothing and say why', () => {
    expect(backgroundVentFlow(exampleVent({ condition: 'closed' }), 4).flow.high).toBe(0);
    expect(backgroundVentFlow(exampleVent({ condition: 'closed' }), 4).warnings[0]?.code).toBe('vent-closed');
    expect(backgroundVentFlow(exampleVent({ condition: 'blocked' }), 4).warnings[0]?.code).toBe('vent-blocked');
  });

  it('property: more area never gives less air; low ≤ central ≤ high; never NaN', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        fc.double({ min: 0, max: 50, noNaN: true }),
        fc.constantFrom('equivalent' as const, 'free' as const, 'unknown' as const),
        (a, extra, dp, basis) => {
          const small = labelledVentFlow(a, basis, dp).flow;
          const big = labelledVentFlow(a + extra, basis, dp).flow;
          for (const end of ['low', 'central', 'high'] as const) {
            expect(Number.isNaN(small[end])).toBe(false);
            expect(big[end]).toBeGreaterThanOrEqual(small[end]);
          }
          expect(small.low).toBeLessThanOrEqual(small.central);
          expect(small.central).toBeLessThanOrEqual(small.high);
        },
      ),
    );
  });
});
