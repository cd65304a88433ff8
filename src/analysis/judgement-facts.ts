/**
 * The few facts of a room's judgement that a comparison between visits reads — its priority,
 * its mould risk and the fixes it recommended — taken from `RoomResults.judgement` in ONE place.
 * The judgement is filled by the criteria engine; where it is absent (null, or an older result
 * without it) every fact here is null or empty, and the comparison says "not judged".
 *
 * Example: judgementFacts({ judgement: null }) = { judged: false, priority: null, mould: null, fixes: [] }.
 */
import { PRIORITY_LEVELS } from '../core/judgement/priority.ts';
import type { RoomMouldVerdict } from '../core/judgement/room-moisture.ts';
import type { Ranged, RoomJudgement } from './results.ts';

/** Priority levels from most to least urgent (the criteria engine's own order). */
export const PRIORITY_ORDER: readonly string[] = PRIORITY_LEVELS.map((p) => p.level);
/** Mould verdicts from worst to best; 'not-established' is not on the scale. */
export const MOULD_ORDER: readonly Exclude<RoomMouldVerdict, 'not-established'>[] = ['mould-observed', 'risk', 'uncertain', 'no-risk-predicted'];

export interface JudgementFacts {
  /** False when the room carries no judgement at all. */
  judged: boolean;
  priority: { level: string; words: string; rank: number | null } | null;
  /** Mould verdict, and the coldest wall's monthly-mean surface RH, %, low = favourable end. */
  mould: { verdict: string; wallSurfaceRh_pct: Ranged | null } | null;
  /** Fixes recommended (sized options first, then supporting work). */
  fixes: { kind: string; title: string }[];
}

/** The facts, or nothing when the room has no judgement (results made before it existed). */
export function judgementFacts(room: { judgement: RoomJudgement | null }): JudgementFacts {
  const j = room.judgement;
  if (!j) return { judged: false, priority: null, mould: null, fixes: [] };
  const wall = j.moisture.wallSurfaceRh_pct;
  return {
    judged: true,
    priority: { level: j.priority.level, words: j.priority.words, rank: j.rank },
    mould: { verdict: j.moisture.mould.verdict, wallSurfaceRh_pct: { value: wall.central, low: wall.favourable, high: wall.unfavourable } },
    fixes: [...(j.fixes?.options ?? []), ...(j.fixes?.supporting ?? [])].map((f) => ({ kind: f.kind, title: f.title })),
  };
}
