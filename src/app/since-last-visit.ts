/**
 * Use case: what changed since last visit, for a survey started from an earlier one. Loads both
 * surveys (without photos), analyses both with the same options, and compares them room by room
 * (analysis/compare-visits.ts). The result is what the room screens and the report's "since last
 * visit" section show.
 *
 * 'none': the survey did not start from an earlier one; 'previous-gone': the earlier survey is
 * no longer on the device (restore it from a backup to compare).
 *
 * The analysis and comparison code is loaded only when there is an earlier visit to compare, so a
 * first visit's overview does not wait for it.
 */
import type { AnalysisOptions } from '../analysis/analyse-survey.ts';
import type { FigureChange, RoomChange, VisitComparison } from '../analysis/compare-visits.ts';

export type { RoomChange, VisitComparison };
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
  const [{ analyseSurvey }, { compareVisits }] = await Promise.all([import('../analysis/analyse-survey.ts'), import('../analysis/compare-visits.ts')]);
  const comparison = compareVisits(
    { document: previous, results: analyseSurvey(previous, options) },
    { document: current, results: analyseSurvey(current, options) },
  );
  return { status: 'compared', comparison };
}

const figureWords = (c: FigureChange) =>
  c.outcome === 'not-compared' ? 'not compared' : c.outcome === 'no-clear-change' ? 'no clear change' : `${c.outcome} (${c.better ? 'better' : 'worse'})`;

/**
 * One line for a room's card. Example: a classroom given more vents →
 * 'Since last visit: better. Supply higher (better), steady CO₂ lower (better).'
 */
export function roomChangeLine(change: RoomChange): string {
  if (change.overall === 'new-room') return 'Since last visit: a new room this time, nothing to compare.';
  const overall = change.overall === 'no-clear-change' ? 'no clear change' : change.overall;
  const levels = [
    ['priority', change.priority] as const,
    ['mould risk', change.mouldRisk] as const,
  ].flatMap(([label, c]) => (c.outcome === 'better' || c.outcome === 'worse' ? [`, ${label} ${c.outcome}`] : []));
  return `Since last visit: ${overall}. Supply ${figureWords(change.supply_m3s)}, steady CO₂ ${figureWords(change.steadyCo2_ppm)}${levels.join('')}.`;
}
