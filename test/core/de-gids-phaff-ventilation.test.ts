import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { deGidsPhaffFlow } from '../../src/core/de-gids-phaff-ventilation.ts';

describe('deGidsPhaffFlow (src/core/de-gids-phaff-ventilation.ts)', () => {
  it('A 1 m², U_10 3 m/s, H 1.2 m, Δθ 16 K gives 0.1468 m³/s', () => {
    // derived (our computation from de Gids & Phaff 1982, Air Infiltration Review 4(1), as implemented in
    // AixLib GidsPhaff.mo, references.md §3.3 [C]): references.md §7.4 [D].
    approxEqual(deGidsPhaffFlow(1, 3, 1.2, 16), 0.1468, { abs: 5e-5 });
  });

  it('keeps its turbulence floor in still, isothermal air and scales with area', () => {
    // de Gids & Phaff 1982: the 0.01 term alone gives (A/2)·0.1 m³/s.
    approxEqual(deGidsPhaffFlow(1, 0, 1.2, 0), 0.05, { rel: 1e-12 });
    approxEqual(deGidsPhaffFlow(2, 3, 1.2, 16), 2 * deGidsPhaffFlow(1, 3, 1.2, 16), { rel: 1e-12 });
    expect(deGidsPhaffFlow(0, 3, 1.2, 16)).toBe(0);
  });
});
