/** Helpers for store tests on fake-indexeddb: fresh databases, and a dump of everything stored. */
import 'fake-indexeddb/auto';
import { Connection } from '../../src/store/connection.ts';
import { SURVEY_PART_STORES } from '../../src/store/schema.ts';

let counter = 0;
const opened: Connection[] = [];

/** A connection to a new, empty database (closed by closeAll). */
export function freshConnection(): Connection {
  counter += 1;
  const connection = new Connection({ name: `ventwalk-test-${process.pid}-${counter}` });
  opened.push(connection);
  return connection;
}

export function closeAll(): void {
  opened.splice(0).forEach((c) => c.close());
}

/** Every record of every store, for "nothing changed" checks. */
export async function dumpAll(connection: Connection): Promise<Record<string, unknown[]>> {
  const db = await connection.get();
  const names = ['surveys', 'meta', ...SURVEY_PART_STORES] as const;
  const all = await Promise.all(names.map((name) => db.getAll(name)));
  return Object.fromEntries(names.map((name, i) => [name, all[i]]));
}

/** Ids for new records in tests: 0f0f…-n, unique within the run. */
export function testIds(): () => string {
  let n = 0;
  const run = (counter + 1).toString(16).padStart(4, '0');
  return () => `0f0f${run}-0000-4000-8000-${(++n).toString(16).padStart(12, '0')}`;
}
