/**
 * What the report needs from the criteria judgement, as a small interface of its own, and the
 * one adapter from the analysis results' `judgement` slots to it.
 *
 * The report is written against this view so that the judgement's own types can change without
 * touching the renderers. Results without a judgement (an older results file) give null, and the
 * report then says the judgement was not available: it never invents a verdict.
 *
 * Units: every number is SI, in the unit of its criterion's metric (m³/s per person, ppm, s⁻¹,
 * %); the report converts for display through src/core/units.ts.
 *
 * Example: judgementView(analyseSurvey(demoFlats)).rooms.get(bathroomId).priority = 'act-now'.
 */
import type { AnalysisResults, Ranged, RoomJudgement } from '../analysis/results.ts';
import type { AveragingPeriod, CriterionMetric, CriterionStatus } from '../core/criteria/criterion.ts';
import type { CriterionCheck } from '../core/judgement/judge-criterion.ts';
import { PRIORITY_LEVELS, type PriorityLevel } from '../core/judgement/priority.ts';
import { litresPerSecond, roundToStep } from '../core/units.ts';

/** A room's priority: the judgement's four levels (safety items make "act-now"). */
export type ReportPriority = PriorityLevel;

/** How soon to act, following from the priority. */
export type ReportUrgency = 'immediate' | 'weeks' | 'planned' | 'none';

/** The priority levels in order, with the judgement's own words. */
export const REPORT_PRIORITIES = PRIORITY_LEVELS;

const URGENCY: Readonly<Record<PriorityLevel, ReportUrgency>> = {
  'act-now': 'immediate',
  'act-within-weeks': 'weeks',
  'plan-improvement': 'planned',
  'no-action-found': 'none',
};

/** One check of a room against one criterion. */
export interface ReportCheckView {
  criterionId: string;
  title: string;
  /** Document, edition and clause, in words. */
  source: string;
  status: CriterionStatus;
  /** How it is applied here: a duty, a limit the room must meet, or a benchmark (new-work guidance on existing buildings). */
  role: CriterionCheck['role'];
  period: AveragingPeriod;
  metric: CriterionMetric;
  /** "not yet confirmed against …" where the value is from memory (criterionCaveat), else ''. */
  caveat: string;
  /** The threshold in the metric's SI unit; null for duties without a number. */
  limit: number | null;
  /** The room's value in the same unit, with its range. */
  value: Ranged | null;
  /** 'short': on the wrong side of the limit over the whole range; 'uncertain': the range straddles it. */
  outcome: 'meets' | 'short' | 'uncertain' | 'not-assessed';
  /** The finding in words, as the judgement states it. */
  words: string;
  /** For an uncertain or unassessed result: the measurement that would settle it. */
  settleBy: string | null;
}

/** A sized fix with its safety notes. */
export interface ReportFixView {
  title: string;
  /** Extra outdoor air the fix must bring, m³/s; null when not a flow. */
  extraSupply_m3s: number | null;
  /** Named items and quantities ("two 5,000 mm² background vents"). */
  items: string[];
  /** Conditions before doing it (open-flued appliance, fire door, restrictor…). */
  safetyNotes: string[];
  urgency: ReportUrgency;
}

/** The judgement of one room. */
export interface ReportRoomJudgementView {
  priority: ReportPriority;
  /** The priority in the judgement's words ("Act now"). */
  priorityWords: string;
  urgency: ReportUrgency;
  /** 1 = first to act on, across the survey (the judgement's ranking). */
  rank: number;
  /** Why, as facts (seen or measured) and opinions (estimated, predicted, assumed). */
  reasons: string[];
  checks: ReportCheckView[];
  /** Moisture and mould findings in words (surface humidity, vapour-pressure excess, mould risk). */
  moisture: string[];
  /** Safety items for this room, in words. */
  safety: string[];
  fixes: ReportFixView[];
}

/** The judgement of the whole survey. */
export interface ReportJudgementView {
  /** Criteria data used, as "<set> v<version>". */
  criteriaVersion: string;
  rooms: ReadonlyMap<string, ReportRoomJudgementView>;
  /** Findings for dwellings and other areas, by area id, in words. */
  areas: ReadonlyMap<string, string[]>;
}

function checkView(c: CriterionCheck): ReportCheckView {
  return {
    criterionId: c.criterionId,
    title: c.title,
    source: c.source,
    status: c.status,
    role: c.role,
    period: c.period,
    metric: c.metric,
    caveat: c.caveat,
    limit: c.limit,
    value: c.value ? ranged(c.value) : null,
    outcome: c.outcome === 'does-not-meet' ? 'short' : c.outcome,
    words: c.statement,
    settleBy: c.settleBy,
  };
}

