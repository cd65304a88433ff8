/**
 * The outdoor level from an outdoor logger: median, quartiles and robust spread, checked against
 * jstat 1.9.6 (jStat.percentile, Hyndman & Fan definition 7 when not exclusive; jStat.normal.inv
 * for the normal IQR) and against hand-computed values. The readings are invented.
 */
import { describe, it, expect } from 'vitest';
import jstatModule from 'jstat';
import { approxEqual } from '../support/approx-equal.ts';
import { NORMAL_IQR_PER_SD, outdoorLoggerLevel } from '../../src/core/outdoor-logger-level.ts';
import { DEFAULT_OUTDOOR_PPM } from '../../src/core/outdoor-level.ts';
import { meterErrorFromStatedAccuracy } from '../../src/core/meter-error.ts';
import { createSeededRandom } from '../../src/core/seeded-random.ts';

const { jStat } = jstatModule as unknown as { jStat: { percentile(a: number[], k: number): number; median(a: number[]): number; normal: { inv(p: number, m: number, s: number): number } } };
const meter = meterErrorFromStatedAccuracy(50, 3, 10);

describe('outdoorLoggerLevel', () => {
  it('gives the worked example of its doc block (hand-computed)', () => {
    // Sorted: 421 424 426 427 429 431 433 436 612; definition 7 positions 2, 4, 6 → 426, 429, 433; IQR 7.
    const o = outdoorLoggerLevel([433, 612, 421, 429, 436, 424, 431, 426, 427], { sameMeterAsRoom: true, meter });
    expect([o.lowerQuartile_ppm, o.value_ppm, o.upperQuartile_ppm]).toEqual([426, 429, 433]);
    approxEqual(o.sd_ppm, 7 / 1.349, { rel: 1e-3 });
    expect(o.sameMeterAsRoom).toBe(true);
    expect(o.readings).toBe(9);
    expect(o.warnings).toEqual([]);
  });

  it('uses the normal distribution’s interquartile range in standard deviations', () => {
    // jStat.normal.inv(0.75, 0, 1) = 0.6744898 (the normal upper quartile).
    approxEqual(NORMAL_IQR_PER_SD, 2 * jStat.normal.inv(0.75, 0, 1), { rel: 1e-9 });
  });

  it('matches jstat’s median and quartiles on a day of invented points', () => {
    const rng = createSeededRandom(11);
    const random = () => rng.uniform();
    const values = Array.from({ length: 361 }, (_, i) => Math.round(428 + 6 * Math.sin(i / 40) + 8 * (random() - 0.5)));
    const o = outdoorLoggerLevel(values, { sameMeterAsRoom: true, meter });
    approxEqual(o.value_ppm, jStat.median(values), { abs: 1e-9 });
    approxEqual(o.lowerQuartile_ppm, jStat.percentile(values, 0.25), { abs: 1e-9 });
    approxEqual(o.upperQuartile_ppm, jStat.percentile(values, 0.75), { abs: 1e-9 });
    approxEqual(o.spreadSd_ppm, (jStat.percentile(values, 0.75) - jStat.percentile(values, 0.25)) / NORMAL_IQR_PER_SD, { abs: 1e-9 });
  });

  it('is not dragged by spikes from passing traffic, where a mean would be', () => {
    // 120 points at 430 ± 3 ppm, then 20 spikes of 700–900 ppm (14 % of the points).
    const rng = createSeededRandom(3);
    const random = () => rng.uniform();
    const calm = Array.from({ length: 120 }, () => 430 + 6 * (random() - 0.5));
    const spikes = Array.from({ length: 20 }, () => 700 + 200 * random());
    const o = outdoorLoggerLevel([...calm, ...spikes], { sameMeterAsRoom: true, meter });
    const mean = [...calm, ...spikes].reduce((a, b) => a + b, 0) / 140;
    expect(mean).toBeGreaterThan(480);
    approxEqual(o.value_ppm, 430, { abs: 3 });
    expect(o.sd_ppm).toBeLessThan(10);
  });

  it('corrects onto true ppm and adds offset and gain on another meter', () => {
    // A logger reading 20 ppm high (offset 20, gain 1): 450 read is 430 true.
    const logger = { ...meter, offset_ppm: 20 };
    const o = outdoorLoggerLevel([448, 450, 452], { sameMeterAsRoom: false, meter: logger });
    expect(o.value_ppm).toBe(430);
    expect(o.sameMeterAsRoom).toBe(false);
    // hypot(max(IQR 2/1.349, 10/√3), 25, 0.015 × 430), hand-computed: √(33.3 + 625 + 41.6) = 26.46 ppm.
    approxEqual(o.sd_ppm, Math.hypot(10 / Math.sqrt(3), 25, 0.015 * 430), { rel: 1e-12 });
    approxEqual(o.sd_ppm, 26.46, { abs: 0.01 });
  });

  it('queries a median outside 390–500 ppm and falls back to the default with no points', () => {
    // practice.md §2 item 5: query outdoor readings below ~390 or above ~500 ppm (common practice (no published source)).
    expect(outdoorLoggerLevel([515, 520, 530], { sameMeterAsRoom: true, meter }).warnings.map((w) => w.code)).toEqual(['outdoor-reading-unusual']);
    const none = outdoorLoggerLevel([], { sameMeterAsRoom: true, meter });
    expect(none.value_ppm).toBe(DEFAULT_OUTDOOR_PPM);
    expect(none.warnings.map((w) => w.code)).toEqual(['outdoor-assumed']);
  });
});
