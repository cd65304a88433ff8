/**
 * Builds the demo survey file (test/fixtures/demo-survey.json): three invented surveys in one
 * file — a 1960s school block, two flats, and an office floor — with readings made by the
 * single-zone CO₂ balance (src/core/balance.ts) from invented supplies and occupants, plus a
 * little seeded meter noise. Every name, place and figure is invented for Ventwalk.
 *
 * `npm run demo` rewrites the fixture; test/model/demo-survey.test.ts fails when it is stale.
 */
import { levelAfter, type BalanceConditions } from '../../src/core/balance.ts';
import { occupantCo2Output, type OccupantGroup } from '../../src/core/co2-generation.ts';
import { STANDARD_PRESSURE_PA } from '../../src/core/units.ts';
import { makeSurveyFile, type SurveyFile } from '../../src/model/survey-file.ts';
import type { SurveyDocument, DocumentRoom } from '../../src/model/survey-document.ts';
import type { Reading, Conditions } from '../../src/model/reading.ts';
import type { OccupantGroupRecord } from '../../src/model/occupancy.ts';
import type { ExposedWall } from '../../src/model/exposed-wall.ts';
import type { Opening } from '../../src/model/opening.ts';
import type { LoggerSeries } from '../../src/model/logger-series.ts';
import type { Survey } from '../../src/model/survey.ts';
import { newSurveyRecord } from '../../src/model/survey-defaults.ts';
import { blankRoomParts } from '../../src/model/room-defaults.ts';

/** Deterministic ids: dea1xxxx-… (version 4, variant 8), numbered in the order they are made. */
function idMaker(): () => string {
  let n = 0;
  return () => {
    n += 1;
    return `dea10000-0000-4000-8000-${n.toString(16).padStart(12, '0')}`;
  };
}

/** mulberry32: a small seeded generator, so the noise is the same on every run. */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const id = idMaker();
const random = seeded(20260114);
/** Meter noise: uniform ± half-width, ppm or °C or %. */
const jitter = (halfWidth: number) => (random() * 2 - 1) * halfWidth;
/** Round to a step, dropping the binary noise of the division (20.700000000000003 → 20.7). */
const round = (x: number, step: number) => Number((Math.round(x / step) * step).toPrecision(12));
const at = (day: string, hhmm: string) => `${day}T${hhmm}:00Z`;
const addMinutes = (iso: string, minutes: number) => new Date(Date.parse(iso) + minutes * 60_000).toISOString().replace('.000Z', 'Z');
const ROOM_AIR = { temp_C: 20, pressure_Pa: STANDARD_PRESSURE_PA };

function group(label: string, count: number, ageBand: OccupantGroup['ageBand'], sex: OccupantGroup['sex'], met: number): OccupantGroupRecord {
  return { id: id(), label, count, ageBand, sex, activity_met: met };
}

/** CO₂ output of the people present, m³/s at 20 °C. */
function output(groups: OccupantGroupRecord[], present: number[]): number {
  const engineGroups = groups.map((g, i) => ({ count: present[i] ?? 0, ageBand: g.ageBand, sex: g.sex, met: g.activity_met }));
  return occupantCo2Output(engineGroups.filter((g) => g.count > 0), ROOM_AIR).total_m3s;
}

interface Piece {
  /** Supply, m³/s. */
  supply: number;
  /** People present per group. */
  present: number[];
  conditions: Omit<Conditions, 'people'>;
  /** Extra CO₂ source (a seeded release), m³/s. */
  extraSource?: number;
}

/**
 * Readings every `stepMin` minutes from `start` for `minutes`, from `startPpm`, following the
 * balance under one piece of constant conditions. Returns the readings and the level at the end.
 */
function readingsUnder(
  room: { volume: number; groups: OccupantGroupRecord[]; instrumentId: string; outdoor: number },
  piece: Piece,
  start: string,
  minutes: number,
  stepMin: number,
  startPpm: number,
  climate: { temp: number; rh: number },
): { readings: Reading[]; endPpm: number } {
  const conditions: BalanceConditions = {
    volume_m3: room.volume,
    supply_m3s: piece.supply,
    outdoor_ppm: room.outdoor,
    source_m3s: output(room.groups, piece.present) + (piece.extraSource ?? 0),
  };
  const readings: Reading[] = [];
  for (let m = 0; m <= minutes; m += stepMin) {
    const level = levelAfter(conditions, startPpm, m * 60);
    readings.push({
      id: id(),
      time: addMinutes(start, m),
      co2_ppm: round(level + jitter(8), 1),
      temp_C: round(climate.temp + jitter(0.2), 0.1),
      rh_pct: round(climate.rh + jitter(1), 1),
      instrumentId: room.instrumentId,
      conditions: {
        ...piece.conditions,
        people: room.groups.map((g, i) => ({ groupId: g.id, count: piece.present[i] ?? 0 })),
      },
      note: '',
    });
  }
  return { readings, endPpm: levelAfter(conditions, startPpm, minutes * 60) };
}

