/**
 * The shape of analyseSurvey's results: ONE plain, JSON-serialisable object that the app, the
 * command line and the report all read. SI units throughout (m³/s, s⁻¹, ppm, s, m, m², m³);
 * display units are the report's and the screens' business (src/core/units.ts).
 *
 * Every number a surveyor sees carries its interval, its method and its basis:
 * - 'measured': from readings in the room (a decay, a build-up, a spot reading);
 * - 'estimated-from-measurements': a measurement adjusted by a predicted change (another
 *   scenario), or a measured bound combined with a prediction inside it;
 * - 'predicted': from the openings, fans and leakage by the published formulas;
 * - 'assumed': a stated default (no reading, no record).
 * Numbers that cannot be given are null, never NaN or Infinity.
 *
 * Judgement (Engine III): `judgement` on the results, each room and each area holds the criteria
 * checks, moisture and mould, safety items, priority with reasons, rank and sized fixes. It reads
 * the figures here and adds to them; it never recomputes them.
 *
 * Example: analyseSurvey(demoDocument).rooms[0].headline.supply_m3s.basis = 'measured'.
 */
import type { AirflowMechanism } from '../core/airflow-item.ts';
import type { VentilationMode } from '../core/room-natural-ventilation.ts';
import type { EstimateKind, IntervalMethod, SupplyMethod } from '../core/supply-estimate.ts';
import type { AnalysisWarning } from './analysis-warnings.ts';
import type { CriterionEdit } from '../core/criteria/criterion-edits.ts';
import type { CriterionCheck } from '../core/judgement/judge-criterion.ts';
import type { RequiredSupply } from '../core/judgement/required-supply.ts';
import type { RoomMoisture } from '../core/judgement/room-moisture.ts';
import type { RoomMoistureRelease } from '../core/judgement/room-moisture-release.ts';
import type { SafetyItem } from '../core/judgement/safety-items.ts';
import type { FixPlan } from '../core/judgement/size-fixes.ts';
import type { PriorityLevel, RoomPriority } from '../core/judgement/priority.ts';
import type { VapourPressureExcessResult } from '../core/vapour-pressure-excess.ts';

export type { AnalysisWarning, WarningSeverity } from './analysis-warnings.ts';

/** Where a number comes from (see the file note). */
export type Basis = 'measured' | 'estimated-from-measurements' | 'predicted' | 'assumed';

/** A value with its range: low ≤ value ≤ high where all three are known. SI units. */
export interface Ranged {
  value: number | null;
  low: number | null;
  high: number | null;
}

/** A ranged value with its basis and method, in words. */
export interface Figure extends Ranged {
  basis: Basis;
  method: string;
}

/** Bounds of a figure that has no central value (a day-profile metric at the two ends). */
export interface Bounds {
  /** At the favourable end (high supply, low output). */
  low: number | null;
  /** At the unfavourable end (low supply, high output). */
  high: number | null;
}

/** The occupants a figure assumes. */
export interface OccupancyFigures {
  /** People, summed over groups. */
  count: number;
  /** CO2 output of everyone at the room's temperature, m³/s. */
  output_m3s: number;
  groups: { groupId: string; label: string; count: number; ageBand: string; sex: string; met: number }[];
  basis: Basis;
}

/** The state of a room's openings for a test or a scenario, in plain terms. */
export interface RoomStateSummary {
  /** Openings counted open, by record id, with how many of their units were open. */
  open: { openingId: string; units: number }[];
  /** Fans counted running, by record id. */
  fansRunning: string[];
  doorsOpen: boolean;
  /** Whether each opening was recorded one by one (otherwise parts are assumed). */
  recordedOneByOne: boolean;
  /** What was assumed to complete the state, in words. */
  assumptions: string[];
}

/** One item of a prediction's breakdown (flows in m³/s). */
export interface PredictedItem {
  itemId: string;
  mechanism: AirflowMechanism;
  low: number;
  central: number;
  high: number;
  countsAsOutdoorAir: boolean;
  method: string;
}

