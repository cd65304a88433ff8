/**
 * Photos on the device: the description and the JPEG bytes as an ArrayBuffer (never a Blob:
 * Safari's IndexedDB fails on Blobs intermittently). The bytes must be read from the File and
 * downscaled before this is called: nothing but IndexedDB happens inside the transaction.
 */
import { photoSchema, type Photo } from '../model/photo.ts';
import type { Connection } from './connection.ts';
import { savePart } from './survey-parts.ts';
import { ofSurvey } from './schema.ts';

/** Save one photo of a survey (a JPEG already downscaled and stripped of location data). */
export async function savePhoto(connection: Connection, surveyId: string, photo: Photo, jpeg: ArrayBuffer): Promise<Photo> {
  const record = photoSchema.parse(photo);
  await savePart(connection, 'photos', surveyId, { ...record, bytes: jpeg, type: 'image/jpeg' }, record.takenAt);
  return record;
}

/** A photo's JPEG bytes, or undefined when there is no such photo. */
export async function getPhotoBytes(connection: Connection, photoId: string): Promise<ArrayBuffer | undefined> {
  const record = await connection.run((db) => db.get('photos', photoId));
  return record?.bytes;
}

/** The photos of a survey, described (without their bytes), in the order they were added. */
export async function listPhotos(connection: Connection, surveyId: string): Promise<Photo[]> {
  const records = await connection.run((db) => db.getAllFromIndex('photos', 'bySurvey', ofSurvey(surveyId)));
  return records.map(({ surveyId: _s, position: _p, bytes: _b, type: _t, ...photo }) => photo);
}
