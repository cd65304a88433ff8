/**
 * Use case: what changed since last visit, for a survey started from an earlier one. Loads both
 * surveys (without photos), analyses both with the same options, and compares them room by room
 * (analysis/compare-visits.ts). The result is what the room screens and the report's "since last
 * visit" section show.
 *
 * 'none': the survey did not start from an earlier one; 'previous-gone': the earlier survey is
 * no longer on the device (restore it from a backup to compare).
 */
import { analyseSurvey, type AnalysisOptions } from '../analysis/analyse-survey.ts';
import { compareVisits, type VisitComparison } from '../analysis/compare-visits.ts';
import { loadSurvey } from '../store/load-survey.ts';
import { connection } from './storage-connection.ts';

export type SinceLastVisit =
  | { status: 'compared'; comparison: VisitComparison }
  | { status: 'none' }
  | { status: 'previous-gone'; previousSurveyId: string };

export async function sinceLastVisit(surveyId: string, options: AnalysisOptions = {}): Promise<SinceLastVisit> {
  const current = await loadSurvey(connection, surveyId, { photos: false });
  const previousId = current?.survey.previousSurveyId;
  if (!current || previousId === undefined) return { status: 'none' };
  const previous = await loadSurvey(connection, previousId, { photos: false });
  if (!previous) return { status: 'previous-gone', previousSurveyId: previousId };
  const comparison = compareVisits(
    { document: previous, results: analyseSurvey(previous, options) },
    { document: current, results: analyseSurvey(current, options) },
  );
  return { status: 'compared', comparison };
}
