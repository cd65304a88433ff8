/**
 * analyseSurvey: the ONE function whose numbers the app, the command line and the report show.
 * It maps a validated survey document onto the engine's inputs, measures each room's supply from
 * its readings, predicts it from its openings for every scenario and weather case, reconciles
 * the two, adds up areas and dwellings, and returns one plain results object (results.ts).
 *
 * Pure and deterministic: no clock, no Math.random; Monte Carlo seeds come from record ids
 * (id-seed.ts) and options.seed; every cross-room sum is taken in id order, so the results do
 * not depend on the order of rooms or readings. Expected conditions (no readings, a short decay)
 * are warnings on the results, never exceptions.
 *
 * Options: draws (Monte Carlo draws per interval, default 1000; fewer is faster and the 2.5 and
 * 97.5 percentiles less settled), seed (default 0), thresholds_ppm for the time-above figures
 * (default 1000 and 1500 ppm: levels often quoted, common practice (no published source); the
 * criteria engine will pass its own), window_s for the rolling mean (default 20 minutes).
 *
 * Example: analyseSurvey(document).rooms.map((r) => r.headline.supply_m3s.basis) gives
 * 'measured' for a room with a decay test and 'predicted' for a room with no readings.
 */
import { ENGINE_VERSION } from '../core/engine-version.ts';
import { CURRENT_FORMAT_VERSION } from '../model/migrations.ts';
import { roomFloorArea, roomVolume } from '../model/room-geometry.ts';
import type { DocumentRoom, SurveyDocument } from '../model/survey-document.ts';
import { analysisWarning, fromEngineWarning, uniqueWarnings, type AnalysisWarning } from './analysis-warnings.ts';
import { assessArea } from './area-assessment.ts';
import { dayPlan } from './day-schedule.ts';
import { bestMeasured, measureSet } from './measured-supply.ts';
import { outdoorFor } from './meter-inputs.ts';
import { dayOutdoorConditions } from './day-outdoor-conditions.ts';
import { outdoorLoggerAround, outdoorLoggerWindow, type OutdoorLoggerWindow } from './outdoor-logger-window.ts';
import { asFoundCounts, designCounts, occupancyOf, roomAir, roomTemperature } from './occupancy-inputs.ts';
import { readingSets } from './reading-sets.ts';
import { reconcile } from './reconcile.ts';
import type { AnalysisResults, DayOutdoorConditions, MeasuredEstimate, RoomHeadline, RoomResults, SurveyJudgement } from './results.ts';
import type { RoomAirflowInput } from '../core/airflow-inputs.ts';
import { PRIORITY_LEVELS, priorityWords } from '../core/judgement/priority.ts';
import { rankRooms } from '../core/judgement/rank-rooms.ts';
import { surveyCriteria } from './criteria-choice.ts';
import { judgeArea } from './judge-area.ts';
import { judgeRoom } from './judge-room.ts';
import { ceilingHeight, exposedEnvelope, roomAirflowContext, roomAirflowInput } from './room-airflow-input.ts';
import { closedState, stateFromConditions, ventsOpenState, windowsOpenState, type RoomState } from './room-state.ts';
import { roomScenarios } from './scenarios.ts';
import { siteInputs, type SiteInputs } from './site-inputs.ts';
import { dayWeatherCase, weatherCaseResult, weatherCases } from './weather-inputs.ts';
import { predictRoomSupplyOverCases } from '../core/room-supply-prediction.ts';
import type { WeatherCases } from '../core/weather-cases.ts';

/** The analysis's own version: raise it when a mapping or rule here changes a number. */
export const ANALYSIS_VERSION = '0.3.0';

export interface AnalysisOptions {
  draws?: number;
  seed?: number;
  thresholds_ppm?: readonly number[];
  window_s?: number;
}

export const DEFAULT_DRAWS = 1000;
export const DEFAULT_THRESHOLDS_PPM: readonly number[] = [1000, 1500];
export const DEFAULT_WINDOW_S = 1200;

export interface SurveyContext {
  doc: SurveyDocument;
  site: SiteInputs;
  cases: WeatherCases;
  outdoor_ppm: number;
  /** The outdoor logger's points for the measurements, when one is on the survey. */
  outdoorLogger: OutdoorLoggerWindow | null;
  /** The day's outdoor temperature and humidity (day-outdoor-conditions.ts). */
  dayOutdoor: DayOutdoorConditions;
  draws: number;
  seed: number;
  thresholds_ppm: readonly number[];
  window_s: number;
}

