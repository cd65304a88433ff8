import { describe, it } from 'vitest';
import jstatModule from 'jstat';
import { approxEqual } from '../support/approx-equal.ts';
import { fitStraightLine, slopeOnSameX } from '../../src/core/straight-line-fit.ts';

const { jStat } = jstatModule as unknown as {
  jStat: { models: { ols(endog: number[], exog: number[][]): { coef: number[]; t: { se: number[] }; df_resid: number } } };
};

describe('fitStraightLine against jstat 1.9.6 ols (reference library)', () => {
  it('matches slope, intercept and standard errors on an irregular data set', () => {
    // Our own invented readings: times in s, ln(excess) values with scatter.
    const x = [0, 240, 600, 780, 1200, 1500, 2100, 2400, 3000];
    const y = [7.31, 7.22, 7.1, 7.07, 6.93, 6.8, 6.66, 6.56, 6.41];
    const ours = fitStraightLine(x, y);
    const ref = jStat.models.ols(y, x.map((v) => [1, v]));
    approxEqual(ours.intercept, ref.coef[0]!, { rel: 1e-10 });
    approxEqual(ours.slope, ref.coef[1]!, { rel: 1e-10 });
    approxEqual(ours.interceptSe, ref.t.se[0]!, { rel: 1e-8 });
    approxEqual(ours.slopeSe, ref.t.se[1]!, { rel: 1e-8 });
    approxEqual(ours.dof, ref.df_resid, { abs: 0 });
    approxEqual(slopeOnSameX(x, y, ours.xMean, ours.sxx), ours.slope, { rel: 1e-12 });
  });

  it('reproduces the regression check of references.md §7.3', () => {
    // [D] decay λ = 0.8 h⁻¹ from 2000 ppm to C_out 420, every 5 min, with the fixed noise vector
    // [+12, −8, +5, −15, +9, 0, −6, +11, −3, +7, −10, +4, −2] ppm; also checked against jstat above.
    const noise = [12, -8, 5, -15, 9, 0, -6, 11, -3, 7, -10, 4, -2];
    const t = noise.map((_, i) => i * 300);
    const c = t.map((s, i) => 420 + 1580 * Math.exp((-0.8 * s) / 3600) + noise[i]!);
    const fit = fitStraightLine(t, c.map((v) => Math.log(v - 420)));
    const ref = jStat.models.ols(c.map((v) => Math.log(v - 420)), t.map((v) => [1, v]));
    approxEqual(-fit.slope * 3600, 0.8016, { abs: 5e-5 });
    approxEqual(fit.slopeSe * 3600, 0.00713, { abs: 5e-6 });
    approxEqual(fit.slopeSe, ref.t.se[1]!, { rel: 1e-8 });
  });
});
