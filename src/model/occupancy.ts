/**
 * Who uses a room and when: occupant groups (count, age band of the Persily & de Jonge table,
 * sex or mixed, activity in met) and a day schedule of periods. Periods say how full the room
 * is (full, half, empty, or empty and aired), as the engine's day templates do.
 */
import { z } from 'zod';
import { AGE_BANDS, type AgeBand } from '../core/age-bands.ts';
import { choice, clockTime, measure, recordId, text } from './field-rules.ts';

const ageBands = AGE_BANDS as unknown as readonly [AgeBand, ...AgeBand[]];

export const occupantGroupSchema = z.strictObject({
  id: recordId,
  label: text('Group name'),
  count: measure('Number of people', '', 1, 10_000, { integer: true }),
  ageBand: choice('Age band', ageBands),
  sex: choice('Sex', ['male', 'female', 'mixed'] as const),
  /** Activity level in met (1.0 seated quietly, about 1.2-1.4 for class or office work). */
  activity_met: measure('Activity', 'met', 0.7, 8),
});

export const PRESENCE = ['full', 'half', 'empty', 'airing'] as const;

export const schedulePeriodSchema = z.strictObject({
  start: clockTime,
  /** An end before the start runs past midnight. */
  end: clockTime,
  presence: choice('How full the room is', PRESENCE),
  label: text('Period name'),
});

export const scheduleSchema = z.strictObject({
  /** Which of the app's day templates it started from, if any. */
  template: text('Schedule template'),
  periods: z.array(schedulePeriodSchema),
});

export type OccupantGroupRecord = z.infer<typeof occupantGroupSchema>;
export type Schedule = z.infer<typeof scheduleSchema>;
