/**
 * The rooms to fix, in order. With the judgement: by priority (safety first), then urgency, then
 * the outdoor air per person at the unfavourable end of its range. Without it: by that figure
 * alone (least air per person first; rooms with no per-person figure last, in survey order),
 * and every row says it is not judged. The order uses the analysis's figures as they are; the
 * printed values are rounded by report-figure.ts.
 *
 * Example: for the demo school without a judgement, Classroom B2 (predicted, 0.6–2 L/s per person)
 * ranks before Classroom B3 (measured, 0.9–1.2) and Classroom B1 (measured, 1.7–2.1).
 */
import type { AnalysisResults, RoomResults } from '../analysis/results.ts';
import { roomUseLabel, type RoomUse } from '../core/room-uses.ts';
import { roundToStep } from '../core/units.ts';
import type { SurveyDocument } from '../model/survey-document.ts';
import { metricKind, periodWords, statusWords } from './criterion-words.ts';
import { REPORT_PRIORITIES, type ReportCheckView, type ReportJudgementView, type ReportPriority, type ReportUrgency } from './judgement-view.ts';
import { displayNumber, rangeText, reportFigure } from './report-figure.ts';
import type { RankedRoom } from './report-model.ts';
import { roomPlace } from './room-place.ts';

/** Priority in words, text first (never colour alone): the judgement's own words. */
export const PRIORITY_WORDS: Record<ReportPriority | 'not-judged', string> = {
  ...(Object.fromEntries(REPORT_PRIORITIES.map((p) => [p.level, p.words])) as Record<ReportPriority, string>),
  'not-judged': 'Not judged',
};

export const URGENCY_WORDS: Record<ReportUrgency | 'not-judged', string> = {
  immediate: 'immediately',
  weeks: 'within weeks',
  planned: 'in planned work',
  none: 'no action needed',
  'not-judged': 'not judged',
};

/** The order basis when the judgement is not available. */
export const UNJUDGED_ORDER =
  'The criteria judgement was not available when this report was made: no room is passed or failed here. Rooms are listed by outdoor air per person at the low end of its range, least first; rooms without occupants come last.';

/** The figure rooms are ordered by: per-person supply at the low end, m³/s (null: none). */
function orderFigure(room: RoomResults): number | null {
  const f = room.headline.supplyPerPerson_m3s;
  return f ? (f.low ?? f.value) : null;
}

function byFigure(a: RoomResults, b: RoomResults): number {
  const fa = orderFigure(a);
  const fb = orderFigure(b);
  if (fa === null || fb === null) return (fa === null ? 1 : 0) - (fb === null ? 1 : 0);
  return fa - fb;
}

/** A check's value or limit in display units. */
/** A share of floor area (openable windows for purge) reads as a percentage. */
const fraction = (x: number | null) => (x === null ? '—' : `${roundToStep(x * 100, 0.1)} % of floor area`);

/** A criterion's limit (SI, in its metric's unit) in words. Example: ('co2-absolute', 1500) = '1500 ppm'. */
export function limitText(metric: ReportCheckView['metric'], limit: number | null): string {
  if (limit === null) return '—';
  const kind = metricKind(metric);
  if (!kind) return metric === 'opening-area-fraction' ? fraction(limit) : String(limit);
  const figure = reportFigure('', { value: limit, low: null, high: null }, kind);
  return `${metric === 'co2-above-outdoor' ? 'above outdoor ' : ''}${rangeText(figure.value, null, null, figure.unit)}`;
}

export function checkValueText(check: ReportCheckView, which: 'value' | 'limit'): string {
  const kind = metricKind(check.metric);
  if (which === 'limit') return limitText(check.metric, check.limit);
  if (!check.value) return '—';
  if (!kind) return check.metric === 'opening-area-fraction' ? fraction(check.value.value ?? check.value.low) : String(check.value.value ?? '—');
  const v = reportFigure('', check.value, kind);
  return v.text;
}

/** The check a row shows: the first short, then uncertain, then any. */
export function leadingCheck(checks: readonly ReportCheckView[]): ReportCheckView | null {
  return checks.find((c) => c.outcome === 'short') ?? checks.find((c) => c.outcome === 'uncertain') ?? checks[0] ?? null;
}

/** Rank every room (see the file note). */
export function rankRooms(doc: SurveyDocument, results: AnalysisResults, judgement: ReportJudgementView | null): { basis: string; rows: RankedRoom[] } {
  const docRoom = (id: string) => doc.rooms.find((r) => r.id === id)!;
  const rooms = results.rooms.map((r, i) => ({ r, i }));
  rooms.sort((x, y) => {
    // With a judgement, its ranking is the order (safety, priority, severity): the report never re-ranks.
    const jx = judgement?.rooms.get(x.r.roomId);
    const jy = judgement?.rooms.get(y.r.roomId);
    if (jx && jy) return jx.rank - jy.rank;
    return byFigure(x.r, y.r) || x.i - y.i;
  });
  const rows = rooms.map(({ r }, index): RankedRoom => {
    const perPerson = r.headline.supplyPerPerson_m3s;
    const figure = perPerson ? reportFigure('Outdoor air per person', perPerson, 'flowPerPerson') : reportFigure('Outdoor air', r.headline.supply_m3s, 'flow');
    const common = { rank: index + 1, roomId: r.roomId, place: roomPlace(doc, docRoom(r.roomId)), use: roomUseLabel(r.use as RoomUse) };
    const j = judgement?.rooms.get(r.roomId);
    if (!j) {
      return {
        ...common,
        priority: 'not-judged',
        priorityText: PRIORITY_WORDS['not-judged'],
        urgency: 'not-judged',
        criterion: 'Not judged (judgement not available)',
        value: `${figure.label}: ${figure.text}`,
        limit: '—',
        fix: r.suggestion ? 'Measure first: see the room sheet' : '—',
      };
    }
    const check = leadingCheck(j.checks);
    const fix = j.fixes[0];
    return {
      ...common,
      priority: j.priority,
      priorityText: j.priorityWords,
      urgency: j.urgency,
      criterion: check ? `${check.title} (${statusWords(check.status)}; ${periodWords(check.period)})` : '—',
      value: check ? checkValueText(check, 'value') : figure.text,
      limit: check ? checkValueText(check, 'limit') : '—',
      fix: fix
        ? `${fix.title}${fix.extraSupply_m3s !== null ? `: about ${displayNumber(fix.extraSupply_m3s, 'flow')} L/s more` : ''}${fix.items.length ? ` (${fix.items.join('; ')})` : ''}`
        : '—',
    };
  });
  return {
    basis: judgement ? 'Rooms are listed in the judgement’s order: safety items first, then priority, then severity (outdoor air short of the target times the people affected, plus mould seen).' : UNJUDGED_ORDER,
    rows,
  };
}
