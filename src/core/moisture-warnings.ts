/**
 * Warnings attached to the moisture and criteria results: a stable code for software and a
 * plain-English message for the surveyor. Expected conditions (a spot reading, a small
 * temperature difference, an unconfirmed value) are warnings on a result, never exceptions.
 *
 * The shape { code, message } is the same as the engine's other warnings, so the analysis can
 * gather them into one list.
 */

/** Stable warning codes of the moisture and criteria results. */
export type MoistureWarningCode =
  | 'spot-reading'
  | 'small-temperature-difference'
  | 'not-steady-heating'
  | 'factor-out-of-range'
  | 'factor-from-construction'
  | 'factor-assumed'
  | 'surface-saturated'
  | 'no-supply'
  | 'air-saturated'
  | 'buffering-ignored'
  | 'screening-case'
  | 'outdoor-above-indoor'
  | 'unequal-series'
  | 'too-few-days'
  | 'mild-days-only'
  | 'supply-unknown'
  | 'surface-unknown'
  | 'observed-mould'
  | 'from-memory'
  | 'secondary-source'
  | 'edit-unknown-criterion'
  | 'edit-stale-value'
  | 'new-work-guidance-as-benchmark'
  | 'ventilation-unknown'
  | 'tenure-unknown'
  | 'not-rescalable';

/** One warning. */
export interface MoistureWarning {
  code: MoistureWarningCode;
  message: string;
}

/**
 * Build a warning. Example: moistureWarning('spot-reading', 'A single reading …')
 * = { code: 'spot-reading', message: 'A single reading …' }.
 */
export function moistureWarning(code: MoistureWarningCode, message: string): MoistureWarning {
  return { code, message };
}
