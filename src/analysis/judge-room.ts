/**
 * Engine III for one room: which criteria apply and how it fares against each (without misuse),
 * its moisture and mould, its safety items, the supply it needs, sized safe fixes, and its
 * priority with reasons. Reads the room's analysis results; recomputes none of them.
 *
 * - Criteria: selectCriteria for the survey's building use, the survey's stage (new, refurbished
 *   or existing; existing when not recorded, flagged) and ventilation type, on the survey's
 *   criteria with its edits (criteria-choice.ts). Mould seen makes the surface-RH check "does not meet".
 * - Required supply: the largest of (a) the CO2 and rate checks (core required-supply.ts) at the
 *   DESIGN occupancy, (b) for kitchens, bathrooms, toilets and utility rooms the extract rate
 *   (least demanding row of each group), (c) the supply that keeps the coldest wall below 80 %
 *   at the unfavourable end.
 * - Fixes: sized on the engine input of the room's winter state (windows shut), anchored to the
 *   measurement when there is one (core size-fixes.ts), gated by the room's safety facts.
 * Example: Flat 7's bathroom → safety item 'dead-extract-with-mould', priority 'act-now', a
 * repaired extract fan offered with the spillage-test gate (open-flued boiler in the kitchen).
 */
import type { RoomAirflowInput } from '../core/airflow-inputs.ts';
import type { EditedCriterion } from '../core/criteria/criterion-edits.ts';
import { selectCriteria, type RoomContext } from '../core/criteria/select-criteria.ts';
import { judgeCriterion, type CriterionCheck } from '../core/judgement/judge-criterion.ts';
import { roomPriority } from '../core/judgement/priority.ts';
import { severityOf } from '../core/judgement/rank-rooms.ts';
import { requiredSupply, type RequiredSupplyContext } from '../core/judgement/required-supply.ts';
import { roomMoisture } from '../core/judgement/room-moisture.ts';
import { roomMoistureRelease } from '../core/judgement/room-moisture-release.ts';
import { safetyItems } from '../core/judgement/safety-items.ts';
import { sizeFixes, type FixPlan } from '../core/judgement/size-fixes.ts';
import { fromLitresPerSecond, litresPerSecond, roundToStep } from '../core/units.ts';
import type { WeatherCases } from '../core/weather-cases.ts';
import type { DocumentRoom, SurveyDocument } from '../model/survey-document.ts';
import { analysisWarning, fromMoistureWarning, uniqueWarnings, type AnalysisWarning } from './analysis-warnings.ts';
import { OUTPUT_RANGE } from './scenarios.ts';
import type { JudgedAs, MeasuredEstimate, RoomJudgement, RoomResults } from './results.ts';
import { roomEvidence } from './room-evidence.ts';
import { roomMoistureInputs } from './room-moisture-inputs.ts';
import { gateFacts, homeRooms, safetyFacts } from './room-safety-facts.ts';
import { bearingOf } from './opening-inputs.ts';
import { isFanDead, isVentBlocked } from './room-state.ts';

/** What judging a room needs beyond its results. */
export interface RoomJudgeInputs {
  room: DocumentRoom;
  results: Omit<RoomResults, 'judgement'>;
  doc: SurveyDocument;
  criteria: readonly EditedCriterion[];
  cases: WeatherCases;
  outdoor_ppm: number;
  /** The room's engine input with windows shut (vents and fans as found), and in its as-found state. */
  winter: RoomAirflowInput;
  asFound: RoomAirflowInput;
  best: MeasuredEstimate | null;
}

const EXTRACT_ROOMS = new Set(['kitchen', 'wet-room', 'toilet', 'utility']);
/** Flow a dead fan with no rating is recommended at, m³/s (15 L/s, the bathroom extract rate of references.md §5.1; secondary). */
const DEFAULT_REPAIR_FLOW = fromLitresPerSecond(15);

function settleBy(r: Omit<RoomResults, 'judgement'>): string {
  if (r.suggestion) return r.suggestion;
  return r.use === 'bedroom'
    ? 'An overnight logger with the room used as normal would narrow the range.'
    : 'A logger over a full occupied day, or a longer decay test, would narrow the range and decide this.';
}

