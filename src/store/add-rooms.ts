/**
 * Add many areas and rooms to a survey at once (a room list read from a file), in ONE
 * transaction: all of them or none. Each record is checked by the model's schema first; they go
 * after the survey's existing areas and rooms, in the order given. Like every edit, adding to an
 * issued revision moves the survey to the next revision.
 */
import { areaSchema, type Area } from '../model/area.ts';
import { roomSchema, type Room } from '../model/room.ts';
import { editableRevision } from '../model/revision-lock.ts';
import type { Connection } from './connection.ts';
import { StorageError } from './connection.ts';
import { nextPosition } from './survey-parts.ts';
import { commitNow, queue } from './write-requests.ts';

export async function addAreasAndRooms(
  connection: Connection,
  surveyId: string,
  areas: readonly Area[],
  rooms: readonly Room[],
  changedAt: string,
): Promise<{ areas: number; rooms: number }> {
  const areaRecords = areas.map((a) => areaSchema.parse(a));
  const roomRecords = rooms.map((r) => roomSchema.parse(r));
  await connection.run(async (db) => {
    const tx = db.transaction(['surveys', 'areas', 'rooms'], 'readwrite', { durability: 'strict' });
    const survey = await tx.objectStore('surveys').get(surveyId);
    if (!survey) {
      tx.abort();
      await tx.done.catch(() => undefined);
      throw new StorageError('This survey is no longer on the device', 'failed');
    }
    const partTx = tx as unknown as Parameters<typeof nextPosition>[0];
    let areaPosition = await nextPosition(partTx, 'areas', surveyId);
    let roomPosition = await nextPosition(partTx, 'rooms', surveyId);
    for (const area of areaRecords) queue(tx.objectStore('areas').put({ ...area, surveyId, position: areaPosition++ }));
    for (const room of roomRecords) queue(tx.objectStore('rooms').put({ ...room, surveyId, position: roomPosition++ }));
    const later = Date.parse(changedAt) > Date.parse(survey.updatedAt) ? changedAt : survey.updatedAt;
    queue(tx.objectStore('surveys').put({ ...editableRevision(survey), updatedAt: later }));
    commitNow(tx);
    await tx.done;
  });
  return { areas: areaRecords.length, rooms: roomRecords.length };
}
