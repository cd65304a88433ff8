/**
 * Age bands of the CO2 generation table in Persily & de Jonge (2017), Indoor Air 27(5):868–879,
 * with the mean body masses the paper uses for each band (US survey means). Ages in years;
 * each band is [from, to).
 */

/** Age band ids, as in the paper's table. */
export type AgeBand =
  | '0-1'
  | '1-3'
  | '3-6'
  | '6-11'
  | '11-16'
  | '16-21'
  | '21-30'
  | '30-40'
  | '40-50'
  | '50-60'
  | '60-70'
  | '70-80'
  | '80+';

/** Sex as used by the Schofield equations. */
export type Sex = 'male' | 'female';

/** Which Schofield (1985) equation applies to a band (the paper puts 16–<21 with 18–30). */
export type SchofieldRange = 'under3' | '3to10' | '10to18' | '18to30' | '30to60' | '60plus';

interface AgeBandRow {
  schofield: SchofieldRange;
  /** Mean body mass in kg: [male, female]. */
  mass_kg: readonly [number, number];
}

/**
 * Table rows. Masses from Persily & de Jonge 2017, Table (as transcribed in references.md §1.3,
 * confirmed against a public transcription of the paper's table).
 */
const ROWS: Record<AgeBand, AgeBandRow> = {
  '0-1': { schofield: 'under3', mass_kg: [8.0, 7.7] },
  '1-3': { schofield: 'under3', mass_kg: [12.8, 12.3] },
  '3-6': { schofield: '3to10', mass_kg: [18.8, 18.3] },
  '6-11': { schofield: '3to10', mass_kg: [31.9, 31.7] },
  '11-16': { schofield: '10to18', mass_kg: [57.6, 55.9] },
  '16-21': { schofield: '18to30', mass_kg: [77.3, 65.9] },
  '21-30': { schofield: '18to30', mass_kg: [84.9, 71.9] },
  '30-40': { schofield: '30to60', mass_kg: [87.0, 74.8] },
  '40-50': { schofield: '30to60', mass_kg: [90.5, 77.1] },
  '50-60': { schofield: '30to60', mass_kg: [89.5, 77.5] },
  '60-70': { schofield: '60plus', mass_kg: [89.5, 76.8] },
  '70-80': { schofield: '60plus', mass_kg: [83.9, 70.8] },
  '80+': { schofield: '60plus', mass_kg: [76.1, 64.1] },
};

/** All bands, youngest first. */
export const AGE_BANDS: readonly AgeBand[] = Object.keys(ROWS) as AgeBand[];

/**
 * Default body mass (kg) for a band and sex: the paper's mean. Example: defaultBodyMass('21-30', 'male') = 84.9.
 */
export function defaultBodyMass(band: AgeBand, sex: Sex): number {
  return ROWS[band].mass_kg[sex === 'male' ? 0 : 1];
}

/** The Schofield equation range used for a band. Example: schofieldRangeFor('16-21') = '18to30'. */
export function schofieldRangeFor(band: AgeBand): SchofieldRange {
  return ROWS[band].schofield;
}
