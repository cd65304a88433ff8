/**
 * A room's priority in four plain levels of our own, text first (colour, if any, is the
 * screen's business and never the only cue), with reasons in plain sentences that keep FACTS
 * (what was seen or measured) apart from OPINION (estimated, predicted or assumed), and never
 * put damp or stale air down to the occupants' way of life (practice.md §3).
 *
 *   act-now           "Act now"           a safety item: someone could be hurt (CO, fumes, a blocked
 *                                          combustion-air vent, a dead fan where mould grows)
 *   act-within-weeks  "Act within weeks"  mould seen; a rule the room must meet is not met; mould
 *                                          predicted even at the favourable end
 *   plan-improvement  "Plan an improvement" below a benchmark or guidance for new work; a result
 *                                          that the uncertainty leaves open; condensation on glass;
 *                                          extra air needed for a target
 *   no-action-found   "No action found"   every check met with its whole range; no mould seen or predicted
 *
 * "No action found" is not "no problem": it says this survey found none, from these data.
 */
import type { GlazingVerdict, RoomMouldVerdict } from './room-moisture.ts';
import type { CriterionCheck, EvidenceBasis } from './judge-criterion.ts';
import type { SafetyItem } from './safety-items.ts';
import { litresPerSecond, roundToStep } from '../units.ts';

export type PriorityLevel = 'act-now' | 'act-within-weeks' | 'plan-improvement' | 'no-action-found';

/** The levels in order, with their words and meaning. */
export const PRIORITY_LEVELS: readonly { level: PriorityLevel; words: string; meaning: string }[] = [
  { level: 'act-now', words: 'Act now', meaning: 'A safety item: someone could be hurt. Deal with it before anything else.' },
  { level: 'act-within-weeks', words: 'Act within weeks', meaning: 'Mould was seen, a rule the room must meet is not met, or mould is predicted even at the favourable end.' },
  { level: 'plan-improvement', words: 'Plan an improvement', meaning: 'Below a benchmark or guidance for new work, a result the uncertainty leaves open, or condensation on glass.' },
  { level: 'no-action-found', words: 'No action found', meaning: 'Every check was met across its whole range and no mould was seen or predicted, from these data.' },
];

/** A reason: a fact (seen or measured) or an opinion (estimated, predicted, assumed). */
export interface PriorityReason {
  kind: 'fact' | 'opinion';
  basis: EvidenceBasis;
  text: string;
}

/** What a room's priority is decided from. */
export interface PriorityInput {
  safety: readonly SafetyItem[];
  checks: readonly CriterionCheck[];
  mould: { verdict: RoomMouldVerdict; reason: string };
  glazing: { verdict: GlazingVerdict; reason: string };
  /** Extra supply a fix must add, m³/s, or null when no target was set. */
  extraNeeded_m3s: number | null;
}

/** The room's priority. */
export interface RoomPriority {
  level: PriorityLevel;
  words: string;
  reasons: PriorityReason[];
}

const kindOf = (basis: EvidenceBasis): PriorityReason['kind'] => (basis === 'measured' || basis === 'observed' ? 'fact' : 'opinion');

/** A check's value in the unit people read (ppm to 10, L/s to 0.5). */
function valueWords(check: CriterionCheck): string {
  const v = check.value;
  if (!v) return '';
  const fmt = (x: number | null): string => {
    if (x === null) return 'unknown';
    switch (check.metric) {
      case 'co2-absolute':
      case 'co2-above-outdoor':
        return `${roundToStep(x, 10)} ppm`;
      case 'surface-rh':
        return `${Math.round(x)} %`;
      case 'air-change-rate':
        return `${roundToStep(x * 3600, 0.1)} per hour`;
      default:
        return `${roundToStep(litresPerSecond(x), 0.5)} L/s`;
    }
  };
  const lo = fmt(v.favourable);
  const hi = fmt(v.unfavourable);
  return lo === hi ? lo : `${lo} to ${hi}`;
}

/** The plain words of a level. Example: priorityWords('act-now') = 'Act now'. */
export function priorityWords(level: PriorityLevel): string {
  return PRIORITY_LEVELS.find((l) => l.level === level)!.words;
}

/**
 * A room's priority and reasons (see the file note).
 * Example: a dead bathroom fan with mould seen → 'act-now', first reason
 * { kind: 'fact', basis: 'observed', text: 'The extract fan does not run and mould was seen in the room. …' }.
 */
export function roomPriority(input: PriorityInput): RoomPriority {
  const reasons: PriorityReason[] = [];
  for (const s of input.safety) reasons.push({ kind: 'fact', basis: 'observed', text: `${s.fact} ${s.action}` });
  const mouldSeen = input.mould.verdict === 'mould-observed';
  if (mouldSeen) reasons.push({ kind: 'fact', basis: 'observed', text: input.mould.reason });
  else if (input.mould.verdict === 'risk' || input.mould.verdict === 'uncertain') reasons.push({ kind: 'opinion', basis: 'predicted', text: input.mould.reason });
  if (input.glazing.verdict === 'observed') reasons.push({ kind: 'fact', basis: 'observed', text: input.glazing.reason });
  else if (input.glazing.verdict === 'condenses') reasons.push({ kind: 'opinion', basis: 'predicted', text: `Condensation on the glass is predicted in a typical coldest month. ${input.glazing.reason}` });
  // One check per group of alternatives: the most lenient row (largest margin), so a room below
  // EN 16798-1 category III is not also listed below I and II.
  const lenient = new Map<string, CriterionCheck>();
  for (const c of input.checks) {
    if (c.role !== 'limit' && c.role !== 'benchmark') continue;
    const cur = lenient.get(c.group);
    if (!cur || (c.margin?.atFavourable ?? Number.NEGATIVE_INFINITY) > (cur.margin?.atFavourable ?? Number.NEGATIVE_INFINITY)) lenient.set(c.group, c);
  }
  const kept = input.checks.filter((c) => lenient.get(c.group) === c);
  const failedLimit = kept.filter((c) => c.role === 'limit' && c.outcome === 'does-not-meet');
  const open = kept.filter((c) => c.outcome === 'uncertain' || (c.role === 'benchmark' && c.outcome === 'does-not-meet'));
  for (const c of [...failedLimit, ...open]) {
    const v = c.value;
    const basis: EvidenceBasis = v ? v.basis : 'observed';
    reasons.push({ kind: kindOf(basis), basis, text: v ? `${c.statement}: ${valueWords(c)} (${v.describe}).${c.settleBy ? ` ${c.settleBy}` : ''}` : `${c.statement}.` });
  }
  const extra = input.extraNeeded_m3s;
  if (extra !== null && extra > 0) {
    reasons.push({ kind: 'opinion', basis: 'estimated-from-measurements', text: `About ${roundToStep(litresPerSecond(extra), 0.5)} L/s more outdoor air is needed at the unfavourable end of the range in the worst weather case.` });
  }
  let level: PriorityLevel;
  if (input.safety.length > 0) level = 'act-now';
  else if (mouldSeen || failedLimit.length > 0 || input.mould.verdict === 'risk') level = 'act-within-weeks';
  else if (open.length > 0 || input.glazing.verdict === 'condenses' || input.glazing.verdict === 'observed' || input.mould.verdict === 'uncertain' || (extra !== null && extra > 0)) level = 'plan-improvement';
  else level = 'no-action-found';
  if (level === 'no-action-found') reasons.push({ kind: 'opinion', basis: 'predicted', text: 'No action was found from these data; this is not a statement that the room has no problem.' });
  return { level, words: priorityWords(level), reasons };
}
