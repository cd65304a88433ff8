import { describe, it, expect } from 'vitest';
import { surveysPastRetention, wholeMonthsBetween } from '../../src/app/retention-reminder.ts';
import type { SurveySummary } from '../../src/model/survey.ts';

const survey = (id: string, updatedAt: string): SurveySummary => ({ id, title: `Survey ${id}`, site: '', buildingUse: 'school', updatedAt });

describe('retention reminder', () => {
  it('counts whole calendar months', () => {
    expect(wholeMonthsBetween(new Date('2025-01-10T09:00:00Z'), new Date('2026-02-01T09:00:00Z'))).toBe(12);
    expect(wholeMonthsBetween(new Date('2025-01-31T09:00:00Z'), new Date('2025-02-28T09:00:00Z'))).toBe(0);
    expect(wholeMonthsBetween(new Date('2025-01-10T09:00:00Z'), new Date('2025-02-10T09:00:00Z'))).toBe(1);
    expect(wholeMonthsBetween(new Date('2025-01-10T09:00:00Z'), new Date('2025-02-10T08:59:00Z'))).toBe(0);
    expect(wholeMonthsBetween(new Date('2026-03-01T00:00:00Z'), new Date('2026-02-01T00:00:00Z'))).toBe(0);
  });

  it('lists the surveys kept at least the chosen period, oldest first, and none without a period', () => {
    const list = [survey('a', '2025-06-01T09:00:00Z'), survey('b', '2024-11-20T09:00:00Z'), survey('c', '2026-01-30T09:00:00Z')];
    const now = new Date('2026-02-01T09:00:00Z');
    expect(surveysPastRetention(list, 6, now).map((p) => [p.survey.id, p.monthsKept])).toEqual([
      ['b', 14],
      ['a', 8],
    ]);
    expect(surveysPastRetention(list, 12, now).map((p) => p.survey.id)).toEqual(['b']);
    expect(surveysPastRetention(list, undefined, now)).toEqual([]);
  });
});
