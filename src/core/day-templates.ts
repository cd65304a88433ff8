/**
 * Schedule templates for common room uses: our own invented timetables (times in s from
 * midnight), to be adjusted by the surveyor. They give a first day profile before a room's own
 * timetable is known; they are not taken from any published or observed timetable.
 */
import type { OccupantGroup } from './co2-generation.ts';
import type { OtherCo2Source, ScheduleInterval } from './day-profile.ts';

/** Room uses with a template. */
export type TemplateRoomUse = 'classroom' | 'office' | 'bedroom' | 'living-room';

/** What a template needs. Supplies in m³/s, levels in ppm. */
export interface TemplateInputs {
  /** Everyone who uses the room at its busiest. */
  occupants: readonly OccupantGroup[];
  /** Supply while people are in (windows and fans as normally used), m³/s. */
  occupiedSupply_m3s: number;
  /** Supply while the room stands empty (closed up), m³/s. */
  emptySupply_m3s: number;
  /** Supply during breaks when windows or doors are opened to air the room; default: emptySupply. */
  airingSupply_m3s?: number;
  outdoor_ppm: number;
  /** Flames in use while cooking or heating (living room only). */
  otherSources?: readonly OtherCo2Source[];
}

type Presence = 'full' | 'half' | 'empty' | 'airing';

/** [start hh:mm, end hh:mm, presence, label]; an end before its start runs past midnight. */
type Slot = readonly [string, string, Presence, string];

const TIMETABLES: Record<TemplateRoomUse, readonly Slot[]> = {
  classroom: [
    ['07:30', '08:40', 'empty', 'before school'],
    ['08:40', '09:55', 'full', 'lesson 1'],
    ['09:55', '10:15', 'airing', 'morning break'],
    ['10:15', '11:25', 'full', 'lesson 2'],
    ['11:25', '12:25', 'full', 'lesson 3'],
    ['12:25', '13:20', 'airing', 'lunch'],
    ['13:20', '14:25', 'full', 'lesson 4'],
    ['14:25', '14:35', 'half', 'change-over'],
    ['14:35', '15:30', 'full', 'lesson 5'],
    ['15:30', '16:30', 'half', 'after-school club'],
    ['16:30', '18:00', 'empty', 'after school'],
  ],
  office: [
    ['07:00', '08:15', 'empty', 'before work'],
    ['08:15', '09:00', 'half', 'arrivals'],
    ['09:00', '12:30', 'full', 'morning'],
    ['12:30', '13:30', 'half', 'lunch'],
    ['13:30', '17:00', 'full', 'afternoon'],
    ['17:00', '18:00', 'half', 'departures'],
    ['18:00', '19:30', 'empty', 'after work'],
  ],
  bedroom: [
    ['20:30', '22:15', 'empty', 'evening'],
    ['22:15', '06:45', 'full', 'asleep'],
    ['06:45', '07:45', 'airing', 'morning'],
  ],
  'living-room': [
    ['16:30', '17:45', 'half', 'after school'],
    ['17:45', '18:45', 'empty', 'meal elsewhere'],
    ['18:45', '22:30', 'full', 'evening'],
    ['22:30', '23:30', 'half', 'late'],
    ['23:30', '01:00', 'empty', 'night'],
  ],
};

/** One period of a template's timetable, as the surveyor would write it down. */
export interface TimetablePeriod {
  /** "hh:mm" on the 24-hour clock; an end before its start runs past midnight. */
  start: string;
  end: string;
  presence: Presence;
  label: string;
}

/**
 * The template's timetable as periods, to start a room's own day from.
 * Example: templateTimetable('bedroom')[1] = { start: '22:15', end: '06:45', presence: 'full', label: 'asleep' }.
 */
export function templateTimetable(use: TemplateRoomUse): TimetablePeriod[] {
  return TIMETABLES[use].map(([start, end, presence, label]) => ({ start, end, presence, label }));
}

function seconds(hhmm: string): number {
  const [h, m] = hhmm.split(':').map(Number);
  return (h ?? 0) * 3600 + (m ?? 0) * 60;
}

function scaled(groups: readonly OccupantGroup[], factor: number): OccupantGroup[] {
  return factor === 0 ? [] : groups.map((g) => ({ ...g, count: g.count * factor }));
}

/**
 * The schedule for a room use: a list of intervals (s from midnight; a night runs past 86 400 s).
 * 'half' slots have half the occupants; 'airing' slots are empty with the airing supply.
 * Flames (otherSources) are used in the living room's 'full' slots only.
 * Example: dayTemplate('classroom', …) gives 11 intervals from 27 000 s (07:30) to 64 800 s (18:00).
 */
export function dayTemplate(use: TemplateRoomUse, inputs: TemplateInputs): ScheduleInterval[] {
  const intervals: ScheduleInterval[] = [];
  let dayOffset = 0;
  let previousStart = -1;
  for (const [from, to, presence, label] of TIMETABLES[use]) {
    let start = seconds(from) + dayOffset;
    if (start < previousStart) {
      dayOffset += 86400;
      start += 86400;
    }
    let end = seconds(to) + dayOffset;
    if (end <= start) end += 86400;
    previousStart = start;
    const occupied = presence === 'full' || presence === 'half';
    intervals.push({
      start_s: start,
      end_s: end,
      occupants: scaled(inputs.occupants, presence === 'full' ? 1 : presence === 'half' ? 0.5 : 0),
      supply_m3s: occupied
        ? inputs.occupiedSupply_m3s
        : presence === 'airing'
          ? (inputs.airingSupply_m3s ?? inputs.emptySupply_m3s)
          : inputs.emptySupply_m3s,
      outdoor_ppm: inputs.outdoor_ppm,
      otherSources: use === 'living-room' && presence === 'full' ? inputs.otherSources : undefined,
      label,
    });
  }
  return intervals;
}
