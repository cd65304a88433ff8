/**
 * Who uses a room and when: occupant groups (count, age band of the Persily & de Jonge table,
 * sex or mixed, activity in met) and a day schedule of periods. Periods say how full the room
 * is (full, half, empty, or empty and aired), as the engine's day templates do.
 */
import { z } from 'zod';
import { AGE_BANDS, type AgeBand } from '../core/age-bands.ts';
import { choice, clockTimeOf, measure, recordId, text } from './field-rules.ts';
import { dayPeriodProblems } from './day-periods.ts';

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
  start: clockTimeOf('Period start'),
  /** An end before the start runs past midnight. */
  end: clockTimeOf('Period end'),
  presence: choice('How full the room is', PRESENCE),
  label: text('Period name'),
});

export const scheduleSchema = z
  .strictObject({
    /** Which of the app's day templates it started from, if any. */
    template: text('Schedule template'),
    /** The room's own day; when there are any, they are used instead of the template. */
    periods: z.array(schedulePeriodSchema),
  })
  .superRefine((schedule, ctx) => {
    // Each period lasts, and no two cover the same time (day-periods.ts).
    for (const problem of dayPeriodProblems(schedule.periods)) {
      ctx.addIssue({ code: 'custom', path: ['periods', ...problem.path], message: problem.message, input: schedule });
    }
  });

export type OccupantGroupRecord = z.infer<typeof occupantGroupSchema>;
export type Schedule = z.infer<typeof scheduleSchema>;
