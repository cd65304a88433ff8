/**
 * A measured flow as typed on site and as stored: typed in L/s, stored in m³/s (through
 * src/core/units.ts), without binary noise either way (12.3 L/s shows as 12.3, not 12.299999…).
 *
 * Examples: flowShown(0.0123) = 12.3; flowStored(12.3) = 0.0123; both pass undefined through.
 */
import { fromLitresPerSecond, litresPerSecond } from '../core/units.ts';

/** The unit a flow is typed in, shown beside the field. */
export const FLOW_ENTRY_UNIT = 'L/s';

const clean = (x: number) => Number(x.toPrecision(12));

/** A stored flow (m³/s) in L/s for the field; undefined stays empty. */
export function flowShown(flow_m3s: number | undefined): number | undefined {
  return flow_m3s === undefined ? undefined : clean(litresPerSecond(flow_m3s));
}

/** A typed flow (L/s) in m³/s for the record; undefined stays empty, never 0. */
export function flowStored(flow_Ls: number | undefined): number | undefined {
  return flow_Ls === undefined ? undefined : clean(fromLitresPerSecond(flow_Ls));
}
