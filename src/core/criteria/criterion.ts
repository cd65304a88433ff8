/**
 * Criteria as data: every threshold the app may judge a room against, with its published
 * source, how sure we are of the value, what it measures, over what period, its status, and
 * which buildings, rooms and situations it covers. A judge function reads `metric`, `period`,
 * `limit` and `direction`; the report reads the rest (practice.md §3: name the criterion, its
 * source, averaging period and status beside every finding).
 *
 * Units are SI, as everywhere in the engine: CO2 in ppm, flows in m³/s (per person, per m² of
 * floor, or whole), air change rates in s⁻¹, areas in m², surface RH in %. Display units come
 * from units.ts.
 */
import type { BuildingUse } from '../building-uses.ts';

/** How sure we are of a value: checked against the document, seen only in a secondary summary, or recalled. */
export type CriterionConfidence = 'confirmed' | 'secondary' | 'from memory';

/** What the threshold is a limit on, and in which unit. */
export type CriterionMetric =
  | 'co2-absolute' // ppm, as read
  | 'co2-above-outdoor' // ppm above the outdoor level
  | 'flow-per-person' // m³/s per person
  | 'flow-per-person-and-area' // m³/s per person plus areaTerm_m3s_m2 per m² of floor
  | 'flow-per-floor-area' // m³/s per m² of floor
  | 'whole-dwelling-flow' // m³/s for the whole dwelling
  | 'extract-flow' // m³/s at one extract point
  | 'air-change-rate' // s⁻¹
  | 'ventilator-equivalent-area' // m² (background ventilator in a room)
  | 'door-undercut-area' // m² below an internal door
  | 'opening-area-fraction' // openable window area as a fraction of floor area
  | 'surface-rh' // % at the surface
  | 'qualitative-duty'; // a duty without a number (hazard rating, fitness, adequate ventilation)

/** The averaging period the threshold is defined over. A spot reading can only meet 'instant'. */
export type AveragingPeriod =
  | 'instant'
  | '20-consecutive-minutes'
  | 'occupied-day-mean' // mean over the teaching or working day
  | 'occupied-period-mean' // mean over the hours a room is in use (a bedroom's night)
  | '8-hours'
  | '24-hours'
  | 'consistently' // "consistently above" in HSE guidance: not a single reading
  | 'monthly-mean'
  | 'when-running' // a fan's or system's capacity when switched on or boosted
  | 'continuous' // a rate supplied all the time
  | 'design-provision' // something the building must have (a vent, an opening, an undercut)
  | 'not-applicable'; // duties without a number

/** What kind of rule it is. */
export type CriterionStatus =
  | 'law' // an Act or Regulations
  | 'approved-code-of-practice' // an ACoP with special legal status
  | 'statutory-guidance' // guidance under the Building Regulations, for building work
  | 'design-guidance-new-work' // design guidance for new or refurbished buildings
  | 'guidance' // non-statutory guidance or a code of practice
  | 'benchmark'; // a published category or band to compare with, not a requirement

/** Which side of the limit is acceptable. */
export type LimitDirection = 'at-most' | 'at-least' | 'none';

/** The state of the building for the work a criterion covers. */
export type BuildingSituation = 'new' | 'refurbished' | 'existing';

/** How a room or building is ventilated. */
export type VentilationType = 'natural' | 'mechanical' | 'hybrid';

/** Tenure of a dwelling (some housing duties apply only to rented homes). */
export type Tenure = 'owner-occupied' | 'private-rented' | 'social-rented';

/** Where a criterion applies. Room-use ids are those of the room-use list; 'whole-dwelling' for dwelling totals. */
export interface CriterionCoverage {
  buildingUses: readonly BuildingUse[];
  roomUses: readonly string[] | 'any';
  situations: readonly BuildingSituation[];
  ventilation: readonly VentilationType[] | 'any';
  /** Only for these tenures (dwellings); absent means any. */
  tenures?: readonly Tenure[];
}

/** The published source of a value. */
export interface CriterionSource {
  document: string;
  edition: string;
  /** Clause, table or paragraph, when known. */
  clause?: string;
}

/** One threshold. */
export interface Criterion {
  id: string;
  /** Criteria sharing a group are alternatives for different situations or ventilation types. */
  group: string;
  /** A short plain label for screens and reports. */
  title: string;
  source: CriterionSource;
  confidence: CriterionConfidence;
  metric: CriterionMetric;
  period: AveragingPeriod;
  status: CriterionStatus;
  /** The threshold in the metric's SI unit; null for duties without a number. */
  limit: number | null;
  direction: LimitDirection;
  /** For 'flow-per-person-and-area': the per-m² floor term, m³/s per m². */
  areaTerm_m3s_m2?: number;
  /** For dwelling totals that depend on it: the number of bedrooms the row is for. */
  bedrooms?: number;
  /** CO2 output per person the band assumes, m³/s, so it can be rescaled for children or sleepers. */
  assumedCo2Output_m3s?: number;
  covers: CriterionCoverage;
  /** Anything a reader must know to apply it fairly. */
  note?: string;
}

/** A named set of criteria for one kind of building. */
export interface CriteriaSet {
  id: 'schools' | 'dwellings' | 'workplaces';
  title: string;
  criteria: readonly Criterion[];
}
