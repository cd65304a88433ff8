/**
 * A room's day as the engine's schedule: the room's own periods (full, half, empty, airing), or,
 * when none are recorded, the engine's invented template for its schedule template or room use
 * (day-templates.ts). Times are seconds from midnight on the clock the surveyor recorded; a
 * period whose end is before its start runs past midnight.
 *
 * Supplies by presence, as the engine's templates use them: full and half → the supply of the
 * scenario being judged; empty → the room closed up; airing → windows open (purge). Half means
 * half of every group.
 *
 * Example: periods [08:40–09:55 full] → slots [{ start_s: 31200, end_s: 35700, presence: 'full' }].
 */
import { dayTemplate, type TemplateInputs, type TemplateRoomUse } from '../core/day-templates.ts';
import type { ScheduleInterval } from '../core/day-profile.ts';
import type { DocumentRoom } from '../model/survey-document.ts';
import type { PRESENCE } from '../model/occupancy.ts';

export type Presence = (typeof PRESENCE)[number];

export interface Slot {
  start_s: number;
  end_s: number;
  presence: Presence;
  label: string;
}

export interface DayPlan {
  /** Where the day came from, in words. */
  source: string;
  slots: Slot[];
}

const TEMPLATE_USES: readonly TemplateRoomUse[] = ['classroom', 'office', 'bedroom', 'living-room'];
const DAY_S = 86_400;

/** "08:40" → 31 200 s. */
function clock(hhmm: string): number {
  return Number(hhmm.slice(0, 2)) * 3600 + Number(hhmm.slice(3, 5)) * 60;
}

/**
 * Seconds from midnight of a recorded time, on the clock it was recorded in (the ISO text's own
 * hours and minutes, whatever its offset). Example: clockSeconds('2026-01-14T09:05:00Z') = 32 700.
 */
export function clockSeconds(iso: string): number {
  const m = /T(\d{2}):(\d{2})(?::(\d{2}(?:\.\d+)?))?/.exec(iso);
  return m ? Number(m[1]) * 3600 + Number(m[2]) * 60 + Number(m[3] ?? 0) : 0;
}

/**
 * The template's slots: the template is run with one person and marker supplies (occupied 1,
 * empty 0, airing 2 m³/s), and each interval's presence read back from them.
 */
function templateSlots(use: TemplateRoomUse): Slot[] {
  const marker: TemplateInputs = {
    occupants: [{ count: 1, ageBand: '30-40', sex: 'mixed', met: 1 }],
    occupiedSupply_m3s: 1,
    emptySupply_m3s: 0,
    airingSupply_m3s: 2,
    outdoor_ppm: 0,
  };
  return dayTemplate(use, marker).map((i) => {
    const people = i.occupants.reduce((s, g) => s + g.count, 0);
    const presence: Presence = people >= 1 ? 'full' : people > 0 ? 'half' : i.supply_m3s === 2 ? 'airing' : 'empty';
    return { start_s: i.start_s, end_s: i.end_s, presence, label: i.label ?? '' };
  });
}

/**
 * The room's day plan, or null when it has neither periods nor a template for its use.
 * Example: a classroom with no periods → the classroom template's 11 slots.
 */
export function dayPlan(room: DocumentRoom): DayPlan | null {
  if (room.schedule.periods.length > 0) {
    const slots = room.schedule.periods
      .map((p): Slot => {
        const start = clock(p.start);
        let end = clock(p.end);
        if (end <= start) end += DAY_S;
        return { start_s: start, end_s: end, presence: p.presence, label: p.label };
      })
      .sort((a, b) => a.start_s - b.start_s);
    return { source: 'the room’s recorded periods', slots };
  }
  const named = TEMPLATE_USES.find((u) => u === room.schedule.template) ?? TEMPLATE_USES.find((u) => u === room.use);
  return named ? { source: `the ${named} template (invented timetable)`, slots: templateSlots(named) } : null;
}

/** The slot holding a time of day (s), trying the next day for slots past midnight. */
export function slotAt(plan: DayPlan, time_s: number): Slot | null {
  return plan.slots.find((s) => (time_s >= s.start_s && time_s < s.end_s) || (time_s + DAY_S >= s.start_s && time_s + DAY_S < s.end_s)) ?? null;
}

/** The first slot with people in it. */
export function firstOccupiedSlot(plan: DayPlan): Slot | null {
  return plan.slots.find((s) => s.presence === 'full' || s.presence === 'half') ?? null;
}

/**
 * The engine schedule for a plan with the given occupants, supplies and outdoor level.
 * Example: scheduleIntervals(plan, { occupants, occupiedSupply_m3s: 0.05, emptySupply_m3s: 0.01, outdoor_ppm: 430 }).
 */
export function scheduleIntervals(plan: DayPlan, inputs: TemplateInputs): ScheduleInterval[] {
  return plan.slots.map((s) => {
    const share = s.presence === 'full' ? 1 : s.presence === 'half' ? 0.5 : 0;
    return {
      start_s: s.start_s,
      end_s: s.end_s,
      occupants: share === 0 ? [] : inputs.occupants.map((g) => ({ ...g, count: g.count * share })),
      supply_m3s:
        share > 0 ? inputs.occupiedSupply_m3s : s.presence === 'airing' ? (inputs.airingSupply_m3s ?? inputs.emptySupply_m3s) : inputs.emptySupply_m3s,
      outdoor_ppm: inputs.outdoor_ppm,
      label: s.label,
    };
  });
}
