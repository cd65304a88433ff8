import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import {
  crossFlow,
  crossStackFlow,
  crossWindFlow,
  printedRuleSaysStack,
  seriesArea,
} from '../../src/core/cross-ventilation.ts';

describe('BS 5925 cross ventilation (src/core/cross-ventilation.ts)', () => {
  it('series area of four 0.3 m² openings in two pairs is 0.4243 m²', () => {
    // derived (our computation from BS 5925:1991, references.md §3.2): references.md §7.4 [D].
    approxEqual(seriesArea([0.6, 0.6]), 0.4243, { abs: 5e-5 });
    expect(seriesArea([0.6, 0])).toBe(0);
    expect(seriesArea([])).toBe(0);
  });

  it('wind: A_w 0.4243 m², ΔC_p 0.9, U_r 4 m/s gives 0.982 m³/s', () => {
    // derived (our computation from BS 5925:1991, references.md §3.2): references.md §7.4 [D].
    approxEqual(crossWindFlow(seriesArea([0.6, 0.6]), 4, 0.9), 0.982, { abs: 5e-4 });
  });

  it('stack: A_b 0.4243 m², H_1 1.5 m, Δθ 16 K gives 0.332 m³/s', () => {
    // derived (our computation from BS 5925:1991, references.md §3.2): references.md §7.4 [D].
    approxEqual(crossStackFlow(seriesArea([0.6, 0.6]), 1.5, 16, 13), 0.332, { abs: 5e-4 });
  });

  it('the printed switching rule: 0.336 < U_r/√Δθ = 1.0, so wind governs', () => {
    // BS 5925:1991 rule (references.md §3.2, exact layout from memory); numbers references.md §7.4 [D].
    expect(printedRuleSaysStack(4, 16, 0.4243, 0.4243, 1.5, 0.9)).toBe(false);
    expect(printedRuleSaysStack(0.5, 16, 0.4243, 0.4243, 1.5, 0.9)).toBe(true);
    expect(printedRuleSaysStack(4, 0, 0.4243, 0.4243, 1.5, 0.9)).toBe(false);
  });

  it('the worked four-opening case: wind governs at 0.982 m³/s', () => {
    const facade = [
      { area_m2: 0.3, centreHeight_m: 0.5 },
      { area_m2: 0.3, centreHeight_m: 2.0 },
    ];
    const r = crossFlow(facade, facade, [], 4, 16, 13, 0.9);
    approxEqual(r.wind, 0.982, { abs: 5e-4 });
    approxEqual(r.stack, 0.332, { abs: 5e-4 });
    expect(r.governing).toBe('wind');
    expect(r.printedRule).toBe('wind');
    approxEqual(r.flow, 0.982, { abs: 5e-4 });
  });

  it('an internal doorway on the path acts in series and lowers the flow', () => {
    const a = [{ area_m2: 0.5, centreHeight_m: 1.5 }];
    const open = crossFlow(a, a, [], 3, 10, 15, 0.5).flow;
    const throughDoor = crossFlow(a, a, [0.2], 3, 10, 15, 0.5).flow;
    expect(throughDoor).toBeLessThan(open);
    approxEqual(throughDoor / open, seriesArea([0.5, 0.5, 0.2]) / seriesArea([0.5, 0.5]), { rel: 1e-12 });
  });
});
