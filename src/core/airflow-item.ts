/**
 * One line of a room's predicted air supply: which item (window, vent, fan, leakage), by what
 * mechanism, how much (a range, m³/s), whether it is outdoor air, how it was computed and what
 * the surveyor should know about it.
 */
import type { AirflowWarning } from './airflow-warnings.ts';
import type { FlowRange } from './flow-range.ts';

/** How air moves through the item. */
export type AirflowMechanism =
  | 'single-sided'
  | 'cross'
  | 'background-vent'
  | 'air-brick'
  | 'mechanical-extract'
  | 'mechanical-supply'
  | 'recirculating'
  | 'internal-transfer'
  | 'leakage'
  | 'none';

/** One item's contribution to a room's air supply. */
export interface AirflowItem {
  /** The id of the opening, fan or leakage entry this line describes. */
  itemId: string;
  mechanism: AirflowMechanism;
  /** Predicted flow, m³/s. For internal transfer this is a capacity, not a supply. */
  flow: FlowRange;
  /** False for air from other rooms (undercuts, grilles), recirculation and air that never reaches the room. */
  countsAsOutdoorAir: boolean;
  /** The published method and the stated conditions used, in words. */
  method: string;
  warnings: AirflowWarning[];
}
