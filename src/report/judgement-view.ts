/**
 * What the report needs from the criteria judgement, as a small interface of its own, and the
 * one adapter from the analysis results' `judgement` slots to it.
 *
 * The report is written against this view so that the judgement's own types can change without
 * touching the renderers. Until the judgement fills the results' slots the adapter returns null,
 * and the report says the judgement was not available: it never invents a verdict.
 *
 * Units: every number is SI, in the unit of its criterion's metric (m³/s per person, ppm, s⁻¹,
 * %); the report converts for display through src/core/units.ts.
 *
 * Example: judgementView(analyseSurvey(doc)) = null while results.judgement is null.
 */
import type { AnalysisResults, Ranged } from '../analysis/results.ts';
import type { AveragingPeriod, CriterionMetric, CriterionSource, CriterionStatus } from '../core/criteria/criterion.ts';

/** A room's priority: safety items stand apart from improvements. */
export type ReportPriority = 'safety' | 'high' | 'medium' | 'low' | 'none';

/** How soon to act. */
export type ReportUrgency = 'immediate' | 'weeks' | 'planned' | 'none';

/** One check of a room against one criterion. */
export interface ReportCheckView {
  criterionId: string;
  title: string;
  source: CriterionSource;
  status: CriterionStatus;
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
  urgency: ReportUrgency;
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

/**
 * The judgement of these results as the report reads it, or null when the results carry none.
 * Example: judgementView({ ...results, judgement: null }) = null.
 */
export function judgementView(results: AnalysisResults): ReportJudgementView | null {
  // The results' judgement slots are null until the criteria engine fills them; map them here.
  return results.judgement;
}
