/**
 * A whole-dwelling system's terminals after a room is removed: a terminal that served the room
 * no longer points at it (the survey file refuses a reference to a missing room), and keeps the
 * room's name as its location when no location was typed, so what was measured stays placed.
 *
 * Example: a terminal { roomId: kitchen.id, location: '' } becomes { location: 'Kitchen' }
 * when the room "Kitchen" is removed; an area with no such terminal is returned as it was.
 */
import type { Area } from './area.ts';

/** The area with its terminals no longer serving `room`; the same object when nothing changes. */
export function withoutTerminalRoom<A extends Area>(area: A, room: { id: string; name: string }): A {
  const system = area.dwelling?.system;
  if (!system || !system.terminals.some((t) => t.roomId === room.id)) return area;
  const terminals = system.terminals.map((t) => {
    if (t.roomId !== room.id) return t;
    const { roomId: _gone, ...rest } = t;
    return { ...rest, location: rest.location || room.name };
  });
  return { ...area, dwelling: { ...area.dwelling, system: { ...system, terminals } } };
}
