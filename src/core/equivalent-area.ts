/**
 * Equivalent area of a vent from what its label says.
 *
 * Equivalent area (ADF, BS EN 13141-1) is the area of a sharp-edged orifice that passes the same
 * flow at the same pressure difference; it is what the orifice equation with C_d 0.61 wants.
 * Many older trickle vents and air bricks are labelled with *free* (geometric) area, which
 * overstates it (practice.md §1 item 10). We convert free area with a stated factor:
 * central 0.75, range 0.5–1.0 (our own screening assumption, from memory: no published table
 * was at hand). An area of unknown basis is treated as free area.
 */
import { airflowWarning, type AirflowWarning } from './airflow-warnings.ts';

/** What the labelled (or measured) area of a vent is. */
export type AreaBasis = 'equivalent' | 'free' | 'unknown';

/** An area range, m²: low ≤ central ≤ high. */
export interface AreaRange {
  low: number;
  central: number;
  high: number;
}

/** Equivalent area as a fraction of free area (assumed; see the file note). */
export const FREE_TO_EQUIVALENT_FACTOR = Object.freeze({ low: 0.5, central: 0.75, high: 1.0 });

/**
 * Equivalent area (m²) of a vent from its labelled area (m²) and what that label gives.
 * Source: definition of equivalent area (ADF; BS EN 13141-1); the free-area factor is our assumption.
 * Example: equivalentAreaFromLabel(0.004, 'free') = { area: { low: 0.002, central: 0.003, high: 0.004 }, warnings: [free-area-label] }.
 */
export function equivalentAreaFromLabel(
  labelArea_m2: number,
  basis: AreaBasis,
): { area: AreaRange; warnings: AirflowWarning[] } {
  const a = Math.max(0, labelArea_m2);
  if (basis === 'equivalent') return { area: { low: a, central: a, high: a }, warnings: [] };
  const f = FREE_TO_EQUIVALENT_FACTOR;
  const area = { low: a * f.low, central: a * f.central, high: a * f.high };
  const warning =
    basis === 'free'
      ? airflowWarning(
          'free-area-label',
          `The label gives free area, which overstates what the vent passes; counted as ${f.low * 100}–${f.high * 100} % of it (assumed).`,
        )
      : airflowWarning(
          'area-basis-unknown',
          `It is not known whether this area is free or equivalent area; treated as free area (${f.low * 100}–${f.high * 100} % counted, assumed).`,
        );
  return { area, warnings: [warning] };
}
