/**
 * fast-check arbitraries for whole survey documents: every record type, optional fields present
 * or absent, values anywhere within their bounds, hostile text in names, and references that
 * point where they must (ids are given out in order after generation, references by index).
 */
import fc from 'fast-check';
import { AGE_BANDS } from '../../src/core/age-bands.ts';
import { ROOM_USE_IDS } from '../../src/core/room-uses.ts';
import { BUILDING_USE_IDS } from '../../src/core/building-uses.ts';
import { FACINGS, CHECK_ANSWERS } from '../../src/model/field-rules.ts';
import type { SurveyDocument } from '../../src/model/survey-document.ts';

const HOSTILE = ['<script>alert("x")</script>', '<img src=x onerror=alert(1)>', '"; DROP TABLE rooms; --', '${7*7}', 'Ünïcødé ✓ 教室'];

const text = (maxLength = 40) =>
  fc.oneof(fc.string({ maxLength }).map((s) => s.trim()), fc.constantFrom('', ...HOSTILE));
const requiredText = () => text().filter((s) => s.length > 0);
/** Any double in [min, max] (never -0, which JSON cannot carry). */
const num = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true }).map((x) => x + 0);
const int = (min: number, max: number) => fc.integer({ min, max });
const when = fc.date({ min: new Date('2020-01-01T00:00:00Z'), max: new Date('2035-12-31T00:00:00Z'), noInvalidDate: true });
const dateTime = () => when.map((d) => d.toISOString());
const date = () => when.map((d) => d.toISOString().slice(0, 10));
const pick = <T extends readonly unknown[]>(values: T) => fc.constantFrom(...values);
const hhmm = (minute: number) => `${String(Math.floor(minute / 60)).padStart(2, '0')}:${String(minute % 60).padStart(2, '0')}`;
/** Up to three periods of a day that never overlap (the model refuses overlaps), in any order. */
const dayPeriods = () =>
  fc
    .tuple(fc.uniqueArray(int(0, 1439), { maxLength: 6 }), fc.boolean())
    .chain(([minutes, reversed]) => {
      const sorted = [...minutes].sort((a, b) => a - b);
      const spans = Array.from({ length: Math.floor(sorted.length / 2) }, (_, i) => [sorted[2 * i]!, sorted[2 * i + 1]!] as const);
      return fc.tuple(...spans.map(([from, to]) => fc.record({ start: fc.constant(hhmm(from)), end: fc.constant(hhmm(to)), presence: pick(['full', 'half', 'empty', 'airing'] as const), label: text() }))).map((periods) => (reversed ? periods.reverse() : periods));
    });
const PLACEHOLDER = 'id';
const optional = <T extends Record<string, fc.Arbitrary<unknown>>>(shape: T, required: (keyof T)[]) =>
  fc.record(shape, { requiredKeys: required as never });
const ref = () => fc.nat(); // an index, turned into an id later (or dropped when there is nothing to refer to)

const instrument = optional(
  {
    id: fc.constant(PLACEHOLDER),
    model: requiredText(),
    serial: text(),
    measures: fc.uniqueArray(pick(['co2', 'temperature', 'relative-humidity', 'airflow'] as const), { minLength: 1, maxLength: 3 }),
    accuracy: fc.array(fc.record({ quantity: pick(['co2', 'temperature'] as const), plusMinus: num(0, 100), percentOfReading: num(0, 10) }), { maxLength: 2 }),
    calibratedOn: date(),
    autoBaselineOff: fc.boolean(),
    checks: fc.array(optional({ time: dateTime(), quantity: pick(['co2'] as const), reference: text(), offset: num(-100, 100), duration_s: num(0, 3600) }, ['time', 'quantity', 'reference', 'offset']), { maxLength: 2 }),
    notes: text(200),
  },
  ['id', 'model', 'serial', 'measures', 'accuracy', 'checks', 'notes'],
);

