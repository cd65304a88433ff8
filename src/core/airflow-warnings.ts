/**
 * Warnings attached to airflow predictions: a stable code for software and a plain-English
 * message for the surveyor. Expected conditions (a blocked sash, a fan switched off, a vent
 * labelled with free area) are warnings on a result, never exceptions.
 *
 * Same shape as the engine's other warnings ({ code, message }), with codes of its own.
 */

/** Stable codes of airflow warnings. */
export type AirflowWarningCode =
  | 'free-area-label'
  | 'area-basis-unknown'
  | 'vent-closed'
  | 'vent-blocked'
  | 'air-brick-sub-floor'
  | 'air-brick-combustion-air'
  | 'air-brick-purpose-unknown'
  | 'transfer-not-outdoor-air'
  | 'fan-not-running'
  | 'fan-rated-flow-derated'
  | 'fan-flow-unknown'
  | 'recirculating-no-outdoor-air'
  | 'extract-draws-indoor-air'
  | 'dwelling-supply-extract-unbalanced'
  | 'sash-blocked'
  | 'sash-seized'
  | 'sash-restricted'
  | 'window-closed'
  | 'opening-measure-not-applicable'
  | 'opening-angle-limited'
  | 'beyond-single-sided-depth'
  | 'beyond-cross-depth'
  | 'cross-path-closed'
  | 'cross-pressure-assumed'
  | 'cross-through-other-rooms'
  | 'leakage-assumed'
  | 'leakage-interior-room'
  | 'leakage-includes-neighbours'
  | 'screening-weather-case'
  | 'no-outdoor-air';

/** One airflow warning. */
export interface AirflowWarning {
  code: AirflowWarningCode;
  message: string;
}

/**
 * Build a warning.
 * Source: none (a plain constructor; the codes and messages are ours).
 * Example: airflowWarning('vent-closed', 'The vent was closed.') = { code: 'vent-closed', message: 'The vent was closed.' }.
 */
export function airflowWarning(code: AirflowWarningCode, message: string): AirflowWarning {
  return { code, message };
}
