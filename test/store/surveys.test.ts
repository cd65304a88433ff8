import 'fake-indexeddb/auto';
import { describe, it, expect, afterEach } from 'vitest';
import { Connection, StorageError } from '../../src/store/connection.ts';
import { getSurvey, listSurveys, saveSurvey } from '../../src/store/surveys.ts';
import type { Survey } from '../../src/model/survey.ts';
import { newSurveyRecord } from '../../src/model/survey-defaults.ts';

let counter = 0;
function freshConnection(): Connection {
  counter += 1;
  return new Connection({ name: `ventwalk-test-${counter}` });
}

function survey(n: number, updatedAt: string): Survey {
  const id = `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
  const input = { title: `Invented survey ${n}`, site: 'Larchmere Primary (invented)', buildingUse: 'school' as const };
  return { ...newSurveyRecord(input, id, '2026-11-30T09:00:00Z'), updatedAt };
}

const open: Connection[] = [];
afterEach(() => open.splice(0).forEach((c) => c.close()));

describe('survey store', () => {
  it('saves a survey and reads it back exactly', async () => {
    const c = freshConnection();
    open.push(c);
    const s = survey(1, '2026-11-30T10:00:00Z');
    await saveSurvey(c, s);
    expect(await getSurvey(c, s.id)).toEqual(s);
  });

  it('lists summaries newest change first', async () => {
    const c = freshConnection();
    open.push(c);
    await saveSurvey(c, survey(1, '2026-11-30T10:00:00Z'));
    await saveSurvey(c, survey(2, '2026-11-30T12:00:00Z'));
    await saveSurvey(c, survey(3, '2026-11-30T11:00:00Z'));
    const list = await listSurveys(c);
    expect(list.map((s) => s.title)).toEqual(['Invented survey 2', 'Invented survey 3', 'Invented survey 1']);
    expect(Object.keys(list[0]!).sort()).toEqual(['buildingUse', 'id', 'site', 'title', 'updatedAt']);
  });

  it('refuses an invalid record and writes nothing', async () => {
    const c = freshConnection();
    open.push(c);
    const bad = { ...survey(4, '2026-11-30T10:00:00Z'), title: '   ' };
    await expect(saveSurvey(c, bad)).rejects.toThrow(/title is empty/);
    expect(await listSurveys(c)).toEqual([]);
  });

  it('reopens and retries once after the connection is lost', async () => {
    const c = freshConnection();
    open.push(c);
    await saveSurvey(c, survey(5, '2026-11-30T10:00:00Z'));
    // Close the handle underneath the owner, as Safari does after backgrounding:
    // the next transaction throws InvalidStateError and the owner must reopen.
    (await c.get()).close();
    await saveSurvey(c, survey(6, '2026-11-30T11:00:00Z'));
    expect((await listSurveys(c)).length).toBe(2);
  });

  it('turns a quota error into a message that says nothing was lost', async () => {
    const { describeStorageError } = await import('../../src/store/connection.ts');
    const e = describeStorageError(new DOMException('full', 'QuotaExceededError'));
    expect(e).toBeInstanceOf(StorageError);
    expect(e.reason).toBe('quota');
    expect(e.message).toMatch(/Nothing was lost/);
  });

  it('gives a plain error when the database does not open in time', async () => {
    // An open that never answers: old Safari, or an upgrade blocked by a tab that never lets go.
    const stuck = new Connection({ name: 'ventwalk-test-stuck', openTimeoutMs: 50, opener: () => new Promise(() => {}) });
    await expect(stuck.get()).rejects.toMatchObject({ reason: 'open-timeout', message: expect.stringMatching(/did not open/) });
  });

  it('lets go of its handle when a newer version asks, and tells the app', async () => {
    let told = false;
    const c = new Connection({ name: 'ventwalk-test-newer', onVersionChange: () => (told = true) });
    open.push(c);
    await saveSurvey(c, survey(7, '2026-11-30T10:00:00Z'));
    const { openDB } = await import('idb');
    const newer = await openDB('ventwalk-test-newer', 50); // would hang if we did not close
    expect(told).toBe(true);
    newer.close();
  });
});
