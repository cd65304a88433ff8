import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import {
  occupantCo2Output,
  persilyCo2Output,
  TABLE_AIR_STATE,
  type OccupantGroup,
} from '../../src/core/co2-generation.ts';
import { litresPerSecond } from '../../src/core/units.ts';

/**
 * Persily & de Jonge 2017, Indoor Air 27(5):868–879, table of CO2 generation rates (L/s at
 * 273 K, 101 kPa), as transcribed in references.md §1.3 [C: public transcription of the paper's
 * table]. Columns: printed BMR (MJ/day), then 1.0, 1.2, 1.4, 1.6, 2.0, 3.0, 4.0 met.
 */
const MET = [1.0, 1.2, 1.4, 1.6, 2.0, 3.0, 4.0];
const TABLE: [string, number, number[]][] = [
  ['M 3-6', 3.9, [0.0019, 0.0023, 0.0026, 0.003, 0.0038, 0.0057, 0.0075]],
  ['F 3-6', 3.59, [0.0017, 0.0021, 0.0024, 0.0028, 0.0035, 0.0052, 0.007]],
  ['M 6-11', 5.14, [0.0025, 0.003, 0.0035, 0.004, 0.005, 0.0075, 0.01]],
  ['F 6-11', 4.73, [0.0023, 0.0027, 0.0032, 0.0037, 0.0046, 0.0069, 0.0092]],
  ['M 11-16', 7.02, [0.0034, 0.0041, 0.0048, 0.0054, 0.0068, 0.0102, 0.0136]],
  ['F 11-16', 6.03, [0.0029, 0.0035, 0.0041, 0.0047, 0.0058, 0.0088, 0.0117]],
  ['M 16-21', 7.77, [0.0037, 0.0045, 0.0053, 0.006, 0.0075, 0.0113, 0.015]],
  ['F 16-21', 6.12, [0.0029, 0.0036, 0.0042, 0.0047, 0.0059, 0.0089, 0.0119]],
  ['M 21-30', 8.24, [0.0039, 0.0048, 0.0056, 0.0064, 0.008, 0.012, 0.016]],
  ['F 21-30', 6.49, [0.0031, 0.0038, 0.0044, 0.005, 0.0063, 0.0094, 0.0126]],
  ['M 30-40', 7.83, [0.0037, 0.0046, 0.0053, 0.0061, 0.0076, 0.0114, 0.0152]],
  ['F 30-40', 6.08, [0.0029, 0.0035, 0.0041, 0.0047, 0.0059, 0.0088, 0.0118]],
  ['M 40-50', 8.0, [0.0038, 0.0046, 0.0054, 0.0062, 0.0077, 0.0116, 0.0155]],
  ['F 40-50', 6.16, [0.0029, 0.0036, 0.0042, 0.0048, 0.006, 0.009, 0.0119]],
  ['M 60-70', 6.84, [0.0033, 0.004, 0.0046, 0.0053, 0.0066, 0.0099, 0.0133]],
  ['F 60-70', 5.67, [0.0027, 0.0033, 0.0038, 0.0044, 0.0055, 0.0082, 0.011]],
];

