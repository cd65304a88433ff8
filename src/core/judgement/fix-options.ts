/**
 * Fixes as changes to the engine's input: each option in a builder's units becomes an edit of
 * the room's airflow input (room-supply-prediction.ts), so it can be re-assessed by the same
 * engine that predicted the room. The items and sizes are the trade's:
 *
 * - open the background vents found shut (no work);
 * - unblock background vents found blocked (painted over, stuffed);
 * - repair or replace a dead extract fan and commission it at its rated flow, MEASURED;
 * - add background vents of 5,000 mm² equivalent area in an outside wall, at most one per metre
 *   of that wall (common practice (no published source)); more would be a wall of holes;
 * - an extract fan of a stock size, commissioned at that flow measured (kitchens, bathrooms,
 *   toilets, utility rooms);
 * - a mechanical supply unit (a single-room heat-recovery unit, or ducted supply designed by a
 *   ventilation engineer) of a stock size, measured.
 *
 * Stock sizes (L/s) are common practice (no published source). Combustion-air vents are never
 * touched: only background vents serving the room are opened or unblocked.
 */
import type { BackgroundVentInput, FanInput, RoomAirflowInput } from '../airflow-inputs.ts';
import { fromLitresPerSecond, fromSquareMillimetres } from '../units.ts';

/** Equivalent area of one added background vent, m² (5,000 mm²; common practice (no published source)). */
export const ADDED_VENT_AREA_M2 = fromSquareMillimetres(5000);
/** Most added vents per metre of outside wall (common practice (no published source)). */
export const MAX_VENTS_PER_METRE = 1;
/** Most added vents in one room, whatever the wall (common practice (no published source)). */
export const MAX_ADDED_VENTS = 8;
/** Stock extract fan sizes, m³/s (6–60 L/s; common practice (no published source)). */
export const EXTRACT_FAN_SIZES_M3S: readonly number[] = [6, 8, 10, 15, 20, 30, 40, 60].map(fromLitresPerSecond);
/** Stock supply unit sizes, m³/s (5–400 L/s; common practice (no published source)). */
export const SUPPLY_UNIT_SIZES_M3S: readonly number[] = [5, 10, 15, 20, 30, 40, 60, 80, 100, 120, 150, 200, 250, 300, 400].map(fromLitresPerSecond);

/** An outside wall to put new openings in. */
export interface OutsideWall {
  length_m: number;
  facing_deg: number;
}

/**
 * Open (or unblock) the listed background vents. Only background vents change; any other id is ignored.
 * Example: openVents(input, ['v1']) has vent v1 with condition 'open'.
 */
export function openVents(input: RoomAirflowInput, ids: readonly string[]): RoomAirflowInput {
  const set = new Set(ids);
  return { ...input, openings: input.openings.map((o) => (o.kind === 'background-vent' && set.has(o.id) ? { ...o, condition: 'open' as const } : o)) };
}

/**
 * Repair the listed fans: running, commissioned at the given measured flows (m³/s).
 * Example: repairFans(input, [{ id: 'f1', flow_m3s: 0.015 }]) → f1 running, measuredFlow_m3s 0.015.
 */
export function repairFans(input: RoomAirflowInput, fans: readonly { id: string; flow_m3s: number }[]): RoomAirflowInput {
  const byId = new Map(fans.map((f) => [f.id, f.flow_m3s]));
  return { ...input, fans: input.fans.map((f) => (byId.has(f.id) ? { ...f, running: true, measuredFlow_m3s: byId.get(f.id)!, ratedFlow_m3s: undefined } : f)) };
}

/**
 * Add n background vents of 5,000 mm² equivalent area, open, in the outside wall, at 90 % of the ceiling height.
 * Example: addVents(input, 2, { length_m: 3.6, facing_deg: 0 }).openings ends with two vents 'fix#vent-1', 'fix#vent-2'.
 */
export function addVents(input: RoomAirflowInput, n: number, wall: OutsideWall): RoomAirflowInput {
  const added: BackgroundVentInput[] = Array.from({ length: n }, (_, k) => ({
    kind: 'background-vent',
    id: `fix#vent-${k + 1}`,
    labelArea_m2: ADDED_VENT_AREA_M2,
    areaBasis: 'equivalent',
    condition: 'open',
    facing_deg: wall.facing_deg,
    centreHeight_m: 0.9 * input.ceilingHeight_m,
  }));
  return { ...input, openings: [...input.openings, ...added] };
}

/**
 * Add a running fan of the given role and measured flow (m³/s).
 * Example: addFan(input, 'extract', 0.015).fans ends with { id: 'fix#fan', role: 'extract', measuredFlow_m3s: 0.015 }.
 */
export function addFan(input: RoomAirflowInput, role: 'extract' | 'supply', flow_m3s: number): RoomAirflowInput {
  const fan: FanInput = { kind: 'fan', id: 'fix#fan', role, system: 'local', running: true, measuredFlow_m3s: flow_m3s };
  return { ...input, fans: [...input.fans, fan] };
}

/** Most vents the wall takes. Example: maxAddedVents(3.6) = 3. */
export function maxAddedVents(wallLength_m: number): number {
  return Math.min(MAX_ADDED_VENTS, Math.floor(wallLength_m * MAX_VENTS_PER_METRE));
}
