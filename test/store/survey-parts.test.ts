import { describe, it, expect, afterEach, vi } from 'vitest';
import { openDB } from 'idb';
import { saveArea, saveInstrument, saveReading, saveRoom, saveSeries } from '../../src/store/survey-parts.ts';
import { duplicateRoom } from '../../src/store/duplicate-room.ts';
import { importSurveys } from '../../src/store/backup.ts';
import { loadSurvey } from '../../src/store/load-survey.ts';
import { deleteSurvey } from '../../src/store/delete-survey.ts';
import { savePhoto, getPhotoBytes } from '../../src/store/photos.ts';
import { readMeta, writeMeta } from '../../src/store/meta.ts';
import { Connection, StorageError } from '../../src/store/connection.ts';
import { getSurvey, saveSurvey } from '../../src/store/surveys.ts';
import { closeAll, dumpAll, freshConnection, testIds } from '../support/store-helpers.ts';
import { demoFile } from '../support/fixtures.ts';
import type { SurveyDocument } from '../../src/model/survey-document.ts';

afterEach(() => {
  vi.restoreAllMocks();
  closeAll();
});

async function withSchool(): Promise<{ connection: Connection; school: SurveyDocument }> {
  const connection = freshConnection();
  const file = demoFile();
  const school = file.surveys[0]!;
  await importSurveys(connection, { ...file, surveys: [school] }, {}, testIds());
  return { connection, school };
}