describe('persilyCo2Output (Persily & de Jonge 2017)', () => {
  it('reproduces every printed cell of the table from the printed BMR within 0.0001 L/s', () => {
    let cells = 0;
    for (const [label, bmr, row] of TABLE) {
      row.forEach((printed, j) => {
        const formula = litresPerSecond(persilyCo2Output(bmr, MET[j]!, TABLE_AIR_STATE));
        approxEqual(formula, printed, { abs: 1e-4 }, `${label} at ${MET[j]} met`);
        cells++;
      });
    }
    expect(cells).toBe(112);
  });

  it('reproduces the printed ends of the infant rows', () => {
    // Same table: M <1 (BMR 1.86) 0.0009 at 1.0 met and 0.0036 at 4.0; F <1 (1.75) 0.0008 and 0.0034.
    approxEqual(litresPerSecond(persilyCo2Output(1.86, 1.0, TABLE_AIR_STATE)), 0.0009, { abs: 1e-4 });
    approxEqual(litresPerSecond(persilyCo2Output(1.86, 4.0, TABLE_AIR_STATE)), 0.0036, { abs: 1e-4 });
    approxEqual(litresPerSecond(persilyCo2Output(1.75, 1.0, TABLE_AIR_STATE)), 0.0008, { abs: 1e-4 });
    approxEqual(litresPerSecond(persilyCo2Output(1.75, 4.0, TABLE_AIR_STATE)), 0.0034, { abs: 1e-4 });
  });

  it('scales with absolute temperature over pressure (ideal gas, the T/P term of the formula)', () => {
    // references.md §7.1 [D], checked against the table above: male 21-30 y at 1.2 met is
    // 0.004783 L/s at 273.15 K and 0.005134 L/s at 293.15 K (ratio 293.15/273.15).
    const cold = persilyCo2Output(8.2447, 1.2, TABLE_AIR_STATE);
    const warm = persilyCo2Output(8.2447, 1.2, { temp_C: 20, pressure_Pa: 101325 });
    approxEqual(litresPerSecond(cold), 0.004783, { abs: 5e-7 });
    approxEqual(warm / cold, 293.15 / 273.15, { rel: 1e-12 });
    // Lower pressure (a site at about 1000 m, standard atmosphere 89 875 Pa) gives more volume.
    const high = persilyCo2Output(8.2447, 1.2, { temp_C: 20, pressure_Pa: 89875 });
    approxEqual(high / warm, 101325 / 89875, { rel: 1e-12 });
  });
});

describe('occupantCo2Output', () => {
  it('sums groups using the paper default masses and Schofield BMR', () => {
    // Our invented Year 4 class: 15 boys and 15 girls aged 6-11 at 1.2 met, one teacher
    // (female, 30-40) at 1.4 met. Table cells (Persily & de Jonge 2017): 0.0030, 0.0027, 0.0041 L/s.
    const groups: OccupantGroup[] = [
      { count: 15, ageBand: '6-11', sex: 'male', met: 1.2 },
      { count: 15, ageBand: '6-11', sex: 'female', met: 1.2 },
      { count: 1, ageBand: '30-40', sex: 'female', met: 1.4 },
    ];
    const out = occupantCo2Output(groups, TABLE_AIR_STATE);
    expect(out.count).toBe(31);
    // Each group within the table's 4-decimal rounding (0.00005 L/s per person).
    approxEqual(litresPerSecond(out.perGroup[0]!.perPerson_m3s), 0.003, { abs: 5e-5 });
    approxEqual(litresPerSecond(out.perGroup[1]!.perPerson_m3s), 0.0027, { abs: 5e-5 });
    approxEqual(litresPerSecond(out.perGroup[2]!.perPerson_m3s), 0.0041, { abs: 5e-5 });
    approxEqual(litresPerSecond(out.total_m3s), 15 * 0.003 + 15 * 0.0027 + 0.0041, { abs: 31 * 5e-5 });
  });

  it('averages male and female for a mixed group and honours a given body mass', () => {
    const mixed = occupantCo2Output([{ count: 2, ageBand: '21-30', sex: 'mixed', met: 1.0 }], TABLE_AIR_STATE);
    const male = occupantCo2Output([{ count: 1, ageBand: '21-30', sex: 'male', met: 1.0 }], TABLE_AIR_STATE);
    const female = occupantCo2Output([{ count: 1, ageBand: '21-30', sex: 'female', met: 1.0 }], TABLE_AIR_STATE);
    approxEqual(mixed.total_m3s, male.total_m3s + female.total_m3s, { rel: 1e-12 });
    expect(mixed.perGroup[0]!.bmr_MJday.male).toBeDefined();
    const heavy = occupantCo2Output([{ count: 1, ageBand: '21-30', sex: 'male', met: 1.0, bodyMass_kg: 100 }], TABLE_AIR_STATE);
    // Schofield 18-30 male: 0.063 MJ/(day·kg) more per kg.
    approxEqual(heavy.perGroup[0]!.bmr_MJday.male!, 0.063 * 100 + 2.896, { abs: 1e-12 });
  });

  it('gives zero output for an empty room', () => {
    expect(occupantCo2Output([], TABLE_AIR_STATE).total_m3s).toBe(0);
  });
});
