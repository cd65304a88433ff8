/** A room's own day: copied from the template the findings use, and a new period following on. */
import { describe, it, expect } from 'vitest';
import { nextPeriod, ownDayFrom, templateInUse } from '../../src/app/own-day.ts';
import { scheduleSchema } from '../../src/model/occupancy.ts';
import { dayPlan } from '../../src/analysis/day-schedule.ts';
import { newRoom } from '../../src/app/room-defaults.ts';

describe('a room’s own day', () => {
  it('copies the chosen template’s periods, which the findings then read the same way as the template', () => {
    const periods = ownDayFrom('classroom', 'classroom');
    expect(periods).toHaveLength(11);
    expect(periods[0]).toEqual({ start: '07:30', end: '08:40', presence: 'empty', label: 'before school' });
    expect(scheduleSchema.safeParse({ template: 'classroom', periods }).success).toBe(true);
    // The same day, whether the findings take it from the template or from the copied periods.
    const room = { ...newRoom({ name: 'C1', use: 'classroom', geometry: { kind: 'box', length_m: 7, width_m: 7, height_m: 2.7 } }, new Date(0)), readings: [] };
    const fromTemplate = dayPlan(room)!.slots;
    const fromCopy = dayPlan({ ...room, schedule: { template: 'classroom', periods } })!.slots;
    expect(fromCopy).toEqual(fromTemplate);
  });

  it('copies a fresh list each time (editing one room’s day leaves the template alone)', () => {
    const a = ownDayFrom('bedroom', 'bedroom');
    a[1]!.end = '07:15';
    expect(ownDayFrom('bedroom', 'bedroom')[1]).toEqual({ start: '22:15', end: '06:45', presence: 'full', label: 'asleep' });
  });

  it('falls back to the room use’s template, as the findings do, and to nothing', () => {
    expect(templateInUse('', 'office')?.id).toBe('office');
    expect(ownDayFrom('', 'office')).toHaveLength(7);
    expect(ownDayFrom('', 'kitchen')).toEqual([]);
  });

  it('starts a new period where the last one ends, an hour long, wrapping past midnight', () => {
    expect(nextPeriod([])).toEqual({ start: '09:00', end: '10:00', presence: 'full', label: '' });
    expect(nextPeriod([{ start: '08:40', end: '09:55', presence: 'full', label: 'lesson 1' }])).toEqual({ start: '09:55', end: '10:55', presence: 'full', label: '' });
    expect(nextPeriod([{ start: '22:00', end: '23:30', presence: 'full', label: '' }]).end).toBe('00:30');
    // A last period with its end still being typed: start at the usual time.
    expect(nextPeriod([{ start: '22:00', end: '', presence: 'full', label: '' }]).start).toBe('09:00');
  });
});
