/**
 * The valid part of an edit (src/model/valid-part.ts): one field that breaks its rule must not
 * hold back the rest of what the surveyor changed. On records of the invented demo file.
 */
import { describe, it, expect } from 'vitest';
import { roomSchema, type Room } from '../../src/model/room.ts';
import { areaSchema, type Area } from '../../src/model/area.ts';
import { validPart } from '../../src/model/valid-part.ts';
import { demoFile } from '../support/fixtures.ts';

const demo = demoFile();
function classroom(): Room {
  const { readings: _readings, ...room } = structuredClone(demo.surveys[0]!.rooms[0]!) as Room & { readings: unknown };
  return roomSchema.parse(room);
}
function flat(): Area {
  return areaSchema.parse(structuredClone(demo.surveys[1]!.areas.find((a) => a.dwelling)!));
}

describe('the valid part of an edit', () => {
  it('keeps a new name when the height typed breaks its rule, and the last valid height', () => {
    const last = classroom();
    const edited = structuredClone(last);
    edited.name = 'Classroom B1 (north)';
    if (edited.geometry.kind !== 'box') throw new Error('the demo classroom is a box');
    edited.geometry.height_m = 45;
    expect(roomSchema.safeParse(edited).success).toBe(false);
    const kept = validPart(roomSchema, edited, last)!;
    expect(kept.name).toBe('Classroom B1 (north)');
    expect(kept.geometry).toEqual(last.geometry);
  });

  it('goes into a list item by item: a changed opening is kept, one broken by the edit keeps its last valid fields', () => {
    const last = classroom();
    const edited = structuredClone(last);
    const [first, second] = edited.openings as Array<Record<string, unknown>>;
    first!.count = 4;
    second!.count = -2;
    const kept = validPart(roomSchema, edited, last)!;
    expect((kept.openings[0] as { count: number }).count).toBe(4);
    expect(kept.openings[1]).toEqual(last.openings[1]);
    expect(kept.openings).toHaveLength(last.openings.length);
  });

  it('leaves out a new list item that breaks a rule, and keeps the other edits beside it', () => {
    const last = flat();
    const edited = structuredClone(last) as Area & { dwelling: NonNullable<Area['dwelling']> };
    edited.dwelling.bedrooms = 3;
    // A terminal just added, its flow not typed yet (the model requires it).
    edited.dwelling.system!.terminals.push({ location: 'Kitchen ceiling', direction: 'extract', setting: 'normal' } as never);
    expect(areaSchema.safeParse(edited).success).toBe(false);
    const kept = validPart(areaSchema, edited, last)!;
    expect(kept.dwelling!.bedrooms).toBe(3);
    expect(kept.dwelling!.system!.terminals).toEqual(last.dwelling!.system!.terminals);
  });

  it('gives the edit itself when it is valid, and the last valid record when nothing else can be kept', () => {
    const last = classroom();
    const renamed = { ...last, name: 'Art room' };
    expect(validPart(roomSchema, renamed, last)).toEqual(renamed);
    const broken = { ...last, name: '' };
    expect(validPart(roomSchema, broken, last)).toEqual(last);
  });
});