const CLOSED_EMPTY: Omit<Conditions, 'people'> = { windows: 'all-closed', doors: 'closed', fans: 'none', heating: 'on', combustion: false };

function room(partial: Partial<DocumentRoom> & Pick<DocumentRoom, 'name' | 'use' | 'geometry'>): DocumentRoom {
  return {
    id: id(),
    clientRef: '',
    ...blankRoomParts(),
    updatedAt: '2026-01-14T17:00:00Z',
    readings: [],
    ...partial,
  };
}

/** A box-shaped classroom with one exposed wall, the class and its teacher. */
function classroom(
  name: string,
  clientRef: string,
  areaId: string,
  [length_m, width_m, height_m]: [number, number, number],
  wall: Pick<ExposedWall, 'facing' | 'construction'>,
  occupants: OccupantGroupRecord[],
  rest: Partial<DocumentRoom> = {},
): DocumentRoom {
  return room({
    name,
    clientRef,
    areaId,
    use: 'classroom',
    geometry: { kind: 'box', length_m, width_m, height_m },
    exposedWalls: [{ id: id(), ...wall, length_m }],
    occupants,
    schedule: { template: 'classroom', periods: [] },
    ...rest,
  });
}

function window(partial: Partial<Extract<Opening, { type: 'window' }>>): Opening {
  return {
    type: 'window',
    id: id(),
    count: 1,
    condition: '',
    style: 'hinged',
    restrictor: 'no',
    operability: 'opens',
    ...partial,
  };
}

function header(partial: Partial<Survey> & Pick<Survey, 'title' | 'site' | 'buildingUse'>): Survey {
  const { title, site, buildingUse } = partial;
  return {
    ...newSurveyRecord({ title, site, buildingUse }, id(), '2026-01-14T08:00:00Z'),
    surveyors: [{ name: 'Demo Surveyor (invented)', qualifications: 'Invented for the demo' }],
    notes: 'INVENTED DATA for the Ventwalk demo: every name, place, person and reading here is made up.',
    updatedAt: '2026-01-14T17:00:00Z',
    ...partial,
  };
}

function designCases(): Survey['designWeather'] {
  return [
    { id: id(), name: 'Cold and calm', outdoorTemp_C: 0, windSpeed_ms: 1 },
    { id: id(), name: 'Cold and windy', outdoorTemp_C: 0, windSpeed_ms: 6, windFrom: 'SW' },
    { id: id(), name: 'Mild and calm', outdoorTemp_C: 12, windSpeed_ms: 1 },
  ];
}

function meter(model: string, serial: string): SurveyDocument['instruments'][number] {
  return {
    id: id(),
    model,
    serial,
    measures: ['co2', 'temperature', 'relative-humidity'],
    accuracy: [
      { quantity: 'co2', plusMinus: 50, percentOfReading: 3 },
      { quantity: 'temperature', plusMinus: 0.5, percentOfReading: 0 },
      { quantity: 'relative-humidity', plusMinus: 3, percentOfReading: 0 },
    ],
    calibratedOn: '2025-09-02',
    autoBaselineOff: true,
    checks: [],
    notes: '',
  };
}

