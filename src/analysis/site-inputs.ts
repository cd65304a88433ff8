/**
 * The survey's building-wide facts as the airflow engine wants them: the site (terrain and
 * building height, for the wind at the building) and the leakage source (a pressure test, or an
 * assumed air permeability by age), storeys and shelter for the LBL model and SAP's shelter factor.
 *
 * Mappings (our own, stated):
 * - terrain: open country → open flat country; country with windbreaks → scattered windbreaks;
 *   urban → urban; city centre → city (the four BS 5925 classes); not recorded: urban, assumed;
 * - building height: storeys × 3 m (assumed storey height; common practice (no published source));
 *   storeys not recorded: 2, assumed;
 * - shelter: exposed → LBL class 2, 0 sheltered sides; normal → class 3, 2 sides; sheltered →
 *   class 4, 4 sides; not recorded: normal;
 * - leakage: the survey's measured air permeability (m³/s per m² at 50 Pa, stored SI) converted to
 *   the engine's m³/(h·m²); else assumed by the year built; no year: the 1965–1980 value, flagged.
 *
 * Example: siteInputs({ terrain: 'urban', storeys: 2, … }).site = { terrain: 'urban', buildingHeight_m: 6 }.
 */
import type { LeakageSource, SiteInput } from '../core/airflow-inputs.ts';
import type { DwellingAgeBand } from '../core/assumed-air-permeability.ts';
import type { LblShelterClass, LblStoreys } from '../core/lbl-infiltration.ts';
import type { TerrainKind } from '../core/reference-wind-speed.ts';
import { cubicMetresPerHour } from '../core/units.ts';
import type { Survey } from '../model/survey.ts';
import { analysisWarning, type AnalysisWarning } from './analysis-warnings.ts';

/** Storey height assumed for the building height, m (common practice (no published source)). */
export const ASSUMED_STOREY_HEIGHT_M = 3;

const TERRAIN: Readonly<Record<NonNullable<Survey['terrain']>, TerrainKind>> = {
  'open-country': 'open-flat-country',
  'country-with-windbreaks': 'country-scattered-windbreaks',
  urban: 'urban',
  'city-centre': 'city',
};

const SHELTER: Readonly<Record<NonNullable<Survey['shelter']>, { shelterClass: LblShelterClass; shelteredSides: number }>> = {
  exposed: { shelterClass: 2, shelteredSides: 0 },
  normal: { shelterClass: 3, shelteredSides: 2 },
  sheltered: { shelterClass: 4, shelteredSides: 4 },
};

/** Upper year of each age band, oldest first. */
const AGE_BANDS: readonly [number, DwellingAgeBand][] = [
  [1918, 'before-1919'],
  [1944, '1919-1944'],
  [1964, '1945-1964'],
  [1980, '1965-1980'],
  [1995, '1981-1995'],
  [2005, '1996-2005'],
  [2013, '2006-2013'],
];

/**
 * Age band of a year built. Example: ageBandOf(1968) = '1965-1980'; ageBandOf(2020) = '2014-on'.
 */
export function ageBandOf(year: number): DwellingAgeBand {
  return AGE_BANDS.find(([upTo]) => year <= upTo)?.[1] ?? '2014-on';
}

export interface SiteInputs {
  site: SiteInput;
  leakage: LeakageSource;
  storeys: LblStoreys;
  shelterClass: LblShelterClass;
  shelteredSides: number;
  warnings: AnalysisWarning[];
}

/** The site and leakage inputs of a survey (see the file note). */
export function siteInputs(survey: Survey): SiteInputs {
  const warnings: AnalysisWarning[] = [];
  const storeys = survey.storeys ?? 2;
  const shelter = SHELTER[survey.shelter ?? 'normal'];
  let leakage: LeakageSource;
  if (survey.airPermeability) {
    leakage = { basis: 'measured-air-permeability', q50_m3hm2: cubicMetresPerHour(survey.airPermeability.q50_m3sm2) };
  } else {
    const band = ageBandOf(survey.builtYear ?? 1970);
    leakage = { basis: 'assumed', assumed: { by: 'age', ageBand: band } };
    if (survey.builtYear === undefined) {
      warnings.push(
        analysisWarning(
          'leakage-age-assumed',
          'caution',
          'Neither a pressure test nor the year built is recorded, so air leakage is assumed for a 1965–1980 building. Record the year built.',
        ),
      );
    }
  }
  const assumed = [
    survey.terrain === undefined ? 'urban terrain (for the wind at the building)' : null,
    survey.storeys === undefined ? '2 storeys (for the wind and the stack effect)' : null,
    survey.shelter === undefined ? 'some shelter from neighbouring buildings (for the leakage)' : null,
  ].filter((x): x is string => x !== null);
  if (assumed.length > 0) {
    const list = assumed.length === 1 ? assumed[0]! : `${assumed.slice(0, -1).join(', ')} and ${assumed.at(-1)!}`;
    warnings.push(analysisWarning('state-assumed', 'info', `Not recorded, so assumed: ${list}. Record ${assumed.length === 1 ? 'it' : 'them'} on the survey details.`));
  }
  return {
    site: { terrain: TERRAIN[survey.terrain ?? 'urban'], buildingHeight_m: storeys * ASSUMED_STOREY_HEIGHT_M },
    leakage,
    storeys: Math.min(3, Math.max(1, storeys)) as LblStoreys,
    shelterClass: shelter.shelterClass,
    shelteredSides: shelter.shelteredSides,
    warnings,
  };
}
