import 'fake-indexeddb/auto';
import { describe, it, expect, beforeEach } from 'vitest';
import { backupImport, describeValue, MAX_IMPORT_BYTES } from '../../src/app/backup-import.svelte.ts';
import { connection } from '../../src/app/storage-connection.ts';
import { deleteSurvey } from '../../src/store/delete-survey.ts';
import { listSurveys } from '../../src/store/surveys.ts';
import { dumpAll } from '../support/store-helpers.ts';
import { demoFile, fixtureText } from '../support/fixtures.ts';

const demoText = fixtureText('demo-survey.json');
const file = (text: string, name = 'backup.json') => new File([text], name, { type: 'application/json' });

beforeEach(async () => {
  backupImport.reset();
  for (const s of await listSurveys(connection)) await deleteSurvey(connection, s.id);
  await backupImport.choose(file(demoText));
  expect(backupImport.stage.kind).toBe('done');
  backupImport.reset();
});

async function refusedWithDataUnchanged(chosen: File): Promise<string[]> {
  const before = await dumpAll(connection);
  await backupImport.choose(chosen);
  const stage = backupImport.stage;
  expect(stage.kind).toBe('refused');
  expect(await dumpAll(connection)).toEqual(before);
  return stage.kind === 'refused' ? stage.problems.map((p) => `${p.field}: ${p.message}`) : [];
}

describe('restoring from a backup file', () => {
  it('refuses a 50 MB file with an overlong note, naming the field, and changes nothing', async () => {
    const big = demoFile();
    big.surveys[0]!.survey.notes = 'x'.repeat(50_000_000);
    const problems = await refusedWithDataUnchanged(file(JSON.stringify(big)));
    expect(problems).toEqual(['surveys.0.survey.notes: Notes is longer than 20,000 characters']);
  });

  it('refuses 50 MB of something that is not JSON, and changes nothing', async () => {
    const problems = await refusedWithDataUnchanged(file('{'.padEnd(50_000_000, 'a')));
    expect(problems[0]).toMatch(/not a complete JSON file/);
  });

  it('does not even read a file far larger than any backup', async () => {
    const huge = { name: 'video.mp4', size: MAX_IMPORT_BYTES + 1, text: () => Promise.reject(new Error('must not be read')) } as unknown as File;
    const problems = await refusedWithDataUnchanged(huge);
    expect(problems[0]).toMatch(/: The file is 300 MB; a Ventwalk backup is never that large/);
  });

  it('lists at most 50 problems and counts the rest', async () => {
    const bad = demoFile();
    bad.surveys[0]!.series[0]!.co2_ppm = bad.surveys[0]!.series[0]!.co2_ppm!.map(() => 99_999);
    await refusedWithDataUnchanged(file(JSON.stringify(bad)));
    const stage = backupImport.stage;
    expect(stage.kind === 'refused' && [stage.problems.length, stage.total]).toEqual([50, 480]);
  });

  it('asks about surveys already on the device, then replaces as chosen', async () => {
    const edited = demoFile();
    edited.surveys[1]!.survey.notes = 'Edited on the office computer';
    await backupImport.choose(file(JSON.stringify(edited)));
    expect(backupImport.stage.kind).toBe('choose');
    expect(backupImport.ready).toBe(false);
    for (const s of edited.surveys) backupImport.decide(s.survey.id, 'replace');
    expect(backupImport.ready).toBe(true);
    await backupImport.confirm();
    const stage = backupImport.stage;
    expect(stage.kind === 'done' && stage.imported.map((s) => s.as)).toEqual(['replaced', 'replaced', 'replaced']);
    expect((await listSurveys(connection)).length).toBe(3);
  });

  it('shows values short and quoted', () => {
    expect(describeValue('<script>')).toBe('"<script>"');
    expect(describeValue(65_000)).toBe('65000');
    expect(describeValue(undefined)).toBe('(missing)');
    expect(describeValue('x'.repeat(100))).toHaveLength(58);
  });
});