// ---------------------------------------------------------------- school
function schoolSurvey(): SurveyDocument {
  const day = '2026-01-14';
  const outdoor = 430;
  const handheld = meter('Handheld CO₂ meter, demo model H (invented)', 'DEMO-H-0001');
  const logger = { ...meter('Wall logger, demo model L (invented)', 'DEMO-L-0042'), id: id() };
  logger.checks = [{ time: at(day, '07:50'), quantity: 'co2', referenceInstrumentId: handheld.id, reference: 'Side by side in the staff room', offset: 12, duration_s: 1200 }];
  const survey = header({
    title: 'Termly walk-round, Block B (demo, invented)',
    site: 'Thornwick Lane Primary School, Block B (invented)',
    client: 'Thornwick Lane estates team (invented)',
    buildingUse: 'school',
    purpose: 'Check that classrooms in the 1968 block get enough outdoor air in winter, and rank fixes.',
    scope: 'Block B classrooms B1, B2 and B3. Not seen: store rooms, plant room.',
    visits: [{ start: at(day, '07:45'), end: at(day, '16:30') }],
    ventilation: 'natural',
    stage: 'existing',
    construction: 'Concrete frame with brick infill, single-glazed steel windows replaced 1995 with double-glazed aluminium.',
    builtYear: 1968,
    storeys: 2,
    terrain: 'urban',
    shelter: 'normal',
    weather: { conditions: 'Overcast, dry, light wind from the south-west.', outdoorTemp_C: 4.5, outdoorRh_pct: 86, wind: 'light', windFrom: 'SW', rainInPreviousDays: true },
    outdoorReadings: [
      { id: id(), time: at(day, '08:05'), moment: 'start', co2_ppm: 428, temp_C: 4.2, rh_pct: 87, instrumentId: handheld.id, location: 'Playground, upwind of Block B' },
      { id: id(), time: at(day, '15:50'), moment: 'end', co2_ppm: 433, temp_C: 5.1, rh_pct: 84, instrumentId: handheld.id, location: 'Playground, upwind of Block B' },
    ],
    designWeather: designCases(),
  });
  const block = { id: id(), kind: 'block' as const, name: 'Block B (1968)', clientRef: 'B', notes: '' };
  const ground = { id: id(), parentId: block.id, kind: 'floor' as const, name: 'Ground floor', clientRef: 'B-G', notes: '' };
  const first = { id: id(), parentId: block.id, kind: 'floor' as const, name: 'First floor', clientRef: 'B-1', notes: '' };

  const pupils = () => group('Pupils, year 4', 28, '6-11', 'mixed', 1.2);
  const teacher = () => group('Teacher', 1, '30-40', 'female', 1.6);
  const LESSON: Omit<Conditions, 'people'> = { windows: 'all-closed', doors: 'closed', fans: 'none', heating: 'on', combustion: false };

  // B1: build-up in lesson 1, decay at break; one window seized shut.
  const b1Groups = [pupils(), teacher()];
  const b1Volume = 7.2 * 7.0 * 2.9;
  const b1 = { volume: b1Volume, groups: b1Groups, instrumentId: handheld.id, outdoor };
  const buildUp = readingsUnder(b1, { supply: 0.055, present: [28, 1], conditions: LESSON }, at(day, '09:00'), 50, 5, 640, { temp: 20.5, rh: 48 });
  const decay = readingsUnder(b1, { supply: 0.055, present: [0, 0], conditions: CLOSED_EMPTY }, at(day, '10:00'), 20, 2, buildUp.endPpm - 40, { temp: 20.2, rh: 46 });
  const seized = window({ count: 1, facing: 'SW', hinge: 'top', sashWidth_m: 0.9, sashHeight_m: 0.6, sillHeight_m: 1.9, headHeight_m: 2.5, openingAngle_deg: 0, operability: 'seized', condition: 'Paint-bound and hinge arms corroded; cannot be opened by hand.' });
  const roomB1 = classroom('Classroom B1', 'B.G.04', ground.id, [7.2, 7.0, 2.9], { facing: 'SW', construction: 'cavity-unfilled' }, b1Groups, {
    schedule: {
      template: 'classroom',
      periods: [
        { start: '08:40', end: '09:55', presence: 'full', label: 'Lesson 1' },
        { start: '09:55', end: '10:15', presence: 'airing', label: 'Break' },
        { start: '10:15', end: '12:25', presence: 'full', label: 'Lessons 2 and 3' },
        { start: '12:25', end: '13:20', presence: 'empty', label: 'Lunch' },
        { start: '13:20', end: '15:30', presence: 'full', label: 'Afternoon' },
      ],
    },
    openings: [
      window({ count: 3, facing: 'SW', hinge: 'top', sashWidth_m: 0.9, sashHeight_m: 0.6, sillHeight_m: 1.9, headHeight_m: 2.5, openingAngle_deg: 25, restrictor: 'yes', operability: 'restricted', condition: 'Restrictors limit the opening to about 100 mm.' }),
      seized,
      { type: 'undercut', id: id(), count: 1, condition: '', gap_m: 0.008, doorWidth_m: 0.9 },
    ],
    defects: [{ id: id(), kind: 'other', location: 'High-level window, right of the board', openingId: seized.id, notes: 'Window seized shut: one of four openable sashes lost.' }],
    interview: [
      { topic: 'Window habits', answer: 'Windows kept shut in winter because of draughts onto the front desks.' },
      { topic: 'Class size', answer: '28 pupils, one teacher; a teaching assistant some mornings.' },
    ],
    tests: [
      { id: id(), kind: 'build-up', readingIds: buildUp.readings.map((r) => r.id), note: 'Lesson 1, windows and door shut.' },
      { id: id(), kind: 'decay', readingIds: decay.readings.map((r) => r.id), note: 'Class out at break, windows and door shut.' },
    ],
    readings: [...buildUp.readings, ...decay.readings],
  });

  // B2: the 2005 refurbished room with trickle vents; one spot reading in lesson 3.
  const b2Groups = [pupils(), teacher()];
  const b2 = { volume: 8 * 7 * 2.7, groups: b2Groups, instrumentId: handheld.id, outdoor };
  const spot = readingsUnder(b2, { supply: 0.16, present: [28, 1], conditions: { ...LESSON, windows: 'some-open' } }, at(day, '11:40'), 0, 1, 1020, { temp: 21.2, rh: 44 });
  const roomB2 = classroom('Classroom B2', 'B.G.06', ground.id, [8, 7, 2.7], { facing: 'SW', construction: 'cavity-filled' }, b2Groups, {
    openings: [
      window({ count: 4, facing: 'SW', hinge: 'side', sashWidth_m: 0.6, sashHeight_m: 1.2, sillHeight_m: 0.9, headHeight_m: 2.1, openingAngle_deg: 30, restrictor: 'yes', operability: 'restricted', condition: 'Good.' }),
      { type: 'vent', id: id(), count: 4, facing: 'SW', condition: 'Open, clean.', kind: 'background-vent', purpose: 'room', labelArea_m2: 0.005, labelAreaIs: 'equivalent', operability: 'opens' },
    ],
    readings: spot.readings.map((r) => ({ ...r, note: 'Spot reading 40 minutes into lesson 3; two windows open about 50 mm.' })),
  });

  // B3: a logger over the school day at one-minute intervals.
  const b3Groups = [pupils(), teacher()];
  const roomB3 = classroom('Classroom B3', 'B.1.02', first.id, [7.2, 7, 2.9], { facing: 'NE', construction: 'cavity-unfilled' }, b3Groups, {
    geometry: { kind: 'parts', parts: [{ kind: 'box', length_m: 7.2, width_m: 7, height_m: 2.9 }, { kind: 'area', floorArea_m2: 4.5, height_m: 2.4 }] },
    openings: [window({ count: 4, facing: 'NE', hinge: 'bottom', sashWidth_m: 0.9, sashHeight_m: 0.5, sillHeight_m: 2.0, headHeight_m: 2.5, openingAngle_deg: 20, operability: 'opens' })],
    notes: 'Logger on the back wall at 1.1 m, away from windows and radiators, 08:00-16:00.',
  });
  const series = schoolDayLog(roomB3.id, logger.id, 7.2 * 7 * 2.9 + 4.5 * 2.4, b3Groups, outdoor, day);
  return {
    survey,
    instruments: [handheld, logger],
    areas: [block, ground, first],
    rooms: [roomB1, roomB2, roomB3],
    series: [series],
    photos: [],
    photosLeftOut: false,
  };
}

