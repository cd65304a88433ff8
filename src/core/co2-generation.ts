/**
 * CO2 output of occupants by Persily & de Jonge (2017), "Carbon dioxide generation rates for
 * building occupants", Indoor Air 27(5):868–879, doi 10.1111/ina.12383:
 *
 *     V_CO2 [L/s] = RQ · BMR [MJ/day] · M [met] · (T [K] / P [kPa]) · 0.000211
 *
 * RQ 0.85 and the constant 0.000211 are from memory (references.md §1.1); together they
 * reproduce every cell of the paper's table within 0.0001 L/s (test/core/co2-generation.test.ts).
 * Output here in m³/s at the room's temperature and pressure (the table is at 273.15 K, 101.325 kPa).
 */
import { defaultBodyMass, type AgeBand, type Sex } from './age-bands.ts';
import { schofieldBmr } from './schofield-bmr.ts';
import { fromLitresPerSecond, kelvin, kilopascals, STANDARD_PRESSURE_PA } from './units.ts';

/** Persily & de Jonge constant, L·kPa·day/(s·K·MJ) (from memory; fits the paper's table). */
export const PERSILY_CONSTANT = 0.000211;
/** Respiratory quotient assumed by Persily & de Jonge (from memory). */
export const DEFAULT_RESPIRATORY_QUOTIENT = 0.85;

/** Air state at which the CO2 volume is wanted. */
export interface AirState {
  /** Temperature, °C. */
  temp_C: number;
  /** Pressure, Pa. */
  pressure_Pa: number;
}

/** The state of the paper's table: 0 °C, 101 325 Pa. */
export const TABLE_AIR_STATE: AirState = { temp_C: 0, pressure_Pa: STANDARD_PRESSURE_PA };

/**
 * CO2 output of one person, m³/s, from BMR (MJ/day) and activity (met) at the given air state.
 * Example: persilyCo2Output(8.2447, 1.2, { temp_C: 20, pressure_Pa: 101325 }) = 5.134e-6 m³/s
 * (0.005134 L/s; references.md §7.1).
 */
export function persilyCo2Output(
  bmr_MJday: number,
  met: number,
  air: AirState,
  respiratoryQuotient = DEFAULT_RESPIRATORY_QUOTIENT,
): number {
  const litresPerSecond =
    respiratoryQuotient * bmr_MJday * met * (kelvin(air.temp_C) / kilopascals(air.pressure_Pa)) * PERSILY_CONSTANT;
  return fromLitresPerSecond(litresPerSecond);
}

/** A group of similar occupants. */
export interface OccupantGroup {
  /** Number of people (may be fractional for average occupancy). */
  count: number;
  ageBand: AgeBand;
  /** 'mixed' means half male, half female. */
  sex: Sex | 'mixed';
  /** Body mass, kg; default: the paper's mean for the band and sex. */
  bodyMass_kg?: number;
  /** Activity level, met (Persily & de Jonge's Compendium-based scale). */
  met: number;
}

/** Output of one group, with the body mass and BMR it assumed. */
export interface GroupOutput {
  group: OccupantGroup;
  /** Per person, m³/s. */
  perPerson_m3s: number;
  /** count × per person, m³/s. */
  total_m3s: number;
  /** BMR used per sex, MJ/day (both for a mixed group). */
  bmr_MJday: { male?: number; female?: number };
}

/** CO2 output of all occupants. */
export interface OccupantsOutput {
  /** Total CO2 output, m³/s at the stated air state. */
  total_m3s: number;
  /** Number of people. */
  count: number;
  perGroup: GroupOutput[];
  air: AirState;
}

function perPersonForSex(group: OccupantGroup, sex: Sex, air: AirState): [number, number] {
  const mass = group.bodyMass_kg ?? defaultBodyMass(group.ageBand, sex);
  const bmr = schofieldBmr(group.ageBand, sex, mass);
  return [persilyCo2Output(bmr, group.met, air), bmr];
}

/**
 * CO2 output of a list of occupant groups (m³/s), by Persily & de Jonge with Schofield BMR.
 * Example: 15 boys + 15 girls aged 6–11 at 1.2 met and one woman 30–40 at 1.4 met, at 0 °C and
 * 101 325 Pa → total 9.00e-5 m³/s (0.0900 L/s; the table's rounded cells give 0.0896).
 */
export function occupantCo2Output(groups: readonly OccupantGroup[], air: AirState): OccupantsOutput {
  const perGroup = groups.map((group): GroupOutput => {
    let perPerson: number;
    const bmr: GroupOutput['bmr_MJday'] = {};
    if (group.sex === 'mixed') {
      const [male, bmrMale] = perPersonForSex(group, 'male', air);
      const [female, bmrFemale] = perPersonForSex(group, 'female', air);
      perPerson = (male + female) / 2;
      bmr.male = bmrMale;
      bmr.female = bmrFemale;
    } else {
      const [value, bmrValue] = perPersonForSex(group, group.sex, air);
      perPerson = value;
      bmr[group.sex] = bmrValue;
    }
    return { group, perPerson_m3s: perPerson, total_m3s: perPerson * group.count, bmr_MJday: bmr };
  });
  return {
    total_m3s: perGroup.reduce((sum, g) => sum + g.total_m3s, 0),
    count: groups.reduce((sum, g) => sum + g.count, 0),
    perGroup,
    air,
  };
}
