import { describe, it, expect } from 'vitest';
import jstatModule from 'jstat';
import { approxEqual } from '../support/approx-equal.ts';
import { createSeededRandom } from '../../src/core/seeded-random.ts';

const { jStat } = jstatModule as unknown as { jStat: { studentt: { inv(p: number, dof: number): number }; normal: { inv(p: number, m: number, s: number): number } } };

describe('createSeededRandom', () => {
  it('repeats exactly for a seed and differs between seeds', () => {
    const a = createSeededRandom(42);
    const b = createSeededRandom(42);
    const c = createSeededRandom(43);
    const xs = Array.from({ length: 5 }, () => a.uniform());
    expect(Array.from({ length: 5 }, () => b.uniform())).toEqual(xs);
    expect(Array.from({ length: 5 }, () => c.uniform())).not.toEqual(xs);
    expect(xs.every((x) => x > 0 && x < 1)).toBe(true);
  });

  it('gives normal and t variates whose quantiles match jstat (reference library)', () => {
    const rng = createSeededRandom(9);
    const n = 100000;
    const normals = Float64Array.from({ length: n }, () => rng.normal()).sort();
    const ts = Float64Array.from({ length: n }, () => rng.studentT(5)).sort();
    for (const p of [0.025, 0.5, 0.975]) {
      // Sampling error of a quantile at n = 1e5 is about 0.01–0.02.
      approxEqual(normals[Math.floor(p * n)]!, jStat.normal.inv(p, 0, 1), { abs: 0.03 });
      approxEqual(ts[Math.floor(p * n)]!, jStat.studentt.inv(p, 5), { abs: 0.05 });
    }
  });
});