describe('saving parts of a survey', () => {
  it('rewrites one room record, keeps its place, and moves the survey’s last change', async () => {
    const { connection, school } = await withSchool();
    const before = await dumpAll(connection);
    const { readings: _r, ...room } = school.rooms[1]!;
    await saveRoom(connection, school.survey.id, { ...room, notes: 'Checked again', updatedAt: '2026-01-15T08:00:00Z' });
    const after = await dumpAll(connection);
    expect(after.readings).toEqual(before.readings);
    expect(after.rooms!.filter((r, i) => JSON.stringify(r) !== JSON.stringify(before.rooms![i])).length).toBe(1);
    const loaded = await loadSurvey(connection, school.survey.id, { photos: true });
    expect(loaded!.rooms.map((r) => r.name)).toEqual(school.rooms.map((r) => r.name));
    expect(loaded!.rooms[1]!.notes).toBe('Checked again');
    expect(loaded!.survey.updatedAt).toBe('2026-01-15T08:00:00Z');
  });

  it('puts a new reading last and refuses one for a room that is not saved', async () => {
    const { connection, school } = await withSchool();
    const room = school.rooms[2]!;
    const reading = { id: '0e0e0000-0000-4000-8000-000000000101', time: '2026-01-14T16:10:00Z', co2_ppm: 612, conditions: { people: [], windows: 'all-closed' as const, doors: 'closed' as const, fans: 'none' as const, heating: 'on' as const, combustion: false }, note: '' };
    await saveReading(connection, school.survey.id, room.id, reading, '2026-01-14T16:11:00Z');
    expect((await loadSurvey(connection, school.survey.id, { photos: true }))!.rooms[2]!.readings).toEqual([reading]);
    const before = await dumpAll(connection);
    await expect(saveReading(connection, school.survey.id, '0e0e0000-0000-4000-8000-0000000009ff', { ...reading, id: '0e0e0000-0000-4000-8000-000000000102' }, '2026-01-14T16:12:00Z')).rejects.toThrow(/room for this reading is not saved/);
    expect(await dumpAll(connection)).toEqual(before);
  });

  it('refuses an out-of-range value with the field and rule, writing nothing', async () => {
    const { connection, school } = await withSchool();
    const before = await dumpAll(connection);
    const { readings: _r, ...room } = school.rooms[0]!;
    await expect(saveRoom(connection, school.survey.id, { ...room, geometry: { kind: 'box', length_m: 7.2, width_m: 7, height_m: 0.5 } })).rejects.toThrow(/Room height must be between 1.5 and 30 m/);
    expect(await dumpAll(connection)).toEqual(before);
  });

  it('moves an issued survey to its next revision on the first edit', async () => {
    const { connection, school } = await withSchool();
    const header = await getSurvey(connection, school.survey.id);
    await saveSurvey(connection, { ...header!, issued: [{ revision: 1, issuedAt: '2026-01-20T10:00:00Z', issuedBy: 'Demo Surveyor (invented)', note: '' }] });
    const { readings: _r, ...room } = school.rooms[0]!;
    await saveRoom(connection, school.survey.id, { ...room, notes: 'After issue', updatedAt: '2026-01-21T09:00:00Z' });
    expect((await getSurvey(connection, school.survey.id))!.revision).toBe(2);
  });

  it('adds an instrument and an area after the ones already there', async () => {
    const { connection, school } = await withSchool();
    const instrument = { ...school.instruments[0]!, id: '0e0e0000-0000-4000-8000-000000000501', serial: 'DEMO-H-0099' };
    const area = { id: '0e0e0000-0000-4000-8000-000000000502', kind: 'floor' as const, name: 'Second floor', clientRef: 'B-2', notes: '' };
    await saveInstrument(connection, school.survey.id, instrument, '2026-01-15T08:00:00Z');
    await saveArea(connection, school.survey.id, area, '2026-01-15T08:01:00Z');
    const loaded = await loadSurvey(connection, school.survey.id, { photos: true });
    expect(loaded!.instruments.at(-1)).toEqual(instrument);
    expect(loaded!.areas.map((a) => a.name)).toEqual([...school.areas.map((a) => a.name), 'Second floor']);
  });

  it('stores logger columns as Float64Array and gives back plain numbers', async () => {
    const { connection, school } = await withSchool();
    const series = { ...school.series[0]!, id: '0e0e0000-0000-4000-8000-000000000201', periods: [] };
    await saveSeries(connection, school.survey.id, series, '2026-01-15T08:00:00Z');
    const stored = await (await connection.get()).get('series', series.id);
    expect(stored!.times_ms).toBeInstanceOf(Float64Array);
    expect((await loadSurvey(connection, school.survey.id, { photos: true }))!.series[1]).toEqual(series);
  });

  it('keeps photo bytes as an ArrayBuffer', async () => {
    const { connection, school } = await withSchool();
    const jpeg = new Uint8Array([0xff, 0xd8, 0xff, 0xd9]).buffer;
    await savePhoto(connection, school.survey.id, { id: '0e0e0000-0000-4000-8000-000000000301', roomId: school.rooms[0]!.id, caption: '', takenAt: '2026-01-14T09:00:00Z', width_px: 1, height_px: 1 }, jpeg);
    const bytes = await getPhotoBytes(connection, '0e0e0000-0000-4000-8000-000000000301');
    expect(bytes).toBeInstanceOf(ArrayBuffer);
    expect([...new Uint8Array(bytes!)]).toEqual([0xff, 0xd8, 0xff, 0xd9]);
  });

  it('deletes a survey and all its records, leaving others alone', async () => {
    const connection = freshConnection();
    const file = demoFile();
    await importSurveys(connection, file, {}, testIds());
    await deleteSurvey(connection, file.surveys[0]!.survey.id);
    const all = await dumpAll(connection);
    expect(all.surveys!.length).toBe(2);
    expect(all.rooms!.every((r) => (r as { surveyId: string }).surveyId !== file.surveys[0]!.survey.id)).toBe(true);
    expect(all.series).toEqual([]);
  });
});

