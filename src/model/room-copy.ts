/**
 * A quick copy of a room for the next similar one: its size and openings (with new ids), its
 * use and where it is — never its readings, tests, defects, photos, occupants, walls,
 * appliances, interview or notes. A copied opening loses its condition notes and any measured
 * fan flow, so no measured or observed fact is duplicated; whether it opens is kept for the
 * surveyor to confirm.
 *
 * Example: roomCopy(classroomB1, newId, now) is "Classroom B1 (copy)" with B1's size and windows.
 */
import type { Room } from './room.ts';
import { MAX_NAME_LENGTH } from './field-rules.ts';

export function roomCopy(room: Room, newId: () => string, now: string): Room {
  const name = `${room.name} (copy)`;
  return {
    id: newId(),
    ...(room.areaId === undefined ? {} : { areaId: room.areaId }),
    name: name.length <= MAX_NAME_LENGTH ? name : room.name,
    clientRef: '',
    use: room.use,
    geometry: structuredClone(room.geometry),
    exposedWalls: [],
    occupants: [],
    schedule: { template: '', periods: [] },
    openings: room.openings.map((opening) => {
      const { measuredWith: _instrument, measuredFlow_m3s: _measured, ...rest } = opening as typeof opening & {
        measuredWith?: string;
        measuredFlow_m3s?: number;
      };
      return { ...structuredClone(rest), id: newId(), condition: '' } as typeof opening;
    }),
    appliances: [],
    defects: [],
    interview: [],
    tests: [],
    notes: '',
    updatedAt: now,
  };
}
