import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { busyDay } from '../support/invented-days.ts';
import { buildDayProfile, sampleProfile, type DayProfile } from '../../src/core/day-profile.ts';
import { profileMetrics, type MetricPeriod } from '../../src/core/day-profile-metrics.ts';

/** Brute force on 1-second samples: the figures the exact ones must agree with. */
function bruteForce(profile: DayProfile, threshold: number, window: number, period: MetricPeriod) {
  const { time_s, level_ppm } = sampleProfile(profile, 1);
  const counted = time_s.map((t) => {
    if (period === 'whole') return true;
    const piece = profile.pieces.find((p) => t >= p.start_s && t < p.end_s);
    return !!piece && piece.occupants > 0;
  });
  let sum = 0;
  let n = 0;
  let peak = -Infinity;
  let above = 0;
  let run = 0;
  let longest = 0;
  let rolling = -Infinity;
  for (let i = 0; i < time_s.length - 1; i++) {
    if (!counted[i]) {
      run = 0;
      continue;
    }
    const mid = 0.5 * (level_ppm[i]! + level_ppm[i + 1]!);
    sum += mid;
    n++;
    peak = Math.max(peak, level_ppm[i]!, level_ppm[i + 1]!);
    if (mid > threshold) {
      above++;
      run++;
      longest = Math.max(longest, run);
    } else run = 0;
    if (i + window <= time_s.length - 1 && counted.slice(i, i + window).every(Boolean)) {
      let w = 0;
      for (let k = i; k < i + window; k++) w += 0.5 * (level_ppm[k]! + level_ppm[k + 1]!);
      rolling = Math.max(rolling, w / window);
    }
  }
  return { mean: sum / n, peak, above, longest, rolling };
}

describe('profileMetrics', () => {
  for (const period of ['occupied', 'whole'] as const) {
    it(`agrees with 1-second brute force over the ${period} period`, () => {
      const profile = buildDayProfile(busyDay());
      const m = profileMetrics(profile, { threshold_ppm: 1000, window_s: 1200, period });
      const b = bruteForce(profile, 1000, 1200, period);
      approxEqual(m.mean_ppm!, b.mean, { abs: 0.01 });
      approxEqual(m.peak_ppm!, b.peak, { abs: 1e-6 });
      approxEqual(m.timeAbove_s, b.above, { abs: 20 });
      approxEqual(m.longestRunAbove_s, b.longest, { abs: 2 });
      approxEqual(m.highestRollingMean_ppm!, b.rolling, { abs: 0.05 });
      expect(m.timeAbove_s).toBeGreaterThan(0);
    });
  }

  it('gives the exact figures of a single rise (references.md §7.2 classroom at 100 L/s)', () => {
    const profile = buildDayProfile({
      volume_m3: 151.2,
      startLevel_ppm: 450,
      air: { temp_C: 0, pressure_Pa: 101325 },
      schedule: [
        { start_s: 0, end_s: 3600, occupants: [], otherSources: [{ label: 'stand-in for N·G', co2_m3s: 8.96e-5 }], supply_m3s: 0.1, outdoor_ppm: 420 },
      ],
    });
    const m = profileMetrics(profile, { threshold_ppm: 1000, period: 'whole' });
    // Peak at the end is the 60-minute build-up value 1235.9 ppm [D], as checked in balance.test.ts.
    approxEqual(m.peak_ppm!, 1235.9, { abs: 0.05 });
    expect(m.peakTime_s).toBe(3600);
    expect(m.longestRunAbove_s).toBe(m.timeAbove_s);
    // The highest 20-minute mean of a rising curve is its last 20 minutes.
    approxEqual(m.highestRollingMeanStart_s!, 2400, { abs: 1 });
  });

  it('reports no occupied figures for an empty room, with a warning', () => {
    const profile = buildDayProfile({
      volume_m3: 40,
      startLevel_ppm: 450,
      air: { temp_C: 20, pressure_Pa: 101325 },
      schedule: [{ start_s: 0, end_s: 3600, occupants: [], supply_m3s: 0.01, outdoor_ppm: 420 }],
    });
    const m = profileMetrics(profile, { threshold_ppm: 1000 });
    expect(m.mean_ppm).toBeNull();
    expect(m.warnings.map((w) => w.code)).toEqual(['no-occupied-period']);
  });
});