/** A predicted supply under one weather case. */
export interface PredictionResult {
  weatherId: string;
  /** Outdoor air, m³/s: low, central (value), high. */
  supply_m3s: Ranged;
  mode: VentilationMode;
  items: PredictedItem[];
  combination: string;
  windAtHeight_ms: number;
  envelopePressure_Pa: number;
  warnings: AnalysisWarning[];
}

/** One measured supply: a test, a logger period or a single reading, evaluated by its method. */
export interface MeasuredEstimate {
  /** Stable id: the test's, the logger period's or the reading's id. */
  setId: string;
  source: 'test' | 'logger-period' | 'reading';
  /** The test kind recorded, or what the readings were taken as. */
  setKind: 'decay' | 'seeded-decay' | 'build-up' | 'steady' | 'spot';
  method: SupplyMethod;
  kind: EstimateKind;
  supply_m3s: Ranged;
  airChangeRate_perSecond: Ranged;
  supplyPerPerson_m3s: Ranged;
  steadyLevel_ppm: Ranged;
  /** Rank tier by the best-estimate rule (0 best); see measured-supply.ts. */
  tier: number;
  /** Readings used and left out (combustion, wrong instrument, no CO2). */
  readingsUsed: number;
  readingsExcluded: number;
  /** Time of the first and last reading used (ISO, as recorded). */
  from: string | null;
  to: string | null;
  /** Room state recorded during the set (openings, doors, fans), or null if not recorded. */
  state: RoomStateSummary | null;
  /** People present during the set, when the method used them. */
  occupants: OccupancyFigures | null;
  /** How the interval was found, with the meter and outdoor level assumed. */
  interval: IntervalMethod & { confidence: 0.95 };
  meter: { instrumentId: string | null; source: string; offset_ppm: number; offsetSd_ppm: number; gain: number; gainSd: number; noiseSd_ppm: number };
  outdoor: { value_ppm: number; sd_ppm: number; sameMeterAsRoom: boolean; readings: number; source: string };
  details: Record<string, number | null>;
  warnings: AnalysisWarning[];
}

/** Day-profile figures under the room's schedule at the two ends of a scenario's range. */
export interface ProfileFigures {
  weatherId: string;
  /** The schedule used: the room's own periods, a template, in words. */
  schedule: string;
  occupiedMean_ppm: Bounds;
  peak_ppm: Bounds;
  highestRollingMean_ppm: Bounds;
  window_s: number;
  above: { threshold_ppm: number; time_s: Bounds; longestRun_s: Bounds }[];
  /** The predicted day itself, for charts: only on the as-found scenario, else null. */
  curve: ProfileCurve | null;
  warnings: AnalysisWarning[];
}

/**
 * A predicted day sampled for drawing: every PROFILE_CURVE_STEP_S and at every change of
 * conditions (s from midnight on the recorded clock), at the two ends of the supply's range,
 * with the periods the room is in use. Example: a classroom template day gives about 70 times.
 */
export interface ProfileCurve {
  time_s: number[];
  /** At the high end of the supply (the lower curve), ppm. */
  favourable_ppm: number[];
  /** At the low end of the supply (the higher curve), ppm. */
  unfavourable_ppm: number[];
  /** When people are in (full or half), with the slot's label. */
  inUse: { from_s: number; to_s: number; label: string }[];
}

/** One scenario under one weather case. */
export interface ScenarioCase {
  weatherId: string;
  supply_m3s: Figure;
  airChangeRate_perSecond: Figure;
  supplyPerPerson_m3s: Figure | null;
  steadyLevel_ppm: Figure | null;
  prediction: PredictionResult;
}

export type ScenarioId = 'as-found' | 'closed' | 'vents-open' | 'windows-open' | 'design-occupancy';

