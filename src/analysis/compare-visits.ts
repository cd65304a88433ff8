/**
 * Since last visit: every room of this survey beside the same room in the survey it started
 * from (rooms paired by `previousRoomId`, model/repeat-visit.ts), with what changed — supply,
 * steady CO2 in use, mould risk, priority — and whether each fix recommended last time was done.
 * The result is the plain object the report's "since last visit" section and the room screens
 * show; it holds figures, never sentences about people.
 *
 * Changed means the intervals do not overlap: a supply whose 95 % intervals then and now
 * overlap is "no clear change" however far the central values moved; a figure without an
 * interval is "not compared", and so is a figure measured one visit and predicted the other
 * (`basisChanged`): that compares two methods, not the room — measure again to compare. Mould risk is compared on the coldest wall's surface
 * RH range (favourable to unfavourable end) when both visits have it, else on the verdict;
 * priority on its level. Both come from the judgement (judgement-facts.ts): without one they are
 * "not compared".
 *
 * Pure: no clock, no storage; SI units (m³/s, ppm, %).
 *
 * Example: a classroom whose supply was 60–90 L/s and is now 140–190 L/s, with steady CO2 from
 * 1,900–2,400 ppm to 1,100–1,300 ppm, gives supply 'higher' (better) and steadyCo2 'lower' (better).
 */
import type { DocumentRoom, SurveyDocument } from '../model/survey-document.ts';
import type { AnalysisResults, Basis, Figure, Ranged, RoomResults } from './results.ts';
import { fixFollowUp, type FixFollowUp } from './fix-follow-up.ts';
import { judgementFacts, MOULD_ORDER, PRIORITY_ORDER, type JudgementFacts } from './judgement-facts.ts';

/** 'higher' and 'lower' only when the intervals do not overlap. */
export type FigureOutcome = 'higher' | 'lower' | 'no-clear-change' | 'not-compared';

export interface FigureChange {
  before: (Ranged & { basis: Basis | null }) | null;
  after: (Ranged & { basis: Basis | null }) | null;
  outcome: FigureOutcome;
  /** True when the change is for the better, false for the worse, null when there is none. */
  better: boolean | null;
  /** Measured one visit, predicted (or assumed) the other. */
  basisChanged: boolean;
}

export type LevelOutcome = 'better' | 'worse' | 'same' | 'not-compared';

export interface LevelChange {
  before: string | null;
  after: string | null;
  outcome: LevelOutcome;
}

export interface MouldChange extends LevelChange {
  /** The coldest wall's surface RH, %, compared by intervals, when both visits have it. */
  wallSurfaceRh_pct: FigureChange | null;
}

export type FixesDone = 'done' | 'partly-done' | 'not-done' | 'no-fix-recommended' | 'not-judged';

export interface RoomChange {
  roomId: string;
  /** Null for a room new on this visit. */
  previousRoomId: string | null;
  name: string;
  clientRef: string;
  supply_m3s: FigureChange;
  steadyCo2_ppm: FigureChange;
  mouldRisk: MouldChange;
  priority: LevelChange;
  /** Each fix recommended last visit, and whether it was done. */
  fixes: FixFollowUp[];
  /** Done when any recommended option was done (they are alternatives). */
  fixesDone: FixesDone;
  /** better / worse when every clear change points one way; mixed when they disagree. */
  overall: 'better' | 'worse' | 'mixed' | 'no-clear-change' | 'new-room';
}

export interface VisitComparison {
  surveyId: string;
  previousSurveyId: string;
  previousTitle: string;
  /** When each visit started (the first visit's start, else the survey's creation), ISO. */
  previousDate: string;
  currentDate: string;
  rooms: RoomChange[];
  /** Rooms of last visit with no room on this one. */
  roomsNotRevisited: { roomId: string; name: string; clientRef: string }[];
  counts: Record<RoomChange['overall'], number>;
}

export interface VisitInput {
  document: SurveyDocument;
  results: AnalysisResults;
}

const rangedOf = (figure: Figure | Ranged | null, basis: Basis | null = null) =>
  figure ? { value: figure.value, low: figure.low, high: figure.high, basis: 'basis' in figure ? figure.basis : basis } : null;

/** Compare two ranged figures by the overlap rule; `higherIsBetter` says which way is better. */
export function compareFigures(before: FigureChange['before'], after: FigureChange['after'], higherIsBetter: boolean): FigureChange {
  const basisChanged = !!before && !!after && (before.basis === 'measured') !== (after.basis === 'measured');
  const known = (r: FigureChange['before']): r is NonNullable<FigureChange['before']> & { low: number; high: number } =>
    !!r && r.low !== null && r.high !== null;
  // A measurement against a prediction compares two methods, not the room: measure again to compare.
  if (!known(before) || !known(after) || basisChanged) return { before, after, outcome: 'not-compared', better: null, basisChanged };
  const outcome: FigureOutcome = after.low > before.high ? 'higher' : after.high < before.low ? 'lower' : 'no-clear-change';
  const better = outcome === 'no-clear-change' ? null : (outcome === 'higher') === higherIsBetter;
  return { before, after, outcome, better, basisChanged };
}

/** Compare two levels on a scale listed worst first (unknown levels: same or not compared). */
function compareLevels(before: string | null, after: string | null, worstFirst: readonly string[]): LevelChange {
  if (before === null || after === null) return { before, after, outcome: 'not-compared' };
  if (before === after) return { before, after, outcome: 'same' };
  const [b, a] = [worstFirst.indexOf(before), worstFirst.indexOf(after)];
  if (b < 0 || a < 0) return { before, after, outcome: 'not-compared' };
  return { before, after, outcome: a > b ? 'better' : 'worse' };
}

