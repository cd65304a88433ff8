/**
 * The IndexedDB layout: object stores, their keys and indexes, and the cumulative, named
 * upgrades that build them. Upgrades are additive: each one brings any older database up one
 * step, so a phone that skipped releases still upgrades in order.
 *
 * Stored normalised: a survey's header, and one record per instrument, area, room, reading,
 * logger series and photo, each carrying its survey's id and a position that keeps the order
 * the surveyor gave them. Saving a room rewrites one room record; the survey list reads headers
 * only; a survey's records come back in order from the `bySurvey` index ([surveyId, position]).
 */
import type { DBSchema, IDBPDatabase, IDBPTransaction, StoreNames } from 'idb';
import type { Survey } from '../model/survey.ts';
import type { Instrument } from '../model/instrument.ts';
import type { Area } from '../model/area.ts';
import type { Room } from '../model/room.ts';
import type { Reading } from '../model/reading.ts';
import type { LoggerSeries } from '../model/logger-series.ts';
import type { Photo } from '../model/photo.ts';
import { completeSurveyRecord } from '../model/survey-defaults.ts';

export const DB_NAME = 'ventwalk';

/** What every record of a survey carries besides its own fields. */
export interface Owned {
  surveyId: string;
  /** Order within the survey, as given by the surveyor (or the file). */
  position: number;
}

export type InstrumentRecord = Instrument & Owned;
export type AreaRecord = Area & Owned;
export type RoomRecord = Room & Owned;
export type ReadingRecord = Reading & Owned & { roomId: string };
/** A logger series with its columns as Float64Array: compact, and read back exactly. */
export type SeriesRecord = Omit<LoggerSeries, 'times_ms' | 'co2_ppm' | 'temp_C' | 'rh_pct'> &
  Owned & { times_ms: Float64Array; co2_ppm?: Float64Array; temp_C?: Float64Array; rh_pct?: Float64Array };
/** A photo: its description and the JPEG as an ArrayBuffer (Safari fails on stored Blobs). */
export type PhotoRecord = Photo & Owned & { bytes: ArrayBuffer; type: 'image/jpeg' };

type OwnedStore<V> = { key: string; value: V; indexes: { bySurvey: [string, number] } };

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
  instruments: OwnedStore<InstrumentRecord>;
  areas: OwnedStore<AreaRecord>;
  rooms: OwnedStore<RoomRecord>;
  readings: OwnedStore<ReadingRecord>;
  series: OwnedStore<SeriesRecord>;
  photos: OwnedStore<PhotoRecord>;
}

/** The stores holding a survey's own records (all but the header). */
export const SURVEY_PART_STORES = ['instruments', 'areas', 'rooms', 'readings', 'series', 'photos'] as const;
export type SurveyPartStore = (typeof SURVEY_PART_STORES)[number];

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
  {
    name: 'one store per survey part (instruments, areas, rooms, readings, series, photos) by survey and position; headers completed',
    run: (db, tx) => {
      for (const name of SURVEY_PART_STORES) {
        db.createObjectStore(name, { keyPath: 'id' }).createIndex('bySurvey', ['surveyId', 'position']);
      }
      // Headers saved by the first release lack the newer fields: fill them with empty values.
      void (async () => {
        let cursor = await tx.objectStore('surveys').openCursor();
        while (cursor) {
          await cursor.update(completeSurveyRecord(cursor.value));
          cursor = await cursor.continue();
        }
      })();
    },
  },
];

export const DB_VERSION = UPGRADES.length;

/** Key range of one survey's records in a `bySurvey` index. */
export function ofSurvey(surveyId: string): IDBKeyRange {
  return IDBKeyRange.bound([surveyId, -Infinity], [surveyId, Infinity]);
}
