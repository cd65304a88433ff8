/**
 * The anonymised export: every text field of the survey file is either replaced or emptied by
 * anonymiseSurvey, or kept on purpose (a trade label, not prose about people). The test fills
 * EVERY free-text field of a survey (found by walking the file's JSON Schema) with its own
 * marker, anonymises it, and looks for the markers anywhere in the output JSON. A new text field
 * in the model fails the first test until someone decides which list it belongs on.
 */
import { describe, it, expect } from 'vitest';
import { anonymiseSurvey, WITHHELD_REASON } from '../../src/model/anonymise.ts';
import { surveyDocumentSchema, type SurveyDocument } from '../../src/model/survey-document.ts';
import { makeSurveyFile, readSurveyFile } from '../../src/model/survey-file.ts';
import { bytesToBase64 } from '../../src/model/base64.ts';
import { analyseSurvey } from '../../src/analysis/analyse-survey.ts';
import { demoFile } from '../support/fixtures.ts';
import { schemaFields } from '../support/schema-text-fields.ts';

/** Text fields the anonymiser replaces, empties or leaves out (paths within one survey). */
const REMOVED = [
  'survey.title',
  'survey.site',
  'survey.client',
  'survey.surveyors[].name',
  'survey.surveyors[].qualifications',
  'survey.purpose',
  'survey.scope',
  'survey.construction',
  'survey.airPermeability.reference',
  'survey.criteria.overrides[].reason',
  'survey.weather.conditions',
  'survey.outdoorReadings[].location',
  'survey.notes',
  'survey.issued[].issuedBy',
  'survey.issued[].note',
  'instruments[].notes',
  'areas[].name',
  'areas[].clientRef',
  'areas[].dwelling.system.notes',
  'areas[].notes',
  'rooms[].name',
  'rooms[].clientRef',
  'rooms[].occupants[].label',
  'rooms[].openings[].condition',
  'rooms[].appliances[].notes',
  'rooms[].defects[].notes',
  'rooms[].interview[].topic',
  'rooms[].interview[].answer',
  'rooms[].tests[].note',
  'rooms[].notes',
  'rooms[].readings[].note',
  'series[].sourceFile',
  'series[].periods[].note',
  'photos[].caption',
];

/** Text fields kept on purpose: labels of the trade, where in a room, instrument identity. */
const KEPT = [
  'survey.criteria.setId',
  'survey.criteria.version',
  'survey.criteria.overrides[].thresholdId',
  'survey.designWeather[].name',
  'instruments[].model',
  'instruments[].serial',
  'instruments[].checks[].reference',
  'areas[].dwelling.system.mode',
  'areas[].dwelling.system.terminals[].location',
  'rooms[].exposedWalls[].measured.location',
  'rooms[].schedule.template',
  'rooms[].schedule.periods[].label',
  'rooms[].defects[].location',
  'series[].columns.time',
  'series[].columns.co2',
  'series[].columns.temperature',
  'series[].columns.relativeHumidity',
  'series[].timeZone',
];

const SURVEY_PREFIX = 'surveys[].';
const surveyTextPaths = () =>
  schemaFields()
    .filter((f) => f.freeText && f.path.startsWith(SURVEY_PREFIX))
    .map((f) => f.path.slice(SURVEY_PREFIX.length));

/** A small JPEG-like byte string carrying an EXIF block with a GPS tag. */
const EXIF_JPEG = bytesToBase64(new TextEncoder().encode('\xff\xd8\xff\xe1Exif\0\0GPSLatitude 51.5 GPSLongitude -0.1\xff\xd9'));

/** The demo school with one of every optional record, so every text field has a value. */
function everyFieldSurvey(): SurveyDocument {
  const doc = structuredClone(demoFile().surveys[0]!);
  const room = doc.rooms[0]!;
  const instrument = doc.instruments[0]!;
  const uuid = (n: number) => `aaaa0000-0000-4000-8000-${n.toString(16).padStart(12, '0')}`;
  doc.survey.airPermeability = { q50_m3sm2: 0.002, reference: 'x' };
  doc.survey.criteria = { setId: 'x', version: 'x', overrides: [{ thresholdId: 'x', value: 1200, reason: 'x' }] };
  doc.survey.outdoorReadings.push({ id: uuid(1), time: '2026-01-14T09:00:00Z', moment: 'start', co2_ppm: 430, location: 'x' });
  doc.survey.designWeather.push({ id: uuid(2), name: 'x', outdoorTemp_C: 0, windSpeed_ms: 1 });
  doc.survey.issued.push({ revision: 1, issuedAt: '2026-01-15T09:00:00Z', issuedBy: 'x', note: 'x' });
  instrument.checks.push({ time: '2026-01-14T08:30:00Z', quantity: 'co2', reference: 'x', offset: 5 });
  doc.areas[0]!.dwelling = {
    system: { kind: 'continuous-extract', mode: 'x', running: 'yes', notes: 'x', terminals: [{ location: 'x', direction: 'extract', setting: 'normal', flow_m3s: 0.008 }] },
  };
  room.exposedWalls[0] = {
    id: room.exposedWalls[0]!.id,
    construction: 'cavity-unfilled',
    measured: { time: '2026-01-14T10:00:00Z', insideAir_C: 20, outsideAir_C: 5, surface_C: 15, factor: 0.67, location: 'x' },
  };
  room.appliances.push({
    id: uuid(3),
    kind: 'gas-fire',
    flue: 'open-flued',
    combustionAirVentPresent: 'yes',
    combustionAirVentClear: 'yes',
    coAlarmPresent: 'yes',
    coAlarmTested: 'yes',
    gasSafetyRecordSeen: 'yes',
    notes: 'x',
  });
  room.interview.push({ topic: 'x', answer: 'x' });
  doc.photos.push({ id: uuid(4), roomId: room.id, caption: 'x', takenAt: '2026-01-14T10:05:00Z', width_px: 4, height_px: 3, jpegBase64: EXIF_JPEG });
  doc.photosLeftOut = false;
  return surveyDocumentSchema.parse(doc);
}

