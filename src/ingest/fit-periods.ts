/**
 * Each period found in a CO2 record fitted by the engine, with its interval, the engine's and
 * the importer's warnings, a curve to draw over the readings, and a suggestion to accept or
 * reject it with the reason. The surveyor decides; accepted periods go into the logger series
 * record (logger-series-record.ts).
 *
 * - Decay: fitDecay (log-linear with the background fitted when it spans two time constants;
 *   ASTM E741 concentration decay).
 * - Build-up: with the caller's head count and output per person, fitBuildUpKnownOutput;
 *   otherwise (the usual case for a logger file) fitBuildUpRateAndLevel, which needs no output.
 * - Near-steady plateau: estimateNearSteady when the head count is known; otherwise no fit.
 *
 * Inputs the file cannot give: the room volume (without it only the air change rate is given),
 * the outdoor level (the engine's default with its warning when absent) and the meter (default:
 * a stated accuracy of ±(50 ppm + 3 % of reading), typical of NDIR loggers, common practice (no
 * published source); its noise is the noise measured in the record).
 *
 * Example: a decay logged each minute for 3 h from 1600 ppm at 1.0 h⁻¹ in a 50 m³ room with
 * outdoor 420 → air change rate ≈ 1.0 h⁻¹, supply ≈ 13.9 L/s, suggestion accept.
 */
import { fitBuildUpKnownOutput, fitBuildUpRateAndLevel } from '../core/build-up-fit.ts';
import { fitDecay } from '../core/decay-fit.ts';
import { meterErrorFromStatedAccuracy, type MeterErrorModel } from '../core/meter-error.ts';
import { estimateNearSteady } from '../core/near-steady-level.ts';
import { outdoorLevel } from '../core/outdoor-level.ts';
import { NO_FIGURE, type Reading, type SupplyEstimate, type UncertaintyInputs } from '../core/supply-estimate.ts';
import { fittedCurve, type SampledCurve } from './fitted-curve.ts';
import { ingestWarning, type IngestWarning } from './ingest-warnings.ts';
import type { FoundPeriod, OccupiedWindow, PeriodFinding } from './period-finding.ts';
import { periodReadings } from './period-readings.ts';

export interface FitOptions {
  /** Room volume, m³. */
  volume_m3?: number;
  /** Standard uncertainty of the volume as a fraction (default 0.05: a measured room, common practice (no published source)). */
  volumeRelSd?: number;
  /** Outdoor CO2, ppm, read on another meter. */
  outdoor_ppm?: number;
  meter?: MeterErrorModel;
  /** People present, and each one's CO2 output (m³/s) with its relative sd. */
  occupancy?: readonly OccupiedWindow[];
  perPerson_m3s?: number;
  perPersonRelSd?: number;
  /** Monte Carlo draws per decay (default 1000). */
  draws?: number;
}

export interface Suggestion {
  accept: boolean;
  reason: string;
}

export interface FittedPeriod extends FoundPeriod {
  /** The engine's result; null for exclusions and plateaus without a head count. */
  fit: SupplyEstimate<null> | null;
  /** Readings given to the fit. */
  fitPoints: number;
  /** The fitted curve in the meter's reading scale, for drawing. */
  curve: SampledCurve | null;
  suggestion: Suggestion;
}

/** Engine warnings that make a fit unfit to use. */
const SERIOUS = new Set(['too-few-readings', 'rate-not-determined', 'curvature', 'short-decay', 'small-excess']);
/** Importer warnings that make a period unfit to use. */
const DISQUALIFYING = new Set(['combustion-suspected', 'unoccupied-rise', 'occupied-during-decay', 'excluded-by-caller']);
const MIN_FIT_S = 15 * 60;

/** The default meter and the outdoor level the fits use. */
export function fitUncertainty(options: FitOptions, noise_ppm: number): { uncertainty: UncertaintyInputs; volumeKnown: boolean } {
  const meter = { ...(options.meter ?? meterErrorFromStatedAccuracy(50, 3)), noiseSd_ppm: options.meter?.noiseSd_ppm ?? noise_ppm };
  const outdoor = outdoorLevel(options.outdoor_ppm === undefined ? [] : [options.outdoor_ppm], { sameMeterAsRoom: false, meter });
  const volumeKnown = options.volume_m3 !== undefined && options.volume_m3 > 0;
  const volume = volumeKnown ? options.volume_m3! : 1;
  return { uncertainty: { volume_m3: volume, volumeSd_m3: volumeKnown ? volume * (options.volumeRelSd ?? 0.05) : 0, outdoor, meter }, volumeKnown };
}

function occupantsDuring(p: FoundPeriod, options: FitOptions): number {
  let count = 0;
  for (const w of options.occupancy ?? []) if (w.from_s < p.end_s && p.start_s < w.to_s) count = Math.max(count, w.count);
  return count;
}

function toReading(meter: MeterErrorModel, level: number): number {
  return meter.gain * level + meter.offset_ppm;
}

