/**
 * Which surveys have been kept longer than the surveyor chose to keep them: surveys hold
 * personal data about tenants' homes and pupils' rooms, and should not stay on a phone for ever.
 * A survey's age counts from its last change. No period chosen: no reminder.
 *
 * Example: surveysPastRetention([{ …, updatedAt: '2025-01-10T09:00:00Z' }], 12,
 * new Date('2026-02-01T09:00:00Z')) → that survey, kept 12 months.
 */
import type { SurveySummary } from '../model/survey.ts';

export interface PastRetention {
  survey: SurveySummary;
  /** Whole months since its last change. */
  monthsKept: number;
}

/** Whole calendar months from `from` to `to` (0 within the first month). Example: 10 Jan 2025 → 1 Feb 2026 = 12. */
export function wholeMonthsBetween(from: Date, to: Date): number {
  const months = (to.getUTCFullYear() - from.getUTCFullYear()) * 12 + (to.getUTCMonth() - from.getUTCMonth());
  const notYet = to.getUTCDate() < from.getUTCDate() || (to.getUTCDate() === from.getUTCDate() && to.getTime() % 86_400_000 < from.getTime() % 86_400_000);
  return Math.max(0, months - (notYet ? 1 : 0));
}

/** Surveys last changed `retentionMonths` or more months before `now`, oldest first. */
export function surveysPastRetention(surveys: readonly SurveySummary[], retentionMonths: number | undefined, now: Date): PastRetention[] {
  if (retentionMonths === undefined) return [];
  return surveys
    .map((survey) => ({ survey, monthsKept: wholeMonthsBetween(new Date(survey.updatedAt), now) }))
    .filter((s) => s.monthsKept >= retentionMonths)
    .sort((a, b) => Date.parse(a.survey.updatedAt) - Date.parse(b.survey.updatedAt));
}
