/**
 * The criteria sets a survey can be judged against, and the one a building use starts with.
 * Example: criteriaFor('school') = { setId: 'schools', version: '1', overrides: [] }.
 */
import { CRITERIA_DATA_VERSION, listCriteriaSets } from '../core/criteria/criteria-sets.ts';
import type { BuildingUse } from '../core/building-uses.ts';
import type { Survey } from '../model/survey.ts';

export const CRITERIA_OPTIONS = listCriteriaSets().map((s) => ({ id: s.id, label: s.title }));

const BY_USE: Record<BuildingUse, string | undefined> = { school: 'schools', dwelling: 'dwellings', office: 'workplaces', other: undefined };

export function criteriaChoice(setId: string, overrides: NonNullable<Survey['criteria']>['overrides'] = []): NonNullable<Survey['criteria']> {
  return { setId, version: String(CRITERIA_DATA_VERSION), overrides };
}

export function criteriaFor(use: BuildingUse): Survey['criteria'] {
  const setId = BY_USE[use];
  return setId ? criteriaChoice(setId) : undefined;
}
