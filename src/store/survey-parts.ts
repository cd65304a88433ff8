/**
 * Intent-named saves of a survey's parts: an instrument, an area, a room, a reading, a logger
 * series. Each validates with the model's schema, then writes the one record (and the survey
 * header's last-change time) in a short transaction with strict durability, and resolves only
 * after `tx.done`. A record keeps its position in the survey; a new one goes last.
 *
 * An edit to an issued revision moves the survey to the next revision in the same transaction
 * (revision-lock.ts): what was issued stays told apart from what came after.
 */
import type { IDBPTransaction } from 'idb';
import { instrumentSchema, type Instrument } from '../model/instrument.ts';
import { areaSchema, type Area } from '../model/area.ts';
import { roomSchema, type Room } from '../model/room.ts';
import { readingSchema, type Reading } from '../model/reading.ts';
import { loggerSeriesSchema, type LoggerSeries } from '../model/logger-series.ts';
import { editableRevision } from '../model/revision-lock.ts';
import type { Connection } from './connection.ts';
import { StorageError } from './connection.ts';
import { ofSurvey, type Owned, type SurveyPartStore, type VentwalkDB } from './schema.ts';
import { toSeriesRecord } from './series-columns.ts';
import { commitNow, queue } from './write-requests.ts';

type PartTx = IDBPTransaction<VentwalkDB, ('surveys' | SurveyPartStore)[], 'readwrite'>;

/** The position after the last record of a survey in a store (0 for the first). */
export async function nextPosition(tx: PartTx, store: SurveyPartStore, surveyId: string): Promise<number> {
  const cursor = await tx.objectStore(store).index('bySurvey').openKeyCursor(ofSurvey(surveyId), 'prev');
  return cursor ? (cursor.key as [string, number])[1] + 1 : 0;
}

/**
 * Write one part record of survey `surveyId`, after `check` (IDB reads only) has passed.
 * `changedAt` moves the survey's last-change time forward.
 */
export async function savePart<S extends SurveyPartStore>(
  connection: Connection,
  store: S,
  surveyId: string,
  record: Omit<VentwalkDB[S]['value'], keyof Owned>,
  changedAt: string,
  check?: (tx: PartTx) => Promise<string | undefined>,
): Promise<void> {
  await connection.run(async (db) => {
    const stores: ('surveys' | SurveyPartStore)[] = store === 'readings' ? ['surveys', store, 'rooms'] : ['surveys', store];
    const tx = db.transaction(stores, 'readwrite', { durability: 'strict' }) as unknown as PartTx;
    const survey = await tx.objectStore('surveys').get(surveyId);
    const existing = await tx.objectStore(store).get(record.id);
    const refusal = !survey
      ? 'This survey is no longer on the device'
      : existing && existing.surveyId !== surveyId
        ? 'This record belongs to another survey'
        : await check?.(tx);
    if (refusal || !survey) {
      tx.abort();
      await tx.done.catch(() => undefined);
      throw new StorageError(refusal ?? 'This survey is no longer on the device', 'failed');
    }
    const position = existing ? existing.position : await nextPosition(tx, store, surveyId);
    queue(tx.objectStore(store).put({ ...record, surveyId, position } as VentwalkDB[S]['value']));
    const edited = editableRevision(survey);
    const later = Date.parse(changedAt) > Date.parse(survey.updatedAt);
    if (edited !== survey || later) {
      queue(tx.objectStore('surveys').put({ ...edited, updatedAt: later ? changedAt : survey.updatedAt }));
    }
    commitNow(tx);
    await tx.done;
  });
}

/** Save one room (the record a keystroke on a room screen rewrites). */
export async function saveRoom(connection: Connection, surveyId: string, room: Room): Promise<Room> {
  const record = roomSchema.parse(room);
  await savePart(connection, 'rooms', surveyId, record, record.updatedAt);
  return record;
}

/** Save one reading of a room (the room must already be saved); `changedAt` is when it was entered. */
export async function saveReading(
  connection: Connection,
  surveyId: string,
  roomId: string,
  reading: Reading,
  changedAt: string,
): Promise<Reading> {
  const record = readingSchema.parse(reading);
  await savePart(connection, 'readings', surveyId, { ...record, roomId }, changedAt, async (tx) => {
    const room = await tx.objectStore('rooms').get(roomId);
    return room?.surveyId === surveyId ? undefined : 'The room for this reading is not saved on the device';
  });
  return record;
}

export async function saveInstrument(connection: Connection, surveyId: string, instrument: Instrument, changedAt: string): Promise<Instrument> {
  const record = instrumentSchema.parse(instrument);
  await savePart(connection, 'instruments', surveyId, record, changedAt);
  return record;
}

export async function saveArea(connection: Connection, surveyId: string, area: Area, changedAt: string): Promise<Area> {
  const record = areaSchema.parse(area);
  await savePart(connection, 'areas', surveyId, record, changedAt);
  return record;
}

/** Save a logger series; its columns are stored as Float64Array. */
export async function saveSeries(connection: Connection, surveyId: string, series: LoggerSeries, changedAt: string): Promise<LoggerSeries> {
  const record = loggerSeriesSchema.parse(series);
  await savePart(connection, 'series', surveyId, toSeriesRecord(record), changedAt);
  return record;
}
