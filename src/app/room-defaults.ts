/**
 * Starting values a room's use suggests, so a surveyor types less: a ceiling height to confirm,
 * the usual occupants, and the day template. Every one is shown as a suggestion to accept or
 * change, never stored without the surveyor's tap.
 *
 * Source: common practice (no published source) for the heights and occupant groups; the day
 * templates are the engine's own invented timetables (src/core/day-templates.ts).
 *
 * Example: suggestedHeight('classroom') = 2.7; a new bedroom starts from the 'bedroom' template.
 */
import type { RoomUse } from '../core/room-uses.ts';
import type { BuildingUse } from '../core/building-uses.ts';
import type { OccupantGroupRecord } from '../model/occupancy.ts';
import type { Room } from '../model/room.ts';
import type { Geometry } from '../model/room-geometry.ts';
import { blankRoomParts } from '../model/room-defaults.ts';

const HEIGHTS: Partial<Record<RoomUse, number>> = { classroom: 2.7, hall: 4, office: 2.6, 'meeting-room': 2.6 };

/** A typical ceiling height for the use, m (2.4 m for rooms of homes and others). */
export function suggestedHeight(use: RoomUse): number {
  return HEIGHTS[use] ?? 2.4;
}

const FIRST_USE: Record<BuildingUse, RoomUse> = { school: 'classroom', dwelling: 'bedroom', office: 'office', other: 'other' };

/**
 * The use a new room's form starts on, from the building's use, so a flat's rooms are not offered
 * as classrooms. Example: newRoomUse('dwelling') = 'bedroom'.
 */
export function newRoomUse(buildingUse: BuildingUse | undefined): RoomUse {
  return buildingUse ? FIRST_USE[buildingUse] : 'classroom';
}

export const SCHEDULE_TEMPLATES = [
  { id: 'classroom', label: 'School day (lessons and breaks)' },
  { id: 'office', label: 'Office day' },
  { id: 'bedroom', label: 'Bedroom (asleep overnight)' },
  { id: 'living-room', label: 'Living room (evenings)' },
] as const;

/** The day template a use starts from, or '' when none fits. */
function templateFor(use: RoomUse): string {
  return SCHEDULE_TEMPLATES.find((t) => t.id === use)?.id ?? '';
}

type Group = Omit<OccupantGroupRecord, 'id'>;

/** The people a room of this use usually holds, in a building of this use. */
export function usualOccupants(use: RoomUse, building: BuildingUse): Group[] {
  const adults = (label: string, count: number, met: number): Group => ({ label, count, ageBand: '30-40', sex: 'mixed', activity_met: met });
  if (use === 'classroom') {
    return [{ label: 'Pupils', count: 30, ageBand: '11-16', sex: 'mixed', activity_met: 1.2 }, adults('Teacher', 1, 1.6)];
  }
  if (use === 'office' || use === 'meeting-room') return [adults('Staff', use === 'office' ? 8 : 6, 1.2)];
  if (use === 'bedroom') return [adults('Adults', 2, 0.9)];
  if (use === 'living-room' || (building === 'dwelling' && use === 'kitchen')) return [adults('Household', 3, 1.2)];
  return [];
}

/** A new room, its size given, everything else empty. */
export function newRoom(input: { name: string; use: RoomUse; areaId?: string; geometry: Geometry }, now: Date): Room {
  return {
    id: crypto.randomUUID(),
    ...(input.areaId ? { areaId: input.areaId } : {}),
    name: input.name,
    clientRef: '',
    use: input.use,
    geometry: input.geometry,
    ...blankRoomParts(),
    schedule: { template: templateFor(input.use), periods: [] },
    updatedAt: now.toISOString(),
  };
}
