/**
 * Room lists from estates spreadsheets (invented schools and flats): columns guessed from their
 * names with units in the headers, decimal commas, rows left out with their line, column and
 * problem, and empty cells never read as 0.
 */
import { describe, it, expect } from 'vitest';
import { readRoomList, type RoomListOptions } from '../../src/ingest/room-list.ts';
import { roomUseFromText } from '../../src/ingest/room-use-text.ts';
import { roomFloorArea, roomVolume } from '../../src/model/room-geometry.ts';
import { surveyDocumentSchema } from '../../src/model/survey-document.ts';
import type { Area } from '../../src/model/area.ts';
import { demoFile } from '../support/fixtures.ts';
import { approxEqual } from '../support/approx-equal.ts';

function options(extra: Partial<RoomListOptions> = {}): RoomListOptions {
  let n = 0;
  return { newId: () => `b0000000-0000-4000-8000-${(++n).toString(16).padStart(12, '0')}`, now: '2026-02-01T09:00:00Z', ...extra };
}

function read(text: string, extra: Partial<RoomListOptions> = {}) {
  const result = readRoomList(text, options(extra));
  if (result.status !== 'read') throw new Error(result.error);
  return result;
}

const GOOD = [
  'Hollowmere Academy room schedule (invented),,,,,,',
  'Block,Room,Room no.,Use,Floor area (m²),Height (m),Pupils',
  'North Block / Ground floor,Classroom N1,N.G.01,Classroom,56.4,2.7,30',
  'North Block / Ground floor,Classroom N2,N.G.02,Classroom,54,2.7,28',
  'North Block / First floor,Science lab,N.1.01,Science lab,72.5,3.1,',
  'North Block,Sports hall,N.0.10,Sports hall,320,7.5,60',
  '',
].join('\n');

describe('room list import: a good file', () => {
  it('reads every room with its area, number, use, size, height and occupants', () => {
    const result = read(GOOD);
    expect(result.problems).toEqual([]);
    expect(result.report).toMatchObject({ delimiter: ',', headerLine: 2, rowsRead: 4 });
    expect(result.rooms.map((r) => [r.name, r.clientRef, r.use])).toEqual([
      ['Classroom N1', 'N.G.01', 'classroom'],
      ['Classroom N2', 'N.G.02', 'classroom'],
      ['Science lab', 'N.1.01', 'classroom'],
      ['Sports hall', 'N.0.10', 'hall'],
    ]);
    expect(result.rooms[0]!.geometry).toEqual({ kind: 'area', floorArea_m2: 56.4, height_m: 2.7 });
    expect(result.rooms.map((r) => r.occupants.map((g) => g.count))).toEqual([[30], [28], [], [60]]);
  });

  it('nests "Block / Floor" areas and reuses an area by name', () => {
    const result = read(GOOD);
    const byId = new Map(result.areas.map((a) => [a.id, a]));
    expect(result.areas.map((a) => [a.name, a.kind, a.parentId ? byId.get(a.parentId)!.name : null])).toEqual([
      ['North Block', 'block', null],
      ['Ground floor', 'floor', 'North Block'],
      ['First floor', 'floor', 'North Block'],
    ]);
    expect(byId.get(result.rooms[3]!.areaId!)!.name).toBe('North Block');
    const existing: Area = { id: 'c0000000-0000-4000-8000-000000000001', kind: 'block', name: 'north block', clientRef: '', notes: '' };
    const again = read(GOOD, { existingAreas: [existing] });
    expect(again.areas.map((a) => a.name)).toEqual(['Ground floor', 'First floor']);
    expect(again.rooms[3]!.areaId).toBe(existing.id);
  });

  it('gives rooms and areas that make a valid survey with the demo school', () => {
    const doc = structuredClone(demoFile().surveys[0]!);
    const result = read(GOOD);
    doc.areas.push(...result.areas);
    doc.rooms.push(...result.rooms.map((r) => ({ ...r, readings: [] })));
    expect(surveyDocumentSchema.safeParse(doc).success).toBe(true);
  });

  it('reports each column it guessed, with its role, unit and preview', () => {
    const { report } = read(GOOD);
    expect(report.columns.map((c) => [c.name, c.role, c.unit])).toEqual([
      ['Block', 'area', ''],
      ['Room', 'room', ''],
      ['Room no.', 'client-ref', ''],
      ['Use', 'use', ''],
      ['Floor area (m²)', 'floor-area', 'm²'],
      ['Height (m)', 'height', 'm'],
      ['Pupils', 'occupants', ''],
    ]);
    expect(report.columns[1]!.preview.slice(0, 2)).toEqual(['Classroom N1', 'Classroom N2']);
  });
});

