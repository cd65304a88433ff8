/**
 * A room's scenarios over the weather cases: as found, closed, vents open, windows open (purge),
 * and design occupancy. Each gives supply, air change rate, supply per person and steady CO2
 * under every weather case, with the worst case named, and day-profile figures under the
 * room's schedule in that worst case.
 *
 * States (room-state.ts): as found = the state recorded for the best measurement, else the
 * latest reading's, else closed; closed = windows shut, vents and fans as found; vents open;
 * windows open = vents open and every openable sash open; design occupancy = as found with every
 * occupant group in full (the others use the occupancy seen on the visit).
 *
 * Measured before predicted. When the room has a best measurement (an estimate):
 * - as found and design occupancy use it unchanged in every case (basis 'measured': it stands
 *   for the day it was made);
 * - the other scenarios take the measurement plus the predicted change from the as-found state
 *   in the same weather case: Q_s = Q_m + (P_s − P_a). Additive, not a ratio: opening a window
 *   adds its own flow whatever the fabric leaks, and a ratio would scale that window flow by the
 *   error of the leakage prediction (or blow up when P_a is near zero). Ends combine end by end:
 *   low = Q_m,low + min(ΔP at each end), high = Q_m,high + max(ΔP at each end), never below zero
 *   (basis 'estimated-from-measurements').
 * With only a measured bound or range (near-steady, spot), the as-found prediction is clamped
 * into the measured bounds (a measurement outranks a prediction; basis 'estimated-from-measurements').
 *
 * Steady CO2 and profile figures are monotone in supply and output, so they are given at the two
 * ends: favourable (high supply, output −29 %, 1.96 × its 15 % sd) and unfavourable (low supply,
 * output +29 %). A low end of zero supply gives no steady level (null): the room never settles.
 *
 * Example: a room measured at 30 (25–36) L/s as found, with a window predicted to add 40 L/s in a
 * case → windows open ≈ 70 L/s in that case, 'estimated-from-measurements'.
 */
import type { RoomAirflowInput } from '../core/airflow-inputs.ts';
import { steadyLevel } from '../core/balance.ts';
import type { AirState, OccupantGroup } from '../core/co2-generation.ts';
import { buildDayProfile, sampleProfileWithChanges, type DayProfile } from '../core/day-profile.ts';
import { profileMetrics } from '../core/day-profile-metrics.ts';
import type { FlowRange } from '../core/flow-range.ts';
import { predictRoomSupplyOverCases, type RoomSupplyPrediction } from '../core/room-supply-prediction.ts';
import type { WeatherCases } from '../core/weather-cases.ts';
import { analysisWarning, fromEngineWarning, uniqueWarnings, type AnalysisWarning } from './analysis-warnings.ts';
import { scheduleIntervals, type DayPlan } from './day-schedule.ts';
import { OUTPUT_RELATIVE_SD, type RoomOccupancy } from './occupancy-inputs.ts';
import type { Figure, MeasuredEstimate, PredictionResult, ProfileCurve, ProfileFigures, ScenarioCase, ScenarioId, ScenarioResult } from './results.ts';
import { summariseState, type RoomState } from './room-state.ts';

/** Output at the ends of its range: ×(1 ± 1.96 × relative sd). */
export const OUTPUT_RANGE = 1.959963984540054 * OUTPUT_RELATIVE_SD;

const DESCRIPTIONS: Readonly<Record<ScenarioId, string>> = {
  'as-found': 'as found: openings, doors and fans as recorded during the readings',
  closed: 'closed: windows shut, vents and fans as found',
  'vents-open': 'vents open: windows shut, every usable background vent open',
  'windows-open': 'windows open (purge): every openable sash and vent open',
  'design-occupancy': 'design occupancy: as found, with every occupant group in full',
};

/** What the scenarios of one room need. */
export interface ScenarioInputs {
  volume_m3: number;
  outdoor_ppm: number;
  air: AirState;
  cases: WeatherCases;
  states: Readonly<Record<Exclude<ScenarioId, 'design-occupancy'>, RoomState>>;
  /** The room's airflow input for a state. */
  airflowInput: (state: RoomState) => { input: RoomAirflowInput; warnings: AnalysisWarning[] };
  asFound: RoomOccupancy;
  design: RoomOccupancy;
  best: MeasuredEstimate | null;
  /** Measured bounds when there is no estimate (from bound or range results). */
  bounds: { low: number | null; high: number | null };
  plan: DayPlan | null;
  thresholds_ppm: readonly number[];
  window_s: number;
}

