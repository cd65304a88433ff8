import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { exactInputs } from '../support/synthetic-readings.ts';
import { estimateNearSteady } from '../../src/core/near-steady-level.ts';
import { fromLitresPerSecond } from '../../src/core/units.ts';

/** references.md §7.2 classroom: steady level 1316 ppm at 100 L/s (N·G = 0.0896 L/s, outdoor 420). */
const OCC = { count: 31, countSd: 0, perPerson_m3s: fromLitresPerSecond(0.0896) / 31, perPersonRelSd: 0 };
const base = { uncertainty: exactInputs(151.2, 420, OCC), conditions: null, seed: 1 };

describe('estimateNearSteady (practice.md §1.8)', () => {
  it('gives an estimate after enough time constants at constant occupancy', () => {
    const r = estimateNearSteady({ ...base, reading: { time_s: 3 * 3600, level_ppm: 1316 }, occupiedSince_s: 0, history: 'rising-at-constant-occupancy' });
    expect(r.kind).toBe('estimate');
    approxEqual(r.supply_m3s.value!, 0.1, { rel: 1e-3 });
  });

  it('gives only an upper bound when the room may still have been rising', () => {
    const r = estimateNearSteady({ ...base, reading: { time_s: 1200, level_ppm: 1000 }, occupiedSince_s: 0, history: 'rising-at-constant-occupancy' });
    expect(r.kind).toBe('upper-bound');
    expect(r.warnings.map((w) => w.code)).toContain('not-steady');
    // Steady-state form: 1e6·N·G/(C − C_out) = 89.6/580 m³/s… = 0.1545 m³/s.
    approxEqual(r.supply_m3s.value!, 0.0896e-3 * 1e6 / 580, { rel: 1e-9 });
    expect(r.supply_m3s.low!).toBeLessThan(r.supply_m3s.value!);
  });

  it('gives an open range when the history is unknown', () => {
    const r = estimateNearSteady({ ...base, reading: { time_s: 1200, level_ppm: 1000 }, occupiedSince_s: 0, history: 'unknown' });
    expect(r.kind).toBe('range');
    expect(r.supply_m3s.high).toBeNull();
    expect(r.supply_m3s.low!).toBeGreaterThan(0);
    expect(r.warnings.map((w) => w.code)).toContain('history-unknown');
  });
});

describe('estimateNearSteady: a reading no start at outdoor could reach', () => {
  it('gives a lower limit of zero, not a gap', () => {
    // 1316 ppm after 20 min: a sealed room from 420 ppm reaches only 420 + 0.5926 ppm/s × 1200 s = 1131 ppm.
    const r = estimateNearSteady({ ...base, reading: { time_s: 1200, level_ppm: 1316 }, occupiedSince_s: 0, history: 'rising-at-constant-occupancy' });
    expect(r.kind).toBe('upper-bound');
    expect(r.supply_m3s.low).toBe(0);
    approxEqual(r.supply_m3s.value!, 0.1, { rel: 1e-6 });
  });
});
