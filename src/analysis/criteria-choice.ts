/**
 * The criteria a survey is judged by: the shipped data (src/core/criteria) with the survey's
 * recorded overrides applied as edits (who, why, old and new value), and the stamp the results
 * carry so a report can say which set, which data version and which edits it used.
 *
 * - Set: the survey's chosen set id, else the set for its building use (school → schools,
 *   dwelling → dwellings, office and other → workplaces). Selection per room still reads every
 *   set's coverage (a school's staff are covered by the workplace set).
 * - Overrides ({ thresholdId, value, reason }) become limit edits by the first surveyor named.
 *   An override naming an unknown threshold is not applied, with a caution.
 *
 * Example: a school survey overriding 'hse-co2-action' to 1200 ppm → stamp { setId: 'schools',
 * version: 1, edits: [{ criterionId: 'hse-co2-action', field: 'limit', oldValue: 1500, newValue: 1200, … }] }.
 */
import { allCriteria, CRITERIA_DATA_VERSION } from '../core/criteria/criteria-sets.ts';
import { applyCriterionEdits, type CriterionEdit, type EditedCriterion } from '../core/criteria/criterion-edits.ts';
import type { Survey } from '../model/survey.ts';
import { analysisWarning, fromMoistureWarning, type AnalysisWarning } from './analysis-warnings.ts';
import type { CriteriaStamp } from './results.ts';

const SET_FOR_USE: Readonly<Record<Survey['buildingUse'], string>> = { school: 'schools', dwelling: 'dwellings', office: 'workplaces', other: 'workplaces' };

/**
 * The survey's criteria with its edits, and the stamp.
 * Example: surveyCriteria(survey).stamp.version = CRITERIA_DATA_VERSION.
 */
export function surveyCriteria(survey: Survey): { criteria: EditedCriterion[]; stamp: CriteriaStamp; warnings: AnalysisWarning[] } {
  const shipped = allCriteria();
  const by = survey.surveyors[0]?.name ?? 'surveyor (not named)';
  const edits: CriterionEdit[] = (survey.criteria?.overrides ?? []).map((o) => ({
    criterionId: o.thresholdId,
    field: 'limit',
    oldValue: shipped.find((c) => c.id === o.thresholdId)?.limit ?? null,
    newValue: o.value,
    by,
    reason: o.reason,
  }));
  const applied = applyCriterionEdits(shipped, edits);
  const warnings = applied.warnings.map(fromMoistureWarning);
  if (survey.criteria && survey.criteria.version !== String(CRITERIA_DATA_VERSION)) {
    warnings.push(analysisWarning('criteria-version-differs', 'info', `The survey chose criteria version ${survey.criteria.version}; this analysis uses version ${CRITERIA_DATA_VERSION} of the criteria data.`));
  }
  return {
    criteria: applied.criteria,
    stamp: { setId: survey.criteria?.setId ?? SET_FOR_USE[survey.buildingUse], version: CRITERIA_DATA_VERSION, edits: applied.applied },
    warnings,
  };
}
