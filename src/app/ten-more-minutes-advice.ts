/**
 * What the guided test screen says beside "ten more minutes": keep going, worth waiting, or
 * little to gain. It never says "you can stop" while the fit itself warns that the decay is too
 * short or has too few readings, or while its interval still reaches down to no air at all (low
 * end at or below zero or unknown): ten projected minutes along a fit that weak prove nothing.
 * Otherwise the projection is worth waiting for when its interval is at least a fifth narrower.
 *
 * Example: a fit 2 (−2.7 to 8.3) m³/s with a 'short-decay' warning gives 'keep-going', whatever
 * the projection; a fit 0.03 (0.02–0.04) m³/s whose projection is 0.03 (0.025–0.035) m³/s gives
 * 'worth-waiting' (width 0.01 < 0.8 × 0.02).
 */
import type { Ranged } from '../analysis/results.ts';

export type TenMoreMinutesAdvice = 'keep-going' | 'worth-waiting' | 'little-to-gain';

/** Fit warnings that mean the test is not yet long or full enough to stop on. */
const TOO_EARLY: ReadonlySet<string> = new Set(['short-decay', 'too-few-readings']);

const width = (r: Ranged) => (r.low === null || r.high === null ? Infinity : r.high - r.low);

export function tenMoreMinutesAdvice(now: Ranged, projected: Ranged, warnings: readonly { code: string }[]): TenMoreMinutesAdvice {
  if (warnings.some((w) => TOO_EARLY.has(w.code)) || now.low === null || now.low <= 0) return 'keep-going';
  return width(projected) < 0.8 * width(now) ? 'worth-waiting' : 'little-to-gain';
}

/** The advice in words, as the screen shows it. */
export const TEN_MORE_MINUTES_WORDS: Record<TenMoreMinutesAdvice, string> = {
  'keep-going': 'Keep going: the test is too short to judge yet (see the notes above).',
  'worth-waiting': 'Worth waiting for: the interval narrows noticeably.',
  'little-to-gain': 'Little to gain: the interval hardly narrows (the meter and the outdoor level limit it), so you can stop.',
};
