/**
 * Duplicate a room for the next similar one: size and openings only (model/room-copy.ts),
 * saved as a new room of the same survey, last in order.
 */
import { roomCopy } from '../model/room-copy.ts';
import type { Room } from '../model/room.ts';
import type { Connection } from './connection.ts';
import { StorageError } from './connection.ts';
import { saveRoom } from './survey-parts.ts';

export async function duplicateRoom(connection: Connection, roomId: string, newId: () => string, now: string): Promise<Room> {
  const stored = await connection.run((db) => db.get('rooms', roomId));
  if (!stored) throw new StorageError('This room is no longer on the device', 'failed');
  const { surveyId, position: _position, ...room } = stored;
  return saveRoom(connection, surveyId, roomCopy(room, newId, now));
}
