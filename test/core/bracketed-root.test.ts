import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { findRootInBracket } from '../../src/core/bracketed-root.ts';

describe('findRootInBracket (Brent 1973)', () => {
  it('finds roots to the tolerance and refuses a bracket without a sign change', () => {
    approxEqual(findRootInBracket((x) => x * x - 2, 0, 2)!, Math.SQRT2, { abs: 1e-12 });
    approxEqual(findRootInBracket((x) => Math.cos(x) - x, 0, 1)!, 0.7390851332151607, { abs: 1e-12 });
    approxEqual(findRootInBracket((x) => Math.exp(x) - 1e6, 0, 50)!, Math.log(1e6), { abs: 1e-11 });
    expect(findRootInBracket((x) => x * x + 1, -1, 1)).toBeNull();
  });
});
