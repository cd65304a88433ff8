/** The per-room work of the engine benchmark: an invented room's day profile and one decay fit. */
import { buildDayProfile } from '../../../src/core/day-profile.ts';
import { profileMetrics } from '../../../src/core/day-profile-metrics.ts';
import { dayTemplate } from '../../../src/core/day-templates.ts';
import { fitDecay } from '../../../src/core/decay-fit.ts';
import { meterErrorFromStatedAccuracy } from '../../../src/core/meter-error.ts';
import { outdoorLevel } from '../../../src/core/outdoor-level.ts';
import { createSeededRandom } from '../../../src/core/seeded-random.ts';
import { CLASS, AIR } from '../../support/invented-days.ts';

const METER = meterErrorFromStatedAccuracy(50, 3, 10);

/** Run rooms [from, to); returns how many were analysed. */
export function runRooms(from: number, to: number): number {
  let done = 0;
  for (let room = from; room < to; room++) {
    const rng = createSeededRandom(room);
    const volume = 100 + 150 * rng.uniform();
    const supply = 0.02 + 0.2 * rng.uniform();
    const schedule = dayTemplate('classroom', { occupants: CLASS, occupiedSupply_m3s: supply, emptySupply_m3s: 0.01, airingSupply_m3s: 0.4, outdoor_ppm: 430 });
    const profile = buildDayProfile({ volume_m3: volume, startLevel_ppm: 450, air: AIR, schedule });
    profileMetrics(profile, { threshold_ppm: 1500 });
    const lambda = supply / volume;
    const readings = Array.from({ length: 20 }, (_, i) => ({
      time_s: i * 180,
      level_ppm: 430 + 1400 * Math.exp(-lambda * i * 180) + 10 * rng.normal(),
    }));
    const outdoor = outdoorLevel([428 + 4 * rng.normal()], { sameMeterAsRoom: true, meter: METER });
    const fit = fitDecay({ readings, uncertainty: { volume_m3: volume, volumeSd_m3: 0.05 * volume, outdoor, meter: METER }, conditions: null, seed: room });
    if (fit.supply_m3s.value !== null) done++;
  }
  return to - from;
}