/** A scenario of a room over every weather case, the worst named. */
export interface ScenarioResult {
  id: ScenarioId;
  description: string;
  state: RoomStateSummary;
  occupancy: OccupancyFigures;
  cases: ScenarioCase[];
  /** The case with the lowest supply (ties: lowest low end, then first listed). */
  worstWeatherId: string;
  /** Under the worst case; null when nobody uses the room or it has no schedule. */
  profile: ProfileFigures | null;
}

/** Measured against predicted for one measurement. */
export type ReconciliationReason =
  | 'door-open-to-corridor'
  | 'unrecorded-opening'
  | 'fan-off-or-weak'
  | 'leakier-fabric-than-assumed'
  | 'openings-pass-less-than-predicted'
  | 'state-not-recorded';

export interface Reconciliation {
  setId: string;
  method: SupplyMethod;
  measured_m3s: Ranged;
  /** Prediction for the state recorded during the test, under the day's weather or every case. */
  predicted_m3s: Ranged;
  predictedUnder: string;
  /** 'agree': the intervals overlap; otherwise the measurement is above or below. */
  outcome: 'agree' | 'measured-above' | 'measured-below' | 'not-compared';
  /** Measured ÷ predicted, central values; null when either is missing. */
  ratio: number | null;
  reason: ReconciliationReason | null;
  explanation: string;
}

/** The figures a room is summarised by. */
export interface RoomHeadline {
  /** As-found supply: the best measurement when there is one, else the worst-case prediction. */
  supply_m3s: Figure;
  airChangeRate_perSecond: Figure;
  supplyPerPerson_m3s: Figure | null;
  steadyLevel_ppm: Figure | null;
  /** The measurement behind it, or null when predicted. */
  measuredSetId: string | null;
  weatherId: string | null;
}

export interface RoomResults {
  roomId: string;
  name: string;
  clientRef: string;
  areaId: string | null;
  use: string;
  volume_m3: number;
  floorArea_m2: number;
  ceilingHeight_m: number;
  exposedEnvelope_m2: number;
  /** Room temperature used for occupants' output, °C, and where it came from. */
  roomTemp_C: Figure;
  occupancy: { asFound: OccupancyFigures; design: OccupancyFigures };
  measured: MeasuredEstimate[];
  /** setId of the best measurement by the rule in measured-supply.ts, or null. */
  bestMeasuredSetId: string | null;
  scenarios: ScenarioResult[];
  headline: RoomHeadline;
  reconciliation: Reconciliation[];
  /** What measurement would settle this room, when none was made (or none succeeded). */
  suggestion: string | null;
  warnings: AnalysisWarning[];
  /** Engine III: criteria checks, moisture, safety, priority, rank and fixes. */
  judgement: RoomJudgement;
}

export interface AreaResults {
  areaId: string;
  name: string;
  kind: string;
  parentId: string | null;
  /** Rooms of this area and the areas inside it, by id. */
  roomIds: string[];
  floorArea_m2: Figure;
  bedrooms: number | null;
  usualOccupants: number | null;
  /** Whole-dwelling (or whole-area) outdoor air: rooms' headline supplies with the area's own system. */
  supply_m3s: Figure;
  supplyPerFloorArea_m3sm2: Ranged;
  supplyPerOccupant_m3s: Ranged | null;
  /** The dwelling system's supply and extract (core whole-dwelling-balance.ts), m³/s; null without one. */
  balance: { supply_m3s: Ranged; extract_m3s: Ranged; mismatch: number; madeUpThroughEnvelope_m3s: number } | null;
  warnings: AnalysisWarning[];
  judgement: AreaJudgement;
}

export interface WeatherCaseResult {
  id: string;
  label: string;
  indoor_C: number;
  outdoor_C: number;
  windAt10m_ms: number;
  source: 'survey' | 'screening' | 'day-of-visit';
}

/** One of the day's outdoor conditions (°C or %), with where it came from. */
export interface DayOutdoorValue {
  value: number;
  basis: 'recorded' | 'outdoor-readings' | 'outdoor-logger';
  /** Where it came from, in words ('median of the outdoor logger “roof.csv” from 08:40 to 16:10'). */
  words: string;
}

