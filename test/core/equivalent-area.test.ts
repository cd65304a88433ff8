import { describe, it, expect } from 'vitest';
import { equivalentAreaFromLabel, FREE_TO_EQUIVALENT_FACTOR } from '../../src/core/equivalent-area.ts';

describe('equivalentAreaFromLabel (src/core/equivalent-area.ts)', () => {
  it('takes an equivalent-area label as it is, without warning', () => {
    expect(equivalentAreaFromLabel(0.005, 'equivalent')).toEqual({
      area: { low: 0.005, central: 0.005, high: 0.005 },
      warnings: [],
    });
  });

  it('never counts more than the free area and flags a free-area label', () => {
    // practice.md §1 item 10: free area overstates equivalent area (common practice (no published source));
    // the 0.5–1.0 factor is our own stated assumption (from memory).
    const { area, warnings } = equivalentAreaFromLabel(0.004, 'free');
    expect(area.high).toBeLessThanOrEqual(0.004);
    expect(area.central).toBeCloseTo(0.004 * FREE_TO_EQUIVALENT_FACTOR.central, 12);
    expect(area.low).toBeLessThan(area.central);
    expect(warnings.map((w) => w.code)).toEqual(['free-area-label']);
  });

  it('treats an area of unknown basis as free area, with its own warning', () => {
    const { area, warnings } = equivalentAreaFromLabel(0.004, 'unknown');
    expect(area).toEqual(equivalentAreaFromLabel(0.004, 'free').area);
    expect(warnings.map((w) => w.code)).toEqual(['area-basis-unknown']);
  });

  it('never returns a negative area', () => {
    expect(equivalentAreaFromLabel(-1, 'equivalent').area.low).toBe(0);
  });
});
