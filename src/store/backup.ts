/**
 * Backups: export surveys as a survey file, and import one — all or nothing.
 *
 * Import order: the file is read and checked completely (readSurveyFile) by the caller before
 * anything here runs; photos are decoded from base64 before the transaction; then ONE write
 * transaction (strict durability) replaces or adds every survey of the file, or none if
 * anything fails. A survey whose id is already on the device is kept as a separate copy (new
 * ids throughout) or replaces the one on the device, as the person chose. A survey whose other
 * records' ids are used by a different survey on the device is always imported as a copy.
 */
import type { IDBPTransaction } from 'idb';
import type { SurveyDocument } from '../model/survey-document.ts';
import { makeSurveyFile, type SurveyFile } from '../model/survey-file.ts';
import { withFreshIds } from '../model/fresh-ids.ts';
import { base64ToBytes } from '../model/base64.ts';
import { MAX_NAME_LENGTH } from '../model/field-rules.ts';
import type { Connection } from './connection.ts';
import { StorageError } from './connection.ts';
import { ofSurvey, SURVEY_PART_STORES, type SurveyPartStore, type VentwalkDB } from './schema.ts';
import { deleteSurveyRecords } from './delete-survey.ts';
import { loadSurvey, type LoadOptions } from './load-survey.ts';
import { listSurveys } from './surveys.ts';
import { toSeriesRecord } from './series-columns.ts';

export type ClashChoice = 'keep-both' | 'replace';

export interface ImportPlanItem {
  surveyId: string;
  title: string;
  /** The title of the survey with the same id already on the device, if any. */
  onDevice?: string;
}

export interface ImportedSurvey {
  surveyId: string;
  title: string;
  /** new: added; replaced: took the place of the one on the device; copy: added with new ids. */
  as: 'new' | 'replaced' | 'copy';
}

type WriteTx = IDBPTransaction<VentwalkDB, ('surveys' | SurveyPartStore)[], 'readwrite'>;

/** Which surveys of a checked file are already on the device (the person chooses for those). */
export async function planImport(connection: Connection, file: SurveyFile): Promise<ImportPlanItem[]> {
  const found = await connection.run((db) => Promise.all(file.surveys.map((doc) => db.get('surveys', doc.survey.id))));
  return file.surveys.map((doc, i) => ({
    surveyId: doc.survey.id,
    title: doc.survey.title,
    ...(found[i] ? { onDevice: found[i].title } : {}),
  }));
}

/** Ids a document would write into each store. */
function storeKeys(doc: SurveyDocument): Record<SurveyPartStore, string[]> {
  return {
    instruments: doc.instruments.map((x) => x.id),
    areas: doc.areas.map((x) => x.id),
    rooms: doc.rooms.map((x) => x.id),
    readings: doc.rooms.flatMap((r) => r.readings.map((x) => x.id)),
    series: doc.series.map((x) => x.id),
    photos: doc.photos.map((x) => x.id),
  };
}

function copyTitle(title: string): string {
  const copy = `${title} (imported copy)`;
  return copy.length <= MAX_NAME_LENGTH ? copy : title;
}

/** Write one document's records. IndexedDB calls only. */
function putDocument(tx: WriteTx, doc: SurveyDocument, photoBytes: ArrayBuffer[]): void {
  const surveyId = doc.survey.id;
  const owned = { surveyId };
  void tx.objectStore('surveys').put(doc.survey);
  doc.instruments.forEach((x, position) => void tx.objectStore('instruments').put({ ...x, ...owned, position }));
  doc.areas.forEach((x, position) => void tx.objectStore('areas').put({ ...x, ...owned, position }));
  let readingPosition = 0;
  doc.rooms.forEach(({ readings, ...room }, position) => {
    void tx.objectStore('rooms').put({ ...room, ...owned, position });
    for (const reading of readings) {
      void tx.objectStore('readings').put({ ...reading, roomId: room.id, ...owned, position: readingPosition++ });
    }
  });
  doc.series.forEach((x, position) => void tx.objectStore('series').put({ ...toSeriesRecord(x), ...owned, position }));
  doc.photos.forEach(({ jpegBase64: _text, ...photo }, position) =>
    void tx.objectStore('photos').put({ ...photo, ...owned, position, bytes: photoBytes[position]!, type: 'image/jpeg' }),
  );
}

