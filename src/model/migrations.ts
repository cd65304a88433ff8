/**
 * Migrations of survey files: an ordered list, where migration n takes a file of version n to
 * version n + 1. A file of any released version is brought up to the current one by running
 * the migrations from its version onwards, then checked against the current schema.
 *
 * Rules: append only; never edit a released migration; each one has a fixture of the version it
 * reads in test/fixtures/formats and a test that the migrated fixture parses.
 */

/** A survey file as read from JSON, before it is checked. */
export type RawFile = Record<string, unknown>;

export interface Migration {
  /** The version it reads; it writes `from + 1`. */
  from: number;
  /** What changed, for reviewers and the upgrade log. */
  name: string;
  migrate: (file: RawFile) => RawFile;
}

/** Released migrations. Version 1 is the first format: nothing to migrate yet. */
export const MIGRATIONS: readonly Migration[] = [];

/** The version this release writes: one more than the last migration reads. */
export const CURRENT_FORMAT_VERSION = 1 + MIGRATIONS.length;

/**
 * Bring a file of version `version` up to `migrations.length + 1`, one step at a time.
 * Throws when the list has a gap (a programming error, caught by the tests).
 */
export function migrateFile(file: RawFile, version: number, migrations: readonly Migration[] = MIGRATIONS): RawFile {
  let current = file;
  for (let step = version; step <= migrations.length; step += 1) {
    const migration = migrations[step - 1];
    if (!migration || migration.from !== step) throw new Error(`No migration from survey file version ${step}`);
    current = { ...migration.migrate(current), version: step + 1 };
  }
  return current;
}
