import { describe, it, expect } from 'vitest';
import {
  addRanges,
  coverValues,
  LEAKAGE_MODEL_FACTOR,
  NO_FLOW,
  OPENING_MODEL_UNCERTAINTY,
  rangeAboutCentral,
  rangeByFactor,
  scaleRange,
} from '../../src/core/flow-range.ts';

describe('flow ranges (src/core/flow-range.ts)', () => {
  it('carries the model uncertainties practice.md §1 item 9 asks for', () => {
    // practice.md §1 item 9: opening formulas ±30–50 % at best; leakage ×0.5–×2 (common practice (no published source)).
    expect(OPENING_MODEL_UNCERTAINTY).toBeGreaterThanOrEqual(0.5);
    expect(LEAKAGE_MODEL_FACTOR).toBeGreaterThanOrEqual(2);
  });

  it('builds ranges about a central value', () => {
    expect(rangeAboutCentral(0.1, 0.5)).toEqual({ low: 0.05, central: 0.1, high: 0.15000000000000002 });
    expect(rangeByFactor(0.01, 2)).toEqual({ low: 0.005, central: 0.01, high: 0.02 });
  });

  it('adds, scales and widens end by end', () => {
    expect(addRanges([{ low: 1, central: 2, high: 3 }, { low: 1, central: 1, high: 1 }])).toEqual({ low: 2, central: 3, high: 4 });
    expect(addRanges([])).toEqual(NO_FLOW);
    expect(scaleRange({ low: 1, central: 2, high: 3 }, 0.5)).toEqual({ low: 0.5, central: 1, high: 1.5 });
    expect(coverValues({ low: 1, central: 2, high: 3 }, [0.5, 4])).toEqual({ low: 0.5, central: 2, high: 4 });
    expect(coverValues({ low: 1, central: 2, high: 3 }, [])).toEqual({ low: 1, central: 2, high: 3 });
  });
});