const SUGGESTIONS: Readonly<Record<string, string>> = {
  bedroom: 'A seeded decay (CO₂ released to 2,000–3,000 ppm with a mixing fan, then 20–40 minutes of readings with the room shut) or an overnight logger would measure this bedroom’s supply.',
  'wet-room': 'Measure the extract fan’s flow with a hood or a vane anemometer and cone; a seeded decay would measure the room’s supply.',
  kitchen: 'Measure the extract fan’s flow with a hood or a vane anemometer and cone; a 20-minute decay test would measure the room’s supply.',
};
const DEFAULT_SUGGESTION =
  'A 20-minute decay test (readings every 2–5 minutes after the room empties, doors and windows as normally found) would measure this room’s supply.';

/** A room's results before judgement, with what judging it needs from the analysis. */
export interface AnalysedRoom {
  results: Omit<RoomResults, 'judgement'>;
  winter: RoomAirflowInput;
  asFound: RoomAirflowInput;
  best: MeasuredEstimate | null;
}

function analyseRoom(room: DocumentRoom, ctx: SurveyContext): AnalysedRoom {
  const { doc } = ctx;
  const volume = roomVolume(room.geometry);
  const floorArea = roomFloorArea(room.geometry);
  const ceiling = ceilingHeight(room.geometry);
  const temp = roomTemperature(room);
  const air = roomAir(temp.value!);
  const seen = asFoundCounts(room);
  const asFound = occupancyOf(room, seen.counts, air, seen.assumed ? 'assumed' : 'measured');
  const design = occupancyOf(room, designCounts(room), air, 'assumed');
  const plan = dayPlan(room);
  const warnings: AnalysisWarning[] = [];
  if (temp.basis === 'assumed') warnings.push(analysisWarning('room-temperature-assumed', 'info', 'No temperature was read in the room: 20 °C is assumed for the occupants’ CO₂ output.'));
  if (room.occupants.length === 0) warnings.push(analysisWarning('no-occupants', 'info', 'No occupants are recorded, so there are no per-person, steady CO₂ or day-profile figures.'));

  const airflow = roomAirflowContext(room, doc, ctx.site);

  // Measured supply.
  const sets = readingSets(room, doc);
  const measurementContext = {
    room,
    survey: doc.survey,
    instruments: doc.instruments,
    outdoorLogger: ctx.outdoorLogger,
    outdoorLoggerAround: (from_ms: number, to_ms: number) => outdoorLoggerAround(doc, from_ms, to_ms),
    volume_m3: volume,
    air,
    asFound,
    plan,
    draws: ctx.draws,
    seed: ctx.seed,
  };
  const evaluated = sets.map((set) => measureSet(measurementContext, set));
  const measured = evaluated.flatMap((e) => e.estimates);
  for (const e of evaluated) if (e.estimates.length === 0) warnings.push(...e.warnings);
  const best = bestMeasured(measured);
  const boundsFrom = measured.filter((m) => (m.kind === 'upper-bound' || m.kind === 'range') && !m.warnings.some((w) => w.severity === 'error'));
  const maxOf = (xs: (number | null)[]) => (xs.some((x) => x !== null) ? Math.max(...xs.filter((x): x is number => x !== null)) : null);
  const minOf = (xs: (number | null)[]) => (xs.some((x) => x !== null) ? Math.min(...xs.filter((x): x is number => x !== null)) : null);
  const bounds = { low: maxOf(boundsFrom.map((m) => m.supply_m3s.low)), high: minOf(boundsFrom.map((m) => m.supply_m3s.high)) };
  for (const m of measured) {
    for (const w of m.warnings) if (w.severity !== 'info') warnings.push(w);
  }

  // States.
  const setOf = (id: string | undefined) => sets.find((s) => s.setId === id);
  const latest = [...room.readings].sort((a, b) => Date.parse(a.time) - Date.parse(b.time) || (a.id < b.id ? -1 : 1)).at(-1);
  const bestConditions = setOf(best?.setId)?.conditions ?? latest?.conditions;
  const asFoundState: RoomState = bestConditions ? stateFromConditions(room, bestConditions) : closedState(room);
  const states = { 'as-found': asFoundState, closed: closedState(room), 'vents-open': ventsOpenState(room), 'windows-open': windowsOpenState(room) };
  const scenarioOut = roomScenarios({
    volume_m3: volume,
    outdoor_ppm: ctx.outdoor_ppm,
    air,
    cases: ctx.cases,
    states,
    airflowInput: (state) => roomAirflowInput(airflow, state, null),
    asFound,
    design,
    best,
    bounds,
    plan,
    thresholds_ppm: ctx.thresholds_ppm,
    window_s: ctx.window_s,
  });
  warnings.push(...scenarioOut.warnings);

  // Reconciliation: each measurement against the prediction for its own recorded state.
  const day = dayWeatherCase(doc.survey, temp.value!, ctx.dayOutdoor.temp_C);
  const reconciliation = measured
    .filter((m) => m.kind !== 'none')
    .map((m) => {
      const set = setOf(m.setId)!;
      const state = set.conditions ? stateFromConditions(room, set.conditions) : null;
      if (!state) return reconcile({ measured: m, state, predicted: null, predictedUnder: '', fanCounted: false, anythingOpen: false, leakageAssumed: false });
      const { input } = roomAirflowInput(airflow, state, set.start_ms);
      const over = predictRoomSupplyOverCases(input, day ? [day] : ctx.cases).predictions;
      const predicted = {
        low: Math.min(...over.map((p) => p.outdoorAir.low)),
        central: Math.min(...over.map((p) => p.outdoorAir.central)),
        high: Math.max(...over.map((p) => p.outdoorAir.high)),
      };
      const items = over.flatMap((p) => p.items);
      return reconcile({
        measured: m,
        state,
        predicted,
        predictedUnder: day ? day.label : 'every weather case (the day’s weather was not recorded)',
        fanCounted: items.some((i) => (i.mechanism === 'mechanical-extract' || i.mechanism === 'mechanical-supply') && i.flow.central > 0),
        anythingOpen: items.some((i) => (i.mechanism === 'single-sided' || i.mechanism === 'cross' || i.mechanism === 'background-vent') && i.flow.central > 0),
        leakageAssumed: ctx.site.leakage.basis === 'assumed',
      });
    });
  for (const r of reconciliation) {
    if (r.reason && r.outcome !== 'not-compared') {
      warnings.push(analysisWarning('disagrees-with-prediction', 'caution', `A measurement (${r.method}) is ${r.outcome === 'measured-above' ? 'above' : 'below'} the prediction for its recorded state. ${r.explanation}`));
    }
  }

  // Headline: the as-found scenario in its worst case (the measurement when there is one).
  const asFoundScenario = scenarioOut.scenarios[0]!;
  const worstCase = asFoundScenario.cases.find((c) => c.weatherId === asFoundScenario.worstWeatherId)!;
  const headline: RoomHeadline = {
    supply_m3s: worstCase.supply_m3s,
    airChangeRate_perSecond: worstCase.airChangeRate_perSecond,
    supplyPerPerson_m3s: worstCase.supplyPerPerson_m3s,
    steadyLevel_ppm: worstCase.steadyLevel_ppm,
    measuredSetId: best?.setId ?? null,
    weatherId: best ? null : worstCase.weatherId,
  };
  // What the surveyor must see about the as-found prediction itself (nothing brings in outdoor air, assumed leakage…).
  for (const w of worstCase.prediction.warnings) if (w.severity !== 'info') warnings.push(w);
  let suggestion: string | null = null;
  if (!best) {
    suggestion = SUGGESTIONS[room.use] ?? DEFAULT_SUGGESTION;
    warnings.push(
      measured.length > 0
        ? analysisWarning('measurement-not-usable', 'caution', `No reading set gave a supply estimate, so the figures are predictions${bounds.low !== null || bounds.high !== null ? ' held within the measured bounds' : ''}. ${suggestion}`)
        : analysisWarning('no-measurement', 'info', `No readings: the figures are predictions from the openings. ${suggestion}`),
    );
  }
  const envelope = exposedEnvelope(room, ceiling);
  const results = {
    roomId: room.id,
    name: room.name,
    clientRef: room.clientRef,
    areaId: room.areaId ?? null,
    use: room.use,
    volume_m3: volume,
    floorArea_m2: floorArea,
    ceilingHeight_m: ceiling,
    exposedEnvelope_m2: envelope.area_m2,
    roomTemp_C: temp,
    occupancy: { asFound: asFound.figures, design: design.figures },
    measured,
    bestMeasuredSetId: best?.setId ?? null,
    scenarios: scenarioOut.scenarios,
    headline,
    reconciliation,
    suggestion,
    warnings: uniqueWarnings(warnings),
  };
  return {
    results,
    winter: roomAirflowInput(airflow, states.closed, null).input,
    asFound: roomAirflowInput(airflow, states['as-found'], null).input,
    best,
  };
}

