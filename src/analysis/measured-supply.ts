/**
 * Measured supply of a room: every reading set (reading-sets.ts) evaluated by the Engine I method
 * that fits it, and the best of them chosen by one documented rule.
 *
 * Methods by set:
 * - decay and seeded decay tests, logger decay periods: fitDecay (log-linear, with a fitted
 *   background when the decay is long enough; two readings: the two-point form);
 * - build-up tests and logger build-up periods, with the people recorded: five readings or more,
 *   both build-up fits (known output, and rate and level, which checks the output); four, the
 *   known-output fit; two or three, the two-point build-up from the first and last;
 * - logger steady periods: the near-steady method on the last reading, the room rising at
 *   constant occupancy since the period began;
 * - a single occupied reading: if it falls in the first occupied period of the room's day, the
 *   spot-reading method from the outdoor level at that period's start (the room stood empty
 *   before; start sd 50 ppm or the outdoor sd if larger, assumed); otherwise the near-steady
 *   method with an unknown history (a lower limit only: practice.md §1 item 8).
 * People present during a decay add CO2 the decay form ignores: flagged.
 *
 * Uncertain inputs: the meter (meter-inputs.ts), the outdoor level on that meter, the volume ±5 %
 * (1 sd; tape measurement of an ordinary room, common practice (no published source)), people
 * counted (no count uncertainty), output per person ±15 % (occupancy-inputs.ts).
 *
 * Best-estimate rule (a measurement always outranks a prediction; this picks among measurements):
 * only kind 'estimate' with a supply and no error-severity warning competes; an estimate whose
 * interval reaches down to no air at all (low end at or below zero, or unknown: a decay cut short
 * after a few minutes) ranks behind every estimate with a positive low end, so an abandoned test
 * never displaces a usable reading; then lower tier wins —
 * 0 decay with background, 1 decay (log-linear), 2 build-up fits, 3 two-point forms (decay or
 * build-up), 4 spot reading and near-steady; within a tier the narrower interval relative to its
 * value wins; then the smaller set id (so the choice never depends on order). Every estimate is
 * kept in the results.
 *
 * Example: Classroom B1 has a decay (tier 1) and a build-up (tier 2): the decay is the best.
 */
import { fitBuildUpKnownOutput, fitBuildUpRateAndLevel } from '../core/build-up-fit.ts';
import type { AirState } from '../core/co2-generation.ts';
import { estimateBuildUpTwoPoint, estimateSpotReading } from '../core/build-up-two-point.ts';
import { fitDecay } from '../core/decay-fit.ts';
import { estimateNearSteady } from '../core/near-steady-level.ts';
import type { Figure as EngineFigure, OccupantUncertainty, SupplyEstimate, SupplyMethod, UncertaintyInputs } from '../core/supply-estimate.ts';
import type { Instrument } from '../model/instrument.ts';
import type { Survey } from '../model/survey.ts';
import type { DocumentRoom } from '../model/survey-document.ts';
import { analysisWarning, fromEngineWarning, uniqueWarnings, type AnalysisWarning } from './analysis-warnings.ts';
import { clockSeconds, firstOccupiedSlot, slotAt, type DayPlan } from './day-schedule.ts';
import { seedFromIds } from './id-seed.ts';
import { meterModel, outdoorFor } from './meter-inputs.ts';
import type { OutdoorLoggerWindow } from './outdoor-logger-window.ts';
import { OUTPUT_RELATIVE_SD, occupancyOf, presentCounts, type RoomOccupancy } from './occupancy-inputs.ts';
import type { ReadingSet } from './reading-sets.ts';
import type { MeasuredEstimate, OccupancyFigures, Ranged } from './results.ts';
import { stateFromConditions, summariseState, type RoomState } from './room-state.ts';

/** Relative standard uncertainty of a measured room volume (see the file note). */
export const VOLUME_RELATIVE_SD = 0.05;
/** Standard uncertainty of a start level taken as outdoor after the room stood empty, ppm (assumed). */
export const EMPTY_ROOM_START_SD_PPM = 50;
/** Occupied time assumed before a reading outside every scheduled period, s. */
export const ASSUMED_OCCUPIED_TIME_S = 3600;

/** Tier of each method in the best-estimate rule (see the file note). */
export const METHOD_TIER: Readonly<Record<SupplyMethod, number>> = {
  'decay-with-background': 0,
  'decay-log-linear': 1,
  'build-up-known-output': 2,
  'build-up-rate-and-level': 2,
  'decay-two-point': 3,
  'build-up-two-point': 3,
  'spot-reading': 4,
  'near-steady': 4,
};

/** What evaluating a room's sets needs. */
export interface MeasurementContext {
  room: DocumentRoom;
  survey: Survey;
  instruments: readonly Instrument[];
  /** The outdoor logger's points for the measurements (outdoor-logger-window.ts), or null. */
  outdoorLogger: OutdoorLoggerWindow | null;
  /** Its points around one measurement (ms since 1970), or null when too few were logged then. */
  outdoorLoggerAround: (from_ms: number, to_ms: number) => OutdoorLoggerWindow | null;
  volume_m3: number;
  air: AirState;
  asFound: RoomOccupancy;
  plan: DayPlan | null;
  draws: number;
  seed: number;
}

