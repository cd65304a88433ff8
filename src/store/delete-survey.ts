/**
 * Remove a survey and every record of it from the device, in one transaction: all or nothing.
 */
import type { IDBPTransaction } from 'idb';
import type { Connection } from './connection.ts';
import { ofSurvey, SURVEY_PART_STORES, type SurveyPartStore, type VentwalkDB } from './schema.ts';

type WriteTx = IDBPTransaction<VentwalkDB, ('surveys' | SurveyPartStore)[], 'readwrite'>;

/**
 * Inside a write transaction over the surveys and part stores: delete a survey's header and
 * parts (its photos too, unless `keepPhotos`). IndexedDB calls only.
 */
export async function deleteSurveyRecords(tx: WriteTx, surveyId: string, keepPhotos = false): Promise<void> {
  const range = ofSurvey(surveyId);
  void tx.objectStore('surveys').delete(surveyId);
  const stores = SURVEY_PART_STORES.filter((s) => !(keepPhotos && s === 'photos'));
  const keyLists = await Promise.all(stores.map((store) => tx.objectStore(store).index('bySurvey').getAllKeys(range)));
  stores.forEach((store, i) => keyLists[i]!.forEach((key) => void tx.objectStore(store).delete(key)));
}

/** Delete one survey with all its rooms, readings, series and photos. */
export async function deleteSurvey(connection: Connection, surveyId: string): Promise<void> {
  await connection.run(async (db) => {
    const tx = db.transaction(['surveys', ...SURVEY_PART_STORES], 'readwrite', { durability: 'strict' });
    await deleteSurveyRecords(tx, surveyId);
    await tx.done;
  });
}
