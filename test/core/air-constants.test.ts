import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import {
  AIR_DENSITY_KG_M3,
  GRAVITY_M_S2,
  SHARP_EDGE_DISCHARGE_COEFFICIENT,
} from '../../src/core/air-constants.ts';

describe('air constants (src/core/air-constants.ts)', () => {
  it('match the values the published forms are stated with', () => {
    // BS 5925:1991 cl. 9 sharp-edged C_d 0.61 (references.md §3.1 [C]); g 9.81 as in references.md §7.4.
    expect(SHARP_EDGE_DISCHARGE_COEFFICIENT).toBe(0.61);
    expect(GRAVITY_M_S2).toBe(9.81);
    // ρ 1.2 kg/m³ is the density behind 0.787 L/s per 1000 mm² at 1 Pa (references.md §3.1 [D]).
    approxEqual(SHARP_EDGE_DISCHARGE_COEFFICIENT * 1e-3 * Math.sqrt(2 / AIR_DENSITY_KG_M3) * 1000, 0.787, { abs: 1e-3 });
  });
});
