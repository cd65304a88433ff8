import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { odexLevels } from '../support/odex-day-profile.ts';
import { buildDayProfile, levelAt, levelIntegralTo, sampleProfile, sampleProfileWithChanges, type DayProfileInput } from '../../src/core/day-profile.ts';
import { AIR, busyDay, CLASS } from '../support/invented-days.ts';

describe('day profile against odex (reference ODE solver)', () => {
  it('agrees with numerical integration of the same ODE within 0.01 ppm over a day with ten or more changes', () => {
    const input = busyDay();
    const profile = buildDayProfile(input);
    expect(profile.pieces.length).toBeGreaterThanOrEqual(11);
    const reference = odexLevels(profile, 60);
    const ours = sampleProfile(profile, 60);
    expect(ours.time_s).toEqual(reference.time_s);
    let largest = 0;
    ours.level_ppm.forEach((level, i) => {
      largest = Math.max(largest, Math.abs(level - reference.level_ppm[i]!));
    });
    expect(largest).toBeLessThan(0.01);
    expect(profile.warnings).toEqual([]);
  });

  it('samples every change of conditions as well as the grid, and agrees with odex there', () => {
    const profile = buildDayProfile(busyDay());
    const ours = sampleProfileWithChanges(profile, 600);
    const changes = profile.pieces.flatMap((p) => [p.start_s, p.end_s]);
    for (const t of changes) expect(ours.time_s).toContain(t);
    expect(ours.time_s).toEqual([...ours.time_s].sort((a, b) => a - b));
    expect(new Set(ours.time_s).size).toBe(ours.time_s.length);
    // Every change in the invented day falls on a whole minute, so the 60 s odex grid holds them all.
    const reference = odexLevels(profile, 60);
    ours.time_s.forEach((t, i) => {
      const k = reference.time_s.indexOf(t);
      expect(k).toBeGreaterThanOrEqual(0);
      approxEqual(ours.level_ppm[i]!, reference.level_ppm[k]!, { abs: 0.01 });
    });
  });
});

describe('day profile', () => {
  it('chains pieces so each starts where the last ended', () => {
    const profile = buildDayProfile(busyDay());
    for (let i = 1; i < profile.pieces.length; i++) {
      expect(profile.pieces[i]!.startLevel_ppm).toBe(profile.pieces[i - 1]!.endLevel_ppm);
      expect(profile.pieces[i]!.start_s).toBe(profile.pieces[i - 1]!.end_s);
    }
  });

  it('gives levels and integrals consistent with fine sampling', () => {
    const profile = buildDayProfile(busyDay());
    const samples = sampleProfile(profile, 1);
    let integral = 0;
    for (let i = 1; i < samples.time_s.length; i++) {
      integral += 0.5 * (samples.level_ppm[i]! + samples.level_ppm[i - 1]!) * (samples.time_s[i]! - samples.time_s[i - 1]!);
    }
    const end = samples.time_s[samples.time_s.length - 1]!;
    approxEqual(levelIntegralTo(profile, end), integral, { rel: 1e-6 });
    approxEqual(levelAt(profile, 40000), samples.level_ppm[40000 - 27000]!, { abs: 1e-9 });
  });

  it('fills a gap with an empty room and warns, and cuts an overlap', () => {
    const profile = buildDayProfile({
      volume_m3: 40,
      startLevel_ppm: 450,
      air: AIR,
      schedule: [
        { start_s: 0, end_s: 3600, occupants: CLASS.slice(1), supply_m3s: 0.01, outdoor_ppm: 420 },
        { start_s: 7200, end_s: 9000, occupants: CLASS.slice(1), supply_m3s: 0.01, outdoor_ppm: 420 },
        { start_s: 8000, end_s: 9500, occupants: [], supply_m3s: 0.01, outdoor_ppm: 420 },
      ],
    });
    expect(profile.warnings.map((w) => w.code)).toEqual(['schedule-gap', 'schedule-overlap']);
    expect(profile.pieces.map((p) => [p.start_s, p.end_s])).toEqual([
      [0, 3600],
      [3600, 7200],
      [7200, 8000],
      [8000, 9500],
    ]);
  });

  it('has no pieces for an empty schedule and no NaN when sampled', () => {
    const profile = buildDayProfile({ volume_m3: 40, startLevel_ppm: 450, air: AIR, schedule: [] });
    expect(profile.pieces).toEqual([]);
    expect(sampleProfile(profile, 60)).toEqual({ time_s: [], level_ppm: [] });
  });
});
