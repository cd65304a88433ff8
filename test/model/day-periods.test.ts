import { describe, it, expect } from 'vitest';
import { dayPeriodProblems, runsPastMidnight } from '../../src/model/day-periods.ts';
import { scheduleSchema } from '../../src/model/occupancy.ts';
import { validationProblems } from '../../src/model/validation-problem.ts';

const p = (start: string, end: string) => ({ start, end, presence: 'full' as const, label: '' });

describe('the rules of a room’s own day', () => {
  it('accepts periods that meet end to start, in any order, and one past midnight', () => {
    expect(dayPeriodProblems([p('08:40', '09:55'), p('09:55', '10:15'), p('22:15', '06:45'), p('07:00', '08:40')])).toEqual([]);
  });

  it('names the later period’s start when it begins inside an earlier one', () => {
    expect(dayPeriodProblems([p('08:40', '09:55'), p('09:30', '10:15')])).toEqual([
      { path: [1, 'start'], message: 'Start of period 2 (09:30) is inside period 1 (08:40–09:55): periods must not overlap' },
    ]);
  });

  it('names the end when a later period swallows an earlier one’s start', () => {
    expect(dayPeriodProblems([p('09:00', '10:00'), p('08:00', '12:00')])).toEqual([
      { path: [1, 'end'], message: 'Period 2 (08:00–12:00) covers the start of period 1 (09:00–10:00): periods must not overlap' },
    ]);
  });

  it('sees an overlap across midnight (a night 22:00–07:00 and an early 06:00 start)', () => {
    expect(dayPeriodProblems([p('22:00', '07:00'), p('06:00', '08:00')]).map((x) => x.path)).toEqual([[1, 'start']]);
    expect(dayPeriodProblems([p('06:00', '08:00'), p('22:00', '07:00')]).map((x) => x.path)).toEqual([[1, 'end']]);
  });

  it('refuses a period that ends when it starts', () => {
    expect(dayPeriodProblems([p('09:00', '09:00')])).toEqual([
      { path: [0, 'end'], message: 'End of period 1 (09:00) is the same as its start: a period must last at least a minute' },
    ]);
  });

  it('leaves times that are not times of day to the field rules', () => {
    expect(dayPeriodProblems([p('', '09:00'), p('08:00', '9.30')])).toEqual([]);
  });

  it('knows a period that runs past midnight', () => {
    expect(runsPastMidnight(p('22:15', '06:45'))).toBe(true);
    expect(runsPastMidnight(p('08:40', '09:55'))).toBe(false);
  });

  it('is part of the schedule schema: problems sit on the field, with its name', () => {
    const parsed = scheduleSchema.safeParse({ template: 'classroom', periods: [p('08:40', '09:55'), p('09:30', ''), p('10:00', '10:00')] });
    expect(parsed.success).toBe(false);
    expect(validationProblems(parsed.error!).map((x) => [x.field, x.message])).toEqual([
      ['periods.1.end', 'Period end must be a time of day such as 08:40'],
      ['periods.2.end', 'End of period 3 (10:00) is the same as its start: a period must last at least a minute'],
    ]);
    const overlapping = scheduleSchema.safeParse({ template: '', periods: [p('08:40', '09:55'), p('09:30', '10:15'), p('11:00', '11:00')] });
    expect(validationProblems(overlapping.error!).map((x) => x.field)).toEqual(['periods.2.end', 'periods.1.start']);
  });
});