const opening = fc.oneof(
  optional(
    { type: fc.constant('window' as const), id: fc.constant(PLACEHOLDER), count: int(1, 200), facing: pick(FACINGS), condition: text(), style: pick(['hinged', 'sash', 'sliding', 'louvre', 'fixed'] as const), hinge: pick(['side', 'top', 'bottom'] as const), sashWidth_m: num(0.05, 10), sashHeight_m: num(0.05, 10), sillHeight_m: num(0, 50), headHeight_m: num(0, 50), openingAngle_deg: num(0, 180), openingStroke_m: num(0, 5), restrictor: pick(CHECK_ANSWERS), operability: pick(['opens', 'restricted', 'blocked', 'seized'] as const) },
    ['type', 'id', 'count', 'condition', 'style', 'restrictor', 'operability'],
  ),
  optional(
    { type: fc.constant('vent' as const), id: fc.constant(PLACEHOLDER), count: int(1, 200), condition: text(), kind: pick(['background-vent', 'air-brick', 'grille'] as const), purpose: pick(['room', 'sub-floor', 'combustion-air'] as const), labelArea_m2: num(1e-6, 1), labelAreaIs: pick(['free', 'equivalent', 'unknown'] as const), operability: pick(['opens', 'blocked'] as const) },
    ['type', 'id', 'count', 'condition', 'kind', 'purpose', 'labelAreaIs', 'operability'],
  ),
  optional(
    { type: fc.constant('fan' as const), id: fc.constant(PLACEHOLDER), count: int(1, 5), condition: text(), direction: pick(['extract', 'supply'] as const), ratedFlow_m3s: num(1e-4, 5), measuredFlow_m3s: num(0, 5), measuredWith: ref(), runOn_s: num(0, 7200), humidistat: pick(CHECK_ANSWERS), isolator: pick(['on', 'off', 'none', 'not-found'] as const), ducting: pick(['ducted', 'recirculating', 'through-wall'] as const) },
    ['type', 'id', 'count', 'condition', 'direction', 'humidistat', 'isolator', 'ducting'],
  ),
  fc.record({ type: fc.constant('undercut' as const), id: fc.constant(PLACEHOLDER), count: int(1, 3), condition: text(), gap_m: num(0, 0.2), doorWidth_m: num(0.3, 5) }),
);

const geometryPart = fc.oneof(
  fc.record({ kind: fc.constant('box' as const), length_m: num(0.3, 200), width_m: num(0.3, 200), height_m: num(1.5, 30) }),
  fc.record({ kind: fc.constant('area' as const), floorArea_m2: num(0.1, 10_000), height_m: num(1.5, 30) }),
);
const geometry = fc.oneof(geometryPart, fc.record({ kind: fc.constant('parts' as const), parts: fc.array(geometryPart, { minLength: 1, maxLength: 3 }) }));

const reading = optional(
  {
    id: fc.constant(PLACEHOLDER),
    time: dateTime(),
    co2_ppm: num(250, 10_000),
    temp_C: num(-30, 60),
    rh_pct: num(0, 100),
    surfaceTemp_C: num(-50, 80),
    instrumentId: ref(),
    conditions: optional(
      { people: fc.array(fc.record({ groupId: ref(), count: int(0, 100) }), { maxLength: 2 }), windows: pick(['all-closed', 'some-open', 'all-open', 'none'] as const), doors: pick(['closed', 'open'] as const), fans: pick(['off', 'on', 'none'] as const), heating: pick(['off', 'on'] as const), combustion: fc.boolean(), openOpeningIds: fc.array(ref(), { maxLength: 2 }) },
      ['people', 'windows', 'doors', 'fans', 'heating', 'combustion'],
    ),
    note: text(),
  },
  ['id', 'time', 'co2_ppm', 'conditions', 'note'],
);

const room = optional(
  {
    id: fc.constant(PLACEHOLDER),
    areaId: ref(),
    name: requiredText(),
    clientRef: text(),
    use: pick(ROOM_USE_IDS),
    geometry,
    exposedWalls: fc.array(
      optional({ id: fc.constant(PLACEHOLDER), facing: pick(FACINGS), construction: pick(['solid-masonry', 'cavity-filled'] as const), length_m: num(0.1, 200) }, ['id', 'construction']),
      { maxLength: 2 },
    ),
    occupants: fc.array(fc.record({ id: fc.constant(PLACEHOLDER), label: text(), count: int(1, 10_000), ageBand: pick(AGE_BANDS), sex: pick(['male', 'female', 'mixed'] as const), activity_met: num(0.7, 8) }), { maxLength: 2 }),
    schedule: fc.record({ template: text(), periods: dayPeriods() }),
    openings: fc.array(opening, { maxLength: 4 }),
    appliances: fc.array(fc.record({ id: fc.constant(PLACEHOLDER), kind: pick(['gas-boiler', 'open-fire'] as const), flue: pick(['room-sealed', 'open-flued', 'flueless', 'not-known'] as const), combustionAirVentPresent: pick(CHECK_ANSWERS), combustionAirVentClear: pick(CHECK_ANSWERS), coAlarmPresent: pick(CHECK_ANSWERS), coAlarmTested: pick(CHECK_ANSWERS), gasSafetyRecordSeen: pick(['yes', 'no', 'not-checked', 'not-applicable'] as const), notes: text() }), { maxLength: 1 }),
    defects: fc.array(optional({ id: fc.constant(PLACEHOLDER), kind: pick(['mould', 'condensation', 'fan-dead'] as const), location: text(), extent_m2: num(0, 1000), pattern: pick(['spots', 'patches'] as const), openingId: ref(), notes: text() }, ['id', 'kind', 'location', 'notes']), { maxLength: 2 }),
    interview: fc.array(fc.record({ topic: requiredText(), answer: text(200) }), { maxLength: 2 }),
    tests: fc.array(fc.record({ id: fc.constant(PLACEHOLDER), kind: pick(['decay', 'build-up', 'seeded-decay'] as const), readingIds: fc.array(ref(), { minLength: 2, maxLength: 3 }), note: text() }), { maxLength: 1 }),
    notes: text(200),
    updatedAt: dateTime(),
    readings: fc.array(reading, { maxLength: 4 }),
  },
  ['id', 'name', 'clientRef', 'use', 'geometry', 'exposedWalls', 'occupants', 'schedule', 'openings', 'appliances', 'defects', 'interview', 'tests', 'notes', 'updatedAt', 'readings'],
);

