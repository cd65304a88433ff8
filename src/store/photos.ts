/**
 * Photos on the device: the description and the JPEG bytes as an ArrayBuffer (never a Blob:
 * Safari's IndexedDB fails on Blobs intermittently). The bytes must be read from the File and
 * downscaled before this is called: nothing but IndexedDB happens inside the transaction.
 */
import { photoSchema, type Photo } from '../model/photo.ts';
import { editableRevision } from '../model/revision-lock.ts';
import type { Connection } from './connection.ts';
import { StorageError } from './connection.ts';
import { ofSurvey } from './schema.ts';
import { savePart } from './survey-parts.ts';
import { commitNow, queue } from './write-requests.ts';

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

/**
 * Delete every photo of a survey (and nothing else) in one transaction; returns how many went.
 * Like any edit, it moves an issued revision on to the next and the survey's last change to
 * `changedAt`.
 */
export async function deleteSurveyPhotos(connection: Connection, surveyId: string, changedAt: string): Promise<number> {
  return connection.run(async (db) => {
    const tx = db.transaction(['surveys', 'photos'], 'readwrite', { durability: 'strict' });
    const survey = await tx.objectStore('surveys').get(surveyId);
    if (!survey) {
      tx.abort();
      await tx.done.catch(() => undefined);
      throw new StorageError('This survey is no longer on the device', 'failed');
    }
    const keys = await tx.objectStore('photos').index('bySurvey').getAllKeys(ofSurvey(surveyId));
    for (const key of keys) queue(tx.objectStore('photos').delete(key));
    if (keys.length > 0) {
      const later = Date.parse(changedAt) > Date.parse(survey.updatedAt) ? changedAt : survey.updatedAt;
      queue(tx.objectStore('surveys').put({ ...editableRevision(survey), updatedAt: later }));
    }
    commitNow(tx);
    await tx.done;
    return keys.length;
  });
}

/** The photos of a survey, described (without their bytes), in the order they were added. */
export async function listPhotos(connection: Connection, surveyId: string): Promise<Photo[]> {
  const records = await connection.run((db) => db.getAllFromIndex('photos', 'bySurvey', ofSurvey(surveyId)));
  return records.map(({ surveyId: _s, position: _p, bytes: _b, type: _t, ...photo }) => photo);
}
