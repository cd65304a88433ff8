/**
 * The IndexedDB layout: object stores, their keys and indexes, and the cumulative, named
 * upgrades that build them. Upgrades are additive: each one brings any older database up one
 * step, so a phone that skipped releases still upgrades in order.
 */
import type { DBSchema, IDBPDatabase, IDBPTransaction, StoreNames } from 'idb';
import type { Survey } from '../model/survey.ts';

export const DB_NAME = 'ventwalk';

export interface VentwalkDB extends DBSchema {
  surveys: {
    key: string;
    value: Survey;
    indexes: { byUpdatedAt: string };
  };
  /** Small facts the app keeps about itself (last backup date, last open survey, …). */
  meta: {
    key: string;
    value: { key: string; value: unknown };
  };
}

type UpgradeTx = IDBPTransaction<VentwalkDB, StoreNames<VentwalkDB>[], 'versionchange'>;

interface Upgrade {
  /** What this step does, for the upgrade log and for reviewers. */
  name: string;
  run: (db: IDBPDatabase<VentwalkDB>, tx: UpgradeTx) => void;
}

/** Upgrade n takes the database from version n to n+1. Append only; never edit a released step. */
export const UPGRADES: readonly Upgrade[] = [
  {
    name: 'surveys store with an index on last change; meta store',
    run: (db) => {
      const surveys = db.createObjectStore('surveys', { keyPath: 'id' });
      surveys.createIndex('byUpdatedAt', 'updatedAt');
      db.createObjectStore('meta', { keyPath: 'key' });
    },
  },
];

export const DB_VERSION = UPGRADES.length;