const series = fc
  .record({
    id: fc.constant(PLACEHOLDER),
    roomId: ref(),
    sourceFile: requiredText(),
    columns: fc.record({ time: requiredText(), co2: text() }),
    timeZone: fc.constantFrom('Europe/London', 'UTC'),
    start: fc.integer({ min: Date.UTC(2020, 0, 1), max: Date.UTC(2030, 0, 1) }),
    steps: fc.array(fc.integer({ min: 1, max: 600_000 }), { minLength: 1, maxLength: 20 }),
    co2: fc.array(num(250, 10_000), { minLength: 20, maxLength: 20 }),
  })
  .map(({ start, steps, co2, ...rest }) => {
    const times_ms = steps.map((_, i) => start + steps.slice(0, i + 1).reduce((a, b) => a + b, 0));
    return { ...rest, times_ms, co2_ppm: co2.slice(0, times_ms.length), periods: [{ id: PLACEHOLDER, kind: 'decay' as const, start_ms: start, end_ms: start + 1, note: '' }] };
  });

const survey = optional(
  {
    id: fc.constant(PLACEHOLDER),
    title: requiredText(),
    site: text(),
    client: text(),
    surveyors: fc.array(fc.record({ name: requiredText(), qualifications: text() }), { maxLength: 2 }),
    purpose: text(200),
    scope: text(200),
    visits: fc.array(optional({ start: dateTime(), end: dateTime() }, ['start']), { maxLength: 2 }),
    buildingUse: pick(BUILDING_USE_IDS),
    ventilation: pick(['natural', 'mechanical', 'hybrid'] as const),
    stage: pick(['new', 'refurbished', 'existing'] as const),
    construction: text(),
    builtYear: int(1000, 2200),
    storeys: int(1, 200),
    terrain: pick(['open-country', 'urban'] as const),
    shelter: pick(['exposed', 'normal', 'sheltered'] as const),
    airPermeability: optional({ q50_m3sm2: num(1e-6, 0.03), testedOn: date(), reference: text() }, ['q50_m3sm2', 'reference']),
    criteria: fc.record({ setId: requiredText(), version: requiredText(), overrides: fc.array(fc.record({ thresholdId: requiredText(), value: num(0, 1e6), reason: requiredText() }), { maxLength: 1 }) }),
    units: pick(['si', 'imperial'] as const),
    weather: optional({ conditions: text(), outdoorTemp_C: num(-50, 50), outdoorRh_pct: num(0, 100), wind: pick(['calm', 'strong'] as const), windFrom: pick(FACINGS), rainInPreviousDays: fc.boolean() }, ['conditions']),
    outdoorReadings: fc.array(optional({ id: fc.constant(PLACEHOLDER), time: dateTime(), moment: pick(['start', 'end', 'during'] as const), co2_ppm: num(250, 10_000), temp_C: num(-50, 50), instrumentId: ref(), location: text() }, ['id', 'time', 'moment', 'co2_ppm', 'location']), { maxLength: 2 }),
    designWeather: fc.array(optional({ id: fc.constant(PLACEHOLDER), name: requiredText(), outdoorTemp_C: num(-50, 50), windSpeed_ms: num(0, 40), windFrom: pick(FACINGS) }, ['id', 'name', 'outdoorTemp_C', 'windSpeed_ms']), { maxLength: 2 }),
    notes: text(200),
    revision: int(1, 999),
    issued: fc.array(fc.record({ revision: int(1, 999), issuedAt: dateTime(), issuedBy: text(), note: text() }), { maxLength: 2 }),
    createdAt: dateTime(),
    updatedAt: dateTime(),
  },
  ['id', 'title', 'site', 'client', 'surveyors', 'purpose', 'scope', 'visits', 'buildingUse', 'construction', 'units', 'weather', 'outdoorReadings', 'designWeather', 'notes', 'revision', 'issued', 'createdAt', 'updatedAt'],
);

