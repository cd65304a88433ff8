import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { correctedLevel, meterErrorFromSideBySide, meterErrorFromStatedAccuracy } from '../../src/core/meter-error.ts';

describe('meter error model', () => {
  it('reads a stated accuracy as 95 % bounds on offset and gain (common practice (no published source))', () => {
    const m = meterErrorFromStatedAccuracy(50, 3);
    expect(m.offsetSd_ppm).toBe(25);
    approxEqual(m.gainSd, 0.015, { abs: 1e-15 });
    expect(m.noiseSd_ppm).toBe(10);
  });

  it('fits offset and gain from a side-by-side check that spans the range', () => {
    // Invented check: this meter reads 1.04 × reference + 30 ppm.
    const pairs = [420, 700, 1000, 1400, 1900].map((r) => ({ reference_ppm: r, meter_ppm: 1.04 * r + 30 }));
    const m = meterErrorFromSideBySide(pairs, 10, meterErrorFromStatedAccuracy(50, 3));
    approxEqual(m.gain, 1.04, { abs: 1e-9 });
    approxEqual(m.offset_ppm, 30, { abs: 1e-6 });
    approxEqual(correctedLevel(1.04 * 1234 + 30, m), 1234, { abs: 1e-6 });
  });

  it('estimates the offset only from a check at one level and keeps the stated gain uncertainty', () => {
    const pairs = [431, 433, 430, 434].map((r) => ({ reference_ppm: r, meter_ppm: r + 22 }));
    const stated = meterErrorFromStatedAccuracy(50, 3);
    const m = meterErrorFromSideBySide(pairs, 10, stated);
    approxEqual(m.offset_ppm, 22, { abs: 1e-9 });
    expect(m.gainSd).toBe(stated.gainSd);
    expect(m.offsetSd_ppm).toBeLessThan(stated.offsetSd_ppm);
  });
});
