/**
 * The criteria sets the app ships, by kind of building, and the version stamped on results so
 * a report can say which edition of our criteria data it used.
 */
import type { Criterion, CriteriaSet } from './criterion.ts';
import { DWELLING_CRITERIA } from './dwelling-criteria.ts';
import { SCHOOL_CRITERIA } from './school-criteria.ts';
import { WORKPLACE_CRITERIA } from './workplace-criteria.ts';

/** Version of the criteria data; raise it whenever a value, tag or coverage changes. */
export const CRITERIA_DATA_VERSION = 1;

const SETS: readonly CriteriaSet[] = [
  { id: 'schools', title: 'Schools (England): teaching spaces', criteria: SCHOOL_CRITERIA },
  { id: 'dwellings', title: 'Homes (England): new work and existing or rented homes', criteria: DWELLING_CRITERIA },
  { id: 'workplaces', title: 'Workplaces (Great Britain), including school and office staff', criteria: WORKPLACE_CRITERIA },
];

/**
 * All criteria sets. Example: listCriteriaSets().map((s) => s.id) = ['schools', 'dwellings', 'workplaces'].
 */
export function listCriteriaSets(): readonly CriteriaSet[] {
  return SETS;
}

/**
 * Every criterion of every set, in set order. Example: allCriteria().length = 53.
 */
export function allCriteria(): readonly Criterion[] {
  return SETS.flatMap((s) => s.criteria);
}