const area = optional(
  { id: fc.constant(PLACEHOLDER), parentId: ref(), kind: pick(['block', 'floor', 'flat'] as const), name: requiredText(), clientRef: text(), dwelling: optional({ bedrooms: int(0, 50), floorArea_m2: num(5, 5000) }, []), notes: text() },
  ['id', 'kind', 'name', 'clientRef', 'notes'],
);

const photo = optional(
  { id: fc.constant(PLACEHOLDER), roomId: ref(), caption: text(), takenAt: dateTime(), width_px: int(1, 10_000), height_px: int(1, 10_000), bytes: fc.uint8Array({ minLength: 1, maxLength: 64 }) },
  ['id', 'caption', 'takenAt', 'width_px', 'height_px', 'bytes'],
);

/** Replace placeholder ids with unique ones and index references with the ids they point at. */
function wire(raw: unknown, nextId: () => string): SurveyDocument {
  const doc = raw as Record<string, any>;
  const assign = (list: { id: string }[]) => list.forEach((x) => (x.id = nextId()));
  const point = (holder: Record<string, any>, key: string, targets: { id: string }[]) => {
    if (holder[key] === undefined) return;
    if (targets.length === 0) delete holder[key];
    else holder[key] = targets[holder[key] % targets.length]!.id;
  };
  const pointAll = (holder: Record<string, any>, key: string, targets: { id: string }[]) => {
    if (holder[key] === undefined) return;
    holder[key] = targets.length === 0 ? [] : holder[key].map((i: number) => targets[i % targets.length]!.id);
  };
  doc.survey.id = nextId();
  assign(doc.survey.outdoorReadings);
  assign(doc.survey.designWeather);
  assign(doc.instruments);
  assign(doc.areas);
  for (const r of doc.rooms) {
    r.id = nextId();
    for (const key of ['exposedWalls', 'occupants', 'openings', 'appliances', 'defects', 'tests', 'readings']) assign(r[key]);
  }
  for (const s of doc.series) {
    s.id = nextId();
    assign(s.periods);
  }
  assign(doc.photos);
  doc.survey.outdoorReadings.forEach((r: any) => point(r, 'instrumentId', doc.instruments));
  doc.instruments.forEach((x: any) => x.checks.forEach((c: any) => delete c.referenceInstrumentId));
  // Parents only among earlier areas, so areas never loop.
  doc.areas.forEach((a: any, i: number) => point(a, 'parentId', doc.areas.slice(0, i)));
  for (const r of doc.rooms) {
    point(r, 'areaId', doc.areas);
    r.openings.forEach((o: any) => point(o, 'measuredWith', doc.instruments));
    r.defects.forEach((d: any) => point(d, 'openingId', r.openings));
    r.readings.forEach((x: any) => {
      point(x, 'instrumentId', doc.instruments);
      x.conditions.people = r.occupants.length === 0 ? [] : x.conditions.people.map((p: any) => ({ ...p, groupId: r.occupants[p.groupId % r.occupants.length].id }));
      pointAll(x.conditions, 'openOpeningIds', r.openings);
    });
    r.tests = r.readings.length < 2 ? [] : r.tests;
    r.tests.forEach((t: any) => pointAll(t, 'readingIds', r.readings));
  }
  doc.series.forEach((s: any) => point(s, 'roomId', doc.rooms));
  doc.photos = doc.photos.map(({ bytes, ...p }: any) => {
    point(p, 'roomId', doc.rooms);
    return { ...p, jpegBase64: Buffer.from(bytes).toString('base64') };
  });
  return doc as SurveyDocument;
}

/** A whole, valid survey document; `prefix` starts its ids, keeping them unique across the documents of one file. */
export function surveyDocument(prefix: number): fc.Arbitrary<SurveyDocument> {
  return fc
    .record({
      survey,
      instruments: fc.array(instrument, { maxLength: 2 }),
      areas: fc.array(area, { maxLength: 3 }),
      rooms: fc.array(room, { maxLength: 3 }),
      series: fc.array(series, { maxLength: 1 }),
      photos: fc.array(photo, { maxLength: 2 }),
      photosLeftOut: fc.constant(false),
    })
    .map((raw) => {
      let n = 0;
      return wire(structuredClone(raw), () => `${prefix.toString(16).padStart(8, '0')}-0000-4000-8000-${(++n).toString(16).padStart(12, '0')}`);
    });
}
