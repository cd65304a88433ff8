/**
 * Engine III for an area: for a dwelling, the whole-dwelling checks (supply against the rate for
 * its bedrooms and its floor area — for an existing home a labelled benchmark, "below what current
 * guidance sets for new homes", never a failure), the supply–extract balance of its system, the
 * extra supply it needs at the unfavourable end, its safety items and its priority (the most
 * urgent of its rooms', or of its own checks when they are worse).
 *
 * The whole-dwelling rate by bedrooms is the row for the recorded number of bedrooms (more than
 * five: the five-bedroom row plus 6 L/s per further bedroom, as the row's note says); without a
 * bedroom count only the per-m² rate is judged, with a caution.
 * Example: Flat 3 (2 bedrooms, 58 m²), surveyed rooms 4–8 L/s → benchmark 25 L/s "below what
 * current guidance sets for new homes", extra needed about 21 L/s.
 */
import type { EditedCriterion } from '../core/criteria/criterion-edits.ts';
import { selectCriteria } from '../core/criteria/select-criteria.ts';
import { judgeCriterion, type CriterionCheck } from '../core/judgement/judge-criterion.ts';
import { PRIORITY_LEVELS, priorityWords, type PriorityLevel } from '../core/judgement/priority.ts';
import { fromLitresPerSecond, litresPerSecond, roundToStep } from '../core/units.ts';
import type { Area } from '../model/area.ts';
import type { Survey } from '../model/survey.ts';
import { analysisWarning, fromMoistureWarning, uniqueWarnings, type AnalysisWarning } from './analysis-warnings.ts';
import type { AreaJudgement, AreaResults, RoomResults } from './results.ts';

const LEVEL_ORDER = new Map(PRIORITY_LEVELS.map((l, i) => [l.level, i]));
const EXTRA_BEDROOM = fromLitresPerSecond(6);

/** The whole-dwelling rows for a number of bedrooms (more than 5: the 5-bed row + 6 L/s each). */
function forBedrooms(criteria: readonly EditedCriterion[], bedrooms: number | null): EditedCriterion[] {
  return criteria.flatMap((c) => {
    if (c.bedrooms === undefined) return [c];
    if (bedrooms === null) return [];
    if (c.bedrooms === bedrooms) return [c];
    if (bedrooms > 5 && c.bedrooms === 5 && c.limit !== null) return [{ ...c, limit: c.limit + EXTRA_BEDROOM * (bedrooms - 5), title: `${c.title} plus 6 L/s for each of ${bedrooms - 5} further bedroom(s)` }];
    return [];
  });
}

/**
 * The judgement of one area from its figures and its rooms' judgements.
 */
export function judgeArea(area: Area, a: Omit<AreaResults, 'judgement'>, rooms: readonly RoomResults[], survey: Survey, criteria: readonly EditedCriterion[]): AreaJudgement {
  const warnings: AnalysisWarning[] = [];
  const own = rooms.filter((r) => a.roomIds.includes(r.roomId)).sort((x, y) => (x.roomId < y.roomId ? -1 : 1));
  const safety = own.flatMap((r) => r.judgement.safety.map((item) => ({ roomId: r.roomId, item })));
  let checks: CriterionCheck[] = [];
  let extra: number | null = null;
  if (area.dwelling) {
    const selection = selectCriteria(
      { buildingUse: 'dwelling', roomUse: 'whole-dwelling', situation: survey.stage ?? 'existing', ventilation: survey.ventilation ?? 'unknown' },
      forBedrooms(criteria, a.bedrooms),
    );
    warnings.push(...selection.warnings.map(fromMoistureWarning));
    if (a.bedrooms === null) warnings.push(analysisWarning('bedrooms-unknown', 'caution', 'The number of bedrooms is not recorded, so the whole-dwelling rate by bedrooms is not judged.'));
    const s = a.supply_m3s;
    const f = a.supplyPerFloorArea_m3sm2;
    const evidence = [
      { metric: 'whole-dwelling-flow' as const, period: 'continuous' as const, favourable: s.high, central: s.value, unfavourable: s.low, basis: s.basis, describe: `the whole-dwelling supply (${s.method})` },
      { metric: 'flow-per-floor-area' as const, period: 'continuous' as const, favourable: f.high, central: f.value, unfavourable: f.low, basis: s.basis, describe: 'the whole-dwelling supply per m² of floor' },
    ];
    const ctx = { evidence, outdoor_ppm: null, occupants: null, floorArea_m2: a.floorArea_m2.value ?? 0, settleBy: 'Measuring the rooms not yet measured (a decay test in each, or fan flows) would narrow the whole-dwelling supply.' };
    checks = selection.selected.filter((x) => x.role !== 'duty').map((x) => judgeCriterion(x, ctx));
    const needs = checks.flatMap((c) => {
      if (c.limit === null || c.outcome === 'not-assessed') return [];
      if (c.metric === 'whole-dwelling-flow') return [c.limit];
      if (c.metric === 'flow-per-floor-area') return [c.limit * (a.floorArea_m2.value ?? 0)];
      return [];
    });
    if (needs.length > 0 && s.low !== null) extra = Math.max(0, Math.max(...needs) - s.low);
  }
  const balance = a.balance
    ? `Dwelling system: supply ${roundToStep(litresPerSecond(a.balance.supply_m3s.value ?? 0), 0.5)} L/s, extract ${roundToStep(litresPerSecond(a.balance.extract_m3s.value ?? 0), 0.5)} L/s; ${roundToStep(litresPerSecond(a.balance.madeUpThroughEnvelope_m3s), 0.5)} L/s made up through the fabric and vents.`
    : null;
  let level: PriorityLevel = own.reduce<PriorityLevel>((worst, r) => (LEVEL_ORDER.get(r.judgement.priority.level)! < LEVEL_ORDER.get(worst)! ? r.judgement.priority.level : worst), 'no-action-found');
  const reasons: string[] = [];
  if (safety.length > 0) reasons.push(`${safety.length} safety item(s) in its rooms.`);
  for (const c of checks) if (c.outcome === 'does-not-meet' || c.outcome === 'uncertain') reasons.push(`${c.statement}.`);
  if (extra !== null && extra > 0) {
    reasons.push(`About ${roundToStep(litresPerSecond(extra), 0.5)} L/s more outdoor air for the whole home at the unfavourable end (rooms not surveyed add air not counted).`);
    if (level === 'no-action-found') level = 'plan-improvement';
  }
  return { checks, extraNeeded_m3s: extra, balance, safety, priority: { level, words: priorityWords(level), reasons }, warnings: uniqueWarnings(warnings) };
}
