/**
 * Intent-named storage for survey records. Every write is validated by the model's schema,
 * written in a short transaction with strict durability, and reported saved only after
 * `tx.done` resolves. Nothing but IndexedDB calls happens inside a transaction.
 */
import { surveySchema, type Survey, type SurveySummary } from '../model/survey.ts';
import type { Connection } from './connection.ts';
import { commitNow, queue } from './write-requests.ts';

/** Save (create or replace) one survey. Throws StorageError or the schema's error; never half-writes. */
export async function saveSurvey(connection: Connection, survey: Survey): Promise<Survey> {
  const record = surveySchema.parse(survey);
  await connection.run(async (db) => {
    const tx = db.transaction('surveys', 'readwrite', { durability: 'strict' });
    queue(tx.store.put(record));
    commitNow(tx);
    await tx.done;
  });
  return record;
}

/** The survey list, newest change first, as summaries. */
export async function listSurveys(connection: Connection): Promise<SurveySummary[]> {
  const all = await connection.run((db) => db.getAllFromIndex('surveys', 'byUpdatedAt'));
  return all.reverse().map(({ id, title, site, buildingUse, updatedAt }) => ({ id, title, site, buildingUse, updatedAt }));
}

/** One survey by id, or undefined when there is none. */
export async function getSurvey(connection: Connection, id: string): Promise<Survey | undefined> {
  return connection.run((db) => db.get('surveys', id));
}