/** The day's outdoor temperature and humidity; null when none was recorded (day-outdoor-conditions.ts). */
export interface DayOutdoorConditions {
  temp_C: DayOutdoorValue | null;
  rh_pct: DayOutdoorValue | null;
}

export interface AnalysisStamps {
  engineVersion: string;
  formatVersion: number;
  analysisVersion: string;
  /** Criteria set, data version and the edits recorded for this survey. */
  criteria: CriteriaStamp;
}

export interface AnalysisResults {
  stamps: AnalysisStamps;
  surveyId: string;
  /** The options the numbers depend on. */
  settings: { draws: number; seed: number; thresholds_ppm: number[]; window_s: number };
  weatherCases: WeatherCaseResult[];
  /** The weather of the visit as a case, for reconciliation; null when not recorded. */
  dayWeather: WeatherCaseResult | null;
  /** The day's outdoor temperature and humidity, as recorded or else from readings or the outdoor logger. */
  dayOutdoor: DayOutdoorConditions;
  outdoor: { value_ppm: number; sd_ppm: number; readings: number; source: string };
  rooms: RoomResults[];
  areas: AreaResults[];
  warnings: AnalysisWarning[];
  judgement: SurveyJudgement;
}

/** The criteria a survey was judged by. */
export interface CriteriaStamp {
  setId: string;
  version: number;
  /** Edits recorded for this survey and applied (shown beside the findings in the report). */
  edits: CriterionEdit[];
}

/** What the room was judged as. */
export interface JudgedAs {
  buildingUse: string;
  roomUse: string;
  situation: 'new' | 'refurbished' | 'existing';
  ventilation: 'natural' | 'mechanical' | 'hybrid' | 'unknown';
  /** What had to be assumed to choose the criteria, in words. */
  assumptions: string[];
}

/** Moisture and mould of a room: the core findings, the release behind them and any logged excess. */
export interface RoomMoistureResults extends RoomMoisture {
  release: RoomMoistureRelease;
  /** Vapour-pressure excess from a temperature and humidity log, when there is one. */
  logged: VapourPressureExcessResult | null;
}

/** Engine III for one room. */
export interface RoomJudgement {
  judgedAs: JudgedAs;
  checks: CriterionCheck[];
  /** The supply the room needs at the unfavourable end, m³/s, and what sets it; null when nothing does. */
  required: (Omit<RequiredSupply, 'role'> & { role: RequiredSupply['role'] | 'moisture' | 'extract' }) | null;
  moisture: RoomMoistureResults;
  /** Safety items, kept apart and ranked above all else. */
  safety: SafetyItem[];
  priority: RoomPriority;
  /** Severity for ranking (rank-rooms.ts): L/s short × people, plus 10 per m² of mould seen. */
  severity: number;
  /** 1 = first to act on, across the survey. */
  rank: number;
  /** Sized fixes; null when no target was set. */
  fixes: FixPlan | null;
  warnings: AnalysisWarning[];
}

/** Engine III for an area (a dwelling's whole-dwelling checks and priority). */
export interface AreaJudgement {
  checks: CriterionCheck[];
  /** Extra whole-dwelling supply needed at the unfavourable end, m³/s; null without a target. */
  extraNeeded_m3s: number | null;
  /** The supply-extract balance in words, when the dwelling has a system. */
  balance: string | null;
  safety: { roomId: string; item: SafetyItem }[];
  priority: { level: PriorityLevel; words: string; reasons: string[] };
  warnings: AnalysisWarning[];
}

/** Engine III for the survey: the ranked rooms and every safety item. */
export interface SurveyJudgement {
  ranking: { roomId: string; rank: number; level: PriorityLevel; words: string; safetyItems: number; severity: number }[];
  safety: { roomId: string; item: SafetyItem }[];
  /** How many rooms at each level. */
  levels: Record<PriorityLevel, number>;
}