/** A prediction as the results carry it. */
export function predictionResult(p: RoomSupplyPrediction): PredictionResult {
  return {
    weatherId: p.weather.id,
    supply_m3s: { value: p.outdoorAir.central, low: p.outdoorAir.low, high: p.outdoorAir.high },
    mode: p.mode,
    items: p.items.map((i) => ({
      itemId: i.itemId,
      mechanism: i.mechanism,
      low: i.flow.low,
      central: i.flow.central,
      high: i.flow.high,
      countsAsOutdoorAir: i.countsAsOutdoorAir,
      method: i.method,
    })),
    combination: p.combination,
    windAtHeight_ms: p.windAtHeight_ms,
    envelopePressure_Pa: p.envelopePressure_Pa,
    warnings: uniqueWarnings([...p.items.flatMap((i) => i.warnings), ...p.warnings].map(fromEngineWarning)),
  };
}

const clamp = (x: number, lo: number | null, hi: number | null): number => Math.min(Math.max(x, lo ?? -Infinity), hi ?? Infinity);

/** The supply figure of a scenario in one case (see the file note). */
function supplyFigure(id: ScenarioId, p: FlowRange, asFoundPrediction: FlowRange, inputs: ScenarioInputs): Figure {
  const m = inputs.best;
  const predicted: Figure = { value: p.central, low: p.low, high: p.high, basis: 'predicted', method: 'predicted from openings, fans and leakage' };
  const asFoundLike = id === 'as-found' || id === 'design-occupancy';
  if (m && m.supply_m3s.value !== null && m.supply_m3s.low !== null && m.supply_m3s.high !== null) {
    if (asFoundLike) return { ...m.supply_m3s, basis: 'measured', method: `${m.method} (${m.setKind} ${m.from ?? ''})`.trim() };
    const d = [p.low - asFoundPrediction.low, p.central - asFoundPrediction.central, p.high - asFoundPrediction.high];
    return {
      value: Math.max(0, m.supply_m3s.value + d[1]!),
      low: Math.max(0, m.supply_m3s.low + Math.min(...d)),
      high: Math.max(0, m.supply_m3s.high + Math.max(...d)),
      basis: 'estimated-from-measurements',
      method: `measured as found (${m.method}) plus the predicted change from the as-found state`,
    };
  }
  const { low, high } = inputs.bounds;
  if (asFoundLike && (low !== null || high !== null) && (low === null || high === null || low <= high)) {
    const clamped = { value: clamp(p.central, low, high), low: clamp(p.low, low, high), high: clamp(p.high, low, high) };
    if (clamped.value !== p.central || clamped.low !== p.low || clamped.high !== p.high) {
      return { ...clamped, basis: 'estimated-from-measurements', method: 'predicted, held within the measured bounds' };
    }
  }
  return predicted;
}

function derivedFigures(supply: Figure, occupancy: RoomOccupancy, inputs: ScenarioInputs): Pick<ScenarioCase, 'airChangeRate_perSecond' | 'supplyPerPerson_m3s' | 'steadyLevel_ppm'> {
  const per = (v: number | null, k: number): number | null => (v === null ? null : v * k);
  const ach: Figure = { ...supply, value: per(supply.value, 1 / inputs.volume_m3), low: per(supply.low, 1 / inputs.volume_m3), high: per(supply.high, 1 / inputs.volume_m3) };
  const n = occupancy.figures.count;
  if (!(n > 0)) return { airChangeRate_perSecond: ach, supplyPerPerson_m3s: null, steadyLevel_ppm: null };
  const g = occupancy.figures.output_m3s;
  const steady = (q: number | null, output: number): number | null => {
    if (q === null) return null;
    const c = steadyLevel({ volume_m3: inputs.volume_m3, supply_m3s: q, outdoor_ppm: inputs.outdoor_ppm, source_m3s: output });
    return Number.isFinite(c) ? c : null;
  };
  return {
    airChangeRate_perSecond: ach,
    supplyPerPerson_m3s: { ...supply, value: per(supply.value, 1 / n), low: per(supply.low, 1 / n), high: per(supply.high, 1 / n) },
    steadyLevel_ppm: {
      value: steady(supply.value, g),
      low: steady(supply.high, g * (1 - OUTPUT_RANGE)),
      high: steady(supply.low, g * (1 + OUTPUT_RANGE)),
      basis: supply.basis,
      method: `steady state C_out + 1e6·G/Q at ${n} people; ends at the supply's ends with output ±${Math.round(OUTPUT_RANGE * 100)} %`,
    },
  };
}

