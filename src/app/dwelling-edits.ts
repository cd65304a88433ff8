/**
 * Edits to an area's dwelling facts, made in place on the open survey (the area screen then
 * says the area changed): the dwelling and its system created when first needed, a new
 * terminal, a change of kind, and the floor area from the rooms.
 *
 * Only a flat or a house holds dwelling facts. Changing a flat to, say, a floor takes its facts
 * off the area (the analysis would otherwise still judge it as a home) and hands them back, so
 * the screen can put them back if the surveyor changes it to a flat or house again.
 *
 * Example: changeKind(flat, 'floor') returns { bedrooms: 2, … } and leaves flat.dwelling absent;
 * changeKind(flat, 'flat', thatDwelling) restores it.
 */
import { roundToStep } from '../core/units.ts';
import type { Area, Dwelling, DwellingSystem, Terminal } from '../model/area.ts';
import { roomFloorArea, type Geometry } from '../model/room-geometry.ts';

export const DWELLING_KINDS: readonly Area['kind'][] = ['flat', 'house'];

/** True for the kinds of area that are a home (a flat, a house). */
export function holdsDwelling(kind: Area['kind']): boolean {
  return DWELLING_KINDS.includes(kind);
}

/** The area's dwelling facts, created empty when there are none yet. */
export function dwellingOf(area: Area): Dwelling {
  area.dwelling ??= {};
  return area.dwelling;
}

/** The dwelling's whole-dwelling system, created as "none, not checked" when there is none yet. */
export function systemOf(area: Area): DwellingSystem {
  const dwelling = dwellingOf(area);
  dwelling.system ??= { kind: 'none', mode: '', running: 'not-checked', terminals: [], notes: '' };
  return dwelling.system;
}

/**
 * A new terminal in `direction`, at the normal setting. Its flow is not known until typed (never
 * 0): until then the area's check names the missing flow and the save waits.
 */
export function newTerminal(direction: Terminal['direction']): Terminal {
  return { location: '', direction, setting: 'normal' } as Terminal;
}

/**
 * Change the area's kind. Returns the dwelling facts taken off (to a kind that is not a home),
 * or undefined; `setAside` (facts taken off earlier) is put back when the kind is a home again.
 */
export function changeKind(area: Area, kind: Area['kind'], setAside?: Dwelling): Dwelling | undefined {
  area.kind = kind;
  if (holdsDwelling(kind)) {
    if (setAside && !area.dwelling) area.dwelling = setAside;
    return undefined;
  }
  const taken = area.dwelling;
  delete area.dwelling;
  return taken ?? setAside;
}

/** The rooms' floor areas added, m², to 0.1 m²; undefined without rooms. Example: 11.2 + 14.36 → 25.6. */
export function floorAreaOfRooms(rooms: readonly { geometry: Geometry }[]): number | undefined {
  if (rooms.length === 0) return undefined;
  return roundToStep(rooms.reduce((sum, r) => sum + roomFloorArea(r.geometry), 0), 0.1);
}
