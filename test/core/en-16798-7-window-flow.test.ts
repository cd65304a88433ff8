import { describe, it } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { en16798WindowFlow } from '../../src/core/en-16798-7-window-flow.ts';

describe('en16798WindowFlow (src/core/en-16798-7-window-flow.ts)', () => {
  it('A 1 m², U_10 3 m/s, H 1.2 m, Δθ 16 K, density ratio 1 gives 0.1296 m³/s', () => {
    // derived (our computation from EN 16798-7:2017 as implemented in AixLib DIN16798.mo, references.md §3.3 [C]):
    // references.md §7.4 [D]; density ratio 1 at 20 °C outdoors (ρ_ref is at 293 K).
    approxEqual(en16798WindowFlow(1, 3, 1.2, 16, 20), 0.1296, { abs: 5e-5 });
  });

  it('takes the larger of the wind and stack terms, not their sum', () => {
    // EN 16798-7 form: with 0.001·U² = 0.036 > 0.0035·1.2·1 = 0.0042, only wind counts.
    approxEqual(en16798WindowFlow(1, 6, 1.2, 1, 20), 0.5 * Math.sqrt(0.036), { rel: 1e-12 });
  });

  it('scales with outdoor absolute temperature (ρ_ref/ρ_e = T_e/293.15 K)', () => {
    approxEqual(en16798WindowFlow(1, 3, 1.2, 16, 5), 0.1296 * (278.15 / 293.15), { abs: 5e-5 });
  });
});
