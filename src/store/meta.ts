/**
 * Small facts the app keeps about itself in the meta store: when the last backup was made, and
 * which survey and room were open (so a cold start reopens there). Each is checked on reading,
 * so a damaged entry reads as "not known" instead of breaking the app.
 */
import type { Connection } from './connection.ts';

export interface LastOpen {
  surveyId: string;
  roomId?: string;
}

export interface MetaFacts {
  /** ISO date and time of the last backup exported. */
  lastBackupAt: string;
  lastOpen: LastOpen;
}

const CHECKS: { [K in keyof MetaFacts]: (value: unknown) => value is MetaFacts[K] } = {
  lastBackupAt: (value): value is string => typeof value === 'string' && !Number.isNaN(Date.parse(value)),
  lastOpen: (value): value is LastOpen =>
    typeof value === 'object' &&
    value !== null &&
    typeof (value as LastOpen).surveyId === 'string' &&
    ['string', 'undefined'].includes(typeof (value as LastOpen).roomId),
};

export async function readMeta<K extends keyof MetaFacts>(connection: Connection, key: K): Promise<MetaFacts[K] | undefined> {
  const entry = await connection.run((db) => db.get('meta', key));
  return entry && CHECKS[key](entry.value) ? entry.value : undefined;
}

/** Remember a fact (strict durability, like every save). `undefined` forgets it. */
export async function writeMeta<K extends keyof MetaFacts>(connection: Connection, key: K, value: MetaFacts[K] | undefined): Promise<void> {
  await connection.run(async (db) => {
    const tx = db.transaction('meta', 'readwrite', { durability: 'strict' });
    void (value === undefined ? tx.store.delete(key) : tx.store.put({ key, value }));
    await tx.done;
  });
}