/** Stage one of analyseSurvey: every room's figures (measured, predicted, scenarios), before judgement. */
export interface SurveyFigures {
  doc: SurveyDocument;
  ctx: SurveyContext;
  source: ReturnType<typeof weatherCases>['source'];
  outdoor: ReturnType<typeof outdoorFor>;
  rooms: AnalysedRoom[];
}

/**
 * Stage one: the figures of every room (the Monte Carlo intervals live here).
 * Example: surveyFigures(doc, { draws: 50 }).rooms.length = doc.rooms.length.
 */
export function surveyFigures(doc: SurveyDocument, options: AnalysisOptions = {}): SurveyFigures {
  const survey = doc.survey;
  const site = siteInputs(survey);
  const { cases, source } = weatherCases(survey);
  const outdoorLogger = outdoorLoggerWindow(doc);
  const outdoor = outdoorFor(undefined, survey, doc.instruments, outdoorLogger);
  const ctx: SurveyContext = {
    doc,
    site,
    cases,
    outdoor_ppm: outdoor.value_ppm,
    outdoorLogger,
    dayOutdoor: dayOutdoorConditions(doc),
    draws: options.draws ?? DEFAULT_DRAWS,
    seed: options.seed ?? 0,
    thresholds_ppm: options.thresholds_ppm ?? DEFAULT_THRESHOLDS_PPM,
    window_s: options.window_s ?? DEFAULT_WINDOW_S,
  };
  return { doc, ctx, source, outdoor, rooms: doc.rooms.map((room) => analyseRoom(room, ctx)) };
}