/** A school day in B3: lessons with windows shut, breaks aired, empty after 15:30 (decay). */
function schoolDayLog(roomId: string, instrumentId: string, volume: number, groups: OccupantGroupRecord[], outdoor: number, day: string): LoggerSeries {
  const plan: [string, number, number[]][] = [
    ['08:00', 0.02, [0, 0]],
    ['08:40', 0.06, [28, 1]],
    ['09:55', 0.35, [0, 0]],
    ['10:15', 0.06, [28, 1]],
    ['12:25', 0.25, [0, 0]],
    ['13:20', 0.06, [28, 1]],
    ['15:30', 0.03, [0, 0]],
    ['16:00', 0.03, [0, 0]],
  ];
  const start = Date.parse(at(day, '08:00'));
  const times: number[] = [];
  const co2: number[] = [];
  const temp: number[] = [];
  const rh: number[] = [];
  let level = 470;
  for (let p = 0; p < plan.length - 1; p += 1) {
    const [from, supply, present] = plan[p]!;
    const to = plan[p + 1]![0];
    const minutes = (Date.parse(at(day, to)) - Date.parse(at(day, from))) / 60_000;
    const c: BalanceConditions = { volume_m3: volume, supply_m3s: supply, outdoor_ppm: outdoor, source_m3s: output(groups, present) };
    const offset = (Date.parse(at(day, from)) - start) / 60_000;
    for (let m = 0; m < minutes; m += 1) {
      times.push(start + (offset + m) * 60_000);
      co2.push(round(levelAfter(c, level, m * 60) + jitter(10), 1));
      temp.push(round((present[0]! > 0 ? 21 : 19.5) + jitter(0.2), 0.1));
      rh.push(round((present[0]! > 0 ? 47 : 42) + jitter(1), 1));
    }
    level = levelAfter(c, level, minutes * 60);
  }
  return {
    id: id(),
    roomId,
    instrumentId,
    sourceFile: 'B3-logger-2026-01-14.csv',
    columns: { time: 'Date/Time', co2: 'CO2 (ppm)', temperature: 'Temp (C)', relativeHumidity: 'RH (%)' },
    timeZone: 'Europe/London',
    times_ms: times,
    co2_ppm: co2,
    temp_C: temp,
    rh_pct: rh,
    periods: [
      { id: id(), kind: 'build-up', start_ms: Date.parse(at(day, '08:40')), end_ms: Date.parse(at(day, '09:55')) - 60_000, note: 'Lesson 1, windows shut.' },
      { id: id(), kind: 'decay', start_ms: Date.parse(at(day, '15:30')), end_ms: Date.parse(at(day, '16:00')) - 60_000, note: 'Room empty after school, door shut.' },
    ],
  };
}

