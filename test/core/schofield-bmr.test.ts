import { describe, it } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { schofieldBmr } from '../../src/core/schofield-bmr.ts';
import { AGE_BANDS, defaultBodyMass, type AgeBand, type Sex } from '../../src/core/age-bands.ts';

/**
 * BMR printed in Persily & de Jonge 2017 (Indoor Air 27(5):868–879) beside each band's mean body
 * mass, as transcribed in references.md §1.3 [C: public transcription of the paper's table].
 * [male, female] in MJ/day. The Schofield coefficients themselves are from memory; this check
 * against the printed values is what confirms them.
 */
const PRINTED_BMR: Record<AgeBand, [number, number]> = {
  '0-1': [1.86, 1.75],
  '1-3': [3.05, 2.88],
  '3-6': [3.9, 3.59],
  '6-11': [5.14, 4.73],
  '11-16': [7.02, 6.03],
  '16-21': [7.77, 6.12],
  '21-30': [8.24, 6.49],
  '30-40': [7.83, 6.08],
  '40-50': [8.0, 6.16],
  '50-60': [7.95, 6.17],
  '60-70': [6.84, 5.67],
  '70-80': [6.57, 5.45],
  '80+': [6.19, 5.19],
};

describe('schofieldBmr (Schofield 1985, as used by Persily & de Jonge 2017)', () => {
  it('reproduces every printed BMR from the printed mean body mass within 0.02 MJ/day', () => {
    for (const band of AGE_BANDS) {
      (['male', 'female'] as Sex[]).forEach((sex, k) => {
        const bmr = schofieldBmr(band, sex, defaultBodyMass(band, sex));
        approxEqual(bmr, PRINTED_BMR[band][k]!, { abs: 0.02 }, `${sex} ${band}`);
      });
    }
  });

  it('uses the 18-30 equation for the 16-21 band, as the paper does', () => {
    // references.md §1.2 [D on C data]: male 77.3 kg → 7.77 (18-30 equation), not 8.47 (10-18).
    approxEqual(schofieldBmr('16-21', 'male', 77.3), 7.7659, { abs: 1e-4 });
  });
});
