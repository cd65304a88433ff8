/**
 * Basal metabolic rate by the Schofield (1985) equations, Human Nutrition: Clinical Nutrition
 * 39C Suppl 1:5–41, as used by Persily & de Jonge (2017) for CO2 generation.
 * BMR in MJ/day, body mass in kg. Coefficients from memory (references.md §1.2), checked by
 * reproducing every BMR printed in the Persily & de Jonge table within 0.011 MJ/day.
 */
import { schofieldRangeFor, type AgeBand, type SchofieldRange, type Sex } from './age-bands.ts';

/** [slope MJ/(day·kg), intercept MJ/day] for [male, female]. */
const EQUATIONS: Record<SchofieldRange, readonly [readonly [number, number], readonly [number, number]]> = {
  under3: [
    [0.249, -0.127],
    [0.244, -0.13],
  ],
  '3to10': [
    [0.095, 2.11],
    [0.085, 2.033],
  ],
  '10to18': [
    [0.074, 2.754],
    [0.056, 2.898],
  ],
  '18to30': [
    [0.063, 2.896],
    [0.062, 2.036],
  ],
  '30to60': [
    [0.048, 3.653],
    [0.034, 3.538],
  ],
  '60plus': [
    [0.049, 2.459],
    [0.038, 2.755],
  ],
};

/**
 * Schofield BMR (MJ/day) for a person of the given age band, sex and body mass (kg).
 * Example: schofieldBmr('21-30', 'male', 84.9) = 8.2447 MJ/day.
 */
export function schofieldBmr(band: AgeBand, sex: Sex, bodyMass_kg: number): number {
  const [slope, intercept] = EQUATIONS[schofieldRangeFor(band)][sex === 'male' ? 0 : 1];
  return slope * bodyMass_kg + intercept;
}
