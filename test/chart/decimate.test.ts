import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { decimateMinMax } from '../../src/chart/decimate.ts';

describe('decimateMinMax', () => {
  it('thins a week of one-minute readings to the plot width and keeps every extreme', () => {
    const n = 7 * 24 * 60;
    const t = Array.from({ length: n }, (_, i) => i * 60);
    const v = t.map((s, i) => 600 + 400 * Math.sin(s / 5000) + (i === 4321 ? 1500 : 0));
    const out = decimateMinMax(t, v, 320);
    expect(out.t.length).toBeLessThanOrEqual(320 * 4);
    expect(Math.max(...out.v)).toBe(Math.max(...v));
    expect(Math.min(...out.v)).toBe(Math.min(...v));
    for (let i = 1; i < out.t.length; i += 1) expect(out.t[i]!).toBeGreaterThan(out.t[i - 1]!);
  });

  it('keeps global extremes for any series', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 5000, noNaN: true }), { minLength: 1, maxLength: 400 }), fc.integer({ min: 1, max: 50 }), (v, buckets) => {
        const t = v.map((_, i) => i);
        const out = decimateMinMax(t, v, buckets);
        expect(Math.max(...out.v)).toBe(Math.max(...v));
        expect(Math.min(...out.v)).toBe(Math.min(...v));
      }),
    );
  });
});