/** How often a predicted day is sampled for drawing (s); changes of conditions are added. */
export const PROFILE_CURVE_STEP_S = 600;

/** The two ends' days sampled at the same times (their schedules share every change). */
function profileCurve(plan: DayPlan, favourable: DayProfile, unfavourable: DayProfile): ProfileCurve {
  const low = sampleProfileWithChanges(favourable, PROFILE_CURVE_STEP_S);
  const high = sampleProfileWithChanges(unfavourable, PROFILE_CURVE_STEP_S);
  return {
    time_s: low.time_s,
    favourable_ppm: low.level_ppm,
    unfavourable_ppm: high.level_ppm,
    inUse: plan.slots.filter((s) => s.presence === 'full' || s.presence === 'half').map((s) => ({ from_s: s.start_s, to_s: s.end_s, label: s.label })),
  };
}

/** Day-profile figures at the two ends in one case, with the sampled day when asked. */
function profileFor(
  plan: DayPlan,
  groups: readonly OccupantGroup[],
  ends: { occupied: Figure; empty: Figure; airing: Figure },
  weatherId: string,
  inputs: ScenarioInputs,
  withCurve: boolean,
): ProfileFigures {
  const warnings: AnalysisWarning[] = [];
  const days: DayProfile[] = [];
  const at = (end: 'low' | 'high') => {
    const pick = (f: Figure) => f[end] ?? f.value ?? 0;
    const factor = end === 'low' ? 1 + OUTPUT_RANGE : 1 - OUTPUT_RANGE;
    const schedule = scheduleIntervals(plan, {
      occupants: groups.map((g) => ({ ...g, count: g.count * factor })),
      occupiedSupply_m3s: pick(ends.occupied),
      emptySupply_m3s: pick(ends.empty),
      airingSupply_m3s: pick(ends.airing),
      outdoor_ppm: inputs.outdoor_ppm,
    });
    const profile = buildDayProfile({ volume_m3: inputs.volume_m3, startLevel_ppm: inputs.outdoor_ppm, air: inputs.air, schedule });
    days.push(profile);
    const metrics = inputs.thresholds_ppm.map((threshold_ppm, k) =>
      profileMetrics(profile, { threshold_ppm, window_s: k === 0 ? inputs.window_s : Number.POSITIVE_INFINITY }),
    );
    warnings.push(...profile.warnings.map(fromEngineWarning), ...(metrics[0]?.warnings ?? []).map(fromEngineWarning));
    return metrics;
  };
  // Low supply is the unfavourable end: its figures are the high bounds.
  const worst = at('low');
  const best = at('high');
  const bounds = (f: (m: ReturnType<typeof profileMetrics>) => number | null) => ({ low: best[0] ? f(best[0]) : null, high: worst[0] ? f(worst[0]) : null });
  return {
    weatherId,
    schedule: plan.source,
    occupiedMean_ppm: bounds((m) => m.mean_ppm),
    peak_ppm: bounds((m) => m.peak_ppm),
    highestRollingMean_ppm: bounds((m) => m.highestRollingMean_ppm),
    window_s: inputs.window_s,
    above: inputs.thresholds_ppm.map((threshold_ppm, k) => ({
      threshold_ppm,
      time_s: { low: best[k]!.timeAbove_s, high: worst[k]!.timeAbove_s },
      longestRun_s: { low: best[k]!.longestRunAbove_s, high: worst[k]!.longestRunAbove_s },
    })),
    // days[0] is the low-supply (unfavourable) end, days[1] the high-supply end.
    curve: withCurve ? profileCurve(plan, days[1]!, days[0]!) : null,
    warnings: uniqueWarnings(warnings),
  };
}

