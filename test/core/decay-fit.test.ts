import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { createSeededRandom, drawMeter, exactInputs, readCurve } from '../support/synthetic-readings.ts';
import { fitDecay } from '../../src/core/decay-fit.ts';
import { meterErrorFromStatedAccuracy } from '../../src/core/meter-error.ts';
import { outdoorLevel } from '../../src/core/outdoor-level.ts';
import { perHour } from '../../src/core/units.ts';
import type { Reading } from '../../src/core/supply-estimate.ts';

const NOISE_7_3 = [12, -8, 5, -15, 9, 0, -6, 11, -3, 7, -10, 4, -2];
const CONDITIONS = { windows: 'closed', door: 'closed', fans: 'off' } as const;

/** A meter of stated accuracy ±(50 ppm + 3 %) with 10 ppm noise: practice.md §1.1 (common practice (no published source)). */
const METER = meterErrorFromStatedAccuracy(50, 3, 10);

describe('fitDecay: published and reference checks', () => {
  it('reproduces the regression check of references.md §7.3 and passes the conditions through', () => {
    // [D], the OLS figures matched against jstat in straight-line-fit.test.ts.
    const readings = NOISE_7_3.map((e, i) => ({ time_s: i * 300, level_ppm: 420 + 1580 * Math.exp((-0.8 * i * 300) / 3600) + e }));
    const r = fitDecay({ readings, uncertainty: exactInputs(50, 420), conditions: CONDITIONS, seed: 1 });
    expect(r.method).toBe('decay-log-linear');
    expect(r.conditions).toBe(CONDITIONS);
    approxEqual(perHour(r.airChangeRate_perSecond.value!), 0.8016, { abs: 5e-5 });
    // With a perfect meter the interval is the regression's: ±t(0.975, 11)·SE = ±0.0157 h⁻¹.
    approxEqual(perHour(r.airChangeRate_perSecond.high! - r.airChangeRate_perSecond.low!) / 2, 0.0157, { abs: 0.0012 });
    expect(r.warnings).toEqual([]);
  });

  it('gives no estimate and a warning for too few readings', () => {
    const r = fitDecay({ readings: [{ time_s: 0, level_ppm: 1500 }], uncertainty: exactInputs(50, 420), conditions: null, seed: 1 });
    expect(r.kind).toBe('none');
    expect(r.supply_m3s.value).toBeNull();
    expect(r.warnings.map((w) => w.code)).toContain('too-few-readings');
  });

  it('uses the two-point form for two readings (references.md §7.3: λ = ln 2.25 = 0.8109 h⁻¹)', () => {
    const r = fitDecay({
      readings: [
        { time_s: 0, level_ppm: 1500 },
        { time_s: 3600, level_ppm: 900 },
      ],
      uncertainty: exactInputs(50, 420),
      conditions: null,
      seed: 1,
    });
    expect(r.method).toBe('decay-two-point');
    approxEqual(perHour(r.airChangeRate_perSecond.value!), Math.log(2.25), { rel: 1e-12 });
  });

  it('warns about a small excess and a short decay', () => {
    const readings = [0, 120, 240, 360, 480].map((t) => ({ time_s: t, level_ppm: 430 + 150 * Math.exp(-1e-4 * t) }));
    const codes = fitDecay({ readings, uncertainty: exactInputs(50, 430), conditions: null, seed: 1 }).warnings.map((w) => w.code);
    expect(codes).toContain('small-excess');
    expect(codes).toContain('short-decay');
  });
});

/** A synthetic survey: a decay with known supply read by a drawn meter, outdoor read on the same or another meter. */
function syntheticDecay(rng: ReturnType<typeof createSeededRandom>) {
  const volume = 60 + 200 * rng.uniform();
  const volumeSd = 0.05 * volume;
  const trueVolume = volume + volumeSd * rng.normal();
  const lambda = (0.5 + 4 * rng.uniform()) / 3600;
  const outdoorTrue = 425 + 15 * rng.normal();
  const meter = drawMeter(METER, rng);
  const start = 1200 + 1500 * rng.uniform();
  const duration = Math.min(5400, (0.5 + 1.2 * rng.uniform()) / lambda);
  const readings = readCurve((t) => outdoorTrue + (start - outdoorTrue) * Math.exp(-lambda * t), meter, 120, duration);
  const same = rng.uniform() < 0.5;
  const outdoorMeter = same ? meter : drawMeter(METER, rng);
  const outdoor = outdoorLevel([outdoorMeter.read(outdoorTrue), outdoorMeter.read(outdoorTrue)], { sameMeterAsRoom: same, meter: METER });
  return { readings, truth: lambda * trueVolume, uncertainty: { volume_m3: volume, volumeSd_m3: volumeSd, outdoor, meter: METER } };
}

