import { describe, it, expect } from 'vitest';
import { roomFloorArea, roomVolume } from '../../src/model/room-geometry.ts';
import { approxEqual } from '../support/approx-equal.ts';

describe('room size', () => {
  it('multiplies out a box', () => {
    // Arithmetic: 7.2 × 7 = 50.4 m²; × 3 = 151.2 m³.
    approxEqual(roomFloorArea({ kind: 'box', length_m: 7.2, width_m: 7, height_m: 3 }), 50.4, { abs: 1e-12 });
    approxEqual(roomVolume({ kind: 'box', length_m: 7.2, width_m: 7, height_m: 3 }), 151.2, { abs: 1e-12 });
  });

  it('adds up parts of different heights', () => {
    // 50.4 m² × 2.9 m + 4.5 m² × 2.4 m = 146.16 + 10.8 = 156.96 m³.
    const geometry = {
      kind: 'parts' as const,
      parts: [
        { kind: 'box' as const, length_m: 7.2, width_m: 7, height_m: 2.9 },
        { kind: 'area' as const, floorArea_m2: 4.5, height_m: 2.4 },
      ],
    };
    approxEqual(roomFloorArea(geometry), 54.9, { abs: 1e-12 });
    approxEqual(roomVolume(geometry), 156.96, { abs: 1e-12 });
  });
});
