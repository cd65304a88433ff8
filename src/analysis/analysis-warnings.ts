/**
 * Warnings on analysis results, each with a severity a screen or report can sort by:
 * - 'info': how a number was reached (an assumed weather case, a closed window not counted);
 * - 'caution': the number stands but is less certain or may mislead (assumed leakage, a short
 *   decay, readings left out, an assumed default);
 * - 'error': the readings contradict the records (the level rose faster than the stated people
 *   can make it rise; a "decay" that does not fall); the figure from them must not be used.
 *
 * The engine's warnings (src/core/warnings.ts, src/core/airflow-warnings.ts) keep their codes and
 * messages; this file gives each a severity and adds the analysis's own codes.
 *
 * Example: fromEngineWarning({ code: 'short-decay', message: '…' }) has severity 'caution'.
 */
import type { AirflowWarning, AirflowWarningCode } from '../core/airflow-warnings.ts';
import type { EngineWarning, WarningCode } from '../core/warnings.ts';
import type { MoistureWarning, MoistureWarningCode } from '../core/moisture-warnings.ts';

export type WarningSeverity = 'info' | 'caution' | 'error';

/** The analysis's own codes. */
export type AnalysisWarningCode =
  | 'combustion-readings-excluded'
  | 'people-during-decay'
  | 'instrument-not-recorded'
  | 'instrument-accuracy-assumed'
  | 'mixed-instruments'
  | 'no-co2-readings'
  | 'state-assumed'
  | 'opening-not-counted'
  | 'window-extent-assumed'
  | 'facing-assumed'
  | 'height-assumed'
  | 'wall-length-assumed'
  | 'leakage-age-assumed'
  | 'occupied-time-assumed'
  | 'occupants-assumed'
  | 'room-temperature-assumed'
  | 'no-schedule'
  | 'no-occupants'
  | 'no-measurement'
  | 'measurement-not-usable'
  | 'disagrees-with-prediction'
  | 'terminal-at-boost'
  | 'system-state-unknown'
  | 'area-rooms-partial'
  | 'weather-cases-assumed'
  | 'situation-assumed'
  | 'criteria-version-differs'
  | 'moisture-activity-assumed'
  | 'glazing-assumed'
  | 'outdoor-humidity-from-visit'
  | 'too-cold-for-ventilation'
  | 'no-single-fix'
  | 'bedrooms-unknown'
  | 'interval-reaches-zero';

export interface AnalysisWarning {
  code: WarningCode | AirflowWarningCode | MoistureWarningCode | AnalysisWarningCode;
  severity: WarningSeverity;
  message: string;
}

const ERRORS: ReadonlySet<string> = new Set<WarningCode>(['reading-above-sealed-room', 'rate-not-determined']);

const CAUTIONS: ReadonlySet<string> = new Set<WarningCode | AirflowWarningCode>([
  'too-few-readings',
  'small-excess',
  'short-decay',
  'curvature',
  'background-above-outdoor',
  'background-fit-unsettled',
  'outdoor-assumed',
  'outdoor-reading-unusual',
  'outdoor-sources-disagree',
  'outdoor-logger-outside-measurements',
  'not-steady',
  'history-unknown',
  'reading-at-or-below-outdoor',
  'output-disagrees',
  'free-area-label',
  'area-basis-unknown',
  'air-brick-combustion-air',
  'air-brick-purpose-unknown',
  'fan-rated-flow-derated',
  'fan-flow-unknown',
  'dwelling-supply-extract-unbalanced',
  'sash-restricted',
  'beyond-single-sided-depth',
  'beyond-cross-depth',
  'leakage-assumed',
  'leakage-includes-neighbours',
  'no-outdoor-air',
  'schedule-overlap',
]);

/**
 * Severity of an engine or airflow warning code.
 * Example: engineSeverity('reading-above-sealed-room') = 'error'; engineSeverity('window-closed') = 'info'.
 */
export function engineSeverity(code: WarningCode | AirflowWarningCode): WarningSeverity {
  if (ERRORS.has(code)) return 'error';
  return CAUTIONS.has(code) ? 'caution' : 'info';
}

/** An engine or airflow warning with its severity. */
export function fromEngineWarning(w: EngineWarning | AirflowWarning): AnalysisWarning {
  return { code: w.code, severity: engineSeverity(w.code), message: w.message };
}

/** One of the analysis's own warnings. */
export function analysisWarning(code: AnalysisWarningCode, severity: WarningSeverity, message: string): AnalysisWarning {
  return { code, severity, message };
}

/**
 * Warnings without repeats (same code and message), in first-seen order.
 * Example: uniqueWarnings([a, a, b]) = [a, b].
 */
export function uniqueWarnings(warnings: readonly AnalysisWarning[]): AnalysisWarning[] {
  const seen = new Set<string>();
  return warnings.filter((w) => {
    const key = `${w.code}\u0000${w.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

const MOISTURE_CAUTIONS: ReadonlySet<MoistureWarningCode> = new Set<MoistureWarningCode>([
  'factor-assumed',
  'surface-saturated',
  'no-supply',
  'air-saturated',
  'observed-mould',
  'too-few-days',
  'mild-days-only',
  'outdoor-above-indoor',
  'small-temperature-difference',
  'factor-out-of-range',
  'edit-unknown-criterion',
  'edit-stale-value',
]);

/**
 * A moisture or criteria warning with its severity (caution when it could understate a risk or
 * an edit was refused, info otherwise).
 * Example: fromMoistureWarning({ code: 'observed-mould', message: '…' }).severity = 'caution'.
 */
export function fromMoistureWarning(w: MoistureWarning): AnalysisWarning {
  return { code: w.code, severity: MOISTURE_CAUTIONS.has(w.code) ? 'caution' : 'info', message: w.message };
}
