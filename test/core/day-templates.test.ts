import { describe, it, expect } from 'vitest';
import { dayTemplate, type TemplateRoomUse } from '../../src/core/day-templates.ts';
import { buildDayProfile } from '../../src/core/day-profile.ts';
import { CLASS } from '../support/invented-days.ts';

const inputs = { occupants: CLASS, occupiedSupply_m3s: 0.1, emptySupply_m3s: 0.01, airingSupply_m3s: 0.5, outdoor_ppm: 430 };

describe('dayTemplate', () => {
  for (const use of ['classroom', 'office', 'bedroom', 'living-room'] as TemplateRoomUse[]) {
    it(`gives a contiguous, increasing schedule for a ${use}`, () => {
      const schedule = dayTemplate(use, inputs);
      expect(schedule.length).toBeGreaterThanOrEqual(3);
      for (let i = 1; i < schedule.length; i++) expect(schedule[i]!.start_s).toBe(schedule[i - 1]!.end_s);
      for (const s of schedule) expect(s.end_s).toBeGreaterThan(s.start_s);
      const profile = buildDayProfile({ volume_m3: 60, startLevel_ppm: 450, air: { temp_C: 20, pressure_Pa: 101325 }, schedule });
      expect(profile.warnings).toEqual([]);
    });
  }

  it('runs a bedroom night past midnight in seconds from the evening before', () => {
    const night = dayTemplate('bedroom', inputs);
    const asleep = night.find((s) => s.label === 'asleep')!;
    expect(asleep.start_s).toBe(22 * 3600 + 15 * 60);
    expect(asleep.end_s).toBe(86400 + 6 * 3600 + 45 * 60);
  });

  it('halves occupants in half slots and uses the airing supply in breaks', () => {
    const day = dayTemplate('classroom', inputs);
    const club = day.find((s) => s.label === 'after-school club')!;
    expect(club.occupants[0]!.count).toBe(CLASS[0]!.count / 2);
    const lunch = day.find((s) => s.label === 'lunch')!;
    expect(lunch.occupants).toEqual([]);
    expect(lunch.supply_m3s).toBe(0.5);
  });
});