// ---------------------------------------------------------------- flats
function flatsSurvey(): SurveyDocument {
  const day = '2026-01-21';
  const outdoor = 435;
  const handheld = meter('Handheld CO₂ meter, demo model H (invented)', 'DEMO-H-0001');
  const anemometer: SurveyDocument['instruments'][number] = {
    id: id(),
    model: 'Vane anemometer with flow cone, demo model V (invented)',
    serial: 'DEMO-V-0007',
    measures: ['airflow', 'air-speed'],
    accuracy: [{ quantity: 'airflow', plusMinus: 0.001, percentOfReading: 5 }],
    calibratedOn: '2025-06-18',
    checks: [],
    notes: '',
  };
  const survey = header({
    title: 'Damp and mould inspection, flats 3 and 7 (demo, invented)',
    site: 'Calder Rise, Larkhill Road (invented)',
    client: 'Calder Rise Housing Co-operative (invented)',
    buildingUse: 'dwelling',
    purpose: 'Tenant reports of mould (flat 3) and a bathroom fan that does not run (flat 7).',
    scope: 'Flats 3 and 7: every room. Non-intrusive; no gas or electrical inspection.',
    visits: [{ start: at(day, '09:30'), end: at(day, '13:15') }],
    ventilation: 'natural',
    stage: 'existing',
    construction: 'Solid brick walls (1930s), uPVC double glazing fitted 2008, trickle vents in most frames.',
    builtYear: 1934,
    storeys: 3,
    terrain: 'urban',
    shelter: 'sheltered',
    weather: { conditions: 'Cold, clear, calm after two wet days.', outdoorTemp_C: 3, outdoorRh_pct: 90, wind: 'calm', rainInPreviousDays: true },
    outdoorReadings: [
      { id: id(), time: at(day, '09:25'), moment: 'start', co2_ppm: 437, temp_C: 2.8, rh_pct: 91, instrumentId: handheld.id, location: 'Front path, 3 m from the building' },
      { id: id(), time: at(day, '13:20'), moment: 'end', co2_ppm: 432, temp_C: 4.0, rh_pct: 86, instrumentId: handheld.id, location: 'Front path, 3 m from the building' },
    ],
    designWeather: designCases(),
  });

  const flat3 = {
    id: id(),
    kind: 'flat' as const,
    name: 'Flat 3',
    clientRef: 'CR-03',
    dwelling: { bedrooms: 2, floorArea_m2: 58, usualOccupants: 3, system: { kind: 'intermittent-extract' as const, mode: 'Fans on light switches', running: 'yes' as const, terminals: [], notes: '' } },
    notes: '',
  };
  const flat7 = {
    id: id(),
    kind: 'flat' as const,
    name: 'Flat 7',
    clientRef: 'CR-07',
    dwelling: { bedrooms: 1, floorArea_m2: 44, usualOccupants: 2 },
    notes: '',
  };

  // Flat 3, bedroom 1: mould on the cold corner, trickle vents shut, seeded decay (occupants out).
  const sleepers = [group('Adults', 2, '30-40', 'mixed', 0.95)];
  const trickle = { type: 'vent' as const, id: id(), count: 1, facing: 'N' as const, condition: 'Closed; tenant keeps it shut.', kind: 'background-vent' as const, purpose: 'room' as const, labelArea_m2: 0.0025, labelAreaIs: 'free' as const, operability: 'opens' as const };
  const bedroom = { volume: 3.6 * 3.2 * 2.6, groups: sleepers, instrumentId: handheld.id, outdoor };
  const seededDecay = readingsUnder(bedroom, { supply: 0.0045, present: [0], conditions: { ...CLOSED_EMPTY, heating: 'off' } }, at(day, '10:05'), 40, 4, 2650, { temp: 17.8, rh: 66 });
  seededDecay.readings[0]!.note = 'CO₂ released from a small cylinder with a desk fan to mix, then the fan stopped and the door shut.';
  const mould = { id: id(), kind: 'mould' as const, location: 'North-east corner, ceiling to skirting', extent_m2: 0.6, pattern: 'external-corners' as const, notes: 'Black spotting, worst at the ceiling junction.' };
  const bedroom1 = room({
    name: 'Bedroom 1',
    areaId: flat3.id,
    use: 'bedroom',
    geometry: { kind: 'box', length_m: 3.6, width_m: 3.2, height_m: 2.6 },
    exposedWalls: [
      {
        id: id(),
        facing: 'N',
        construction: 'solid-masonry',
        length_m: 3.6,
        measured: { time: at(day, '10:00'), insideAir_C: 17.8, outsideAir_C: 3.0, surface_C: 9.9, factor: 0.47, location: 'North-east corner, 0.3 m below the ceiling' },
      },
    ],
    occupants: sleepers,
    schedule: { template: 'bedroom', periods: [{ start: '22:30', end: '07:00', presence: 'full', label: 'Asleep' }] },
    openings: [window({ count: 1, facing: 'N', hinge: 'side', sashWidth_m: 0.55, sashHeight_m: 1.0, sillHeight_m: 0.9, headHeight_m: 2.1, openingAngle_deg: 45, operability: 'opens' }), trickle],
    defects: [mould, { id: id(), kind: 'vent-shut', location: 'Window head', openingId: trickle.id, notes: '' }, { id: id(), kind: 'condensation', location: 'Window glass, lower third', notes: 'Water on the sill in the morning (tenant).' }],
    interview: [
      { topic: 'When the mould started', answer: 'Last winter; cleaned in spring; back since November.' },
      { topic: 'Why vents are shut', answer: 'Cold draught onto the bed.' },
      { topic: 'Heating', answer: 'Radiator on a timer 06:00-08:00 and 17:00-22:00; bedroom door closed at night.' },
      { topic: 'Drying laundry', answer: 'On an airer in the living room most days.' },
    ],
    tests: [{ id: id(), kind: 'seeded-decay', readingIds: seededDecay.readings.map((r) => r.id), note: 'Seeded to about 2,650 ppm; room empty, door and window shut, vent shut.' }],
    readings: seededDecay.readings,
  });
  const living = { volume: 4.5 * 3.8 * 2.6, groups: [group('Adults', 2, '30-40', 'mixed', 1.2)], instrumentId: handheld.id, outdoor };
  const livingSpot = readingsUnder(living, { supply: 0.012, present: [2], conditions: { ...CLOSED_EMPTY, windows: 'all-closed' } }, at(day, '11:10'), 0, 1, 960, { temp: 20.1, rh: 61 });
  const livingRoom = room({
    name: 'Living room',
    areaId: flat3.id,
    use: 'living-room',
    geometry: { kind: 'box', length_m: 4.5, width_m: 3.8, height_m: 2.6 },
    exposedWalls: [{ id: id(), facing: 'S', construction: 'solid-masonry', length_m: 4.5 }],
    occupants: living.groups,
    schedule: { template: 'living-room', periods: [] },
    openings: [window({ count: 2, facing: 'S', hinge: 'side', sashWidth_m: 0.55, sashHeight_m: 1.1, sillHeight_m: 0.9, headHeight_m: 2.1, openingAngle_deg: 45, operability: 'opens' })],
    readings: livingSpot.readings.map((r) => ({ ...r, note: 'Two adults in the room for the last hour; laundry drying on an airer.' })),
  });

  // Flat 7: bathroom fan dead; kitchen with an open-flued boiler.
  const deadFan: Opening = { type: 'fan', id: id(), count: 1, condition: 'Does not start; no run-on.', direction: 'extract', ratedFlow_m3s: 0.015, measuredFlow_m3s: 0, measuredWith: anemometer.id, humidistat: 'no', isolator: 'on', ducting: 'through-wall' };
  const bathroom = room({
    name: 'Bathroom',
    areaId: flat7.id,
    use: 'wet-room',
    geometry: { kind: 'box', length_m: 2.2, width_m: 1.9, height_m: 2.4 },
    openings: [deadFan, { type: 'undercut', id: id(), count: 1, condition: '', gap_m: 0.012, doorWidth_m: 0.7 }],
    defects: [
      { id: id(), kind: 'fan-dead', location: 'Ceiling fan over the bath', openingId: deadFan.id, notes: 'No airflow with the light on; isolator on.' },
      { id: id(), kind: 'mould', location: 'Ceiling above the bath', extent_m2: 0.3, pattern: 'ceiling-edge', notes: '' },
    ],
    interview: [{ topic: 'Fan use', answer: 'Stopped working in the autumn; reported twice.' }],
  });
  const kitchenGroups = [group('Adult cooking', 1, '40-50', 'female', 1.8)];
  const kitchenRoom = { volume: 3.0 * 2.6 * 2.4, groups: kitchenGroups, instrumentId: handheld.id, outdoor };
  const kitchenSpot = readingsUnder(kitchenRoom, { supply: 0.018, present: [1], conditions: { windows: 'all-closed', doors: 'closed', fans: 'on', heating: 'on', combustion: false } }, at(day, '12:20'), 0, 1, 720, { temp: 21.5, rh: 58 });
  const kitchen = room({
    name: 'Kitchen',
    areaId: flat7.id,
    use: 'kitchen',
    geometry: { kind: 'box', length_m: 3.0, width_m: 2.6, height_m: 2.4 },
    occupants: kitchenGroups,
    openings: [
      { type: 'fan', id: id(), count: 1, condition: 'Runs; some noise.', direction: 'extract', ratedFlow_m3s: 0.03, measuredFlow_m3s: 0.018, measuredWith: anemometer.id, runOn_s: 0, humidistat: 'no', isolator: 'on', ducting: 'ducted' },
      { type: 'vent', id: id(), count: 1, facing: 'E', condition: 'Half covered by a fridge-freezer and stuffed with paper.', kind: 'air-brick', purpose: 'combustion-air', labelArea_m2: 0.0065, labelAreaIs: 'unknown', operability: 'blocked' },
      window({ count: 1, facing: 'E', hinge: 'side', sashWidth_m: 0.5, sashHeight_m: 0.9, sillHeight_m: 1.05, headHeight_m: 2.0, openingAngle_deg: 40 }),
    ],
    appliances: [
      { id: id(), kind: 'gas-boiler', flue: 'open-flued', combustionAirVentPresent: 'yes', combustionAirVentClear: 'no', coAlarmPresent: 'yes', coAlarmTested: 'yes', gasSafetyRecordSeen: 'no', notes: 'Wall-hung boiler in the corner cupboard. Refer to a registered gas engineer: blocked combustion-air vent beside an extract fan.' },
    ],
    readings: kitchenSpot.readings.map((r) => ({ ...r, note: 'Kettle boiled; hob off.' })),
  });
  return {
    survey,
    instruments: [handheld, anemometer],
    areas: [flat3, flat7],
    rooms: [bedroom1, livingRoom, bathroom, kitchen],
    series: [],
    photos: [],
    photosLeftOut: false,
  };
}