describe('room list import: decimal commas, units and dimensions', () => {
  it('reads a semicolon file with decimal commas, and room numbers with points do not confuse it', () => {
    const text = 'Room;Room no.;Use;Length (m);Width (m);Height (m);Occupants\nRoom 1;2.01;Office;7,2;6,5;2,75;8\nRoom 2;2.02;Meeting room;4,0;3,5;2,75;\n';
    const result = read(text);
    expect(result.report).toMatchObject({ delimiter: ';', decimalSeparator: ',' });
    expect(result.rooms[0]!.geometry).toEqual({ kind: 'box', length_m: 7.2, width_m: 6.5, height_m: 2.75 });
    expect(result.rooms[0]!.clientRef).toBe('2.01');
    approxEqual(roomVolume(result.rooms[0]!.geometry), 7.2 * 6.5 * 2.75, { rel: 1e-12 });
  });

  it('converts units written in the header (mm, cm, ft, ft²) to metres', () => {
    const text = 'Room,Use,Length (mm),Width [cm],Height ft\nA,office,7200,650,9\n';
    const geometry = read(text).rooms[0]!.geometry;
    expect(geometry.kind).toBe('box');
    if (geometry.kind !== 'box') return;
    approxEqual(geometry.length_m, 7.2, { rel: 1e-12 });
    approxEqual(geometry.width_m, 6.5, { rel: 1e-12 });
    approxEqual(geometry.height_m, 9 * 0.3048, { rel: 1e-12 }); // 1 ft = 0.3048 m exactly (international foot)
    approxEqual(roomFloorArea(read('Room,Use,Floor area (sq ft),Height (m)\nB,office,100,2.6\n').rooms[0]!.geometry), 100 * 0.3048 ** 2, { rel: 1e-12 });
  });

  it('reads a "7,2 x 6,5" dimensions cell and says when it read unitless lengths as millimetres', () => {
    const result = read('Room;Use;Size;Height\nA;bedroom;3,6 x 3,1;2400\n');
    expect(result.rooms[0]!.geometry).toMatchObject({ kind: 'box', length_m: 3.6, width_m: 3.1 });
    approxEqual((result.rooms[0]!.geometry as { height_m: number }).height_m, 2.4, { rel: 1e-12 });
    expect(result.report.notes.join(' ')).toMatch(/"Height" has no unit .* read as millimetres/);
  });

  it('refuses a unit it cannot read, naming the column', () => {
    const result = readRoomList('Room,Use,Floor area (acres),Height (m)\nA,office,1,2.6\n', options());
    expect(result).toMatchObject({ status: 'failed', error: expect.stringMatching(/Column "Floor area \(acres\)": the unit "acres" is not one Ventwalk reads/) });
  });
});

