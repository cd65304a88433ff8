import { describe, it, expect, afterEach } from 'vitest';
import { deleteSurveyPhotos, getPhotoBytes, savePhoto } from '../../src/store/photos.ts';
import { importSurveys } from '../../src/store/backup.ts';
import { loadSurvey } from '../../src/store/load-survey.ts';
import { readMeta, writeMeta } from '../../src/store/meta.ts';
import { closeAll, freshConnection, testIds } from '../support/store-helpers.ts';
import { demoFile } from '../support/fixtures.ts';

afterEach(() => closeAll());

describe('deleting a survey’s photos', () => {
  it('removes every photo of that survey and nothing else, and moves an issued revision on', async () => {
    const connection = freshConnection();
    const file = demoFile();
    const [school, flats] = file.surveys;
    school!.survey.issued = [{ revision: 1, issuedAt: '2026-01-20T09:00:00Z', issuedBy: 'Demo Surveyor (invented)', note: '' }];
    await importSurveys(connection, { ...file, surveys: [school!, flats!] }, {}, testIds());
    const photo = (id: string, roomId: string) => ({ id, roomId, caption: '', takenAt: '2026-01-14T10:00:00Z', width_px: 2, height_px: 2 });
    await savePhoto(connection, school!.survey.id, photo('aaaa0000-0000-4000-8000-000000000001', school!.rooms[0]!.id), new Uint8Array([1, 2]).buffer);
    await savePhoto(connection, school!.survey.id, photo('aaaa0000-0000-4000-8000-000000000002', school!.rooms[1]!.id), new Uint8Array([3]).buffer);
    await savePhoto(connection, flats!.survey.id, photo('aaaa0000-0000-4000-8000-000000000003', flats!.rooms[0]!.id), new Uint8Array([4]).buffer);
    const before = (await loadSurvey(connection, school!.survey.id, { photos: true }))!;

    await expect(deleteSurveyPhotos(connection, school!.survey.id, '2026-03-01T09:00:00Z')).resolves.toBe(2);
    const after = (await loadSurvey(connection, school!.survey.id, { photos: true }))!;
    expect(after.photos).toEqual([]);
    expect(after.rooms).toEqual(before.rooms);
    expect(after.survey).toMatchObject({ revision: 2, updatedAt: '2026-03-01T09:00:00Z' });
    expect(await getPhotoBytes(connection, 'aaaa0000-0000-4000-8000-000000000003')).toBeDefined();
    await expect(deleteSurveyPhotos(connection, 'f0000000-0000-4000-8000-000000000000', '2026-03-01T09:00:00Z')).rejects.toThrow(/no longer on the device/);
  });

  it('remembers the chosen retention period and ignores a damaged one', async () => {
    const connection = freshConnection();
    await expect(readMeta(connection, 'retentionMonths')).resolves.toBeUndefined();
    await writeMeta(connection, 'retentionMonths', 24);
    await expect(readMeta(connection, 'retentionMonths')).resolves.toBe(24);
    await writeMeta(connection, 'retentionMonths', 0.5 as number);
    await expect(readMeta(connection, 'retentionMonths')).resolves.toBeUndefined();
  });
});