/** A finite number or null. */
const finite = (v: number | null): number | null => (v !== null && Number.isFinite(v) ? v : null);
const ranged = (f: EngineFigure): Ranged => ({ value: finite(f.value), low: finite(f.low), high: finite(f.high) });
/** A flow or rate: none of its ends below zero. */
const atLeastZero = (r: Ranged): Ranged => ({ value: r.value === null ? null : Math.max(0, r.value), low: r.low === null ? null : Math.max(0, r.low), high: r.high === null ? null : Math.max(0, r.high) });

function occupantUncertainty(occ: RoomOccupancy): OccupantUncertainty | undefined {
  const n = occ.figures.count;
  return n > 0 ? { count: n, countSd: 0, perPerson_m3s: occ.figures.output_m3s / n, perPersonRelSd: OUTPUT_RELATIVE_SD } : undefined;
}

/**
 * Evaluate one set: its estimates (a build-up may give two), and the set's own warnings (which
 * the estimates also carry; they matter alone when nothing could be fitted).
 */
export function measureSet(ctx: MeasurementContext, set: ReadingSet): { estimates: MeasuredEstimate[]; warnings: AnalysisWarning[] } {
  const { room } = ctx;
  const warnings: AnalysisWarning[] = [...set.warnings];
  const meter = meterModel(set.instrumentId, ctx.instruments);
  warnings.push(...meter.warnings);
  // An outdoor logger gives the level the room drew while this set was measured, when it ran then.
  const first = set.readings[0];
  const last = set.readings[set.readings.length - 1];
  const around = ctx.outdoorLogger && first && last ? ctx.outdoorLoggerAround(first.time_s * 1000, last.time_s * 1000) : null;
  const outdoor = outdoorFor(set.instrumentId, ctx.survey, ctx.instruments, around ?? ctx.outdoorLogger);
  const state: RoomState | null = set.conditions ? stateFromConditions(room, set.conditions) : null;
  let people: RoomOccupancy = ctx.asFound;
  if (set.conditions) {
    people = occupancyOf(room, presentCounts(set.conditions), ctx.air, 'measured');
  } else if (set.setKind === 'build-up' || set.setKind === 'steady') {
    warnings.push(analysisWarning('occupants-assumed', 'caution', 'Who was in the room during this logger period is not recorded: the room’s usual occupants are assumed.'));
  }
  const isDecay = set.setKind === 'decay' || set.setKind === 'seeded-decay';
  if (isDecay && set.conditions && people.figures.count > 0) {
    warnings.push(analysisWarning('people-during-decay', 'caution', 'People were recorded in the room during the decay: their CO₂ makes the decay read low. Empty the room for a decay test.'));
  }
  const u: UncertaintyInputs = {
    volume_m3: ctx.volume_m3,
    volumeSd_m3: VOLUME_RELATIVE_SD * ctx.volume_m3,
    outdoor,
    meter: meter.meter,
    // A decay's per-person and steady figures are for the room's usual occupants; fits use those present.
    occupants: occupantUncertainty(isDecay ? ctx.asFound : people),
  };
  const seed = seedFromIds(ctx.seed, room.id, set.setId);
  const common = { uncertainty: u, conditions: state, seed, draws: ctx.draws };
  const r = set.readings;
  const estimates: SupplyEstimate<RoomState | null>[] = [];
  if (r.length === 0) {
    warnings.push(analysisWarning('no-co2-readings', 'caution', 'No CO₂ readings are left in this set to fit.'));
  } else if (isDecay) {
    if (r.length >= 2) estimates.push(fitDecay({ ...common, readings: r }));
  } else if (set.setKind === 'build-up') {
    if (r.length >= 5) estimates.push(fitBuildUpKnownOutput({ ...common, readings: r }), fitBuildUpRateAndLevel({ ...common, readings: r }));
    else if (r.length === 4) estimates.push(fitBuildUpKnownOutput({ ...common, readings: r }));
    else if (r.length >= 2) estimates.push(estimateBuildUpTwoPoint({ ...common, start: r[0]!, end: r[r.length - 1]! }));
  } else if (set.setKind === 'steady') {
    estimates.push(estimateNearSteady({ ...common, reading: r[r.length - 1]!, occupiedSince_s: r[0]!.time_s, history: 'rising-at-constant-occupancy' }));
  } else {
    estimates.push(spotOrNearSteady(ctx, set, common, warnings));
  }
  return { estimates: estimates.map((e) => toMeasured(set, e, people.figures, meter.meter, set.instrumentId, warnings, state)), warnings };
}