/**
 * Put a unique marker in every string found at each path; returns marker → path.
 * Markers are PRIVATEnEND so that no marker is a prefix of another.
 */
function markEveryTextField(doc: SurveyDocument, paths: readonly string[]): Map<string, string> {
  const markers = new Map<string, string>();
  const mark = (holder: unknown, steps: string[], path: string): void => {
    if (typeof holder !== 'object' || holder === null) return;
    const [step, ...rest] = steps;
    const list = step!.endsWith('[]');
    const key = list ? step!.slice(0, -2) : step!;
    const value = (holder as Record<string, unknown>)[key];
    if (list) {
      if (Array.isArray(value)) value.forEach((item) => (rest.length ? mark(item, rest, path) : undefined));
    } else if (rest.length) {
      mark(value, rest, path);
    } else if (typeof value === 'string') {
      const marker = `PRIVATE${markers.size + 1}END`;
      markers.set(marker, path);
      (holder as Record<string, unknown>)[key] = marker;
    }
  };
  for (const path of paths) mark(doc, path.split('.'), path);
  return markers;
}

describe('anonymised export', () => {
  it('decides every text field of the survey file: replaced, emptied or left out — or kept on purpose', () => {
    expect([...REMOVED, ...KEPT].sort()).toEqual(surveyTextPaths().sort());
  });

  it('contains none of the names, addresses, notes or answers, and no photo', () => {
    const doc = everyFieldSurvey();
    const markers = markEveryTextField(doc, surveyTextPaths());
    // Every text field got its marker: the check below covers them all.
    expect(new Set(markers.values())).toEqual(new Set(surveyTextPaths()));
    const shared = anonymiseSurvey(surveyDocumentSchema.parse(doc), 1);
    const text = JSON.stringify(makeSurveyFile([shared], '2026-02-01T12:00:00Z', '0.1.0'));
    const leaked = [...markers].filter(([marker, path]) => text.includes(marker) && !KEPT.includes(path)).map(([, path]) => path);
    expect(leaked).toEqual([]);
    // The demo's own invented names and places are gone too.
    const original = demoFile().surveys[0]!;
    for (const known of [original.survey.site, original.survey.client, original.survey.surveyors[0]!.name, original.rooms[0]!.name, original.areas[0]!.name]) {
      expect(text).not.toContain(known);
    }
    expect(shared.photos).toEqual([]);
    expect(shared.photosLeftOut).toBe(true);
    expect(text).not.toContain(EXIF_JPEG);
    expect(text).not.toMatch(/Exif|GPS|jpegBase64/);
  });

  it('gives generic labels and keeps the file valid', () => {
    const shared = anonymiseSurvey(everyFieldSurvey(), 2);
    expect(shared.survey.title).toBe('Survey 2');
    expect(shared.survey.surveyors.map((s) => s.name)).toEqual(['Surveyor 1']);
    expect(shared.areas.map((a) => a.name)).toEqual(['Block 1', 'Floor 1', 'Floor 2']);
    expect(shared.rooms.map((r) => r.name)).toEqual(['Room 1', 'Room 2', 'Room 3']);
    expect(shared.rooms[0]!.occupants.map((g) => g.label)).toEqual(['Group 1', 'Group 2']);
    expect(shared.survey.criteria?.overrides[0]!.reason).toBe(WITHHELD_REASON);
    expect(shared.rooms[0]!.interview).toEqual([]);
    const read = readSurveyFile(JSON.stringify(makeSurveyFile([shared], '2026-02-01T12:00:00Z', '0.1.0')));
    expect(read.ok ? [] : read.problems.slice(0, 3)).toEqual([]);
  });

  it('keeps every measurement: the analysis gives the same figures', () => {
    const original = demoFile().surveys[0]!;
    const figures = (doc: SurveyDocument) =>
      analyseSurvey(doc, { draws: 100 }).rooms.map((r) => [r.roomId, r.volume_m3, r.headline.supply_m3s, r.headline.steadyLevel_ppm]);
    expect(figures(anonymiseSurvey(original, 1))).toEqual(figures(original));
    const readings = (doc: SurveyDocument) => doc.rooms.flatMap((r) => r.readings.map(({ note: _note, ...rest }) => rest));
    expect(readings(anonymiseSurvey(original, 1))).toEqual(readings(original));
  });
});
