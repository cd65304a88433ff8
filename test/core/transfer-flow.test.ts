import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { transferFlow } from '../../src/core/transfer-flow.ts';
import { litresPerSecond } from '../../src/core/units.ts';

describe('transferFlow (src/core/transfer-flow.ts)', () => {
  it('an ADF 7600 mm² undercut passes about 6 L/s at 1 Pa, as capacity, not outdoor air', () => {
    // ADF 7600 mm² undercut ≈ 10 mm under a 760 mm door (practice.md §2 item 1, common practice (no published source));
    // derived (our computation from the orifice equation, BS 5925:1991 cl. 9 eq. (2)): 0.61·0.0076·sqrt(2/1.2) = 5.985 L/s.
    const item = transferFlow({ kind: 'door-undercut', id: 'bath-door', doorWidth_m: 0.76, gap_m: 0.01 });
    approxEqual(litresPerSecond(item.flow.central), 5.985, { abs: 0.001 });
    expect(item.countsAsOutdoorAir).toBe(false);
    expect(item.mechanism).toBe('internal-transfer');
    expect(item.warnings.map((w) => w.code)).toContain('transfer-not-outdoor-air');
  });

  it('states the pressure used and scales with its square root', () => {
    const grille = { kind: 'transfer-grille' as const, id: 'g', labelArea_m2: 0.01, areaBasis: 'equivalent' as const };
    expect(transferFlow(grille, 4).method).toContain('at 4 Pa');
    approxEqual(transferFlow(grille, 4).flow.central, 2 * transferFlow(grille, 1).flow.central, { rel: 1e-12 });
  });

  it('property: an undercut never counts as outdoor supply', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 2, noNaN: true }), fc.double({ min: 0, max: 0.1, noNaN: true }), (w, g) => {
        expect(transferFlow({ kind: 'door-undercut', id: 'd', doorWidth_m: w, gap_m: g }).countsAsOutdoorAir).toBe(false);
      }),
    );
  });
});
