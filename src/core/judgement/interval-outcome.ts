/**
 * The outcome of comparing a value known only as an interval with a limit, and the margin at
 * each end. A result whose interval straddles the limit is "uncertain", never a pass or a fail
 * (practice.md §4 and §5: prefer "uncertain" over a false pass).
 *
 * The two ends are named by what they mean, not by size: the FAVOURABLE end is the one that
 * flatters the room (low CO2, high supply), the UNFAVOURABLE end the one that does not. A
 * missing end (null) is unknown: the room cannot be said to meet the limit at that end.
 *
 *     at-most:  meets if unfavourable ≤ limit;  does not meet if favourable > limit
 *     at-least: meets if unfavourable ≥ limit;  does not meet if favourable < limit
 *     otherwise uncertain.  Margin = limit − x (at-most) or x − limit (at-least): positive meets.
 *
 * Source: interval comparison (no published method); the rule follows practice.md §3
 * ("say which conclusions survive the uncertainty").
 */
import type { LimitDirection } from '../criteria/criterion.ts';

/** A judged outcome. */
export type CheckOutcome = 'meets' | 'does-not-meet' | 'uncertain' | 'not-assessed';

/** A value as an interval in its metric's SI unit: favourable and unfavourable ends, central when known. */
export interface JudgedInterval {
  favourable: number | null;
  central: number | null;
  unfavourable: number | null;
}

/** Signed margins to the limit (positive: on the right side), same unit as the limit. */
export interface CheckMargin {
  atFavourable: number | null;
  atUnfavourable: number | null;
}

/**
 * Outcome and margins of an interval against a limit.
 * Example: intervalOutcome({ favourable: 1200, central: 1500, unfavourable: 2100 }, 1750, 'at-most')
 * = { outcome: 'uncertain', margin: { atFavourable: 550, atUnfavourable: -350 } }.
 */
export function intervalOutcome(x: JudgedInterval, limit: number, direction: Exclude<LimitDirection, 'none'>): { outcome: Exclude<CheckOutcome, 'not-assessed'>; margin: CheckMargin } {
  const sign = direction === 'at-most' ? -1 : 1;
  const margin = (v: number | null) => (v === null ? null : sign * (v - limit));
  const m = { atFavourable: margin(x.favourable), atUnfavourable: margin(x.unfavourable) };
  if (m.atUnfavourable !== null && m.atUnfavourable >= 0) return { outcome: 'meets', margin: m };
  if (m.atFavourable !== null && m.atFavourable < 0) return { outcome: 'does-not-meet', margin: m };
  return { outcome: 'uncertain', margin: m };
}
