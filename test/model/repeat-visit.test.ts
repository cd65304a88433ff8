/**
 * Starting the next visit from the demo surveys: the building, areas, rooms, sizes, openings,
 * appliances and occupants come across with new ids and a map back to last time; readings,
 * tests, defects, photos, answers, notes and logger series never do.
 */
import { describe, it, expect, afterEach } from 'vitest';
import { repeatVisit } from '../../src/model/repeat-visit.ts';
import { surveyDocumentSchema, type SurveyDocument } from '../../src/model/survey-document.ts';
import { makeSurveyFile } from '../../src/model/survey-file.ts';
import { recordIds } from '../../src/model/survey-references.ts';
import { importSurveys } from '../../src/store/backup.ts';
import { loadSurvey } from '../../src/store/load-survey.ts';
import { bytesToBase64 } from '../../src/model/base64.ts';
import { demoFile } from '../support/fixtures.ts';
import { closeAll, freshConnection, testIds } from '../support/store-helpers.ts';

afterEach(() => closeAll());

const NOW = '2026-04-20T08:00:00Z';

function ids(): () => string {
  let n = 0;
  return () => `e0000000-0000-4000-8000-${(++n).toString(16).padStart(12, '0')}`;
}

/** The demo school with a photo, so "never photos" is tested on something. */
function school(): SurveyDocument {
  const doc = structuredClone(demoFile().surveys[0]!);
  doc.photos.push({ id: 'aaaa0000-0000-4000-8000-000000000001', roomId: doc.rooms[0]!.id, caption: 'Seized sash', takenAt: '2026-01-14T10:05:00Z', width_px: 2, height_px: 2, jpegBase64: bytesToBase64(new Uint8Array([255, 216, 255, 217])) });
  return surveyDocumentSchema.parse(doc);
}

describe('repeat visit', () => {
  it('copies the building, areas, rooms, sizes, openings and occupants with new ids and a map to last time', () => {
    const before = school();
    const next = surveyDocumentSchema.parse(repeatVisit(before, ids(), NOW));
    expect(next.survey).toMatchObject({
      title: `${before.survey.title} (next visit)`,
      site: before.survey.site,
      client: before.survey.client,
      buildingUse: before.survey.buildingUse,
      previousSurveyId: before.survey.id,
      revision: 1,
      issued: [],
      visits: [],
      outdoorReadings: [],
      notes: '',
      createdAt: NOW,
    });
    expect(next.areas.map((a) => [a.name, a.kind])).toEqual(before.areas.map((a) => [a.name, a.kind]));
    // Parents follow the copy: the floors sit in the copied block.
    const nameOf = (doc: SurveyDocument, id?: string) => doc.areas.find((a) => a.id === id)?.name;
    expect(next.areas.map((a) => nameOf(next, a.parentId))).toEqual(before.areas.map((a) => nameOf(before, a.parentId)));
    expect(next.rooms.map((r) => [r.name, r.clientRef, r.use, r.geometry, nameOf(next, r.areaId)])).toEqual(
      before.rooms.map((r) => [r.name, r.clientRef, r.use, r.geometry, nameOf(before, r.areaId)]),
    );
    expect(next.rooms.map((r) => r.previousRoomId)).toEqual(before.rooms.map((r) => r.id));
    expect(next.rooms.map((r) => r.occupants.map(({ id: _id, ...g }) => g))).toEqual(before.rooms.map((r) => r.occupants.map(({ id: _id, ...g }) => g)));
    expect(next.rooms.map((r) => r.schedule)).toEqual(before.rooms.map((r) => r.schedule));
    const shape = (doc: SurveyDocument) => doc.rooms.map((r) => r.openings.map(({ id: _id, condition: _c, ...o }) => o));
    expect(shape(next)).toEqual(shape(before));
    // No id in common with last time.
    const old = new Set(recordIds(before).map(([id]) => id));
    expect(recordIds(next).filter(([id]) => old.has(id))).toEqual([]);
  });

  it('never copies readings, tests, defects, photos, answers, notes, logger series or instruments', () => {
    const before = school();
    expect(before.rooms.some((r) => r.readings.length && r.tests.length && r.defects.length && r.interview.length)).toBe(true);
    expect(before.series.length).toBeGreaterThan(0);
    const next = repeatVisit(before, ids(), NOW);
    expect(next.rooms.flatMap((r) => [...r.readings, ...r.tests, ...r.defects, ...r.interview])).toEqual([]);
    expect(next.rooms.map((r) => r.notes).join('')).toBe('');
    expect(next.rooms.flatMap((r) => r.openings.map((o) => o.condition)).join('')).toBe('');
    expect(next).toMatchObject({ series: [], photos: [], instruments: [], photosLeftOut: false });
    expect(next.rooms.flatMap((r) => r.exposedWalls.map((w) => w.measured)).filter(Boolean)).toEqual([]);
  });

  it('keeps a flat’s appliances and fans but not what was measured or checked on the day', () => {
    const flats = demoFile().surveys[1]!;
    const next = surveyDocumentSchema.parse(repeatVisit(flats, ids(), NOW));
    const fans = next.rooms.flatMap((r) => r.openings.filter((o) => o.type === 'fan'));
    expect(fans.length).toBeGreaterThan(0);
    expect(fans.every((f) => f.type === 'fan' && f.measuredFlow_m3s === undefined && f.measuredWith === undefined)).toBe(true);
    expect(fans.map((f) => f.type === 'fan' && f.ratedFlow_m3s)).toEqual(
      flats.rooms.flatMap((r) => r.openings.filter((o) => o.type === 'fan')).map((f) => f.type === 'fan' && f.ratedFlow_m3s),
    );
    const appliances = next.rooms.flatMap((r) => r.appliances);
    expect(appliances.map((a) => [a.kind, a.flue])).toEqual(flats.rooms.flatMap((r) => r.appliances).map((a) => [a.kind, a.flue]));
    expect(appliances.every((a) => a.coAlarmTested === 'not-checked' && a.combustionAirVentClear === 'not-checked' && a.gasSafetyRecordSeen === 'not-checked')).toBe(true);
  });

  it('is saved through the backup import as a new survey, next to the earlier one', async () => {
    const connection = freshConnection();
    const before = school();
    await importSurveys(connection, makeSurveyFile([before], NOW, '0.1.0'), {}, testIds());
    const next = repeatVisit(before, ids(), NOW);
    const saved = await importSurveys(connection, makeSurveyFile([next], NOW, '0.1.0'), {}, testIds());
    expect(saved).toEqual([{ surveyId: next.survey.id, title: next.survey.title, as: 'new' }]);
    expect(await loadSurvey(connection, next.survey.id, { photos: true })).toEqual(next);
    expect((await loadSurvey(connection, before.survey.id, { photos: true }))!.rooms).toEqual(before.rooms);
  });
});