/**
 * Every scenario of a room (see the file note).
 * Example: roomScenarios(inputs).map((s) => s.id) = ['as-found', 'closed', 'vents-open', 'windows-open', 'design-occupancy'].
 */
export function roomScenarios(inputs: ScenarioInputs): { scenarios: ScenarioResult[]; warnings: AnalysisWarning[] } {
  const warnings: AnalysisWarning[] = [];
  const predictions = new Map<Exclude<ScenarioId, 'design-occupancy'>, RoomSupplyPrediction[]>();
  // Scenarios often share a state (closed = vents open when there are no vents): predict each state once.
  const byState = new Map<string, RoomSupplyPrediction[]>();
  for (const [id, state] of Object.entries(inputs.states) as [Exclude<ScenarioId, 'design-occupancy'>, RoomState][]) {
    const { assumptions: _, ...summary } = summariseState(state);
    const key = JSON.stringify(summary);
    let predicted = byState.get(key);
    if (!predicted) {
      const { input, warnings: mapped } = inputs.airflowInput(state);
      warnings.push(...mapped);
      predicted = predictRoomSupplyOverCases(input, inputs.cases).predictions;
      byState.set(key, predicted);
    }
    predictions.set(id, predicted);
  }
  const ids: ScenarioId[] = ['as-found', 'closed', 'vents-open', 'windows-open', 'design-occupancy'];
  const supplies = new Map<ScenarioId, Figure[]>();
  const asFoundPredictions = predictions.get('as-found')!;
  for (const id of ids) {
    const own = predictions.get(id === 'design-occupancy' ? 'as-found' : id)!;
    supplies.set(id, own.map((p, k) => supplyFigure(id, p.outdoorAir, asFoundPredictions[k]!.outdoorAir, inputs)));
  }
  const profiles = new Map<string, ProfileFigures>();
  const scenarios = ids.map((id): ScenarioResult => {
    const own = predictions.get(id === 'design-occupancy' ? 'as-found' : id)!;
    const occupancy = id === 'design-occupancy' ? inputs.design : inputs.asFound;
    const figures = supplies.get(id)!;
    const cases = own.map((p, k): ScenarioCase => ({
      weatherId: p.weather.id,
      supply_m3s: figures[k]!,
      ...derivedFigures(figures[k]!, occupancy, inputs),
      prediction: predictionResult(p),
    }));
    // Worst case: lowest supply, then lowest low end, then lowest predicted central.
    const rank = (k: number): [number, number, number] => [cases[k]!.supply_m3s.value ?? 0, cases[k]!.supply_m3s.low ?? 0, own[k]!.outdoorAir.central];
    let worst = 0;
    for (let k = 1; k < cases.length; k++) {
      const [av, al, ap] = rank(k);
      const [bv, bl, bp] = rank(worst);
      if (av < bv || (av === bv && (al < bl || (al === bl && ap < bp)))) worst = k;
    }
    let profile: ProfileFigures | null = null;
    if (inputs.plan && occupancy.figures.count > 0) {
      const ends = { occupied: figures[worst]!, empty: supplies.get('closed')![worst]!, airing: supplies.get('windows-open')![worst]! };
      // Scenarios with the same supplies and people have the same day: work it out once.
      // Only the as-found day is drawn, so only it carries the sampled curve.
      const withCurve = id === 'as-found';
      const key = JSON.stringify([occupancy.figures.groups, cases[worst]!.weatherId, ends, withCurve]);
      profile = profiles.get(key) ?? profileFor(inputs.plan, occupancy.groups, ends, cases[worst]!.weatherId, inputs, withCurve);
      profiles.set(key, profile);
    }
    const stateKey = id === 'design-occupancy' ? 'as-found' : id;
    return {
      id,
      description: DESCRIPTIONS[id],
      state: summariseState(inputs.states[stateKey]),
      occupancy: occupancy.figures,
      cases,
      worstWeatherId: cases[worst]!.weatherId,
      profile,
    };
  });
  if (!inputs.plan && inputs.asFound.figures.count > 0) {
    warnings.push(analysisWarning('no-schedule', 'info', 'The room has no schedule and its use has no template, so there are no day-profile figures. Record when it is used.'));
  }
  return { scenarios, warnings };
}
