import { describe, it, expect } from 'vitest';
import { readdirSync } from 'node:fs';
import { readSurveyFile, FORMAT_NAME } from '../../src/model/survey-file.ts';
import { CURRENT_FORMAT_VERSION, MIGRATIONS, migrateFile, type Migration } from '../../src/model/migrations.ts';
import { demoFile, fixtureText } from '../support/fixtures.ts';

function problemsOf(input: unknown): { field: string; message: string; value?: unknown }[] {
  const result = readSurveyFile(input);
  expect(result.ok).toBe(false);
  return result.ok ? [] : result.problems;
}

describe('survey file: released versions', () => {
  const released = readdirSync(new URL('../fixtures/formats/', import.meta.url)).filter((f) => f.endsWith('.json'));

  it('has a fixture for every released version', () => {
    const versions = released.map((f) => Number(/-v(\d+)\.json$/.exec(f)?.[1])).sort();
    expect(versions).toEqual(Array.from({ length: CURRENT_FORMAT_VERSION }, (_, i) => i + 1));
  });

  it.each(released)('reads the frozen fixture %s', (name) => {
    const result = readSurveyFile(fixtureText(`formats/${name}`));
    expect(result.ok ? [] : result.problems.slice(0, 5)).toEqual([]);
  });

  it('numbers its migrations from 1 without gaps', () => {
    MIGRATIONS.forEach((m, i) => expect(m.from).toBe(i + 1));
  });
});

describe('survey file: migrations', () => {
  // A pretend version 2 that adds a field, to prove the mechanism end to end.
  const toV2: Migration = {
    from: 1,
    name: 'add a marker field (test only)',
    migrate: (file) => ({ ...file, renamed: true }),
  };

  it('runs each migration in order and stamps the new version', () => {
    const v1 = JSON.parse(fixtureText('formats/ventwalk-survey-v1.json')) as Record<string, unknown>;
    const migrated = migrateFile(v1, 1, [toV2]);
    expect(migrated).toMatchObject({ version: 2, renamed: true, format: FORMAT_NAME });
  });

  it('refuses a list with a gap', () => {
    expect(() => migrateFile({}, 1, [{ ...toV2, from: 2 }])).toThrow(/No migration from survey file version 1/);
  });

  it('reads a file that is already current without touching it', () => {
    const file = { format: FORMAT_NAME, version: CURRENT_FORMAT_VERSION };
    expect(migrateFile(file, CURRENT_FORMAT_VERSION)).toBe(file);
  });
});

describe('survey file: bad files are refused with a clear message', () => {
  const good = fixtureText('demo-survey.json');

  it('refuses truncated JSON', () => {
    expect(problemsOf(good.slice(0, good.length / 2))[0]!.message).toMatch(/not a complete JSON file/);
  });

  it('refuses a JSON value that is not an object', () => {
    expect(problemsOf('[1,2,3]')[0]!.message).toMatch(/not a JSON object/);
  });

  it('refuses another format', () => {
    expect(problemsOf({ ...demoFile(), format: 'some-other-survey' })[0]).toMatchObject({
      message: expect.stringMatching(/not a Ventwalk survey file: its format is "some-other-survey"/),
      value: 'some-other-survey',
    });
  });

  it('refuses a file from a newer app, saying to update', () => {
    expect(problemsOf({ ...demoFile(), version: CURRENT_FORMAT_VERSION + 1 })[0]!.message).toMatch(/made by a newer Ventwalk.*Update the app/);
  });

  it('refuses a version that is not a whole number', () => {
    expect(problemsOf({ ...demoFile(), version: '1' })[0]!.message).toMatch(/version is missing or not a whole number/);
  });

  it('names missing fields and wrong types by their path', () => {
    const file = demoFile();
    const room = file.surveys[0]!.rooms[0]! as Record<string, unknown>;
    delete room.geometry;
    room.name = 42;
    const problems = problemsOf(file);
    expect(problems).toContainEqual({ field: 'surveys.0.rooms.0.geometry', message: 'is missing' });
    expect(problems).toContainEqual({ field: 'surveys.0.rooms.0.name', message: 'Room name must be text', value: 42 });
  });

  it('names out-of-bounds values with the rule and the value', () => {
    const file = demoFile();
    file.surveys[0]!.rooms[0]!.readings[0]!.co2_ppm = 65_000;
    file.surveys[1]!.rooms[0]!.readings[0]!.rh_pct = 130;
    const problems = problemsOf(file);
    expect(problems).toContainEqual({
      field: 'surveys.0.rooms.0.readings.0.co2_ppm',
      message: 'CO₂ must be between 250 and 10,000 ppm (check the meter and the units it shows)',
      value: 65_000,
    });
    expect(problems).toContainEqual({ field: 'surveys.1.rooms.0.readings.0.rh_pct', message: 'Relative humidity must be between 0 and 100 %', value: 130 });
  });

  it('refuses fields it does not know rather than dropping them', () => {
    const file = demoFile() as unknown as Record<string, unknown>;
    file.colourCode = 'red';
    expect(problemsOf(file)[0]!.message).toMatch(/fields Ventwalk does not know: colourCode/);
  });

  it('refuses broken references and ids used twice', () => {
    const file = demoFile();
    const school = file.surveys[0]!;
    school.rooms[0]!.areaId = 'dea10000-0000-4000-8000-ffffffffffff';
    school.rooms[1]!.id = school.rooms[2]!.id;
    school.areas[0]!.parentId = school.areas[1]!.id;
    const fields = problemsOf(file).map((p) => `${p.field}: ${p.message}`);
    expect(fields).toContain('surveys.0.rooms.0.areaId: Refers to an area that is not in this survey');
    expect(fields.some((f) => /^surveys\.0\.rooms\.2\.id: This id is already used at rooms\.1\.id/.test(f))).toBe(true);
    expect(fields.some((f) => /^surveys\.0\.areas\.\d\.parentId: Areas sit inside each other in a loop/.test(f))).toBe(true);
  });

  it('refuses the same id in two surveys of one file', () => {
    const file = demoFile();
    file.surveys[1]!.instruments[0]!.id = file.surveys[0]!.instruments[0]!.id;
    expect(problemsOf(file).map((p) => p.message)).toContain('This id is also used by survey 1 in this file');
  });

  it('refuses a logger series whose columns do not line up with its times', () => {
    const file = demoFile();
    file.surveys[0]!.series[0]!.co2_ppm!.pop();
    expect(problemsOf(file)[0]).toMatchObject({ field: 'surveys.0.series.0.co2_ppm', message: expect.stringMatching(/479 values for 480 times/) });
  });

  it('keeps hostile text in names as plain text', () => {
    const file = demoFile();
    const hostile = '<script>alert("x")</script><img src=x onerror=alert(1)>';
    file.surveys[0]!.rooms[0]!.name = hostile;
    const result = readSurveyFile(JSON.stringify(file));
    expect(result.ok && result.file.surveys[0]!.rooms[0]!.name).toBe(hostile);
  });
});
