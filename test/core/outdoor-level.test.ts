import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { DEFAULT_OUTDOOR_PPM, outdoorLevel } from '../../src/core/outdoor-level.ts';
import { meterErrorFromStatedAccuracy } from '../../src/core/meter-error.ts';

const meter = meterErrorFromStatedAccuracy(50, 3, 10);

describe('outdoorLevel', () => {
  it('never defaults to 400 ppm: it assumes 420–440-ish with a wide interval and warns', () => {
    // practice.md §2.5: outdoor ~420–440 ppm, never default to 400 (common practice (no published source)).
    const o = outdoorLevel([], { sameMeterAsRoom: true, meter });
    expect(o.value_ppm).toBe(DEFAULT_OUTDOOR_PPM);
    expect(o.value_ppm).toBeGreaterThanOrEqual(420);
    expect(o.value_ppm - 2 * o.sd_ppm).toBeLessThan(400);
    expect(o.value_ppm + 2 * o.sd_ppm).toBeGreaterThan(470);
    expect(o.sameMeterAsRoom).toBe(false);
    expect(o.warnings.map((w) => w.code)).toEqual(['outdoor-assumed']);
  });

  it('uses the readings, with the meter noise as a floor on their scatter', () => {
    const o = outdoorLevel([428, 436], { sameMeterAsRoom: true, meter });
    expect(o.value_ppm).toBe(432);
    approxEqual(o.sd_ppm, 10 / Math.sqrt(2), { rel: 1e-12 });
    expect(o.warnings).toEqual([]);
  });

  it('adds the other meter offset and gain when outdoor was read on another meter, and queries odd readings', () => {
    const o = outdoorLevel([520], { sameMeterAsRoom: false, meter });
    expect(o.sd_ppm).toBeGreaterThan(25);
    expect(o.warnings.map((w) => w.code)).toEqual(['outdoor-reading-unusual']);
  });
});
