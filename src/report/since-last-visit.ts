/**
 * The report's "Since the last visit" section: compareVisits' comparison (analysis/compare-visits.ts)
 * put into words and rows. It formats the comparison's numbers (through reportFigure) and its
 * outcomes; it never compares anything itself.
 *
 * Example: a classroom whose supply went from 60–90 L/s to 140–190 L/s gives the row
 * ['Block B / Classroom B3', 'about 75 L/s (range 60–90), measured → about 165 L/s (range 140–190),
 * measured: higher / better', …].
 */
import type { FigureChange, LevelChange, RoomChange, VisitComparison } from '../analysis/compare-visits.ts';
import type { FollowUpStatus } from '../analysis/fix-follow-up.ts';
import type { QuantityKind } from '../core/units.ts';
import { recordedDate } from './recorded-time.ts';
import { reportFigure } from './report-figure.ts';

export interface SinceLastVisitRoom {
  room: string;
  supply: string;
  steadyCo2: string;
  mouldRisk: string;
  priority: string;
  fixes: string[];
  overall: string;
}

export interface SinceLastVisitSection {
  /** Which survey this visit is compared with, and when each took place. */
  basis: string;
  rooms: SinceLastVisitRoom[];
  notRevisited: string[];
  /** The overall outcome counted over the rooms, in words. */
  counts: [string, number][];
  /** How "changed" is decided. */
  rule: string;
}

const OVERALL_WORDS: Record<RoomChange['overall'], string> = {
  better: 'better',
  worse: 'worse',
  mixed: 'mixed: some better, some worse',
  'no-clear-change': 'no clear change',
  'new-room': 'new room this visit',
};

const FOLLOW_UP_WORDS: Record<FollowUpStatus, string> = {
  done: 'done',
  'partly-done': 'partly done',
  'not-done': 'not done',
  'cannot-tell': 'cannot tell',
};

const FIXES_DONE_WORDS: Record<RoomChange['fixesDone'], string> = {
  done: 'done',
  'partly-done': 'partly done',
  'not-done': 'not done',
  'no-fix-recommended': 'no fix recommended last time',
  'not-judged': 'not judged (no criteria judgement last time)',
};

const words = (level: string | null) => (level === null ? 'not known' : level.replace(/-/g, ' '));

function side(figure: FigureChange['before'], kind: QuantityKind): string {
  if (!figure) return 'none';
  const { text } = reportFigure('', { value: figure.value, low: figure.low, high: figure.high, ...(figure.basis ? { basis: figure.basis } : {}) }, kind);
  return text;
}

/** "then → now: outcome". Example: 'about 75 L/s (range 60–90), measured → …: higher / better'. */
export function figureChangeText(change: FigureChange, kind: QuantityKind): string {
  const outcome =
    change.outcome === 'not-compared'
      ? change.basisChanged
        ? 'not compared (measured one visit, predicted the other: measure again to compare)'
        : 'not compared'
      : change.outcome === 'no-clear-change'
        ? 'no clear change'
        : `${change.outcome} / ${change.better ? 'better' : 'worse'}`;
  return `${side(change.before, kind)} → ${side(change.after, kind)}: ${outcome}`;
}

function levelText(change: LevelChange): string {
  const outcome = change.outcome === 'not-compared' ? 'not compared' : change.outcome;
  return `${words(change.before)} → ${words(change.after)}: ${outcome}`;
}

/** The section (see the file note). */
export function sinceLastVisitSection(comparison: VisitComparison): SinceLastVisitSection {
  const place = (r: { name: string; clientRef: string }) => (r.clientRef ? `${r.name} (${r.clientRef})` : r.name);
  return {
    basis: `Compared with “${comparison.previousTitle}”, visited ${recordedDate(comparison.previousDate)}; this visit ${recordedDate(comparison.currentDate)}.`,
    rooms: comparison.rooms.map((r) => ({
      room: place(r),
      supply: figureChangeText(r.supply_m3s, 'flow'),
      steadyCo2: figureChangeText(r.steadyCo2_ppm, 'co2'),
      mouldRisk: levelText(r.mouldRisk),
      priority: levelText(r.priority),
      fixes: r.fixes.length
        ? r.fixes.map((f) => `${f.title}: ${FOLLOW_UP_WORDS[f.status]}${f.evidence ? ` (${f.evidence})` : ''}`)
        : [`Fixes: ${FIXES_DONE_WORDS[r.fixesDone]}`],
      overall: OVERALL_WORDS[r.overall],
    })),
    notRevisited: comparison.roomsNotRevisited.map(place),
    counts: (Object.keys(OVERALL_WORDS) as RoomChange['overall'][]).map((k) => [OVERALL_WORDS[k], comparison.counts[k]]),
    rule:
      'A figure counts as higher or lower only when its ranges then and now do not overlap; overlapping ranges are “no clear change”. A figure measured on one visit and predicted on the other is not compared.',
  };
}