function spotOrNearSteady(
  ctx: MeasurementContext,
  set: ReadingSet,
  common: { uncertainty: UncertaintyInputs; conditions: RoomState | null; seed: number; draws: number },
  warnings: AnalysisWarning[],
): SupplyEstimate<RoomState | null> {
  const reading = set.readings[0]!;
  const clockNow = clockSeconds(reading.time);
  const slot = ctx.plan ? slotAt(ctx.plan, clockNow) : null;
  const since = (slotStart: number) => reading.time_s - (((clockNow - slotStart) % 86_400) + 86_400) % 86_400;
  const first = ctx.plan ? firstOccupiedSlot(ctx.plan) : null;
  if (slot && first && slot === first) {
    const o = common.uncertainty.outdoor;
    const startLevel = o.sameMeterAsRoom ? (o.value_ppm - common.uncertainty.meter.offset_ppm) / common.uncertainty.meter.gain : o.value_ppm;
    return estimateSpotReading({
      ...common,
      reading,
      startTime_s: since(slot.start_s),
      startLevel_ppm: startLevel,
      startLevelSd_ppm: Math.max(EMPTY_ROOM_START_SD_PPM, o.sd_ppm),
    });
  }
  if (!slot) {
    warnings.push(
      analysisWarning('occupied-time-assumed', 'caution', `This reading is outside the room’s scheduled periods: ${ASSUMED_OCCUPIED_TIME_S / 60} minutes of occupancy before it are assumed.`),
    );
  }
  return estimateNearSteady({
    ...common,
    reading,
    occupiedSince_s: slot ? since(slot.start_s) : reading.time_s - ASSUMED_OCCUPIED_TIME_S,
    history: 'unknown',
  });
}

function toMeasured(
  set: ReadingSet,
  e: SupplyEstimate<RoomState | null>,
  occupants: OccupancyFigures,
  meter: UncertaintyInputs['meter'],
  instrumentId: string | undefined,
  setWarnings: AnalysisWarning[],
  state: RoomState | null,
): MeasuredEstimate {
  const o = e.assumed.outdoor;
  // No flow is negative: an interval reaching below zero is cut there, and said to reach "none".
  const reachesZero = e.supply_m3s.low !== null && Number.isFinite(e.supply_m3s.low) && e.supply_m3s.low <= 0;
  const zeroWarning = reachesZero
    ? [
        analysisWarning(
          'interval-reaches-zero',
          'caution',
          'This measurement’s interval reaches no outdoor air at all: it cannot show the room gets any. Take more readings over a longer time, or another kind of test.',
        ),
      ]
    : [];
  return {
    setId: set.setId,
    source: set.source,
    setKind: set.setKind,
    method: e.method,
    kind: e.kind,
    supply_m3s: atLeastZero(ranged(e.supply_m3s)),
    airChangeRate_perSecond: atLeastZero(ranged(e.airChangeRate_perSecond)),
    supplyPerPerson_m3s: atLeastZero(ranged(e.supplyPerPerson_m3s)),
    steadyLevel_ppm: ranged(e.steadyLevel_ppm),
    tier: METHOD_TIER[e.method],
    readingsUsed: set.readings.length,
    readingsExcluded: set.excluded,
    from: set.readings[0]?.time ?? null,
    to: set.readings.at(-1)?.time ?? null,
    state: state ? summariseState(state) : null,
    occupants: occupants.count > 0 ? occupants : null,
    interval: { ...e.assumed.interval, confidence: 0.95 },
    meter: {
      instrumentId: instrumentId ?? null,
      source: meter.source,
      offset_ppm: meter.offset_ppm,
      offsetSd_ppm: meter.offsetSd_ppm,
      gain: meter.gain,
      gainSd: meter.gainSd,
      noiseSd_ppm: meter.noiseSd_ppm,
    },
    outdoor: { value_ppm: o.value_ppm, sd_ppm: o.sd_ppm, sameMeterAsRoom: o.sameMeterAsRoom, readings: o.readings, source: o.source },
    details: Object.fromEntries(Object.entries(e.details).map(([k, v]) => [k, finite(v)])),
    warnings: uniqueWarnings([...setWarnings, ...e.warnings.map(fromEngineWarning), ...zeroWarning]),
  };
}

/** Relative width of an estimate's interval (Infinity when unknown). */
function relativeWidth(m: MeasuredEstimate): number {
  const { value, low, high } = m.supply_m3s;
  return value !== null && low !== null && high !== null && value > 0 ? (high - low) / value : Number.POSITIVE_INFINITY;
}

/** 1 when the interval reaches no air at all (its low end unknown or at or below zero), else 0. */
function unbounded(m: MeasuredEstimate): number {
  return m.supply_m3s.low !== null && m.supply_m3s.low > 0 ? 0 : 1;
}

/**
 * The best measured estimate by the rule in the file note, or null.
 * Example: bestMeasured([buildUp, decay]) = decay.
 */
export function bestMeasured(list: readonly MeasuredEstimate[]): MeasuredEstimate | null {
  const usable = list.filter((m) => m.kind === 'estimate' && m.supply_m3s.value !== null && !m.warnings.some((w) => w.severity === 'error'));
  return (
    [...usable].sort(
      (a, b) => unbounded(a) - unbounded(b) || a.tier - b.tier || relativeWidth(a) - relativeWidth(b) || (a.setId < b.setId ? -1 : a.setId > b.setId ? 1 : 0),
    )[0] ?? null
  );
}
