import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import {
  leakageDivideBy20,
  SAP_UK_MONTHLY_WIND_MS,
  sapInfiltration,
  sapShelterFactor,
  sapWindFactor,
} from '../../src/core/leakage-divide-by-20.ts';
import { lblInfiltration, leakageAreaFromAirPermeability } from '../../src/core/lbl-infiltration.ts';
import { airChangesPerHour } from '../../src/core/units.ts';

describe('divide-by-20 in SAP form (src/core/leakage-divide-by-20.ts)', () => {
  it('SAP factors: shelter 1 − 0.075·n, wind U/4, UK monthly wind table', () => {
    // SAP worksheet boxes (20) and (22a), UK average monthly wind (public SAP worksheet code, references.md §4.2 [C]).
    approxEqual(sapShelterFactor(2), 0.85, { rel: 1e-12 });
    approxEqual(sapShelterFactor(9), 0.7, { rel: 1e-12 });
    approxEqual(sapWindFactor(5.1), 1.275, { rel: 1e-12 });
    expect(SAP_UK_MONTHLY_WIND_MS).toEqual([5.1, 5.0, 4.9, 4.4, 4.3, 3.8, 3.8, 3.7, 4.0, 4.3, 4.5, 4.7]);
  });

  it('q50 10, no openings, 2 sheltered sides: January 0.6468 ach, July 0.5815 ach', () => {
    // derived (our computation from the SAP worksheet boxes (18)–(22b), references.md §4.2 [C]): references.md §7.5 [D].
    const jan = sapInfiltration(10, 0, 2, SAP_UK_MONTHLY_WIND_MS[0]!);
    approxEqual(jan.infiltration_ach, 0.5, { rel: 1e-12 });
    approxEqual(jan.shelterFactor, 0.85, { rel: 1e-12 });
    approxEqual(jan.sheltered_ach, 0.425, { rel: 1e-12 });
    approxEqual(jan.windAdjusted_ach, 0.5419, { abs: 5e-5 });
    approxEqual(jan.naturalVentilationEffective_ach, 0.6468, { abs: 5e-5 });
    approxEqual(sapInfiltration(10, 0, 2, SAP_UK_MONTHLY_WIND_MS[6]!).naturalVentilationEffective_ach, 0.5815, { abs: 5e-5 });
    // Above 1 ach the effective rate is the adjusted rate itself.
    approxEqual(sapInfiltration(30, 0, 0, 5).naturalVentilationEffective_ach, 1.875, { rel: 1e-12 });
  });

  it('room form: q50·A/20 × shelter × U/4', () => {
    // derived (our computation from the divide-by-20 rule in SAP form): 10·20/20·0.85·1 = 8.5 m³/h.
    approxEqual(leakageDivideBy20(10, 20, 2, 4) * 3600, 8.5, { rel: 1e-12 });
    expect(leakageDivideBy20(10, 0, 2, 4)).toBe(0);
  });

  it('agrees with the LBL model within a factor of two on the worked dwelling', () => {
    // Cross-check between published models (references.md §7.5: LBL 0.731 ach against n50/20 0.50 ach).
    const lbl = airChangesPerHour(lblInfiltration(leakageAreaFromAirPermeability(10, 250), 2, 3, 20, 4), 250);
    const rule = airChangesPerHour(leakageDivideBy20(10, 250, 0, 4), 250);
    approxEqual(rule, 0.5, { rel: 1e-12 });
    expect(lbl / rule).toBeGreaterThan(0.5);
    expect(lbl / rule).toBeLessThan(2);
  });
});
