/**
 * Removing a room or a reading entered by mistake: everything of the room goes in one
 * transaction, a removed reading leaves the tests that grouped it, and a refusal changes nothing.
 */
import { describe, it, expect, afterEach } from 'vitest';
import { importSurveys } from '../../src/store/backup.ts';
import { loadSurvey } from '../../src/store/load-survey.ts';
import { deleteReading, deleteRoom } from '../../src/store/remove-parts.ts';
import { closeAll, dumpAll, freshConnection, testIds } from '../support/store-helpers.ts';
import { demoFile } from '../support/fixtures.ts';

afterEach(() => closeAll());

async function school() {
  const connection = freshConnection();
  const file = demoFile();
  const survey = file.surveys[0]!;
  await importSurveys(connection, { ...file, surveys: [survey] }, {}, testIds());
  return { connection, survey };
}

describe('removing parts of a survey', () => {
  it('removes a room with its readings and logger series, and nothing else', async () => {
    const { connection, survey } = await school();
    const room = survey.rooms.find((r) => survey.series.some((s) => s.roomId === r.id))!;
    await deleteRoom(connection, survey.survey.id, room.id, '2026-04-20T08:00:00Z');
    const loaded = (await loadSurvey(connection, survey.survey.id, { photos: false }))!;
    expect(loaded.rooms.map((r) => r.id)).toEqual(survey.rooms.filter((r) => r.id !== room.id).map((r) => r.id));
    expect(loaded.series.some((s) => s.roomId === room.id)).toBe(false);
    expect(loaded.rooms.flatMap((r) => r.readings).length).toBe(survey.rooms.filter((r) => r.id !== room.id).flatMap((r) => r.readings).length);
    expect(loaded.survey.updatedAt).toBe('2026-04-20T08:00:00Z');
  });

  it('removes a reading and takes it out of its test; a test left with one reading goes', async () => {
    const { connection, survey } = await school();
    const room = survey.rooms.find((r) => r.tests.length > 0)!;
    const test = room.tests[0]!;
    await deleteReading(connection, survey.survey.id, test.readingIds[0]!, '2026-04-20T08:00:00Z');
    let loaded = (await loadSurvey(connection, survey.survey.id, { photos: false }))!;
    let after = loaded.rooms.find((r) => r.id === room.id)!;
    expect(after.readings.some((r) => r.id === test.readingIds[0])).toBe(false);
    const kept = after.tests.find((t) => t.id === test.id);
    if (test.readingIds.length > 2) expect(kept!.readingIds).toEqual(test.readingIds.slice(1));
    for (const id of (kept?.readingIds ?? []).slice(0, -1)) await deleteReading(connection, survey.survey.id, id, '2026-04-20T08:05:00Z');
    loaded = (await loadSurvey(connection, survey.survey.id, { photos: false }))!;
    after = loaded.rooms.find((r) => r.id === room.id)!;
    expect(after.tests.some((t) => t.id === test.id)).toBe(false);
  });

  it('changes nothing when the room or reading is not in the survey', async () => {
    const { connection, survey } = await school();
    const before = await dumpAll(connection);
    await expect(deleteRoom(connection, survey.survey.id, 'f0000000-0000-4000-8000-000000000000', '2026-04-20T08:00:00Z')).rejects.toThrow(/not in the survey/);
    await expect(deleteReading(connection, survey.survey.id, 'f0000000-0000-4000-8000-000000000000', '2026-04-20T08:00:00Z')).rejects.toThrow(/not in the survey/);
    expect(await dumpAll(connection)).toEqual(before);
  });
});