describe('duplicating a room', () => {
  it('copies size and openings only: never readings, tests, defects or photos', async () => {
    const { connection, school } = await withSchool();
    const original = school.rooms[0]!;
    const copy = await duplicateRoom(connection, original.id, testIds(), '2026-01-14T12:00:00Z');
    const loaded = (await loadSurvey(connection, school.survey.id, { photos: true }))!.rooms.at(-1)!;
    expect(loaded.id).toBe(copy.id);
    expect(loaded.name).toBe('Classroom B1 (copy)');
    expect(loaded.geometry).toEqual(original.geometry);
    expect(loaded.openings.map((o) => o.type)).toEqual(original.openings.map((o) => o.type));
    expect(loaded.openings.some((o) => original.openings.some((p) => p.id === o.id))).toBe(false);
    expect(loaded.openings.every((o) => o.condition === '')).toBe(true);
    expect({ readings: loaded.readings, tests: loaded.tests, defects: loaded.defects, occupants: loaded.occupants, interview: loaded.interview }).toEqual({ readings: [], tests: [], defects: [], occupants: [], interview: [] });
  });
});

describe('storage failures lose nothing', () => {
  it('reports a full device plainly and leaves stored data as it was', async () => {
    const { connection, school } = await withSchool();
    const before = await dumpAll(connection);
    const put = vi.spyOn(IDBObjectStore.prototype, 'put').mockImplementation(() => {
      throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    });
    const { readings: _r, ...room } = school.rooms[0]!;
    const error = await saveRoom(connection, school.survey.id, { ...room, notes: 'Will not fit' }).catch((e: unknown) => e);
    put.mockRestore();
    expect(error).toBeInstanceOf(StorageError);
    expect(error).toMatchObject({ reason: 'quota', message: expect.stringMatching(/no room left.*Nothing was lost/) });
    expect(await dumpAll(connection)).toEqual(before);
  });

  it('reopens after a lost connection and saves', async () => {
    const { connection, school } = await withSchool();
    (await connection.get()).close(); // as Safari does after backgrounding
    const { readings: _r, ...room } = school.rooms[0]!;
    await saveRoom(connection, school.survey.id, { ...room, notes: 'Saved after reopening' });
    expect((await loadSurvey(connection, school.survey.id, { photos: true }))!.rooms[0]!.notes).toBe('Saved after reopening');
  });
});

describe('remembered facts', () => {
  it('keeps the last backup time and last open survey, and ignores damaged entries', async () => {
    const connection = freshConnection();
    await writeMeta(connection, 'lastBackupAt', '2026-01-14T18:00:00Z');
    await writeMeta(connection, 'lastOpen', { surveyId: 'abc', roomId: 'def' });
    expect(await readMeta(connection, 'lastBackupAt')).toBe('2026-01-14T18:00:00Z');
    expect(await readMeta(connection, 'lastOpen')).toEqual({ surveyId: 'abc', roomId: 'def' });
    await writeMeta(connection, 'lastOpen', { surveyId: 'abc', areaId: 'ghi' });
    expect(await readMeta(connection, 'lastOpen')).toEqual({ surveyId: 'abc', areaId: 'ghi' });
    await (await connection.get()).put('meta', { key: 'lastOpen', value: { surveyId: 'abc', areaId: 7 } });
    expect(await readMeta(connection, 'lastOpen')).toBeUndefined();
    await (await connection.get()).put('meta', { key: 'lastOpen', value: 42 });
    expect(await readMeta(connection, 'lastOpen')).toBeUndefined();
  });
});

describe('upgrading a database from the first release', () => {
  it('keeps its surveys and completes their headers', async () => {
    const name = `ventwalk-test-upgrade-${process.pid}`;
    const old = await openDB(name, 1, {
      upgrade(db) {
        db.createObjectStore('surveys', { keyPath: 'id' }).createIndex('byUpdatedAt', 'updatedAt');
        db.createObjectStore('meta', { keyPath: 'key' });
      },
    });
    const header = { id: '0e0e0000-0000-4000-8000-000000000401', title: 'From release one', site: '', buildingUse: 'office', createdAt: '2025-12-01T09:00:00Z', updatedAt: '2025-12-01T09:00:00Z' };
    await old.put('surveys', header);
    old.close();
    const connection = new Connection({ name });
    const loaded = await loadSurvey(connection, header.id, { photos: true });
    expect(loaded!.survey).toMatchObject({ ...header, revision: 1, surveyors: [], notes: '' });
    expect(loaded!.rooms).toEqual([]);
    connection.close();
  });
});
