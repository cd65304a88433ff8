/**
 * Daily moisture release of a whole household by BS 5250 occupancy class, for a first
 * screening when the activities are not known. BS 5250:2002 Table 1 as recalled (from memory;
 * the 2011 and 2021 editions changed the layout — not yet confirmed against BS 5250:2021):
 *
 *     persons        1     2     3     4     5     6
 *     dry (kg/day)   3.5   4     4     5     6     7
 *     moist          6     8     9     10    11    12
 *     wet            9     11    12    14    15    16
 *
 * "Dry", "moist" and "wet" describe how much water the household's daily activities release
 * (drying washing indoors, many baths, cooking without extract), not how the occupants live.
 * The 9 kg/day for one person in the wet class is also quoted in a surveyors' article
 * (secondary source).
 */
import { SECONDS_PER_HOUR } from './units.ts';

/** BS 5250 occupancy moisture classes. */
export type OccupancyMoistureClass = 'dry' | 'moist' | 'wet';

const KG_PER_DAY: Record<OccupancyMoistureClass, readonly number[]> = {
  dry: [3.5, 4, 4, 5, 6, 7],
  moist: [6, 8, 9, 10, 11, 12],
  wet: [9, 11, 12, 14, 15, 16],
};

/** Daily release of a household: kg/day, the mean rate in kg/s, and the source. */
export interface HouseholdMoisture {
  perDay_kg: number;
  meanRate_kgs: number;
  source: string;
  /** Set when the household size lies outside the table and the nearest row was used. */
  clamped: boolean;
}

/**
 * Daily moisture release of a household of `persons` people in an occupancy class. Sizes
 * outside 1–6 use the nearest row and say so. Example: householdMoisture(4, 'moist') =
 * { perDay_kg: 10, meanRate_kgs: 1.157e-4, … }.
 */
export function householdMoisture(persons: number, occupancy: OccupancyMoistureClass): HouseholdMoisture {
  const row = KG_PER_DAY[occupancy];
  const index = Math.min(row.length, Math.max(1, Math.round(persons))) - 1;
  const perDay = row[index] ?? 0;
  return {
    perDay_kg: perDay,
    meanRate_kgs: perDay / (24 * SECONDS_PER_HOUR),
    source: 'BS 5250:2002 Table 1, household moisture by occupancy (from memory; not yet confirmed against BS 5250:2021)',
    clamped: index + 1 !== persons,
  };
}
