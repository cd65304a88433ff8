/**
 * Put a survey's rooms in a new order (the order the surveyor walks them): each room's position
 * is rewritten in one short transaction. Rooms not named keep their order after the named ones.
 */
import type { Connection } from './connection.ts';
import { StorageError } from './connection.ts';
import { ofSurvey } from './schema.ts';
import { commitNow, queue } from './write-requests.ts';

export async function reorderRooms(connection: Connection, surveyId: string, roomIds: readonly string[]): Promise<void> {
  await connection.run(async (db) => {
    const tx = db.transaction('rooms', 'readwrite', { durability: 'strict' });
    const rooms = await tx.store.index('bySurvey').getAll(ofSurvey(surveyId));
    const rank = (id: string) => {
      const i = roomIds.indexOf(id);
      return i === -1 ? roomIds.length : i;
    };
    if (roomIds.some((id) => !rooms.some((r) => r.id === id))) {
      tx.abort();
      await tx.done.catch(() => undefined);
      throw new StorageError('A room to move is no longer on the device', 'failed');
    }
    [...rooms].sort((a, b) => rank(a.id) - rank(b.id) || a.position - b.position).forEach((room, position) => {
      if (room.position !== position) queue(tx.store.put({ ...room, position }));
    });
    commitNow(tx);
    await tx.done;
  });
}
