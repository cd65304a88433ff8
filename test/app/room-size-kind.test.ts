/** Switching how a room's size is given keeps what it can (one part ↔ one size). */
import { describe, it, expect } from 'vitest';
import { switchSize, totalsOf, type SizeDraft } from '../../src/app/room-size-kind.ts';
import { roomFloorArea, roomVolume, geometrySchema } from '../../src/model/room-geometry.ts';
import { approxEqual } from '../support/approx-equal.ts';

const box = { kind: 'box', length_m: 5, width_m: 4, height_m: 2.4 } as const;
const bay = { kind: 'area', floorArea_m2: 6, height_m: 3 } as const;

describe('switching a room’s size between length × width, floor area and parts', () => {
  it('turns one size into a room of one part and back, unchanged', () => {
    const parts = switchSize(box, 'parts');
    expect(parts).toEqual({ kind: 'parts', parts: [box] });
    expect(switchSize(parts, 'box')).toEqual(box);
    expect(switchSize(switchSize(bay, 'parts'), 'area')).toEqual(bay);
  });

  it('keeps a box’s floor area when switched to floor area; an area keeps only its height as a box', () => {
    expect(switchSize(box, 'area')).toEqual({ kind: 'area', floorArea_m2: 20, height_m: 2.4 });
    expect(switchSize(bay, 'box')).toEqual({ kind: 'box', height_m: 3 });
  });

  it('turns several parts into one floor area with the same total floor area and volume', () => {
    const room: SizeDraft = { kind: 'parts', parts: [box, bay] };
    const one = switchSize(room, 'area');
    expect(one).toEqual({ kind: 'area', floorArea_m2: 26, height_m: 2.538 }); // (48 + 18) m³ / 26 m² = 2.5385 m
    const parsed = geometrySchema.parse(one);
    expect(roomFloorArea(parsed)).toBe(26);
    // Volume within the millimetre the height is rounded to: 26 m² × 0.0005 m = 0.013 m³.
    approxEqual(roomVolume(parsed), roomVolume(geometrySchema.parse(room)), { abs: 0.013 });
  });

  it('keeps the first part when several parts are switched to length × width', () => {
    expect(switchSize({ kind: 'parts', parts: [bay, box] }, 'box')).toEqual({ kind: 'box', height_m: 3 });
  });

  it('leaves empty what cannot be worked out while a field is empty (never 0)', () => {
    expect(switchSize({ kind: 'box', length_m: 5, height_m: 2.4 }, 'area')).toEqual({ kind: 'area', height_m: 2.4 });
    expect(switchSize({ kind: 'parts', parts: [{ kind: 'box', length_m: 5 }, bay] }, 'area')).toEqual({ kind: 'area' });
    expect(totalsOf([{ kind: 'box', length_m: 5, width_m: 4 }])).toBeUndefined();
  });

  it('adds up parts as the model does', () => {
    const t = totalsOf([box, bay])!;
    expect(t.floor_m2).toBe(roomFloorArea({ kind: 'parts', parts: [box, bay] }));
    expect(t.volume_m3).toBe(roomVolume({ kind: 'parts', parts: [box, bay] }));
  });
});
