/**
 * Warnings the engine attaches to its results: a stable code for software and a plain-English
 * message for the surveyor. Expected conditions (too few readings, a decay too short) are
 * warnings on a result, never exceptions.
 */

/** Stable warning codes. */
export type WarningCode =
  | 'schedule-gap'
  | 'schedule-overlap'
  | 'too-few-readings'
  | 'small-excess'
  | 'short-decay'
  | 'curvature'
  | 'background-above-outdoor'
  | 'background-fit-unsettled'
  | 'outdoor-assumed'
  | 'outdoor-reading-unusual'
  | 'outdoor-sources-disagree'
  | 'outdoor-logger-outside-measurements'
  | 'not-steady'
  | 'history-unknown'
  | 'reading-above-sealed-room'
  | 'reading-at-or-below-outdoor'
  | 'output-disagrees'
  | 'rate-not-determined'
  | 'no-occupied-period'
  | 'window-longer-than-period';

/** One warning. */
export interface EngineWarning {
  code: WarningCode;
  message: string;
}

/** Build a warning. Example: warn('short-decay', 'The decay …') = { code: 'short-decay', message: 'The decay …' }. */
export function warn(code: WarningCode, message: string): EngineWarning {
  return { code, message };
}
