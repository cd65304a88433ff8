/**
 * A room's own day of periods, as the room screen builds it: copied from the day template the
 * findings would otherwise use (so the surveyor edits a known day instead of typing one), and a
 * new period that follows on from the last one. Times are "hh:mm" on the 24-hour clock.
 *
 * Example: ownDayFrom('classroom', 'classroom') gives the school day's 11 periods, the first
 * { start: '07:30', end: '08:40', presence: 'empty', label: 'before school' };
 * nextPeriod([{ start: '08:40', end: '09:55', … }]) = { start: '09:55', end: '10:55', presence: 'full', label: '' }.
 */
import { templateTimetable, type TemplateRoomUse } from '../core/day-templates.ts';
import type { RoomUse } from '../core/room-uses.ts';
import type { Schedule } from '../model/occupancy.ts';
import { SCHEDULE_TEMPLATES } from './room-defaults.ts';

export type DayPeriod = Schedule['periods'][number];

/** Length of a new period, minutes. */
const NEW_PERIOD_MIN = 60;
/** Where a first period starts when there is nothing to follow. */
const FIRST_START = '09:00';

/**
 * The template the findings use for a room without periods: its chosen template, else the
 * template of its use, else none (as src/analysis/day-schedule.ts reads them).
 */
export function templateInUse(template: string, use: RoomUse): (typeof SCHEDULE_TEMPLATES)[number] | undefined {
  return SCHEDULE_TEMPLATES.find((t) => t.id === template) ?? SCHEDULE_TEMPLATES.find((t) => t.id === use);
}

/** The periods of the template in use, copied (empty when the room has no template). */
export function ownDayFrom(template: string, use: RoomUse): DayPeriod[] {
  const chosen = templateInUse(template, use);
  return chosen ? templateTimetable(chosen.id as TemplateRoomUse).map((p) => ({ ...p })) : [];
}

function hhmm(minutes: number): string {
  const m = ((minutes % 1440) + 1440) % 1440;
  return `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
}

/** A period of an hour with the room full, starting where the last period ends (or at 09:00). */
export function nextPeriod(periods: readonly DayPeriod[]): DayPeriod {
  const last = periods.at(-1)?.end;
  const start = last && /^\d{2}:\d{2}$/.test(last) ? last : FIRST_START;
  const startMin = Number(start.slice(0, 2)) * 60 + Number(start.slice(3, 5));
  return { start, end: hhmm(startMin + NEW_PERIOD_MIN), presence: 'full', label: '' };
}
