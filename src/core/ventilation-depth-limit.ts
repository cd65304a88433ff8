/**
 * How deep into a room natural ventilation reaches: about 2.5 × floor-to-ceiling height for
 * single-sided ventilation and about 5 × for cross ventilation (CIBSE AM10, from memory;
 * references.md §3.2 and practice.md §1 item 9b). Beyond that the far part of the room may be
 * poorly ventilated even when the flow figure looks adequate, so the prediction warns.
 */
import { airflowWarning, type AirflowWarning } from './airflow-warnings.ts';
import { roundToStep } from './units.ts';

/** Effective depth of single-sided ventilation as a multiple of ceiling height (from memory). */
export const SINGLE_SIDED_DEPTH_RATIO = 2.5;
/** Effective depth of cross ventilation as a multiple of ceiling height (from memory). */
export const CROSS_DEPTH_RATIO = 5;

/**
 * Warnings when a room (depth and ceiling height in m) is deeper than its ventilation mode reaches.
 * Source: CIBSE AM10 rules of thumb (from memory).
 * Example: depthLimitWarnings(7, 2.4, 'single-sided') = [beyond-single-sided-depth] (limit 6.0 m).
 */
export function depthLimitWarnings(
  depth_m: number | undefined,
  ceilingHeight_m: number,
  mode: 'single-sided' | 'cross',
): AirflowWarning[] {
  if (depth_m === undefined || !(ceilingHeight_m > 0)) return [];
  const ratio = mode === 'cross' ? CROSS_DEPTH_RATIO : SINGLE_SIDED_DEPTH_RATIO;
  const limit = ratio * ceilingHeight_m;
  if (depth_m <= limit) return [];
  const code = mode === 'cross' ? 'beyond-cross-depth' : 'beyond-single-sided-depth';
  return [
    airflowWarning(
      code,
      `The room is ${roundToStep(depth_m, 0.1)} m deep; ${mode} ventilation reaches only about ${ratio} × the ceiling height (${roundToStep(limit, 0.1)} m), so the far end may get little of this air.`,
    ),
  ];
}
