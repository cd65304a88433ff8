/**
 * Per-survey edits to criteria: a surveyor may change a limit or an averaging period for one
 * survey (a client's own target, a newer edition of a document). Every edit records who made
 * it, what it changed, why, and the old and new values, so the report can show it beside the
 * finding. The shipped data are never changed; the edits are applied to a copy.
 */
import { moistureWarning, type MoistureWarning } from '../moisture-warnings.ts';
import type { AveragingPeriod, Criterion } from './criterion.ts';

/** One edit to one field of one criterion. */
export type CriterionEdit = {
  criterionId: string;
  /** Who made it (name or role). */
  by: string;
  /** Why, in words, for the report. */
  reason: string;
  /** When, as the caller's own time stamp text (the engine has no clock). */
  at?: string;
} & (
  | { field: 'limit'; oldValue: number | null; newValue: number | null }
  | { field: 'areaTerm_m3s_m2'; oldValue: number | undefined; newValue: number }
  | { field: 'period'; oldValue: AveragingPeriod; newValue: AveragingPeriod }
);

/** A criterion with the edits applied to it (an empty list when unedited). */
export interface EditedCriterion extends Criterion {
  edits: readonly CriterionEdit[];
}

/**
 * Apply edits in order to a copy of the criteria. An edit naming an unknown criterion, or whose
 * old value no longer matches (the data changed since it was made), is skipped with a warning.
 * Example: applying { criterionId: 'hse-co2-action', field: 'limit', oldValue: 1500,
 * newValue: 1200, by: 'A. Surveyor', reason: 'client target' } gives that criterion limit 1200
 * and edits [that edit]; every other criterion has edits [].
 */
export function applyCriterionEdits(
  criteria: readonly Criterion[],
  edits: readonly CriterionEdit[],
): { criteria: EditedCriterion[]; applied: CriterionEdit[]; warnings: MoistureWarning[] } {
  const out: EditedCriterion[] = criteria.map((c) => ({ ...c, edits: [] }));
  const byId = new Map(out.map((c, i) => [c.id, i]));
  const applied: CriterionEdit[] = [];
  const warnings: MoistureWarning[] = [];
  for (const edit of edits) {
    const index = byId.get(edit.criterionId);
    const current = index === undefined ? undefined : out[index];
    if (index === undefined || current === undefined) {
      warnings.push(moistureWarning('edit-unknown-criterion', `An edit names a criterion "${edit.criterionId}" that is not in the list; it was not applied.`));
      continue;
    }
    if (current[edit.field] !== edit.oldValue) {
      warnings.push(
        moistureWarning(
          'edit-stale-value',
          `An edit to ${edit.field} of "${edit.criterionId}" expected ${String(edit.oldValue)} but found ${String(current[edit.field])}; it was not applied.`,
        ),
      );
      continue;
    }
    out[index] = { ...current, [edit.field]: edit.newValue, edits: [...current.edits, edit] };
    applied.push(edit);
  }
  return { criteria: out, applied, warnings };
}