/**
 * Stage two: judge the figures (criteria, moisture, safety, fixes, priority, ranking), add up the
 * areas and put the results together.
 * Example: judgeSurvey(surveyFigures(doc)) equals analyseSurvey(doc).
 */
export function judgeSurvey(figures: SurveyFigures): AnalysisResults {
  const { doc, ctx, source, outdoor } = figures;
  const { site, cases } = ctx;
  const survey = doc.survey;
  const analysed = figures.rooms;
  const chosen = surveyCriteria(survey);
  const judged = analysed.map((a, i) => ({
    ...a.results,
    judgement: judgeRoom({ room: doc.rooms[i]!, results: a.results, doc, criteria: chosen.criteria, cases, outdoor_ppm: outdoor.value_ppm, winter: a.winter, asFound: a.asFound, best: a.best }),
  }));
  const ranked = rankRooms(judged.map((r) => ({ id: r.roomId, safetyItems: r.judgement.safety.length, level: r.judgement.priority.level, severity: r.judgement.severity })));
  const rankOf = new Map(ranked.map((r) => [r.id, r.rank]));
  const rooms: RoomResults[] = judged.map((r) => ({ ...r, judgement: { ...r.judgement, rank: rankOf.get(r.roomId)! } }));
  const areas = doc.areas.map((area) => {
    const figures = assessArea(area, doc.areas, rooms);
    return { ...figures, judgement: judgeArea(area, figures, rooms, survey, chosen.criteria) };
  });
  const levels = Object.fromEntries(PRIORITY_LEVELS.map((l) => [l.level, rooms.filter((r) => r.judgement.priority.level === l.level).length])) as SurveyJudgement['levels'];
  const warnings: AnalysisWarning[] = [...site.warnings, ...outdoor.warnings.map(fromEngineWarning), ...chosen.warnings];
  if (source === 'screening') {
    warnings.push(analysisWarning('weather-cases-assumed', 'info', 'No design weather cases are stated: predictions use the screening cases (cold and calm, cold and windy, mild and calm).'));
  }
  const meanRoomTemp = rooms.length > 0 ? rooms.reduce((s, r) => s + r.roomTemp_C.value!, 0) / rooms.length : 20;
  const dayOutdoor = ctx.dayOutdoor;
  const day = dayWeatherCase(survey, meanRoomTemp, dayOutdoor.temp_C);
  return {
    stamps: { engineVersion: ENGINE_VERSION, formatVersion: CURRENT_FORMAT_VERSION, analysisVersion: ANALYSIS_VERSION, criteria: chosen.stamp },
    surveyId: survey.id,
    settings: { draws: ctx.draws, seed: ctx.seed, thresholds_ppm: [...ctx.thresholds_ppm], window_s: ctx.window_s },
    weatherCases: cases.map((c) => weatherCaseResult(c, source)),
    dayWeather: day ? weatherCaseResult(day, 'day-of-visit') : null,
    dayOutdoor,
    outdoor: { value_ppm: outdoor.value_ppm, sd_ppm: outdoor.sd_ppm, readings: outdoor.readings, source: outdoor.source },
    rooms,
    areas,
    warnings: uniqueWarnings(warnings),
    judgement: {
      ranking: ranked.map((r) => ({ roomId: r.id, rank: r.rank, level: r.level, words: priorityWords(r.level), safetyItems: r.safetyItems, severity: r.severity })),
      safety: ranked.flatMap((r) => rooms.find((x) => x.roomId === r.id)!.judgement.safety.map((item) => ({ roomId: r.id, item }))),
      levels,
    },
  };
}

/**
 * Analyse a validated survey document (see the file note): surveyFigures, then judgeSurvey.
 * Example: analyseSurvey(doc, { draws: 200 }).stamps = { engineVersion: '0.2.0', formatVersion: 1, analysisVersion: '0.3.0', criteria: { setId: 'schools', version: 1, edits: [] } }.
 */
export function analyseSurvey(doc: SurveyDocument, options: AnalysisOptions = {}): AnalysisResults {
  return judgeSurvey(surveyFigures(doc, options));
}