describe('fitDecay: honest intervals and warnings over synthetic decays', () => {
  it('contains the true supply in 93–97 % of 1000 decays with meter offset, gain and noise', () => {
    const rng = createSeededRandom(2024);
    let inside = 0;
    let curved = 0;
    for (let k = 0; k < 1000; k++) {
      const s = syntheticDecay(rng);
      const r = fitDecay({ readings: s.readings, uncertainty: s.uncertainty, conditions: null, seed: k });
      if (r.supply_m3s.low! <= s.truth && s.truth <= r.supply_m3s.high!) inside++;
      if (r.warnings.some((w) => w.code === 'curvature')) curved++;
    }
    console.log(`decay coverage ${(inside / 10).toFixed(1)} %, curvature false alarms ${(curved / 10).toFixed(1)} %`);
    expect(inside / 1000).toBeGreaterThanOrEqual(0.93);
    expect(inside / 1000).toBeLessThanOrEqual(0.97);
    // Clean decays with meter noise raise the curvature warning in under 5 % of draws.
    expect(curved / 1000).toBeLessThan(0.05);
  });

  it('raises the curvature warning when the rate doubles half-way (a window opened)', () => {
    const rng = createSeededRandom(7);
    const meter = drawMeter(METER, rng);
    const lambda = 1.5 / 3600;
    const curve = (t: number): number => {
      const half = 1800;
      const e = t <= half ? Math.exp(-lambda * t) : Math.exp(-lambda * half - 2 * lambda * (t - half));
      return 430 + 1800 * e;
    };
    const readings = readCurve(curve, meter, 120, 3600);
    const outdoor = outdoorLevel([meter.read(430)], { sameMeterAsRoom: true, meter: METER });
    const r = fitDecay({ readings, uncertainty: { volume_m3: 150, volumeSd_m3: 5, outdoor, meter: METER }, conditions: null, seed: 3 });
    expect(r.warnings.map((w) => w.code)).toContain('curvature');
  });

  it('recovers a decay towards a background 150 ppm above outdoor and flags it', () => {
    // A room off a busy corridor: true λ 2 h⁻¹ towards 575 ppm, outdoor 425, logged 2.5 h.
    const rng = createSeededRandom(11);
    const meter = drawMeter({ ...METER, offsetSd_ppm: 0, gainSd: 0 }, rng);
    const lambda = 2 / 3600;
    const readings = readCurve((t) => 575 + 1600 * Math.exp(-lambda * t), meter, 120, 9000);
    const outdoor = outdoorLevel([meter.read(425), meter.read(425)], { sameMeterAsRoom: true, meter: METER });
    const r = fitDecay({ readings, uncertainty: { volume_m3: 100, volumeSd_m3: 0, outdoor, meter: METER }, conditions: null, seed: 5 });
    expect(r.method).toBe('decay-with-background');
    expect(r.warnings.map((w) => w.code)).toContain('background-above-outdoor');
    approxEqual(r.details.background_ppm!, 575, { abs: 15 });
    expect(r.airChangeRate_perSecond.low!).toBeLessThanOrEqual(lambda);
    expect(r.airChangeRate_perSecond.high!).toBeGreaterThanOrEqual(lambda);
    approxEqual(r.airChangeRate_perSecond.value!, lambda, { rel: 0.05 });
  });
});

describe('fitDecay: properties (fast-check)', () => {
  const decays = fc.record({
    ach: fc.double({ min: 0.1, max: 20, noNaN: true }),
    outdoor: fc.double({ min: 390, max: 480, noNaN: true }),
    excess: fc.double({ min: 50, max: 4000, noNaN: true }),
    spanInTimeConstants: fc.double({ min: 0.2, max: 1.9, noNaN: true }),
    points: fc.integer({ min: 3, max: 40 }),
    volume: fc.double({ min: 10, max: 2000, noNaN: true }),
  });

  it('recovers the supply of noise-free decays to a relative 1e-6', () => {
    fc.assert(
      fc.property(decays, (d) => {
        const lambda = d.ach / 3600;
        const span = d.spanInTimeConstants / lambda;
        const readings: Reading[] = Array.from({ length: d.points }, (_, i) => {
          const t = (i * span) / (d.points - 1);
          return { time_s: t, level_ppm: d.outdoor + d.excess * Math.exp(-lambda * t) };
        });
        const r = fitDecay({ readings, uncertainty: exactInputs(d.volume, d.outdoor), conditions: null, seed: 1, draws: 50 });
        return Math.abs(r.supply_m3s.value! / (lambda * d.volume) - 1) < 1e-6;
      }),
      { numRuns: 200 },
    );
  });

  it('never gives NaN for valid input', () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ time_s: fc.double({ min: 0, max: 1e4, noNaN: true }), level_ppm: fc.double({ min: 300, max: 5000, noNaN: true }) }), {
          minLength: 0,
          maxLength: 20,
        }),
        (readings) => {
          const r = fitDecay({ readings, uncertainty: exactInputs(50, 420), conditions: null, seed: 1, draws: 50 });
          const values = [r.supply_m3s, r.airChangeRate_perSecond, r.supplyPerPerson_m3s, r.steadyLevel_ppm].flatMap((f) => [f.value, f.low, f.high]);
          return values.every((v) => v === null || !Number.isNaN(v));
        },
      ),
      { numRuns: 200 },
    );
  });
});
