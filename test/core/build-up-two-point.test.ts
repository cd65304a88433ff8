import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { exactInputs } from '../support/synthetic-readings.ts';
import { estimateBuildUpTwoPoint, estimateSpotReading } from '../../src/core/build-up-two-point.ts';
import { meterErrorFromStatedAccuracy } from '../../src/core/meter-error.ts';
import { fromLitresPerSecond } from '../../src/core/units.ts';

/** references.md §7.2 classroom: 151.2 m³, N·G = 0.0896 L/s for 31 people, outdoor 420. */
const OCC = { count: 31, countSd: 0, perPerson_m3s: fromLitresPerSecond(0.0896) / 31, perPersonRelSd: 0 };

describe('estimateBuildUpTwoPoint', () => {
  it('inverts the §7.2 build-up: 450 → 1052.7 ppm in 30 min at 100 L/s', () => {
    // 1052.7 ppm after 30 min [D], checked against the exact solution in balance.test.ts.
    const r = estimateBuildUpTwoPoint({
      start: { time_s: 0, level_ppm: 450 },
      end: { time_s: 1800, level_ppm: 1052.67 },
      uncertainty: exactInputs(151.2, 420, OCC),
      conditions: null,
      seed: 1,
    });
    approxEqual(r.supply_m3s.value!, 0.1, { rel: 1e-4 });
    expect(r.kind).toBe('estimate');
  });

  it('gives a range that widens with meter error and contains the truth', () => {
    const u = { ...exactInputs(151.2, 420, { ...OCC, perPersonRelSd: 0.15 }), meter: meterErrorFromStatedAccuracy(50, 3, 10) };
    const r = estimateBuildUpTwoPoint({ start: { time_s: 0, level_ppm: 450 }, end: { time_s: 1800, level_ppm: 1052.67 }, uncertainty: u, conditions: null, seed: 4 });
    expect(r.supply_m3s.low!).toBeLessThan(0.1);
    expect(r.supply_m3s.high!).toBeGreaterThan(0.1);
  });

  it('refuses a rise faster than a sealed room could give', () => {
    const r = estimateBuildUpTwoPoint({
      start: { time_s: 0, level_ppm: 450 },
      end: { time_s: 600, level_ppm: 1500 },
      uncertainty: exactInputs(151.2, 420, OCC),
      conditions: null,
      seed: 1,
    });
    expect(r.kind).toBe('none');
    expect(r.warnings.map((w) => w.code)).toContain('reading-above-sealed-room');
  });
});

describe('estimateSpotReading', () => {
  it('inverts the same build-up from a start level known to ±0 and widens with its uncertainty', () => {
    const base = { reading: { time_s: 1800, level_ppm: 1052.67 }, startTime_s: 0, startLevel_ppm: 450, uncertainty: exactInputs(151.2, 420, OCC), conditions: null, seed: 2 };
    const exact = estimateSpotReading({ ...base, startLevelSd_ppm: 0 });
    approxEqual(exact.supply_m3s.value!, 0.1, { rel: 1e-4 });
    const loose = estimateSpotReading({ ...base, startLevelSd_ppm: 40 });
    expect(loose.supply_m3s.high! - loose.supply_m3s.low!).toBeGreaterThan(exact.supply_m3s.high! - exact.supply_m3s.low!);
    expect(loose.method).toBe('spot-reading');
  });
});