/** Fit every period of a finding. */
export function fitPeriods(times: Float64Array, co2: Float64Array, finding: PeriodFinding, options: FitOptions = {}): FittedPeriod[] {
  const { uncertainty, volumeKnown } = fitUncertainty(options, finding.noise_ppm);
  const overlapsExclusion = (p: FoundPeriod) =>
    finding.periods.some((e) => e.exclusion === 'caller' && e.start_s < p.end_s && p.start_s < e.end_s);
  return finding.periods.map((p, index) => {
    if (p.kind === 'excluded') return { ...p, fit: null, fitPoints: 0, curve: null, suggestion: { accept: false, reason: p.note } };
    const warnings: IngestWarning[] = [...p.warnings];
    const readings = periodReadings(times, co2, finding.usable, p);
    const occupants = occupantsDuring(p, options);
    const withOccupants: UncertaintyInputs =
      occupants > 0 && options.perPerson_m3s
        ? { ...uncertainty, occupants: { count: occupants, countSd: 0, perPerson_m3s: options.perPerson_m3s, perPersonRelSd: options.perPersonRelSd ?? 0.15 } }
        : uncertainty;
    if (overlapsExclusion(p)) warnings.push(ingestWarning('excluded-by-caller', 'Part of this period lies in a window marked to be left out.'));
    let fit: SupplyEstimate<null> | null = null;
    let curve: SampledCurve | null = null;
    const meter = uncertainty.meter;
    if (p.kind === 'decay') {
      if (occupants > 0) warnings.push(ingestWarning('occupied-during-decay', `${occupants} people were recorded in the room during this fall, so it is not a decay of an empty room.`));
      fit = fitDecay({ readings, uncertainty, conditions: null, seed: index + 1, draws: options.draws });
      const rate = fit.airChangeRate_perSecond.value;
      const background = fit.method === 'decay-with-background' ? fit.details.background_ppm : null;
      if (rate) curve = fittedCurve(readings, 0, rate, toReading(meter, background ?? uncertainty.outdoor.value_ppm));
    } else if (p.kind === 'build-up') {
      fit = withOccupants.occupants
        ? fitBuildUpKnownOutput({ readings, uncertainty: withOccupants, conditions: null })
        : fitBuildUpRateAndLevel({ readings, uncertainty, conditions: null });
      const rate = fit.details.rate_perSecond;
      const steady = fit.details.fittedSteadyLevel_ppm ?? fit.steadyLevel_ppm.value;
      if (rate && steady !== null && steady !== undefined) curve = fittedCurve(readings, 0, rate, toReading(meter, steady));
    } else if (withOccupants.occupants) {
      const tail = readings.filter((r) => r.time_s >= p.end_s - p.start_s - 30 * 60);
      const level = tail.reduce((a, r) => a + r.level_ppm, 0) / Math.max(1, tail.length);
      const since = (options.occupancy ?? []).filter((w) => w.from_s <= p.start_s && w.count > 0).reduce((a, w) => Math.max(a, w.from_s), -Infinity);
      fit = estimateNearSteady({
        reading: { time_s: p.end_s - p.start_s, level_ppm: level },
        occupiedSince_s: Number.isFinite(since) ? since - p.start_s : 0,
        history: 'rising-at-constant-occupancy',
        uncertainty: withOccupants,
        conditions: null,
        seed: index + 1,
        draws: options.draws,
      });
    } else {
      warnings.push(ingestWarning('needs-occupancy', 'A steady level gives the supply only with the number of people present: add the occupancy to fit it.'));
    }
    if (p.kind === 'steady' && readings.length) {
      const level = readings.reduce((a, r) => a + r.level_ppm, 0) / readings.length;
      curve = { times_s: [readings[0]!.time_s, readings[readings.length - 1]!.time_s], values: [level, level] };
    }
    if (curve) curve = { times_s: curve.times_s.map((t) => t + p.start_s), values: curve.values };
    if (fit && !volumeKnown) fit = { ...fit, supply_m3s: NO_FIGURE, supplyPerPerson_m3s: NO_FIGURE };
    if (fit && !volumeKnown && p.kind !== 'steady') {
      warnings.push(ingestWarning('volume-unknown', 'No room volume was given, so only the air change rate is shown; give the volume for the supply in L/s.'));
    }
    return { ...p, warnings, fit, fitPoints: readings.length, curve, suggestion: suggest(p, fit, warnings, readings) };
  });
}

function suggest(p: FoundPeriod, fit: SupplyEstimate<null> | null, warnings: readonly IngestWarning[], readings: readonly Reading[]): Suggestion {
  const disqualifying = warnings.find((w) => DISQUALIFYING.has(w.code));
  if (disqualifying) return { accept: false, reason: disqualifying.message };
  if (p.end_s - p.start_s < MIN_FIT_S) return { accept: false, reason: `Only ${Math.round((p.end_s - p.start_s) / 60)} minutes long: too short to fit reliably.` };
  if (!fit) return { accept: false, reason: warnings.find((w) => w.code === 'needs-occupancy')?.message ?? 'No fit.' };
  if (fit.kind === 'none') return { accept: false, reason: fit.warnings[fit.warnings.length - 1]?.message ?? 'The fit gave no estimate.' };
  const serious = fit.warnings.find((w) => SERIOUS.has(w.code));
  if (serious) return { accept: false, reason: serious.message };
  if (fit.kind !== 'estimate') return { accept: false, reason: 'The readings give only a bound, not an estimate.' };
  return { accept: true, reason: `A ${p.kind} of ${Math.round((p.end_s - p.start_s) / 60)} minutes with ${readings.length} readings fitted without warnings that rule it out.` };
}
