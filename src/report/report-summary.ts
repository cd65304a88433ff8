/**
 * The summary a budget holder can act on: safety items first (kept apart from improvements),
 * then the worst rooms, what to do and how soon, and counts by priority. From the judgement when
 * it is available; without it, the safety items are the observations recorded on the day, the
 * worst rooms are those with the least outdoor air per person, the actions are the measurements
 * that would settle each predicted room, and the summary says no verdict is given.
 *
 * Example: for the demo flats without a judgement, the safety list holds "Flat 7 / Kitchen: Gas
 * boiler (open-flued): …" items recorded on the day, and counts show "Not judged: 4".
 */
import type { AnalysisResults } from '../analysis/results.ts';
import type { SurveyDocument } from '../model/survey-document.ts';
import type { ReportJudgementView, ReportUrgency } from './judgement-view.ts';
import type { RankedRoom, ReportSummary, SafetyLine } from './report-model.ts';
import { PRIORITY_WORDS, URGENCY_WORDS } from './room-ranking.ts';
import { roomPlace } from './room-place.ts';
import { roomSafetyLines } from './safety-observations.ts';

/** How many rooms the summary names as the worst. */
export const WORST_SHOWN = 5;

export function summaryOf(
  doc: SurveyDocument,
  results: AnalysisResults,
  ranked: readonly RankedRoom[],
  judgement: ReportJudgementView | null,
  screening: string,
): ReportSummary {
  const safety: SafetyLine[] = [];
  for (const room of doc.rooms) {
    const place = roomPlace(doc, room);
    for (const line of roomSafetyLines(room, judgement ? (judgement.rooms.get(room.id)?.safety ?? []) : null)) safety.push({ place, ...line });
  }
  const actions: ReportSummary['actions'] = [];
  if (judgement) {
    for (const row of ranked) {
      for (const fix of judgement.rooms.get(row.roomId)?.fixes ?? []) actions.push({ urgency: fix.urgency, text: `${row.place}: ${fix.title}` });
    }
    const order: ReportUrgency[] = ['immediate', 'weeks', 'planned', 'none'];
    actions.sort((a, b) => order.indexOf(a.urgency as ReportUrgency) - order.indexOf(b.urgency as ReportUrgency));
    // The safety items come before any improvement, and they are actions too.
    if (safety.length) actions.unshift({ urgency: 'immediate', text: 'The safety items above, before anything else: each says what to do and who should do it.' });
  } else {
    if (safety.length) actions.push({ urgency: 'not-judged', text: 'Have the safety items above checked by a competent engineer (gas, solid fuel or electrical as they concern).' });
    for (const row of ranked) {
      const room = results.rooms.find((r) => r.roomId === row.roomId)!;
      if (room.suggestion) actions.push({ urgency: 'not-judged', text: `${row.place}: no usable measurement yet. ${room.suggestion}` });
    }
  }
  const counts = new Map<string, number>();
  for (const row of ranked) counts.set(row.priorityText, (counts.get(row.priorityText) ?? 0) + 1);
  const measured = results.rooms.filter((r) => r.bestMeasuredSetId !== null).length;
  return {
    judgementAvailable: judgement !== null,
    basis: judgement
      ? 'Priorities, urgencies and fixes below are the judgement of each room against the criteria that apply to its use and situation (see the criteria table).'
      : 'The criteria judgement was not available when this report was made, so this summary gives no verdict on any room: it lists the safety items recorded on the day, the rooms with the least outdoor air per person, and the measurements that would settle the rooms that were not measured.',
    safety,
    worst: ranked.filter((r) => r.priority !== 'no-action-found').slice(0, WORST_SHOWN),
    actions,
    counts: [
      { label: 'Rooms surveyed', count: results.rooms.length },
      { label: 'Rooms with a usable measurement', count: measured },
      { label: 'Rooms with predictions only', count: results.rooms.length - measured },
      ...[...counts].map(([label, count]) => ({ label: `Priority: ${label}`, count })),
    ],
    screening,
  };
}
