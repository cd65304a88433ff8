/**
 * A room's mean moisture release over a day, kg/s, from the people who use it and the
 * activities its use implies or the interview records (references.md §6.2):
 *
 * - people: each group's rate by activity (moisture-generation.ts, met → asleep / sedentary /
 *   average / strenuous) for the hours it is in the room, averaged over 24 h;
 * - activities: the published daily amount (activity-moisture.ts: cooking 2 kg/day by
 *   electricity, 3 kg/day by gas; shower 0.2 kg per person per day; laundry drying 1.5 kg per
 *   person per day; dishwashing 0.4 kg/day), times how many people or loads it is counted per,
 *   averaged over 24 h. Its low and high ends scale the daily amount by the ratio of the
 *   table's low and high hourly rates to the typical one (our own spread, stated).
 *
 * Every activity is an assumption about the room's use (basis 'assumed'), except where the
 * interview or notes say so ('recorded'); the words describe the room, never the occupants'
 * way of life.
 */
import { activityMoistureOutput, type MoistureActivityKind } from '../activity-moisture.ts';
import { moistureActivityForMet, personMoistureOutput } from '../moisture-generation.ts';

/** People using the room: count, activity (met) and hours a day in the room. */
export interface MoisturePeople {
  count: number;
  met: number;
  hoursPerDay: number;
}

/** An activity counted in the room: per household/person/load multiplier and whether it was recorded. */
export interface MoistureActivity {
  kind: MoistureActivityKind;
  /** People or loads it is counted for (1 for a household figure). */
  multiplier: number;
  basis: 'recorded' | 'assumed';
  why: string;
}

/** The room's release with each part. */
export interface RoomMoistureRelease {
  /** Mean over 24 h, kg/s. */
  low: number;
  typical: number;
  high: number;
  parts: { what: string; typical_kgDay: number; basis: 'recorded' | 'assumed'; source: string }[];
}

const DAY_S = 86_400;

/**
 * Mean daily moisture release of a room.
 * Example: two adults asleep 8.5 h (40 g/h) and nothing else → typical 0.68 kg/day = 7.87e-6 kg/s.
 */
export function roomMoistureRelease(people: readonly MoisturePeople[], activities: readonly MoistureActivity[]): RoomMoistureRelease {
  let low = 0;
  let typical = 0;
  let high = 0;
  const parts: RoomMoistureRelease['parts'] = [];
  for (const p of people) {
    if (p.count <= 0 || p.hoursPerDay <= 0) continue;
    const out = personMoistureOutput(moistureActivityForMet(p.met));
    const share = (p.count * p.hoursPerDay * 3600) / DAY_S;
    low += out.low_kgs * share;
    typical += out.typical_kgs * share;
    high += out.high_kgs * share;
    parts.push({ what: `${p.count} ${p.count === 1 ? 'person' : 'people'} (${out.activity}), ${p.hoursPerDay.toFixed(1)} h a day`, typical_kgDay: out.typical_kgs * share * DAY_S, basis: 'assumed', source: out.source });
  }
  for (const a of activities) {
    const out = activityMoistureOutput(a.kind);
    const perDay = (out.dailyAmount_kg ?? 0) * a.multiplier;
    const rate = perDay / DAY_S;
    typical += rate;
    low += rate * (out.low_kgs / out.typical_kgs);
    high += rate * (out.high_kgs / out.typical_kgs);
    parts.push({ what: `${a.kind}: ${a.why}`, typical_kgDay: perDay, basis: a.basis, source: out.source });
  }
  return { low, typical, high, parts };
}
