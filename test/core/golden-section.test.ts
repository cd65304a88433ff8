import { describe, it } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { minimizeByGoldenSection } from '../../src/core/golden-section.ts';

describe('minimizeByGoldenSection (Kiefer 1953)', () => {
  it('finds the minimum of unimodal functions to the tolerance', () => {
    approxEqual(minimizeByGoldenSection((x) => (x - 2) ** 2, 0, 5, 1e-9), 2, { abs: 1e-8 });
    // cosh has its minimum at 0; a lopsided bracket still finds it, to about √ε (a flat minimum
    // cannot be located more finely from function values: Press et al., Numerical Recipes, §10.1).
    approxEqual(minimizeByGoldenSection(Math.cosh, -1, 7, 1e-9), 0, { abs: 1e-7 });
  });
});