/** Favourable and unfavourable ends as a low–high range (which end is which depends on the metric). */
function ranged(x: { favourable: number | null; central: number | null; unfavourable: number | null }): Ranged {
  const ends = [x.favourable, x.unfavourable].filter((v): v is number => v !== null);
  return { value: x.central, low: ends.length ? Math.min(...ends) : null, high: ends.length ? Math.max(...ends) : null };
}

const percent = (x: number | null): string => (x === null ? '?' : `${Math.round(x)} %`);
const percentRange = (x: Ranged): string => (x.low === null && x.high === null ? 'not known' : `${percent(x.low)} to ${percent(x.high)}`);

function moistureWords(j: RoomJudgement): string[] {
  const m = j.moisture;
  const lines = [
    `Mould: ${m.mould.reason}`,
    `Predicted relative humidity in the coldest month: room ${percentRange(ranged(m.indoorRh_pct))}; coldest wall surface ${percentRange(ranged(m.wallSurfaceRh_pct))} (mould is likely above 80 % as a monthly mean).`,
    `Glazing: ${m.glazing.reason}`,
  ];
  if (m.supplyForWall_m3s !== null) lines.push(`Outdoor air that would keep the coldest wall below 80 %: about ${roundToStep(litresPerSecond(m.supplyForWall_m3s), 0.5)} L/s.`);
  for (const f of m.diagnosis?.findings ?? []) lines.push(`Diagnosis, ${f.cause.replace(/-/g, ' ')}: ${f.reason}`);
  return lines;
}

function fixViews(j: RoomJudgement, urgency: ReportUrgency): ReportFixView[] {
  const plan = j.fixes;
  if (!plan) return [];
  const extra = plan.extraNeeded_m3s > 0 ? plan.extraNeeded_m3s : null;
  const offered = plan.options.map((o) => ({
    title: o.title,
    extraSupply_m3s: extra,
    items: [],
    safetyNotes: o.gates.map((g) => g.message),
    urgency,
  }));
  const supporting = plan.supporting.map((w) => ({ title: w.title, extraSupply_m3s: null, items: [], safetyNotes: w.gates.map((g) => g.message), urgency: 'planned' as const }));
  return [...offered, ...supporting];
}

/**
 * One check per group of alternatives (the categories of one standard, the rows of one table):
 * the first met, else the first uncertain, else the last — so "meets category II" reads as one line.
 */
function deciding(checks: readonly CriterionCheck[]): CriterionCheck[] {
  const groups = new Map<string, CriterionCheck[]>();
  for (const c of checks) groups.set(c.group, [...(groups.get(c.group) ?? []), c]);
  return [...groups.values()].map((g) => g.find((c) => c.outcome === 'meets') ?? g.find((c) => c.outcome === 'uncertain') ?? g[g.length - 1]!);
}

function roomView(j: RoomJudgement): ReportRoomJudgementView {
  const urgency = URGENCY[j.priority.level];
  return {
    priority: j.priority.level,
    priorityWords: j.priority.words,
    urgency,
    rank: j.rank,
    reasons: j.priority.reasons.map((r) => `${r.kind === 'fact' ? 'Fact' : 'Opinion'} (${r.basis}): ${r.text}`),
    checks: deciding(j.checks).map(checkView),
    moisture: moistureWords(j),
    safety: j.safety.map((s) => `${s.fact} ${s.action}`),
    fixes: fixViews(j, urgency),
  };
}

/**
 * The judgement of these results as the report reads it, or null when the results carry none.
 * Example: judgementView({ ...results, judgement: null }) = null.
 */
export function judgementView(results: AnalysisResults): ReportJudgementView | null {
  // Results written before the judgement existed (older files read by the command line) carry none.
  if (!results.judgement || !results.stamps.criteria) return null;
  const rooms = new Map(results.rooms.map((r) => [r.roomId, roomView(r.judgement)]));
  const areas = new Map(
    results.areas.map((a) => {
      const j = a.judgement;
      const lines = [
        `Priority: ${j.priority.words}.`,
        ...j.priority.reasons,
        ...j.checks.map((c) => `${c.label}: ${c.statement}`),
        ...(j.balance ? [j.balance] : []),
        ...j.safety.map((s) => `${s.item.fact} ${s.item.action}`),
      ];
      return [a.areaId, lines];
    }),
  );
  return { criteriaVersion: `${results.stamps.criteria.setId} v${results.stamps.criteria.version}`, rooms, areas };
}
