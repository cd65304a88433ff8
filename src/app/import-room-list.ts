/**
 * Use case: add the rooms of an estates room list to a survey. Two steps, so the surveyor sees
 * what was read before anything is saved:
 *
 * 1. `readRoomListFile(surveyId, file, choices)` reads the file (ingest/room-list.ts) against
 *    the survey's own areas: the rooms and areas it would add, each column's guess with its
 *    preview (changeable through `choices.columns`), and every row left out by line and column.
 * 2. `addRoomList(surveyId, read)` saves the rooms and areas read, all or none, in one
 *    transaction (store/add-rooms.ts). The rows with problems are not saved: the screen lists
 *    them so they can be fixed in the file and read again, or typed in.
 *
 * The file reader (with its CSV parser) is loaded at the first room list, not with the survey.
 */
import type { OccupantDefaults, RoomListResult } from '../ingest/room-list.ts';
import { ROOM_LIST_ROLE_LABELS, type RoomListOverrides } from '../ingest/room-list-columns.ts';

export type { RoomListResult };
export { ROOM_LIST_ROLE_LABELS };
import type { RoomUse } from '../core/room-uses.ts';
import { loadSurvey } from '../store/load-survey.ts';
import { addAreasAndRooms } from '../store/add-rooms.ts';
import { connection } from './storage-connection.ts';

/** The surveyor's answers to what the file cannot say. */
export interface RoomListChoices {
  defaultUse?: RoomUse;
  occupants?: OccupantDefaults;
  columns?: RoomListOverrides;
}

/** Read a room list for a survey; nothing is saved. */
export async function readRoomListFile(surveyId: string, file: Blob, choices: RoomListChoices = {}, now: Date = new Date()): Promise<RoomListResult> {
  const survey = await loadSurvey(connection, surveyId, { photos: false });
  const bytes = new Uint8Array(await file.arrayBuffer());
  const { readRoomList } = await import('../ingest/room-list.ts');
  return readRoomList(bytes, {
    ...choices,
    newId: () => crypto.randomUUID(),
    now: now.toISOString(),
    existingAreas: survey?.areas ?? [],
  });
}

/** Save what was read (the good rows), all or nothing. */
export async function addRoomList(
  surveyId: string,
  read: Extract<RoomListResult, { status: 'read' }>,
  now: Date = new Date(),
): Promise<{ areas: number; rooms: number }> {
  return addAreasAndRooms(connection, surveyId, read.areas, read.rooms, now.toISOString());
}
