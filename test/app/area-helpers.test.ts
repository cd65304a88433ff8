/**
 * The rules behind the area screen: which areas may hold an area (never itself or one inside
 * it), which rooms it holds, flows typed in L/s and stored in m³/s, dwelling facts created when
 * first needed and set aside when the kind is not a home, the rooms' floor areas added, and the
 * area's check with problems naming the field (a terminal's flow in L/s).
 */
import { describe, it, expect } from 'vitest';
import { areasWithin, parentChoices, roomsWithin } from '../../src/app/area-tree.ts';
import { flowShown, flowStored } from '../../src/app/flow-entry.ts';
import { changeKind, dwellingOf, floorAreaOfRooms, holdsDwelling, newTerminal, systemOf } from '../../src/app/dwelling-edits.ts';
import { checkArea } from '../../src/app/area-problems.ts';
import { areaRemovalPlan } from '../../src/model/area-removal.ts';
import type { Area } from '../../src/model/area.ts';
import { approxEqual } from '../support/approx-equal.ts';

const uuid = (n: number) => `0c0c0000-0000-4000-8000-${n.toString().padStart(12, '0')}`;
const area = (n: number, kind: Area['kind'], parent?: number): Area => ({
  id: uuid(n),
  kind,
  name: `Area ${n}`,
  clientRef: '',
  notes: '',
  ...(parent === undefined ? {} : { parentId: uuid(parent) }),
});
// Block 1 ⊃ Floor 2 ⊃ (Flat 3, Flat 4); Block 5 apart.
const areas = [area(1, 'block'), area(2, 'floor', 1), area(3, 'flat', 2), area(4, 'flat', 2), area(5, 'block')];
const box = (l: number, w: number) => ({ kind: 'box' as const, length_m: l, width_m: w, height_m: 2.4 });
const rooms = [
  { id: uuid(11), areaId: uuid(3), geometry: box(3.6, 3.2) },
  { id: uuid(12), areaId: uuid(3), geometry: { kind: 'area' as const, floorArea_m2: 14.36, height_m: 2.4 } },
  { id: uuid(13), areaId: uuid(4), geometry: box(3, 3) },
  { id: uuid(14), geometry: box(2, 2) },
];

describe('areas inside areas', () => {
  it('finds every area inside one, at any depth', () => {
    expect(areasWithin(areas, uuid(1))).toEqual(new Set([uuid(1), uuid(2), uuid(3), uuid(4)]));
    expect(areasWithin(areas, uuid(3))).toEqual(new Set([uuid(3)]));
  });

  it('offers as parent every area but itself and those inside it', () => {
    expect(parentChoices(areas, uuid(2)).map((a) => a.id)).toEqual([uuid(1), uuid(5)]);
    expect(parentChoices(areas, uuid(1)).map((a) => a.id)).toEqual([uuid(5)]);
    expect(parentChoices(areas, uuid(3)).map((a) => a.id)).toEqual([uuid(1), uuid(2), uuid(4), uuid(5)]);
  });

  it('lists the rooms of an area and of the areas inside it', () => {
    expect(roomsWithin(areas, rooms, uuid(3)).map((r) => r.id)).toEqual([uuid(11), uuid(12)]);
    expect(roomsWithin(areas, rooms, uuid(2)).map((r) => r.id)).toEqual([uuid(11), uuid(12), uuid(13)]);
    expect(roomsWithin(areas, rooms, uuid(5))).toEqual([]);
  });

  it('plans a removal: rooms and inner areas go to the parent, or to no area at the top', () => {
    expect(areaRemovalPlan(areas, rooms, uuid(2))).toEqual({ parentId: uuid(1), roomIds: [], areaIds: [uuid(3), uuid(4)] });
    expect(areaRemovalPlan(areas, rooms, uuid(3))).toEqual({ parentId: uuid(2), roomIds: [uuid(11), uuid(12)], areaIds: [] });
    expect(areaRemovalPlan(areas, rooms, uuid(1))).toEqual({ parentId: undefined, roomIds: [], areaIds: [uuid(2)] });
    expect(areaRemovalPlan(areas, rooms, uuid(99))).toBeUndefined();
  });
});

