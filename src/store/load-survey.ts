/**
 * Load a whole survey: its header and every part record, read in one read-only transaction and
 * assembled into the survey document the file format and the analysis use (readings nested
 * under their rooms, logger columns as plain arrays, photos as base64 or left out).
 */
import type { SurveyDocument } from '../model/survey-document.ts';
import type { Reading } from '../model/reading.ts';
import { bytesToBase64 } from '../model/base64.ts';
import type { Connection } from './connection.ts';
import { ofSurvey, SURVEY_PART_STORES, type Owned } from './schema.ts';
import { fromSeriesRecord } from './series-columns.ts';

export interface LoadOptions {
  /** Include the photos' bytes (large); without them the document says photos were left out. */
  photos: boolean;
}

function withoutOwner<T extends Owned>(record: T): Omit<T, keyof Owned> {
  const { surveyId: _survey, position: _position, ...rest } = record;
  return rest;
}

/** The whole survey, or undefined when there is none with this id. */
export async function loadSurvey(connection: Connection, surveyId: string, options: LoadOptions): Promise<SurveyDocument | undefined> {
  const found = await connection.run(async (db) => {
    const tx = db.transaction(['surveys', ...SURVEY_PART_STORES], 'readonly');
    const range = ofSurvey(surveyId);
    const byIndex = <S extends (typeof SURVEY_PART_STORES)[number]>(store: S) => tx.objectStore(store).index('bySurvey');
    const [survey, instruments, areas, rooms, readings, series, photos, photoCount] = await Promise.all([
      tx.objectStore('surveys').get(surveyId),
      byIndex('instruments').getAll(range),
      byIndex('areas').getAll(range),
      byIndex('rooms').getAll(range),
      byIndex('readings').getAll(range),
      byIndex('series').getAll(range),
      options.photos ? byIndex('photos').getAll(range) : Promise.resolve([]),
      byIndex('photos').count(range),
    ]);
    await tx.done;
    return survey && { survey, instruments, areas, rooms, readings, series, photos, photoCount };
  });
  if (!found) return undefined;

  const readingsByRoom = new Map<string, Reading[]>();
  for (const record of found.readings) {
    const { roomId, ...reading } = withoutOwner(record);
    const list = readingsByRoom.get(roomId);
    if (list) list.push(reading);
    else readingsByRoom.set(roomId, [reading]);
  }
  return {
    survey: found.survey,
    instruments: found.instruments.map(withoutOwner),
    areas: found.areas.map(withoutOwner),
    rooms: found.rooms.map((room) => ({ ...withoutOwner(room), readings: readingsByRoom.get(room.id) ?? [] })),
    series: found.series.map(fromSeriesRecord),
    photos: found.photos.map((record) => {
      const { bytes, type: _type, ...photo } = withoutOwner(record);
      return { ...photo, jpegBase64: bytesToBase64(new Uint8Array(bytes)) };
    }),
    photosLeftOut: !options.photos && found.photoCount > 0,
  };
}
