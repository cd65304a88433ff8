import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { linearisedFigures, monteCarloFigures, trueLevel } from '../../src/core/supply-uncertainty.ts';
import { meterErrorFromStatedAccuracy } from '../../src/core/meter-error.ts';
import { outdoorLevel } from '../../src/core/outdoor-level.ts';

describe('propagation of input uncertainty', () => {
  const meter = meterErrorFromStatedAccuracy(50, 3, 10);
  const u = {
    volume_m3: 150,
    volumeSd_m3: 7.5,
    outdoor: outdoorLevel([430], { sameMeterAsRoom: false, meter }),
    meter,
    occupants: { count: 30, countSd: 1, perPerson_m3s: 3e-6, perPersonRelSd: 0.15 },
  };
  // Steady-state supply from one reading of 1100 ppm: Q = N·G·1e6/(C − C_out).
  const evaluate = (x: Parameters<typeof trueLevel>[0]) => (x.count * x.perPerson_m3s * 1e6) / (trueLevel(x, 1100, 0) - x.outdoor_ppm);

  it('agrees between Monte Carlo and linearised propagation for a mildly non-linear case', () => {
    const mc = monteCarloFigures(u, evaluate, { draws: 20000, seed: 3, statDof: 0, noiseSd_ppm: [10] });
    const lin = linearisedFigures(u, evaluate, { statDof: 0, noiseSd_ppm: [10] });
    expect(mc.supply_m3s.value).toBe(lin.supply_m3s.value);
    approxEqual(mc.supply_m3s.low!, lin.supply_m3s.low!, { rel: 0.05 });
    approxEqual(mc.supply_m3s.high!, lin.supply_m3s.high!, { rel: 0.05 });
    approxEqual(mc.steadyLevel_ppm.value!, 1100 * 1, { abs: 1e-9 });
  });

  it('is deterministic for a seed', () => {
    const a = monteCarloFigures(u, evaluate, { draws: 500, seed: 8, statDof: 0, noiseSd_ppm: [10] });
    const b = monteCarloFigures(u, evaluate, { draws: 500, seed: 8, statDof: 0, noiseSd_ppm: [10] });
    expect(a).toEqual(b);
  });
});
