/**
 * The few facts of a room's judgement that a comparison between visits reads — its priority,
 * its mould risk and the fixes it recommended — taken from `RoomResults.judgement` in ONE place.
 * The judgement is filled by the criteria engine; where it is absent (null, or an older result
 * without it) every fact here is null or empty, and the comparison says "not judged".
 *
 * Read structurally (the judgement's own types live with the criteria engine): priority
 * `{ level, words }` and `rank`; mould `moisture.mould.verdict` with the coldest wall's surface
 * RH at the favourable and unfavourable ends, `moisture.wallSurfaceRh_pct`, %; fixes
 * `fixes.options[]` and `fixes.supporting[]`, each `{ kind, title }`.
 *
 * Example: judgementFacts({ judgement: null }) = { judged: false, priority: null, mould: null, fixes: [] }.
 */
import type { Ranged } from './results.ts';

/** Priority levels from most to least urgent (the criteria engine's own ids). */
export const PRIORITY_ORDER: readonly string[] = ['act-now', 'act-within-weeks', 'plan-improvement', 'no-action-found'];
/** Mould verdicts from worst to best; 'not-established' is not on the scale. */
export const MOULD_ORDER: readonly string[] = ['mould-observed', 'risk', 'uncertain', 'no-risk-predicted'];

export interface JudgementFacts {
  /** False when the room carries no judgement at all. */
  judged: boolean;
  priority: { level: string; words: string; rank: number | null } | null;
  /** Mould verdict, and the coldest wall's monthly-mean surface RH, %, low = favourable end. */
  mould: { verdict: string; wallSurfaceRh_pct: Ranged | null } | null;
  /** Fixes recommended (sized options first, then supporting work). */
  fixes: { kind: string; title: string }[];
}

interface JudgementShape {
  priority?: { level?: unknown; words?: unknown };
  rank?: unknown;
  moisture?: { mould?: { verdict?: unknown }; wallSurfaceRh_pct?: { favourable?: unknown; central?: unknown; unfavourable?: unknown } };
  fixes?: { options?: { kind?: unknown; title?: unknown }[]; supporting?: { kind?: unknown; title?: unknown }[] } | null;
}

const numberOrNull = (x: unknown): number | null => (typeof x === 'number' && Number.isFinite(x) ? x : null);

export function judgementFacts(room: { judgement: unknown }): JudgementFacts {
  const j = (typeof room.judgement === 'object' && room.judgement !== null ? room.judgement : {}) as JudgementShape;
  const level = j.priority?.level;
  const verdict = j.moisture?.mould?.verdict;
  const wall = j.moisture?.wallSurfaceRh_pct;
  const listed = [...(j.fixes?.options ?? []), ...(j.fixes?.supporting ?? [])];
  return {
    judged: typeof room.judgement === 'object' && room.judgement !== null,
    priority: typeof level === 'string' ? { level, words: typeof j.priority?.words === 'string' ? j.priority.words : level, rank: numberOrNull(j.rank) } : null,
    mould:
      typeof verdict === 'string'
        ? {
            verdict,
            wallSurfaceRh_pct: wall ? { value: numberOrNull(wall.central), low: numberOrNull(wall.favourable), high: numberOrNull(wall.unfavourable) } : null,
          }
        : null,
    fixes: listed.flatMap((f) => (typeof f.kind === 'string' ? [{ kind: f.kind, title: typeof f.title === 'string' ? f.title : f.kind }] : [])),
  };
}
