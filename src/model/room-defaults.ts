/**
 * A new room's parts with nothing recorded yet: no walls, occupants, openings, appliances,
 * defects, answers or tests, an empty schedule and no notes. Rooms made by the app (a room
 * list, a form) start from these and add what they know — never an invented value.
 *
 * Example: { id, name: 'B1', clientRef: '', use: 'classroom', geometry, ...blankRoomParts(), updatedAt }.
 */
import type { Room } from './room.ts';

export type BlankRoomParts = Pick<Room, 'exposedWalls' | 'occupants' | 'schedule' | 'openings' | 'appliances' | 'defects' | 'interview' | 'tests' | 'notes'>;

export function blankRoomParts(): BlankRoomParts {
  return {
    exposedWalls: [],
    occupants: [],
    schedule: { template: '', periods: [] },
    openings: [],
    appliances: [],
    defects: [],
    interview: [],
    tests: [],
    notes: '',
  };
}