function mouldChange(before: JudgementFacts['mould'], after: JudgementFacts['mould']): MouldChange {
  const levels = compareLevels(before?.verdict ?? null, after?.verdict ?? null, MOULD_ORDER);
  const wall =
    before?.wallSurfaceRh_pct && after?.wallSurfaceRh_pct
      ? compareFigures({ ...before.wallSurfaceRh_pct, basis: 'predicted' }, { ...after.wallSurfaceRh_pct, basis: 'predicted' }, false)
      : null;
  if (!wall || wall.outcome === 'not-compared' || levels.before === 'mould-observed' || levels.after === 'mould-observed') {
    return { ...levels, wallSurfaceRh_pct: wall };
  }
  const outcome: LevelOutcome = wall.better === null ? 'same' : wall.better ? 'better' : 'worse';
  return { ...levels, outcome, wallSurfaceRh_pct: wall };
}

function fixesDoneOf(judged: boolean, fixes: FixFollowUp[]): FixesDone {
  if (!judged) return 'not-judged';
  if (fixes.length === 0) return 'no-fix-recommended';
  if (fixes.some((f) => f.status === 'done')) return 'done';
  return fixes.some((f) => f.status === 'partly-done') ? 'partly-done' : 'not-done';
}

function overallOf(changes: readonly (boolean | null)[]): RoomChange['overall'] {
  const clear = changes.filter((b): b is boolean => b !== null);
  if (clear.length === 0) return 'no-clear-change';
  if (clear.every(Boolean)) return 'better';
  return clear.some(Boolean) ? 'mixed' : 'worse';
}

function roomChange(
  room: DocumentRoom,
  now: RoomResults,
  previous: { room: DocumentRoom; results: RoomResults } | null,
): RoomChange {
  const base = { roomId: room.id, previousRoomId: previous?.room.id ?? null, name: room.name, clientRef: room.clientRef };
  const after = judgementFacts(now);
  const supplyNow = rangedOf(now.headline.supply_m3s);
  const co2Now = rangedOf(now.headline.steadyLevel_ppm);
  if (!previous) {
    const unpaired = (r: FigureChange['after']): FigureChange => ({ before: null, after: r, outcome: 'not-compared', better: null, basisChanged: false });
    return {
      ...base,
      supply_m3s: unpaired(supplyNow),
      steadyCo2_ppm: unpaired(co2Now),
      mouldRisk: { before: null, after: after.mould?.verdict ?? null, outcome: 'not-compared', wallSurfaceRh_pct: null },
      priority: { before: null, after: after.priority?.level ?? null, outcome: 'not-compared' },
      fixes: [],
      fixesDone: 'no-fix-recommended',
      overall: 'new-room',
    };
  }
  const before = judgementFacts(previous.results);
  const supply = compareFigures(rangedOf(previous.results.headline.supply_m3s), supplyNow, true);
  const co2 = compareFigures(rangedOf(previous.results.headline.steadyLevel_ppm), co2Now, false);
  const mould = mouldChange(before.mould, after.mould);
  const priority = compareLevels(before.priority?.level ?? null, after.priority?.level ?? null, PRIORITY_ORDER);
  const fixes = before.fixes.map((fix) => fixFollowUp(fix, previous.room, room));
  const levelBetter = (c: LevelChange) => (c.outcome === 'better' ? true : c.outcome === 'worse' ? false : null);
  return {
    ...base,
    supply_m3s: supply,
    steadyCo2_ppm: co2,
    mouldRisk: mould,
    priority,
    fixes,
    fixesDone: fixesDoneOf(before.judged, fixes),
    overall: overallOf([supply.better, co2.better, levelBetter(mould), levelBetter(priority)]),
  };
}

/** When a survey's visit started: the first visit, else when the survey was made. */
function visitDate(doc: SurveyDocument): string {
  return doc.survey.visits[0]?.start ?? doc.survey.createdAt;
}

/** Every room of `current` compared with its room in `previous`. */
export function compareVisits(previous: VisitInput, current: VisitInput): VisitComparison {
  const resultsOf = (input: VisitInput) => new Map(input.results.rooms.map((r) => [r.roomId, r]));
  const [previousResults, currentResults] = [resultsOf(previous), resultsOf(current)];
  const previousRooms = new Map(previous.document.rooms.map((r) => [r.id, r]));
  const paired = new Set<string>();
  const rooms = current.document.rooms.flatMap((room) => {
    const now = currentResults.get(room.id);
    if (!now) return [];
    const before = room.previousRoomId === undefined ? undefined : previousRooms.get(room.previousRoomId);
    const beforeResults = before && previousResults.get(before.id);
    if (before && beforeResults) paired.add(before.id);
    return [roomChange(room, now, before && beforeResults ? { room: before, results: beforeResults } : null)];
  });
  const counts: VisitComparison['counts'] = { better: 0, worse: 0, mixed: 0, 'no-clear-change': 0, 'new-room': 0 };
  for (const r of rooms) counts[r.overall] += 1;
  return {
    surveyId: current.document.survey.id,
    previousSurveyId: previous.document.survey.id,
    previousTitle: previous.document.survey.title,
    previousDate: visitDate(previous.document),
    currentDate: visitDate(current.document),
    rooms,
    roomsNotRevisited: previous.document.rooms
      .filter((r) => !paired.has(r.id))
      .map((r) => ({ roomId: r.id, name: r.name, clientRef: r.clientRef })),
    counts,
  };
}
