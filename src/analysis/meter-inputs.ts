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
 *   and gain then cancel); else all outdoor readings corrected onto true ppm by their own meters;
 *   with an outdoor logger on the survey, its median over the measurements by the rule of
 *   outdoorFor (the logger's own meter error from its instrument id).
 *
 * Example: the demo handheld, ±(50 ppm + 3 %), no checks → offsetSd 25 ppm, gainSd 0.015, noise 10 ppm.
 */
import { correctedLevel, meterErrorFromSideBySide, meterErrorFromStatedAccuracy, type MeterErrorModel } from '../core/meter-error.ts';
import { outdoorLoggerLevel } from '../core/outdoor-logger-level.ts';
import { DEFAULT_OUTDOOR_SD_PPM, outdoorLevel, type OutdoorLevel } from '../core/outdoor-level.ts';
import { warn } from '../core/warnings.ts';
import type { Instrument } from '../model/instrument.ts';
import type { Survey } from '../model/survey.ts';
import { analysisWarning, type AnalysisWarning } from './analysis-warnings.ts';
import { windowSpanWords, type OutdoorLoggerWindow } from './outdoor-logger-window.ts';

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

/** The outdoor level from the survey's outdoor spot readings alone (see the file note). */
function spotOutdoor(roomInstrumentId: string | undefined, survey: Survey, instruments: readonly Instrument[]): OutdoorLevel {
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

/** A level on true ppm with its sd: one on the room meter is corrected by that meter, its offset and gain added. */
function onTruePpm(level: OutdoorLevel, roomMeter: MeterErrorModel): { value: number; sd: number } {
  if (!level.sameMeterAsRoom) return { value: level.value_ppm, sd: level.sd_ppm };
  const value = correctedLevel(level.value_ppm, roomMeter);
  return { value, sd: Math.hypot(level.sd_ppm, roomMeter.offsetSd_ppm, roomMeter.gainSd * value) };
}

/**
 * The outdoor level for readings on a room meter (instrument id): from the outdoor logger
 * (outdoor-logger-window.ts) and the survey's outdoor spot readings, by this rule:
 * 1. the outdoor logger is the room meter itself: the logger (offset and gain cancel);
 * 2. else spot readings on the room meter: the spot readings (offset and gain cancel, which
 *    outweighs the logger's cover of the whole span: practice.md §1 item 1);
 * 3. else the logger did not run during the measurements and spot readings exist: the spot readings;
 * 4. else the logger (the median over the measurements; on true ppm by its own meter), ahead of
 *    spot readings on other meters: it covers the whole span and a passing vehicle cannot drag it;
 * 5. no logger: the spot readings, or the default level with its warning.
 * When both exist, the other one is a check: differing by more than twice their combined
 * uncertainty (on true ppm) is warned. `source` says which was used.
 * Example: outdoor readings 428 and 433 ppm on the room meter, no logger → 430.5 ppm, sameMeterAsRoom.
 */
export function outdoorFor(
  roomInstrumentId: string | undefined,
  survey: Survey,
  instruments: readonly Instrument[],
  logger: OutdoorLoggerWindow | null = null,
): OutdoorLevel {
  const spots = spotOutdoor(roomInstrumentId, survey, instruments);
  if (!logger) return spots;
  const hasSpots = spots.readings > 0;
  const loggerIsRoomMeter = logger.instrumentId !== undefined && logger.instrumentId === roomInstrumentId;
  const loggerMeter = meterModel(logger.instrumentId, instruments).meter;
  const fromLogger = outdoorLoggerLevel(logger.values, { sameMeterAsRoom: loggerIsRoomMeter, meter: loggerMeter });
  const loggerLevel: OutdoorLevel = {
    ...fromLogger,
    source: `outdoor logger “${logger.sourceFile}”: ${fromLogger.source}, ${windowSpanWords(logger)}${logger.covers === 'whole-record' ? ' (its whole record)' : ''}`,
    warnings: [...logger.warnings, ...fromLogger.warnings],
  };
  const useLogger = loggerIsRoomMeter || !hasSpots || (!spots.sameMeterAsRoom && logger.covers !== 'whole-record');
  if (!hasSpots) return loggerLevel;
  const chosen = useLogger ? loggerLevel : spots;
  const check = useLogger ? spots : loggerLevel;
  const roomMeter = meterModel(roomInstrumentId, instruments).meter;
  const a = onTruePpm(chosen, roomMeter);
  const b = onTruePpm(check, roomMeter);
  const warnings = [...chosen.warnings, ...check.warnings];
  if (Math.abs(a.value - b.value) > 2 * Math.hypot(a.sd, b.sd)) {
    const [logged, spot] = useLogger ? [a, b] : [b, a];
    warnings.push(
      warn(
        'outdoor-sources-disagree',
        `The outdoor logger (${Math.round(logged.value)} ppm) and the outdoor readings (${Math.round(spot.value)} ppm) differ by more than their uncertainty allows. Check where the logger stood (people, flues, vents, traffic), the meters' side-by-side checks and the logger's clock.`,
      ),
    );
  }
  const checkWords = useLogger ? `${spots.readings} outdoor reading${spots.readings === 1 ? '' : 's'} kept as a check` : `outdoor logger “${logger.sourceFile}” kept as a check`;
  return { ...chosen, source: `${chosen.source}; ${checkWords}`, warnings };
}
