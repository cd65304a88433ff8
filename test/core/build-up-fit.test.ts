import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { createSeededRandom, drawMeter, exactInputs, readCurve } from '../support/synthetic-readings.ts';
import { fitBuildUpKnownOutput, fitBuildUpRateAndLevel } from '../../src/core/build-up-fit.ts';
import { levelAfter, type BalanceConditions } from '../../src/core/balance.ts';
import { meterErrorFromStatedAccuracy } from '../../src/core/meter-error.ts';
import { outdoorLevel } from '../../src/core/outdoor-level.ts';
import { fromLitresPerSecond } from '../../src/core/units.ts';

/** references.md §7.2 classroom: 151.2 m³, N·G = 0.0896 L/s (31 people), outdoor 420, from 450 ppm. */
const PER_PERSON = fromLitresPerSecond(0.0896) / 31;
const OCCUPANTS = { count: 31, countSd: 0, perPerson_m3s: PER_PERSON, perPersonRelSd: 0 };
function classroomReadings(supply_Ls: number, minutes: number, step = 5) {
  const c: BalanceConditions = { volume_m3: 151.2, supply_m3s: fromLitresPerSecond(supply_Ls), outdoor_ppm: 420, source_m3s: 31 * PER_PERSON };
  return Array.from({ length: minutes / step + 1 }, (_, i) => ({ time_s: i * step * 60, level_ppm: levelAfter(c, 450, i * step * 60) }));
}

describe('fitBuildUpKnownOutput', () => {
  it('recovers the §7.2 classroom supply from its exact build-up', () => {
    // Build-up values 838.5 / 1052.7 / 1235.9 ppm at 15/30/60 min [D] are checked in balance.test.ts.
    const r = fitBuildUpKnownOutput({ readings: classroomReadings(100, 60), uncertainty: exactInputs(151.2, 420, OCCUPANTS), conditions: 'windows shut' });
    approxEqual(r.supply_m3s.value!, 0.1, { rel: 1e-6 });
    expect(r.method).toBe('build-up-known-output');
    expect(r.conditions).toBe('windows shut');
    approxEqual(r.steadyLevel_ppm.value!, 1316, { abs: 0.5 });
    approxEqual(r.supplyPerPerson_m3s.value!, 0.1 / 31, { rel: 1e-6 });
  });

  it('needs occupants and enough readings', () => {
    const r = fitBuildUpKnownOutput({ readings: classroomReadings(100, 10), uncertainty: exactInputs(151.2, 420, OCCUPANTS), conditions: null });
    expect(r.kind).toBe('none');
    expect(r.warnings.map((w) => w.code)).toContain('too-few-readings');
  });

  it('recovers noise-free build-ups to a relative 1e-6 (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 8, noNaN: true }),
        fc.double({ min: 0.2, max: 3, noNaN: true }),
        fc.double({ min: 20, max: 600, noNaN: true }),
        fc.integer({ min: 2, max: 40 }),
        (ach, spanTau, volume, people) => {
          const lambda = ach / 3600;
          const q = lambda * volume;
          const occ = { count: people, countSd: 0, perPerson_m3s: 4e-6, perPersonRelSd: 0 };
          const c: BalanceConditions = { volume_m3: volume, supply_m3s: q, outdoor_ppm: 425, source_m3s: people * 4e-6 };
          // Only cases whose rise gives an excess of 50 ppm or more determine the supply.
          const span = spanTau / lambda;
          if (levelAfter(c, 430, span) - 425 < 50) return true;
          const readings = Array.from({ length: 12 }, (_, i) => ({ time_s: (i * span) / 11, level_ppm: levelAfter(c, 430, (i * span) / 11) }));
          const r = fitBuildUpKnownOutput({ readings, uncertainty: exactInputs(volume, 425, occ), conditions: null });
          return Math.abs(r.supply_m3s.value! / q - 1) < 1e-6;
        },
      ),
      { numRuns: 100 },
    );
  });
});

describe('fitBuildUpRateAndLevel', () => {
  it('recovers supply and steady level without the output, and the implied output per person', () => {
    const r = fitBuildUpRateAndLevel({ readings: classroomReadings(100, 120), uncertainty: exactInputs(151.2, 420, OCCUPANTS), conditions: null });
    approxEqual(r.supply_m3s.value!, 0.1, { rel: 1e-6 });
    approxEqual(r.details.fittedSteadyLevel_ppm!, 1316, { abs: 0.5 });
    approxEqual(r.details.impliedPerPerson_m3s!, PER_PERSON, { rel: 1e-6 });
    expect(r.warnings).toEqual([]);
  });

  it('warns when the rise implies a very different output from the assumed one', () => {
    const wrong = { ...OCCUPANTS, perPerson_m3s: PER_PERSON * 2, perPersonRelSd: 0.15 };
    const r = fitBuildUpRateAndLevel({ readings: classroomReadings(100, 120), uncertainty: exactInputs(151.2, 420, wrong), conditions: null });
    expect(r.warnings.map((w) => w.code)).toContain('output-disagrees');
  });
});

describe('build-up intervals over synthetic rooms', () => {
  it('contain the true supply in 93–97 % of 1000 build-ups with meter, outdoor, volume, count and output errors', () => {
    const model = meterErrorFromStatedAccuracy(50, 3, 10);
    const rng = createSeededRandom(77);
    let inside = 0;
    for (let k = 0; k < 1000; k++) {
      const volume = 120 + 100 * rng.uniform();
      const volumeSd = 0.05 * volume;
      const trueVolume = volume + volumeSd * rng.normal();
      const count = 25 + Math.floor(8 * rng.uniform());
      const trueCount = count + rng.normal();
      const perPerson = 3.1e-6;
      const truePerPerson = perPerson * (1 + 0.15 * rng.normal());
      const supply = ((1 + 4 * rng.uniform()) / 3600) * trueVolume;
      const outdoorTrue = 425 + 15 * rng.normal();
      const same = rng.uniform() < 0.5;
      const meter = drawMeter(model, rng);
      const start = outdoorTrue + 30 + 200 * rng.uniform();
      const c: BalanceConditions = { volume_m3: trueVolume, supply_m3s: supply, outdoor_ppm: outdoorTrue, source_m3s: trueCount * truePerPerson };
      const duration = Math.max(2400, Math.min(3 * 3600, (1.5 * trueVolume) / supply));
      const readings = readCurve((t) => levelAfter(c, start, t), meter, 180, duration);
      const outdoorMeter = same ? meter : drawMeter(model, rng);
      const outdoor = outdoorLevel([outdoorMeter.read(outdoorTrue)], { sameMeterAsRoom: same, meter: model });
      const r = fitBuildUpKnownOutput({
        readings,
        uncertainty: { volume_m3: volume, volumeSd_m3: volumeSd, outdoor, meter: model, occupants: { count, countSd: 1, perPerson_m3s: perPerson, perPersonRelSd: 0.15 } },
        conditions: null,
      });
      if (r.supply_m3s.low! <= supply && supply <= r.supply_m3s.high!) inside++;
    }
    console.log(`build-up coverage ${(inside / 10).toFixed(1)} %`);
    expect(inside / 1000).toBeGreaterThanOrEqual(0.93);
    expect(inside / 1000).toBeLessThanOrEqual(0.97);
  });
});
