import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { fitSeparableExponential, type SeparableExponentialModel } from '../../src/core/exponential-fit.ts';

const MODEL: SeparableExponentialModel = {
  basisCount: 2,
  fixed: () => [0, 0],
  basis: (j, rate, t) => (j === 0 ? [1, 0] : [Math.exp(-rate * t), -t * Math.exp(-rate * t)]),
};

describe('fitSeparableExponential', () => {
  it('recovers rate and coefficients of noise-free data exactly, from a search or a start', () => {
    const t = Array.from({ length: 13 }, (_, i) => i * 300);
    const y = t.map((s) => 500 + 1000 * Math.exp(-0.0002 * s));
    for (const fit of [fitSeparableExponential(MODEL, t, y, 1e-6, 1e-2)!, fitSeparableExponential(MODEL, t, y, 1e-6, 1e-2, 0.00021)!]) {
      approxEqual(fit.rate, 0.0002, { rel: 1e-9 });
      approxEqual(fit.coefficients[0]!, 500, { rel: 1e-9 });
      approxEqual(fit.coefficients[1]!, 1000, { rel: 1e-9 });
      expect(fit.dof).toBe(10);
    }
  });

  it('gives a standard error of the rate consistent with the scatter of refits', () => {
    // Check of the covariance s²(JᵀJ)⁻¹ against repeated fits with known noise (our own data).
    const t = Array.from({ length: 25 }, (_, i) => i * 300);
    let seed = 1;
    const noise = (): number => {
      seed = (seed * 16807) % 2147483647;
      const u1 = seed / 2147483647;
      seed = (seed * 16807) % 2147483647;
      return Math.sqrt(-2 * Math.log(u1)) * Math.cos((2 * Math.PI * seed) / 2147483647);
    };
    const rates: number[] = [];
    let se = 0;
    for (let k = 0; k < 300; k++) {
      const y = t.map((s) => 500 + 1000 * Math.exp(-0.0003 * s) + 10 * noise());
      const fit = fitSeparableExponential(MODEL, t, y, 1e-6, 1e-2)!;
      rates.push(fit.rate);
      se += fit.rateSe / 300;
    }
    const mean = rates.reduce((a, b) => a + b, 0) / rates.length;
    const sd = Math.sqrt(rates.reduce((a, r) => a + (r - mean) ** 2, 0) / (rates.length - 1));
    approxEqual(se, sd, { rel: 0.15 });
  });
});
