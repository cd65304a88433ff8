/**
 * Removing a room, a reading, a logger series or an area entered by mistake: everything of the room goes in one
 * transaction (a terminal that served it keeps its name as the location), a removed reading
 * leaves the tests that grouped it, a removed area's rooms and inner areas move to the area it
 * sat in (or to no area), and a refusal changes nothing.
 */
import { describe, it, expect, afterEach } from 'vitest';
import { importSurveys } from '../../src/store/backup.ts';
import { loadSurvey } from '../../src/store/load-survey.ts';
import { deleteArea, deleteInstrument, deleteReading, deleteRoom, deleteSeries } from '../../src/store/remove-parts.ts';
import { instrumentUses, instrumentUseWords } from '../../src/model/instrument-uses.ts';
import { surveyDocumentSchema } from '../../src/model/survey-document.ts';
import type { SurveyDocument } from '../../src/model/survey-document.ts';
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

/**
 * The demo's flats survey, with Flat 3 put on a new "First floor" area, a store cupboard area
 * inside Flat 3, and an extract terminal in Flat 3's system serving its first room.
 */
async function flatsOnAFloor() {
  const connection = freshConnection();
  const file = demoFile();
  const survey = structuredClone(file.surveys.find((s) => s.survey.buildingUse === 'dwelling')!) as SurveyDocument;
  const flat3 = survey.areas.find((a) => a.name === 'Flat 3')!;
  const floor = { id: '0e0e0000-0000-4000-8000-000000000601', kind: 'floor' as const, name: 'First floor', clientRef: '', notes: '' };
  const cupboard = { id: '0e0e0000-0000-4000-8000-000000000602', kind: 'other' as const, name: 'Store cupboard', parentId: flat3.id, clientRef: '', notes: '' };
  flat3.parentId = floor.id;
  survey.areas.unshift(floor);
  survey.areas.push(cupboard);
  const served = survey.rooms.find((r) => r.areaId === flat3.id)!;
  flat3.dwelling!.system!.terminals.push({ roomId: served.id, location: '', direction: 'extract', setting: 'normal', flow_m3s: 0.008 });
  await importSurveys(connection, { ...file, surveys: [survey] }, {}, testIds());
  return { connection, survey, floor, flat3, cupboard, served };
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

  it('keeps a terminal that served a removed room, placed by the room’s name, and the survey stays valid', async () => {
    const { connection, survey, flat3, served } = await flatsOnAFloor();
    await deleteRoom(connection, survey.survey.id, served.id, '2026-04-20T08:00:00Z');
    const loaded = (await loadSurvey(connection, survey.survey.id, { photos: false }))!;
    const terminal = loaded.areas.find((a) => a.id === flat3.id)!.dwelling!.system!.terminals.at(-1)!;
    expect(terminal).toEqual({ location: served.name, direction: 'extract', setting: 'normal', flow_m3s: 0.008 });
    expect(surveyDocumentSchema.safeParse(loaded).success).toBe(true);
  });

  it('removes an area: its rooms and the area inside it move to the area it sat in, nothing else changes', async () => {
    const { connection, survey, floor, flat3, cupboard } = await flatsOnAFloor();
    const flatRooms = survey.rooms.filter((r) => r.areaId === flat3.id).map((r) => r.id);
    expect(flatRooms.length).toBeGreaterThan(0);
    await deleteArea(connection, survey.survey.id, flat3.id, '2026-04-20T08:00:00Z');
    const loaded = (await loadSurvey(connection, survey.survey.id, { photos: false }))!;
    expect(loaded.areas.some((a) => a.id === flat3.id)).toBe(false);
    expect(loaded.areas.find((a) => a.id === cupboard.id)!.parentId).toBe(floor.id);
    for (const id of flatRooms) {
      const room = loaded.rooms.find((r) => r.id === id)!;
      expect(room.areaId).toBe(floor.id);
      expect(room.updatedAt).toBe('2026-04-20T08:00:00Z');
      expect(room.readings.length).toBe(survey.rooms.find((r) => r.id === id)!.readings.length);
    }
    const others = survey.rooms.filter((r) => !flatRooms.includes(r.id));
    expect(others.map((r) => loaded.rooms.find((x) => x.id === r.id)!.areaId)).toEqual(others.map((r) => r.areaId));
    expect(loaded.survey.updatedAt).toBe('2026-04-20T08:00:00Z');
    expect(surveyDocumentSchema.safeParse(loaded).success).toBe(true);
  });

  it('removes an area at the top: its rooms go to no area and the areas inside it to the top', async () => {
    const { connection, survey, floor, flat3 } = await flatsOnAFloor();
    const flatRooms = survey.rooms.filter((r) => r.areaId === flat3.id).map((r) => r.id);
    await deleteArea(connection, survey.survey.id, flat3.id, '2026-04-20T08:00:00Z');
    await deleteArea(connection, survey.survey.id, floor.id, '2026-04-20T08:01:00Z');
    const loaded = (await loadSurvey(connection, survey.survey.id, { photos: false }))!;
    for (const id of flatRooms) expect('areaId' in loaded.rooms.find((r) => r.id === id)!).toBe(false);
    expect(loaded.areas.every((a) => a.parentId === undefined)).toBe(true);
    expect(surveyDocumentSchema.safeParse(loaded).success).toBe(true);
  });

  it('removes one logger series and nothing else', async () => {
    const { connection, survey } = await school();
    const series = survey.series[0]!;
    await deleteSeries(connection, survey.survey.id, series.id, '2026-04-20T08:00:00Z');
    const loaded = (await loadSurvey(connection, survey.survey.id, { photos: false }))!;
    expect(loaded.series).toEqual([]);
    expect(loaded.rooms.map((r) => r.id)).toEqual(survey.rooms.map((r) => r.id));
    expect(loaded.rooms.flatMap((r) => r.readings).length).toBe(survey.rooms.flatMap((r) => r.readings).length);
    expect(loaded.survey.updatedAt).toBe('2026-04-20T08:00:00Z');
  });

  it('changes nothing when the room, reading or area is not in the survey', async () => {
    const { connection, survey } = await school();
    const before = await dumpAll(connection);
    await expect(deleteRoom(connection, survey.survey.id, 'f0000000-0000-4000-8000-000000000000', '2026-04-20T08:00:00Z')).rejects.toThrow(/not in the survey/);
    await expect(deleteReading(connection, survey.survey.id, 'f0000000-0000-4000-8000-000000000000', '2026-04-20T08:00:00Z')).rejects.toThrow(/not in the survey/);
    await expect(deleteArea(connection, survey.survey.id, 'f0000000-0000-4000-8000-000000000000', '2026-04-20T08:00:00Z')).rejects.toThrow(/not in the survey/);
    await expect(deleteSeries(connection, survey.survey.id, 'f0000000-0000-4000-8000-000000000000', '2026-04-20T08:00:00Z')).rejects.toThrow(/not in the survey/);
    expect(await dumpAll(connection)).toEqual(before);
  });

  it('refuses to remove an instrument that readings name, saying what names it, and changes nothing', async () => {
    const { connection, survey } = await school();
    const handheld = survey.instruments.find((i) => survey.rooms.some((r) => r.readings.some((x) => x.instrumentId === i.id)))!;
    const parts = { ...survey, outdoorReadings: survey.survey.outdoorReadings, readings: survey.rooms.flatMap((r) => r.readings) };
    const uses = instrumentUses(parts, handheld.id);
    // Counted by hand from the demo file's records (test/fixtures/demo-survey.json).
    expect(uses.readings).toBe(parts.readings.filter((r) => r.instrumentId === handheld.id).length);
    expect(uses.outdoorReadings).toBe(survey.survey.outdoorReadings.filter((r) => r.instrumentId === handheld.id).length);
    const words = instrumentUseWords(uses);
    expect(words).toMatch(/^\d+ readings/);
    const before = await dumpAll(connection);
    await expect(deleteInstrument(connection, survey.survey.id, handheld.id, '2026-04-20T08:00:00Z')).rejects.toThrow(`${handheld.model} is still named by ${words}: it stays`);
    expect(await dumpAll(connection)).toEqual(before);
  });

  it('removes an instrument nothing names, and the survey stays valid', async () => {
    const connection = freshConnection();
    const file = demoFile();
    const survey = file.surveys[0]!;
    const spare = { id: '0e0e0000-0000-4000-8000-000000000701', model: 'Spare meter (invented)', serial: '', measures: ['co2' as const], accuracy: [], checks: [], notes: '' };
    await importSurveys(connection, { ...file, surveys: [{ ...survey, instruments: [...survey.instruments, spare] }] }, {}, testIds());
    await deleteInstrument(connection, survey.survey.id, spare.id, '2026-04-20T08:00:00Z');
    const loaded = (await loadSurvey(connection, survey.survey.id, { photos: false }))!;
    expect(loaded.instruments.map((i) => i.id)).toEqual(survey.instruments.map((i) => i.id));
    expect(loaded.survey.updatedAt).toBe('2026-04-20T08:00:00Z');
    expect(surveyDocumentSchema.safeParse(loaded).success).toBe(true);
  });

  it('words the uses of an instrument in a list', () => {
    expect(instrumentUseWords({ readings: 1, outdoorReadings: 0, fanTests: 2, terminals: 0, loggerFiles: 1, checks: 0 })).toBe('1 reading, 2 fan tests and 1 logger file');
    expect(instrumentUseWords({ readings: 0, outdoorReadings: 0, fanTests: 0, terminals: 0, loggerFiles: 0, checks: 1 })).toBe('1 side-by-side check of another meter');
    expect(instrumentUseWords({ readings: 0, outdoorReadings: 0, fanTests: 0, terminals: 0, loggerFiles: 0, checks: 0 })).toBe('');
  });
});
