import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { invertMatrix, solveLinearSystem } from '../../src/core/linear-system.ts';

describe('linear systems', () => {
  it('solves and inverts small systems and detects singular ones', () => {
    const x = solveLinearSystem([[2, 1], [1, 3]], [3, 5])!;
    approxEqual(x[0]!, 0.8, { abs: 1e-14 });
    approxEqual(x[1]!, 1.4, { abs: 1e-14 });
    const a = [[4, -2, 1], [-2, 4, -2], [1, -2, 4]];
    const inv = invertMatrix(a)!;
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) {
      const v = a[i]!.reduce((s, aik, k) => s + aik * inv[k]![j]!, 0);
      approxEqual(v, i === j ? 1 : 0, { abs: 1e-14 });
    }
    expect(solveLinearSystem([[1, 2], [2, 4]], [1, 2])).toBeNull();
  });
});
