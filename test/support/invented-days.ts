/**
 * Invented scenarios for engine tests and benchmarks (our own school and rooms; plumbing data,
 * not evidence that a formula is right).
 */
import { dayTemplate } from '../../src/core/day-templates.ts';
import type { OccupantGroup } from '../../src/core/co2-generation.ts';
import type { DayProfileInput } from '../../src/core/day-profile.ts';
import { fromLitresPerSecond } from '../../src/core/units.ts';

/** Our invented Year 4 class at Larkfield Primary (an invented school). */
export const CLASS: OccupantGroup[] = [
  { count: 28, ageBand: '6-11', sex: 'mixed', met: 1.2 },
  { count: 1, ageBand: '30-40', sex: 'female', met: 1.6 },
];
export const AIR = { temp_C: 20, pressure_Pa: 101325 };

/** A busy day with 14 changes of conditions, a sealed spell and a gas heater. */
export function busyDay(): DayProfileInput {
  const schedule = dayTemplate('classroom', {
    occupants: CLASS,
    occupiedSupply_m3s: fromLitresPerSecond(110),
    emptySupply_m3s: fromLitresPerSecond(15),
    airingSupply_m3s: fromLitresPerSecond(600),
    outdoor_ppm: 425,
  });
  schedule.push(
    { start_s: 64800, end_s: 66600, occupants: [], supply_m3s: 0, outdoor_ppm: 430, label: 'sealed' },
    {
      start_s: 66600,
      end_s: 70200,
      occupants: [{ count: 6, ageBand: '40-50', sex: 'mixed', met: 1.4 }],
      supply_m3s: fromLitresPerSecond(20),
      outdoor_ppm: 440,
      otherSources: [{ label: 'flueless gas heater', co2_m3s: fromLitresPerSecond(0.05) }],
      label: 'evening class',
    },
    { start_s: 70200, end_s: 79200, occupants: [], supply_m3s: fromLitresPerSecond(8), outdoor_ppm: 440, label: 'night' },
  );
  return { volume_m3: 165, startLevel_ppm: 520, air: AIR, schedule };
}