/** The extract rate the room needs (least demanding row of each group, largest group), m³/s. */
function extractTarget(checks: readonly CriterionCheck[]): { supply_m3s: number; criterionId: string; title: string } | null {
  for (const role of ['limit', 'benchmark'] as const) {
    const byGroup = new Map<string, CriterionCheck>();
    for (const c of checks) {
      if (c.role !== role || c.metric !== 'extract-flow' || c.limit === null) continue;
      const cur = byGroup.get(c.group);
      if (!cur || c.limit < cur.limit!) byGroup.set(c.group, c);
    }
    const best = [...byGroup.values()].sort((a, b) => b.limit! - a.limit! || (a.criterionId < b.criterionId ? -1 : 1))[0];
    if (best) return { supply_m3s: best.limit!, criterionId: best.criterionId, title: best.title };
  }
  return null;
}

/**
 * Judge one room (see the file note). The rank is filled in by the survey's ranking.
 */
export function judgeRoom(x: RoomJudgeInputs): RoomJudgement {
  const { room, results: r, doc } = x;
  const warnings: AnalysisWarning[] = [];
  const assumptions: string[] = [];
  const situation = doc.survey.stage ?? 'existing';
  if (!doc.survey.stage) assumptions.push('the building is taken as existing (new, refurbished or existing was not recorded)');
  const ventilation = doc.survey.ventilation ?? 'unknown';
  const judgedAs: JudgedAs = { buildingUse: doc.survey.buildingUse, roomUse: r.use, situation, ventilation, assumptions };
  if (assumptions.length > 0) warnings.push(analysisWarning('situation-assumed', 'caution', `Criteria chosen with ${assumptions.join('; ')}.`));
  const ctx: RoomContext = { buildingUse: doc.survey.buildingUse, roomUse: r.use, situation, ventilation };
  const selection = selectCriteria(ctx, x.criteria);
  warnings.push(...selection.warnings.map(fromMoistureWarning));

  // Moisture.
  const { home, rooms: homeMates } = homeRooms(room, doc);
  const mi = roomMoistureInputs(room, r, doc, home, homeMates.filter((m) => m.id !== room.id));
  warnings.push(...mi.warnings);
  const release = roomMoistureRelease(mi.people, mi.activities);
  const moisture = roomMoisture({ ...mi.input, source: { low: release.low, typical: release.typical, high: release.high } });
  warnings.push(...moisture.warnings.map(fromMoistureWarning));

  // Criteria checks.
  const asFound = r.occupancy.asFound;
  const judgeCtx = {
    evidence: roomEvidence(room, r, moisture),
    outdoor_ppm: x.outdoor_ppm,
    occupants: asFound.count > 0 ? { count: asFound.count, outputPerPerson_m3s: asFound.output_m3s / asFound.count, label: asFound.groups.map((g) => `${g.label || 'people'} (${g.ageBand})`).join(' and ') } : null,
    floorArea_m2: r.floorArea_m2,
    settleBy: settleBy(r),
  };
  const checks = selection.selected.map((s) => {
    const check = judgeCriterion(s, judgeCtx);
    if (check.metric === 'surface-rh' && moisture.mould.verdict === 'mould-observed') {
      return { ...check, value: null, margin: null, outcome: 'does-not-meet' as const, statement: `Does not meet ${check.title}: mould was seen`, why: `${moisture.mould.reason} The prediction is kept in the moisture findings for reference only.`, settleBy: null };
    }
    return check;
  });

  // Required supply.
  const design = r.occupancy.design;
  const rsCtx = (people: number): RequiredSupplyContext => ({
    occupants: people,
    outputPerPerson_m3s: design.count > 0 ? design.output_m3s / design.count : 0,
    outputFactor: 1 + OUTPUT_RANGE,
    outdoor_ppm: x.outdoor_ppm,
  });
  const candidates: NonNullable<RoomJudgement['required']>[] = [];
  const co2 = requiredSupply(checks, rsCtx(design.count));
  if (co2) candidates.push(co2);
  const extract = EXTRACT_ROOMS.has(r.use) ? extractTarget(checks) : null;
  if (extract) candidates.push({ ...extract, role: 'extract', method: 'the extract rate for the room (least demanding row of each group)' });
  if (moisture.mould.verdict !== 'no-risk-predicted' && moisture.supplyForWall_m3s !== null) {
    candidates.push({ supply_m3s: moisture.supplyForWall_m3s, criterionId: 'bs5250-surface-rh', role: 'moisture', title: 'Surface RH below 80 % as a monthly mean', method: 'supply holding the coldest wall below 80 % at the unfavourable end (high release, low factor)' });
  }
  if (moisture.wallFactor && moisture.supplyForWall_m3s === null && moisture.mould.verdict !== 'no-risk-predicted') {
    warnings.push(analysisWarning('too-cold-for-ventilation', 'caution', 'The coldest wall is so cold that no amount of outdoor air would keep it below 80 % RH in a typical coldest month: it needs insulation or heating, not only ventilation.'));
  }
  const required = candidates.sort((a, b) => b.supply_m3s - a.supply_m3s || (a.criterionId < b.criterionId ? -1 : 1))[0] ?? null;

  // Fixes.
  let fixes: FixPlan | null = null;
  if (required) {
    const vents = room.openings.filter((o) => o.type === 'vent' && o.kind === 'background-vent' && o.purpose === 'room');
    const openInWinter = new Set(x.winter.openings.filter((o) => o.kind === 'background-vent' && o.condition === 'open').map((o) => o.id));
    const wall = [...room.exposedWalls].sort((a, b) => (b.length_m ?? 0) - (a.length_m ?? 0))[0];
    const people = design.count;
    fixes = sizeFixes({
      cases: x.cases,
      winter: x.winter,
      anchor: x.best && x.best.supply_m3s.low !== null && x.best.supply_m3s.value !== null && x.best.supply_m3s.high !== null
        ? { state: x.asFound, measured: { low: x.best.supply_m3s.low, central: x.best.supply_m3s.value, high: x.best.supply_m3s.high } }
        : null,
      target_m3s: required.supply_m3s,
      targetReason: `${required.title} (${required.method})`,
      extractRoom: EXTRACT_ROOMS.has(r.use),
      shutVentIds: vents.filter((v) => v.type === 'vent' && !isVentBlocked(room, v) && !openInWinter.has(v.id)).map((v) => v.id),
      blockedVentIds: vents.filter((v) => v.type === 'vent' && isVentBlocked(room, v)).map((v) => v.id),
      deadExtractFans: room.openings.flatMap((o) => (o.type === 'fan' && o.direction === 'extract' && isFanDead(room, o) ? [{ id: o.id, flow_m3s: (o.ratedFlow_m3s ?? DEFAULT_REPAIR_FLOW) * o.count }] : [])),
      outsideWall: wall ? { length_m: wall.length_m ?? Math.sqrt(r.floorArea_m2), facing_deg: wall.facing ? bearingOf(wall.facing) : 0 } : null,
      occupancy:
        doc.survey.buildingUse !== 'dwelling' && people > 1 && co2
          ? { count: people, targetFor: (n) => Math.max(requiredSupply(checks, rsCtx(n))?.supply_m3s ?? 0, required.role === 'moisture' ? required.supply_m3s : 0) }
          : null,
      stuckWindows: room.openings.filter((o) => o.type === 'window' && (o.operability === 'seized' || o.operability === 'blocked')).reduce((s, o) => s + o.count, 0),
      gates: gateFacts(room, doc),
    });
  }

  const safety = safetyItems(safetyFacts(room, doc));
  const priority = roomPriority({ safety, checks, mould: moisture.mould, glazing: moisture.glazing, extraNeeded_m3s: fixes ? fixes.extraNeeded_m3s : null });
  const mouldArea = room.defects.filter((d) => d.kind === 'mould').reduce((s, d) => s + (d.extent_m2 ?? 0), 0);
  if (fixes && fixes.extraNeeded_m3s > 0 && fixes.options.length === 0) {
    warnings.push(analysisWarning('no-single-fix', 'caution', `No single fix here reaches the ${roundToStep(litresPerSecond(fixes.target_m3s), 0.5)} L/s needed at the unfavourable end; a ventilation engineer should design one.`));
  }
  return {
    judgedAs,
    checks,
    required,
    moisture: { ...moisture, release, logged: mi.logged },
    safety,
    priority,
    severity: severityOf(fixes?.extraNeeded_m3s ?? 0, design.count, mouldArea),
    rank: 0,
    fixes,
    warnings: uniqueWarnings(warnings),
  };
}