// ---------------------------------------------------------------- office
function officeSurvey(): SurveyDocument {
  const day = '2026-02-03';
  const outdoor = 440;
  const handheld = meter('Handheld CO₂ meter, demo model H (invented)', 'DEMO-H-0002');
  const survey = header({
    title: 'Second-floor office review (demo, invented)',
    site: 'Mercer Yard, 12 Ropewalk Street, second floor (invented)',
    client: 'Mercer Yard Lettings (invented)',
    buildingUse: 'office',
    purpose: 'Staff report stuffiness in the afternoons; check outdoor air per person.',
    scope: 'Second floor: open-plan office and meeting room 2.03.',
    visits: [{ start: at(day, '08:15'), end: at(day, '12:30') }],
    ventilation: 'mechanical',
    stage: 'refurbished',
    construction: 'Steel frame, curtain walling with no opening lights; ceiling supply diffusers from a rooftop air handler (2015 refit).',
    builtYear: 1989,
    storeys: 5,
    terrain: 'city-centre',
    shelter: 'normal',
    weather: { conditions: 'Mild, showers.', outdoorTemp_C: 9, outdoorRh_pct: 78, wind: 'moderate', windFrom: 'W' },
    outdoorReadings: [
      { id: id(), time: at(day, '08:10'), moment: 'start', co2_ppm: 438, temp_C: 8.6, rh_pct: 80, instrumentId: handheld.id, location: 'Roof terrace, upwind of the air handler intake' },
      { id: id(), time: at(day, '12:35'), moment: 'end', co2_ppm: 436, temp_C: 9.8, rh_pct: 76, instrumentId: handheld.id, location: 'Roof terrace' },
    ],
    designWeather: designCases(),
  });
  const floor = { id: id(), kind: 'floor' as const, name: 'Second floor', clientRef: 'L2', notes: '' };
  const staff = [group('Office staff', 36, '30-40', 'mixed', 1.3)];
  const open = { volume: 24 * 12 * 2.7, groups: staff, instrumentId: handheld.id, outdoor };
  const office = { windows: 'none', doors: 'closed', fans: 'on', heating: 'on', combustion: false } as const;
  const arrivals = readingsUnder(open, { supply: 0.3, present: [36], conditions: office }, at(day, '09:00'), 150, 15, 520, { temp: 22, rh: 38 });
  const openPlan = room({
    name: 'Open-plan office',
    clientRef: '2.01',
    areaId: floor.id,
    use: 'office',
    geometry: { kind: 'box', length_m: 24, width_m: 12, height_m: 2.7 },
    occupants: staff,
    schedule: { template: 'office', periods: [] },
    openings: [
      { type: 'fan', id: id(), count: 12, condition: 'Ceiling supply diffusers; flow not measured (no hood on site).', direction: 'supply', ratedFlow_m3s: 0.03, humidistat: 'no', isolator: 'none', ducting: 'ducted' },
    ],
    tests: [{ id: id(), kind: 'build-up', readingIds: arrivals.readings.map((r) => r.id), note: 'From 09:00 with 36 at desks.' }],
    readings: arrivals.readings,
  });
  const meetingGroups = [group('Meeting', 8, '30-40', 'mixed', 1.2)];
  const meeting = { volume: 5 * 4 * 2.7, groups: meetingGroups, instrumentId: handheld.id, outdoor };
  const afterMeeting = readingsUnder(meeting, { supply: 0.022, present: [0], conditions: office }, at(day, '11:05'), 30, 3, 1720, { temp: 23.1, rh: 41 });
  const meetingRoom = room({
    name: 'Meeting room',
    clientRef: '2.03',
    areaId: floor.id,
    use: 'meeting-room',
    geometry: { kind: 'box', length_m: 5, width_m: 4, height_m: 2.7 },
    occupants: meetingGroups,
    openings: [{ type: 'fan', id: id(), count: 1, condition: 'One supply diffuser.', direction: 'supply', ratedFlow_m3s: 0.025, humidistat: 'no', isolator: 'none', ducting: 'ducted' }],
    tests: [{ id: id(), kind: 'decay', readingIds: afterMeeting.readings.map((r) => r.id), note: 'After an hour-long meeting of eight.' }],
    readings: afterMeeting.readings,
  });
  return { survey, instruments: [handheld], areas: [floor], rooms: [openPlan, meetingRoom], series: [], photos: [], photosLeftOut: false };
}

/** The demo file: three invented surveys. */
export function buildDemoSurveyFile(): SurveyFile {
  return makeSurveyFile([schoolSurvey(), flatsSurvey(), officeSurvey()], '2026-02-03T17:00:00Z', 'demo');
}
