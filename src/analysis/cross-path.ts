/**
 * A cross-ventilation path through other rooms of the same area (a flat, a floor), for a state
 * with its doors recorded open. BS 5925's cross forms need an open internal path
 * (practice.md §1 item 9b), so a path exists only when the room's doors were recorded open;
 * with doors shut the path is passed as closed and the engine never uses the cross forms for it.
 *
 * Far openings: the openable windows of the area's other rooms that face at least 90° away from
 * this room's own windows, counted at their recorded extent only when that room's reading
 * nearest in time (within an hour) records its windows open. The internal doorway is taken as
 * 0.8 × 2.0 m (assumed; common practice (no published source)). No far window open: no path.
 *
 * Example: a bedroom with doors open at 10:00 and a living room on the opposite facade whose 10:05
 * reading has windows all open → { internalPathOpen: true, farOpenArea_m2: its open area, farFacing_deg: 0,
 * internalOpeningArea_m2: 1.6 }.
 */
import type { CrossPathInput } from '../core/airflow-inputs.ts';
import { bearingDifference, DIFFERENT_FACING_DEG } from '../core/room-natural-ventilation.ts';
import { windowOpenArea } from '../core/window-open-area.ts';
import type { DocumentRoom } from '../model/survey-document.ts';
import { openingInputs } from './opening-inputs.ts';
import { stateFromConditions, type RoomState } from './room-state.ts';

/** Open internal doorway assumed on a path, m² (0.8 × 2.0 m). */
export const ASSUMED_DOORWAY_AREA_M2 = 1.6;
/** Readings of another room this close in time describe the same moment, ms. */
const SAME_MOMENT_MS = 3_600_000;

/**
 * The cross path of a room in a state at a time (ms), through `others` (rooms of its area), or
 * undefined when there is none to consider.
 */
export function crossPathInput(
  room: DocumentRoom,
  state: RoomState,
  time_ms: number | null,
  others: readonly DocumentRoom[],
  ceilingOf: (r: DocumentRoom) => number,
): CrossPathInput | undefined {
  if (time_ms === null || others.length === 0) return undefined;
  const own = openingInputs(room, state, ceilingOf(room)).openings.flatMap((o) => (o.kind === 'window' ? [o.facing_deg] : []));
  if (own.length === 0) return undefined;
  let farArea = 0;
  let farFacing = 0;
  let largest = 0;
  for (const other of others) {
    const nearest = other.readings
      .map((r) => ({ r, gap: Math.abs(Date.parse(r.time) - time_ms) }))
      .filter((x) => x.gap <= SAME_MOMENT_MS)
      .sort((a, b) => a.gap - b.gap || (a.r.id < b.r.id ? -1 : 1))[0];
    if (!nearest) continue;
    const farState = stateFromConditions(other, nearest.r.conditions);
    for (const w of openingInputs(other, farState, ceilingOf(other)).openings) {
      if (w.kind !== 'window' || !own.some((f) => bearingDifference(f, w.facing_deg) >= DIFFERENT_FACING_DEG)) continue;
      const area = windowOpenArea(w).area_m2;
      farArea += area;
      if (area > largest) {
        largest = area;
        farFacing = w.facing_deg;
      }
    }
  }
  if (!(farArea > 0)) return undefined;
  return {
    internalPathOpen: state.doorsOpen,
    farOpenArea_m2: farArea,
    farFacing_deg: farFacing,
    internalOpeningArea_m2: ASSUMED_DOORWAY_AREA_M2,
  };
}
