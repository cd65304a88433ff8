/**
 * Small facts the app keeps about itself in the meta store: when the last backup was made,
 * which survey and room (or area) were open (so a cold start reopens there), and how long surveys are kept. Each is checked on reading,
 * so a damaged entry reads as "not known" instead of breaking the app.
 */
import type { Connection } from './connection.ts';
import { commitNow, queue } from './write-requests.ts';

export interface LastOpen {
  surveyId: string;
  roomId?: string;
  areaId?: string;
}

export interface MetaFacts {
  /** ISO date and time of the last backup exported. */
  lastBackupAt: string;
  lastOpen: LastOpen;
  /** How long the surveyor keeps surveys on the phone, in whole months (1-120): older ones are pointed out. */
  retentionMonths: number;
}

const CHECKS: { [K in keyof MetaFacts]: (value: unknown) => value is MetaFacts[K] } = {
  lastBackupAt: (value): value is string => typeof value === 'string' && !Number.isNaN(Date.parse(value)),
  lastOpen: (value): value is LastOpen =>
    typeof value === 'object' &&
    value !== null &&
    typeof (value as LastOpen).surveyId === 'string' &&
    ['string', 'undefined'].includes(typeof (value as LastOpen).roomId) &&
    ['string', 'undefined'].includes(typeof (value as LastOpen).areaId),
  retentionMonths: (value): value is number => Number.isInteger(value) && (value as number) >= 1 && (value as number) <= 120,
};

export async function readMeta<K extends keyof MetaFacts>(connection: Connection, key: K): Promise<MetaFacts[K] | undefined> {
  const entry = await connection.run((db) => db.get('meta', key));
  return entry && CHECKS[key](entry.value) ? entry.value : undefined;
}

/** Remember a fact (strict durability, like every save). `undefined` forgets it. */
export async function writeMeta<K extends keyof MetaFacts>(connection: Connection, key: K, value: MetaFacts[K] | undefined): Promise<void> {
  await connection.run(async (db) => {
    const tx = db.transaction('meta', 'readwrite', { durability: 'strict' });
    queue(value === undefined ? tx.store.delete(key) : tx.store.put({ key, value }));
    commitNow(tx);
    await tx.done;
  });
}
