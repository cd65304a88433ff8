import { describe, it, expect, afterEach } from 'vitest';
import fc from 'fast-check';
import { exportSurveys, importSurveys, planImport } from '../../src/store/backup.ts';
import { listSurveys } from '../../src/store/surveys.ts';
import { loadSurvey } from '../../src/store/load-survey.ts';
import { makeSurveyFile, readSurveyFile, type SurveyFile } from '../../src/model/survey-file.ts';
import { surveyDocument } from '../support/survey-arbitraries.ts';
import { closeAll, dumpAll, freshConnection, testIds } from '../support/store-helpers.ts';
import { demoFile, fixtureText } from '../support/fixtures.ts';

afterEach(closeAll);
const stamp = { exportedAt: '2026-02-01T12:00:00Z', app: 'test' };

/** Read a file's text as the app does: all problems or a checked file. */
function checked(text: string): SurveyFile {
  const result = readSurveyFile(text);
  if (!result.ok) throw new Error(JSON.stringify(result.problems.slice(0, 3)));
  return result.file;
}

describe('backup round trip', () => {
  it('export after import reproduces generated surveys exactly, through JSON text', async () => {
    await fc.assert(
      fc.asyncProperty(fc.tuple(surveyDocument(1), surveyDocument(2)), async (docs) => {
        const connection = freshConnection();
        const file = makeSurveyFile(docs, stamp.exportedAt, stamp.app);
        const imported = await importSurveys(connection, checked(JSON.stringify(file)), {}, testIds());
        expect(imported.map((s) => s.as)).toEqual(['new', 'new']);
        const exported = await exportSurveys(connection, docs.map((d) => d.survey.id), { photos: true }, stamp);
        expect(JSON.parse(JSON.stringify(exported))).toEqual(file);
        connection.close();
      }),
      { numRuns: 40 },
    );
  });

  it('round-trips the demo file, logger series included', async () => {
    const connection = freshConnection();
    const file = checked(fixtureText('demo-survey.json'));
    await importSurveys(connection, file, {}, testIds());
    const exported = await exportSurveys(connection, file.surveys.map((s) => s.survey.id), { photos: true }, { exportedAt: file.exportedAt, app: file.app });
    expect(exported).toEqual(file);
    expect((await listSurveys(connection)).length).toBe(3);
  });
});

describe('import: all or nothing, and a choice on clashes', () => {
  it('refuses a survey already on the device until the person chooses, writing nothing', async () => {
    const connection = freshConnection();
    const file = checked(fixtureText('demo-survey.json'));
    await importSurveys(connection, { ...file, surveys: [file.surveys[0]!] }, {}, testIds());
    const before = await dumpAll(connection);
    expect((await planImport(connection, file)).map((p) => p.onDevice)).toEqual([file.surveys[0]!.survey.title, undefined, undefined]);
    await expect(importSurveys(connection, file, {}, testIds())).rejects.toThrow(/already on this device: choose keep both or replace/);
    expect(await dumpAll(connection)).toEqual(before);
  });

  it('keeps both: the copy gets new ids and a title that says so', async () => {
    const connection = freshConnection();
    const school = demoFile().surveys[0]!;
    const file = makeSurveyFile([school], stamp.exportedAt, stamp.app);
    await importSurveys(connection, file, {}, testIds());
    const [copy] = await importSurveys(connection, file, { [school.survey.id]: 'keep-both' }, testIds());
    expect(copy).toMatchObject({ as: 'copy', title: `${school.survey.title} (imported copy)` });
    const loaded = await loadSurvey(connection, copy!.surveyId, { photos: true });
    expect(loaded!.rooms.map((r) => r.name)).toEqual(school.rooms.map((r) => r.name));
    expect(loaded!.rooms[0]!.readings.length).toBe(school.rooms[0]!.readings.length);
    expect((await loadSurvey(connection, school.survey.id, { photos: true }))!.survey.title).toBe(school.survey.title);
  });

  it('replaces: the survey on the device becomes the file’s, with no records left over', async () => {
    const connection = freshConnection();
    const school = demoFile().surveys[0]!;
    await importSurveys(connection, makeSurveyFile([school], stamp.exportedAt, stamp.app), {}, testIds());
    const smaller = { ...school, rooms: school.rooms.slice(0, 1), series: [] };
    const [result] = await importSurveys(connection, makeSurveyFile([smaller], stamp.exportedAt, stamp.app), { [school.survey.id]: 'replace' }, testIds());
    expect(result!.as).toBe('replaced');
    expect(await loadSurvey(connection, school.survey.id, { photos: true })).toEqual(smaller);
    const all = await dumpAll(connection);
    expect(all.rooms!.length).toBe(1);
    expect(all.series!.length).toBe(0);
  });

  it('imports as a copy when record ids belong to a different survey on the device', async () => {
    const connection = freshConnection();
    const school = demoFile().surveys[0]!;
    await importSurveys(connection, makeSurveyFile([school], stamp.exportedAt, stamp.app), {}, testIds());
    const renamed = { ...school, survey: { ...school.survey, id: '0e0e0000-0000-4000-8000-000000000001' } };
    const [result] = await importSurveys(connection, makeSurveyFile([renamed], stamp.exportedAt, stamp.app), {}, testIds());
    expect(result!.as).toBe('copy');
    expect((await loadSurvey(connection, school.survey.id, { photos: true }))!.rooms.length).toBe(3);
  });

  it('keeps the device’s photos when replacing from a backup made without photos', async () => {
    const connection = freshConnection();
    const school = demoFile().surveys[0]!;
    const photo = { id: '0e0e0000-0000-4000-8000-0000000000aa', roomId: school.rooms[0]!.id, caption: 'Seized window', takenAt: '2026-01-14T09:30:00Z', width_px: 2, height_px: 1, jpegBase64: '/9j/' };
    await importSurveys(connection, makeSurveyFile([{ ...school, photos: [photo] }], stamp.exportedAt, stamp.app), {}, testIds());
    const withoutPhotos = (await exportSurveys(connection, [school.survey.id], { photos: false }, stamp)).surveys[0]!;
    expect(withoutPhotos).toMatchObject({ photos: [], photosLeftOut: true });
    await importSurveys(connection, makeSurveyFile([withoutPhotos], stamp.exportedAt, stamp.app), { [school.survey.id]: 'replace' }, testIds());
    expect((await loadSurvey(connection, school.survey.id, { photos: true }))!.photos).toEqual([photo]);
  });
});
