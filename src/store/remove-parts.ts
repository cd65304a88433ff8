/**
 * Removing what was entered by mistake: a room (with its readings, photos and logger series; a
 * whole-dwelling terminal that served it keeps its place as a location), one reading (taken out
 * of any test that grouped it; a test left with fewer than two readings goes too), one logger
 * series (the outdoor logger's, say), an area (its rooms and inner areas move to the area it sat
 * in, or to no area: area-removal.ts), or an instrument nothing refers to (instrument-uses.ts).
 * One transaction each, strict durability, saved only after `tx.done`; like any edit,
 * it moves an issued revision on to the next and the survey's last change to `changedAt`.
 */
import type { IDBPTransaction } from 'idb';
import { areaRemovalPlan, movedTo } from '../model/area-removal.ts';
import { instrumentUseWords, instrumentUses } from '../model/instrument-uses.ts';
import { editableRevision } from '../model/revision-lock.ts';
import { withoutTerminalRoom } from '../model/terminal-room-removal.ts';
import type { Connection } from './connection.ts';
import { StorageError } from './connection.ts';
import { ofSurvey, type SurveyPartStore, type VentwalkDB } from './schema.ts';
import { commitNow, queue } from './write-requests.ts';

type RemoveTx = IDBPTransaction<VentwalkDB, ('surveys' | SurveyPartStore)[], 'readwrite'>;

/** Open the transaction, check the survey, run `remove` (IDB calls only), touch the header, commit. */
async function removeIn(
  connection: Connection,
  stores: SurveyPartStore[],
  surveyId: string,
  changedAt: string,
  remove: (tx: RemoveTx) => Promise<string | undefined>,
): Promise<void> {
  await connection.run(async (db) => {
    const tx = db.transaction(['surveys', ...stores], 'readwrite', { durability: 'strict' }) as unknown as RemoveTx;
    const survey = await tx.objectStore('surveys').get(surveyId);
    const refusal = survey ? await remove(tx) : 'This survey is no longer on the device';
    if (refusal || !survey) {
      tx.abort();
      await tx.done.catch(() => undefined);
      throw new StorageError(refusal ?? 'This survey is no longer on the device', 'failed');
    }
    const later = Date.parse(changedAt) > Date.parse(survey.updatedAt) ? changedAt : survey.updatedAt;
    queue(tx.objectStore('surveys').put({ ...editableRevision(survey), updatedAt: later }));
    commitNow(tx);
    await tx.done;
  });
}

/** Delete a room of a survey with its readings, photos and logger series; terminals that served it keep its name as their location. */
export async function deleteRoom(connection: Connection, surveyId: string, roomId: string, changedAt: string): Promise<void> {
  await removeIn(connection, ['rooms', 'readings', 'photos', 'series', 'areas'], surveyId, changedAt, async (tx) => {
    const room = await tx.objectStore('rooms').get(roomId);
    if (room?.surveyId !== surveyId) return 'This room is not in the survey';
    queue(tx.objectStore('rooms').delete(roomId));
    for (const store of ['readings', 'photos', 'series'] as const) {
      const records = await tx.objectStore(store).index('bySurvey').getAll(ofSurvey(surveyId));
      for (const r of records) if ((r as { roomId?: string }).roomId === roomId) queue(tx.objectStore(store).delete(r.id));
    }
    for (const area of await tx.objectStore('areas').index('bySurvey').getAll(ofSurvey(surveyId))) {
      const kept = withoutTerminalRoom(area, room);
      if (kept !== area) queue(tx.objectStore('areas').put(kept));
    }
    return undefined;
  });
}

/**
 * Delete an area of a survey: its rooms and the areas inside it move to the area it sat in (or
 * to no area), its dwelling facts and system go with it (area-removal.ts).
 */
export async function deleteArea(connection: Connection, surveyId: string, areaId: string, changedAt: string): Promise<void> {
  await removeIn(connection, ['areas', 'rooms'], surveyId, changedAt, async (tx) => {
    const areas = await tx.objectStore('areas').index('bySurvey').getAll(ofSurvey(surveyId));
    const rooms = await tx.objectStore('rooms').index('bySurvey').getAll(ofSurvey(surveyId));
    const plan = areaRemovalPlan(areas, rooms, areaId);
    if (!plan) return 'This area is not in the survey';
    queue(tx.objectStore('areas').delete(areaId));
    for (const room of rooms) {
      if (plan.roomIds.includes(room.id)) queue(tx.objectStore('rooms').put({ ...movedTo(room, 'areaId', plan.parentId), updatedAt: changedAt }));
    }
    for (const area of areas) if (plan.areaIds.includes(area.id)) queue(tx.objectStore('areas').put(movedTo(area, 'parentId', plan.parentId)));
    return undefined;
  });
}

/** Delete one reading, and take it out of the tests of its room. */
export async function deleteReading(connection: Connection, surveyId: string, readingId: string, changedAt: string): Promise<void> {
  await removeIn(connection, ['readings', 'rooms'], surveyId, changedAt, async (tx) => {
    const reading = await tx.objectStore('readings').get(readingId);
    if (reading?.surveyId !== surveyId) return 'This reading is not in the survey';
    queue(tx.objectStore('readings').delete(readingId));
    const room = await tx.objectStore('rooms').get(reading.roomId);
    if (room && room.tests.some((t) => t.readingIds.includes(readingId))) {
      const tests = room.tests
        .map((t) => ({ ...t, readingIds: t.readingIds.filter((id) => id !== readingId) }))
        .filter((t) => t.readingIds.length >= 2);
      queue(tx.objectStore('rooms').put({ ...room, tests, updatedAt: changedAt }));
    }
    return undefined;
  });
}

/** Delete an instrument, refused while any record of the survey says it was measured with it. */
export async function deleteInstrument(connection: Connection, surveyId: string, instrumentId: string, changedAt: string): Promise<void> {
  await removeIn(connection, ['instruments', 'readings', 'rooms', 'areas', 'series'], surveyId, changedAt, async (tx) => {
    const instrument = await tx.objectStore('instruments').get(instrumentId);
    if (instrument?.surveyId !== surveyId) return 'This instrument is not in the survey';
    const all = <S extends 'instruments' | 'readings' | 'rooms' | 'areas' | 'series'>(store: S) => tx.objectStore(store).index('bySurvey').getAll(ofSurvey(surveyId));
    const [instruments, readings, rooms, areas, series, survey] = await Promise.all([
      all('instruments'),
      all('readings'),
      all('rooms'),
      all('areas'),
      all('series'),
      tx.objectStore('surveys').get(surveyId),
    ]);
    const uses = instrumentUseWords(instrumentUses({ outdoorReadings: survey?.outdoorReadings ?? [], instruments, readings, rooms, areas, series }, instrumentId));
    if (uses) return `${instrument.model} is still named by ${uses}: it stays`;
    queue(tx.objectStore('instruments').delete(instrumentId));
    return undefined;
  });
}

/** Delete one logger series of a survey (a room's, or the outdoor logger). */
export async function deleteSeries(connection: Connection, surveyId: string, seriesId: string, changedAt: string): Promise<void> {
  await removeIn(connection, ['series'], surveyId, changedAt, async (tx) => {
    const series = await tx.objectStore('series').get(seriesId);
    if (series?.surveyId !== surveyId) return 'This logger file is not in the survey';
    queue(tx.objectStore('series').delete(seriesId));
    return undefined;
  });
}