/**
 * Import every survey of a checked file in one transaction. `choices` says, for each survey
 * already on the device (by id), whether to keep both or replace; a clash without a choice
 * refuses the whole import. `newId` makes record ids for copies.
 */
export async function importSurveys(
  connection: Connection,
  file: SurveyFile,
  choices: Readonly<Record<string, ClashChoice>>,
  newId: () => string,
): Promise<ImportedSurvey[]> {
  // Work that is not IndexedDB happens before the transaction.
  const decoded = file.surveys.map((doc) => doc.photos.map((p) => base64ToBytes(p.jpegBase64).buffer));
  return connection.run(async (db) => {
    const tx = db.transaction(['surveys', ...SURVEY_PART_STORES], 'readwrite', { durability: 'strict' });
    const taken = await Promise.all(SURVEY_PART_STORES.map((store) => tx.objectStore(store).getAllKeys()));
    const takenBy = Object.fromEntries(SURVEY_PART_STORES.map((store, i) => [store, new Set(taken[i])])) as Record<SurveyPartStore, Set<string>>;
    const outcome: ImportedSurvey[] = [];
    for (const [index, original] of file.surveys.entries()) {
      const surveyId = original.survey.id;
      const onDevice = await tx.objectStore('surveys').getKey(surveyId);
      const choice = onDevice ? choices[surveyId] : undefined;
      if (onDevice && !choice) {
        tx.abort();
        await tx.done.catch(() => undefined);
        throw new StorageError(`“${original.survey.title}” is already on this device: choose keep both or replace`, 'failed');
      }
      const own = onDevice
        ? await Promise.all(SURVEY_PART_STORES.map((store) => tx.objectStore(store).index('bySurvey').getAllKeys(ofSurvey(surveyId))))
        : SURVEY_PART_STORES.map(() => []);
      const ownSets = own.map((keys) => new Set(keys));
      const keys = storeKeys(original);
      const usedElsewhere = SURVEY_PART_STORES.some((store, i) => keys[store].some((id) => takenBy[store].has(id) && !ownSets[i]!.has(id)));
      let doc = original;
      let as: ImportedSurvey['as'] = onDevice ? 'replaced' : 'new';
      if (usedElsewhere || choice === 'keep-both') {
        doc = withFreshIds(original, newId);
        doc = { ...doc, survey: { ...doc.survey, title: copyTitle(doc.survey.title) } };
        as = 'copy';
      } else if (onDevice) {
        await deleteSurveyRecords(tx, surveyId, original.photosLeftOut);
      }
      putDocument(tx, doc, decoded[index]!);
      for (const store of SURVEY_PART_STORES) for (const id of storeKeys(doc)[store]) takenBy[store].add(id);
      outcome.push({ surveyId: doc.survey.id, title: doc.survey.title, as });
    }
    await tx.done;
    return outcome;
  });
}

/** A survey file of the given surveys (or all), with or without photos. */
export async function exportSurveys(
  connection: Connection,
  surveyIds: readonly string[] | 'all',
  options: LoadOptions,
  stamp: { exportedAt: string; app: string },
): Promise<SurveyFile> {
  const ids = surveyIds === 'all' ? (await listSurveys(connection)).map((s) => s.id) : surveyIds;
  const docs: SurveyDocument[] = [];
  for (const id of ids) {
    const doc = await loadSurvey(connection, id, options);
    if (doc) docs.push(doc);
  }
  return makeSurveyFile(docs, stamp.exportedAt, stamp.app);
}