describe('a flow typed in L/s', () => {
  it('is stored in m³/s and shown back as typed, without binary noise', () => {
    // 1 L = 10⁻³ m³ (SI Brochure, 9th edition, Table 8: the litre).
    approxEqual(flowStored(12.3)!, 0.0123, { abs: 1e-15 });
    expect(flowShown(0.0123)).toBe(12.3);
    expect(flowShown(flowStored(8.7))).toBe(8.7);
    expect(flowStored(0)).toBe(0);
  });

  it('stays empty when empty, never 0', () => {
    expect(flowStored(undefined)).toBeUndefined();
    expect(flowShown(undefined)).toBeUndefined();
  });
});

describe('dwelling facts', () => {
  it('only a flat or a house holds them', () => {
    expect(['block', 'floor', 'flat', 'house', 'wing', 'other'].filter((k) => holdsDwelling(k as Area['kind']))).toEqual(['flat', 'house']);
  });

  it('creates the dwelling and its system when first needed, as none and not checked', () => {
    const a = area(3, 'flat');
    dwellingOf(a).bedrooms = 2;
    expect(a.dwelling).toEqual({ bedrooms: 2 });
    systemOf(a).terminals.push({ ...newTerminal('supply'), flow_m3s: 0.01 });
    expect(a.dwelling!.system).toEqual({ kind: 'none', mode: '', running: 'not-checked', terminals: [{ location: '', direction: 'supply', setting: 'normal', flow_m3s: 0.01 }], notes: '' });
    expect(checkArea(a).ok).toBe(true);
  });

  it('takes the facts off when the kind is not a home, and puts them back when it is again', () => {
    const a = area(3, 'flat');
    a.dwelling = { bedrooms: 2, floorArea_m2: 58 };
    const setAside = changeKind(a, 'floor');
    expect(a.kind).toBe('floor');
    expect(a.dwelling).toBeUndefined();
    expect(setAside).toEqual({ bedrooms: 2, floorArea_m2: 58 });
    // Still set aside through another kind that is not a home.
    const still = changeKind(a, 'wing', setAside);
    expect(still).toBe(setAside);
    expect(changeKind(a, 'house', still)).toBeUndefined();
    expect(a).toMatchObject({ kind: 'house', dwelling: { bedrooms: 2, floorArea_m2: 58 } });
  });

  it('adds up its rooms’ floor areas to 0.1 m², and has nothing to add without rooms', () => {
    // 3.6 × 3.2 = 11.52 m², + 14.36 m² = 25.88 m² → 25.9 m² (invented rooms: plumbing check).
    expect(floorAreaOfRooms(roomsWithin(areas, rooms, uuid(3)))).toBe(25.9);
    expect(floorAreaOfRooms([])).toBeUndefined();
  });
});

describe('checking an area before it is saved', () => {
  it('names an empty terminal flow, in L/s, and the terminal it belongs to', () => {
    const a = area(3, 'flat');
    systemOf(a).terminals.push({ ...newTerminal('extract'), flow_m3s: 0.008 }, newTerminal('extract'));
    const checked = checkArea(a);
    expect(checked).toEqual({ ok: false, problems: [{ field: 'dwelling.system.terminals.1.flow_m3s', message: 'Terminal flow is empty: type the measured flow in L/s' }] });
  });

  it('words a flow out of range in L/s (the model’s limit is 2 m³/s)', () => {
    const a = area(3, 'flat');
    systemOf(a).terminals.push({ ...newTerminal('extract'), flow_m3s: 2.5 });
    const checked = checkArea(a);
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.problems[0]!.message).toBe('Terminal flow must be between 0 and 2,000 L/s');
  });

  it('keeps the model’s own words for other fields', () => {
    const a = { ...area(3, 'flat'), name: '  ', dwelling: { bedrooms: 2.5 } };
    const checked = checkArea(a);
    expect(checked.ok).toBe(false);
    if (!checked.ok) {
      expect(checked.problems.map((p) => p.field)).toEqual(['name', 'dwelling.bedrooms']);
      expect(checked.problems[0]!.message).toMatch(/^Area name is empty/);
      expect(checked.problems[1]!.message).toMatch(/^Bedrooms must be a whole number/);
    }
  });
});
