/**
 * A CO2 meter's error model and the outdoor level as seen by it (practice.md §1 item 1: meter
 * error is mostly offset and gain, and cancels against outdoor readings on the same meter).
 *
 * - Stated accuracy ±(ppm + % of reading) → meterErrorFromStatedAccuracy; none stated (or no
 *   instrument recorded): ±(50 ppm + 3 %) assumed, a typical handheld NDIR figure
 *   (references.md §2.4; common practice (no published source)), flagged.
 * - Side-by-side checks store one offset each (this meter minus the reference); they give the
 *   offset only (meterErrorFromSideBySide at one level), the reference meter's own offset
 *   uncertainty added; against outdoor air or a gas with no meter, the default outdoor sd.
 * - Outdoor level: the survey's outdoor CO2 readings taken on the room meter, if any (offset
 *   and gain then cancel); else all outdoor readings corrected onto true ppm by their own meters.
 *
 * Example: the demo handheld, ±(50 ppm + 3 %), no checks → offsetSd 25 ppm, gainSd 0.015, noise 10 ppm.
 */
import { correctedLevel, meterErrorFromSideBySide, meterErrorFromStatedAccuracy, type MeterErrorModel } from '../core/meter-error.ts';
import { DEFAULT_OUTDOOR_SD_PPM, outdoorLevel, type OutdoorLevel } from '../core/outdoor-level.ts';
import type { Instrument } from '../model/instrument.ts';
import type { Survey } from '../model/survey.ts';
import { analysisWarning, type AnalysisWarning } from './analysis-warnings.ts';

/** Accuracy assumed when none is stated: ±(ppm, % of reading). */
export const ASSUMED_CO2_ACCURACY = Object.freeze({ ppm: 50, percent: 3 });
/** A level inside the usual check range, for offset-only checks (the span is zero either way), ppm. */
const CHECK_LEVEL_PPM = 800;

function statedModel(instrument: Instrument | undefined): { model: MeterErrorModel; stated: boolean } {
  const accuracy = instrument?.accuracy.find((a) => a.quantity === 'co2');
  if (accuracy) return { model: meterErrorFromStatedAccuracy(accuracy.plusMinus, accuracy.percentOfReading), stated: true };
  return { model: meterErrorFromStatedAccuracy(ASSUMED_CO2_ACCURACY.ppm, ASSUMED_CO2_ACCURACY.percent), stated: false };
}

/**
 * The error model of an instrument (by id) among the survey's instruments, with warnings.
 * Example: meterModel(undefined, []) → ±(50 ppm + 3 %) assumed, with an 'instrument-not-recorded' caution.
 */
export function meterModel(instrumentId: string | undefined, instruments: readonly Instrument[]): { meter: MeterErrorModel; warnings: AnalysisWarning[] } {
  const instrument = instruments.find((i) => i.id === instrumentId);
  const warnings: AnalysisWarning[] = [];
  const { model, stated } = statedModel(instrument);
  if (!instrument) {
    warnings.push(analysisWarning('instrument-not-recorded', 'caution', `The meter is not recorded: ±(${ASSUMED_CO2_ACCURACY.ppm} ppm + ${ASSUMED_CO2_ACCURACY.percent} %) is assumed.`));
  } else if (!stated) {
    warnings.push(analysisWarning('instrument-accuracy-assumed', 'caution', `${instrument.model}: no CO₂ accuracy stated, ±(${ASSUMED_CO2_ACCURACY.ppm} ppm + ${ASSUMED_CO2_ACCURACY.percent} %) assumed.`));
  }
  const checks = instrument?.checks.filter((c) => c.quantity === 'co2') ?? [];
  if (checks.length === 0) return { meter: model, warnings };
  const referenceSds = checks.map((c) => {
    const reference = instruments.find((i) => i.id === c.referenceInstrumentId);
    return reference ? statedModel(reference).model.offsetSd_ppm : DEFAULT_OUTDOOR_SD_PPM;
  });
  const referenceSd = Math.sqrt(referenceSds.reduce((a, s) => a + s * s, 0) / referenceSds.length);
  const pairs = checks.map((c) => ({ reference_ppm: CHECK_LEVEL_PPM, meter_ppm: CHECK_LEVEL_PPM + c.offset }));
  return { meter: meterErrorFromSideBySide(pairs, referenceSd, model), warnings };
}

/**
 * The outdoor level for readings on a room meter (instrument id), from the survey's outdoor readings.
 * Example: outdoor readings 428 and 433 ppm on the room meter → 430.5 ppm, sameMeterAsRoom.
 */
export function outdoorFor(roomInstrumentId: string | undefined, survey: Survey, instruments: readonly Instrument[]): OutdoorLevel {
  const withCo2 = survey.outdoorReadings.filter((r) => r.co2_ppm !== undefined);
  const same = roomInstrumentId === undefined ? [] : withCo2.filter((r) => r.instrumentId === roomInstrumentId);
  if (same.length > 0) {
    return outdoorLevel(same.map((r) => r.co2_ppm!), { sameMeterAsRoom: true, meter: meterModel(roomInstrumentId, instruments).meter });
  }
  if (withCo2.length === 0) return outdoorLevel([], { sameMeterAsRoom: false, meter: meterModel(undefined, instruments).meter });
  // Other meters: each reading onto true ppm by its own meter; the first reading's meter stands for their uncertainty.
  const corrected = withCo2.map((r) => correctedLevel(r.co2_ppm!, meterModel(r.instrumentId, instruments).meter));
  return outdoorLevel(corrected, { sameMeterAsRoom: false, meter: meterModel(withCo2[0]!.instrumentId, instruments).meter });
}