describe('room list import: bad rows, by line and column', () => {
  const BAD = [
    'Area;Room;Use;Floor area (m²);Height (m);Occupants',
    'Flat 3;Bedroom 1;Bedroom;11,2;2,4;2',
    'Flat 3;;Living room;16;2,4;3', // line 3: no name
    'Flat 3;Kitchen;Kitchen;8,5;;1', // line 4: no height (never 0)
    'Flat 3;Box room;Plant room;4;2,4;', // line 5: unknown use
    'Flat 7;Bedroom 1;Bedroom;abc;2,4;1', // line 6: not a number
    'Flat 7;Bathroom;Bathroom;4,1;0,9;', // line 7: height out of the model's range
    'Flat 7;Bedroom 2;Bedroom;9;2,4;1,5', // line 8: half a person
    'Flat 7;Living room;Living room;15;2,4;2',
  ].join('\n');

  it('keeps the good rows and lists each bad one with its line, column and problem', () => {
    const result = read(BAD);
    expect(result.rooms.map((r) => r.name)).toEqual(['Bedroom 1', 'Living room']);
    expect(result.problems).toEqual([
      { line: 3, column: 'Room', problem: 'The room name is empty' },
      { line: 4, column: 'Height (m)', problem: 'The height is empty: a room needs its height' },
      { line: 5, column: 'Use', problem: expect.stringMatching(/^The use "Plant room" is not one Ventwalk knows/) },
      { line: 6, column: 'Floor area (m²)', problem: 'The floor area "abc" is not a number' },
      { line: 7, column: 'Height (m)', problem: 'Room height must be between 1.5 and 30 m (found "0,9")' },
      { line: 8, column: 'Occupants', problem: 'The occupants "1,5" is not a whole number of people' },
    ]);
    expect(result.report.rowsRead).toBe(8);
    // Every row is a room or a problem: nothing lost without a word.
    expect(result.rooms.length + new Set(result.problems.map((p) => p.line)).size).toBe(result.report.rowsRead);
  });

  it('never turns an empty cell into 0', () => {
    const result = read(BAD);
    expect(result.rooms.every((r) => r.occupants.every((g) => g.count > 0))).toBe(true);
    expect(JSON.stringify(result.rooms)).not.toMatch(/"height_m":0\b|"floorArea_m2":0\b/);
  });

  it('makes areas only for rooms that were kept', () => {
    expect(read(BAD).areas.map((a) => a.name)).toEqual(['Flat 3', 'Flat 7']);
  });

  it('uses the surveyor’s choice of use for empty use cells, and lets them change a column', () => {
    const text = 'Room,Function,Floor area (m2),Height (m)\nA,,20,2.5\n';
    expect(readRoomList(text, options())).toMatchObject({ status: 'read', problems: [{ line: 2, column: 'Function', problem: 'The room use is empty' }] });
    expect(read(text, { defaultUse: 'office' }).rooms[0]!.use).toBe('office');
    const swapped = read('Room,Notes,Floor area (m2),Height (m)\nA,classroom,20,2.5\n', { columns: { 1: 'use' } });
    expect(swapped.rooms[0]!.use).toBe('classroom');
  });

  it('says clearly what a file lacks', () => {
    expect(readRoomList('', options())).toMatchObject({ status: 'failed', error: 'The file is empty.' });
    expect(readRoomList('just one column\nand another line\n', options())).toMatchObject({ status: 'failed' });
    expect(readRoomList('Colour,Shape,Smell\nred,1,2\nblue,3,4\n', options())).toMatchObject({ status: 'failed', error: expect.stringMatching(/No header line naming the columns/) });
    expect(readRoomList('Room,Use,Floor area (m²)\nA,office,20\n', options())).toMatchObject({ status: 'failed', error: expect.stringMatching(/no column for the height/) });
  });

  it('reads bytes, including a Windows-1252 file with a ² in the header', () => {
    const bytes = Uint8Array.from([...'Room;Use;Floor area (m'].map((c) => c.charCodeAt(0)).concat([0xb2], [...');Height (m)\nA;office;20,5;2,6\n'].map((c) => c.charCodeAt(0))));
    const result = readRoomList(bytes, options());
    expect(result).toMatchObject({ status: 'read', report: { encoding: 'windows-1252' } });
    if (result.status === 'read') expect(result.rooms[0]!.geometry).toEqual({ kind: 'area', floorArea_m2: 20.5, height_m: 2.6 });
  });
});

describe('room use words', () => {
  it.each([
    ['Classroom', 'classroom'],
    ['wet-room', 'wet-room'],
    ['Dining hall', 'hall'],
    ['Dining room', 'living-room'],
    ['W.C.', 'toilet'],
    ['En-suite', 'wet-room'],
    ['Staff room', 'office'],
    ['Stairs', 'circulation'],
    ['Plant room', null],
  ])('%s → %s', (text, use) => expect(roomUseFromText(text)).toBe(use));
});
