/**
 * Builds a criterion for a legal duty that has no number (a hazard rating, fitness for
 * habitation, "adequate ventilation"): metric 'qualitative-duty', no limit, no direction, no
 * averaging period. The selection lists these as duties, never as pass or fail.
 */
import type { Criterion } from './criterion.ts';

/**
 * A legal duty as a criterion. Example: legalDuty({ id: 'x', group: 'x', title: 'T', source,
 * confidence: 'secondary', covers }) → { …, metric: 'qualitative-duty', limit: null,
 * direction: 'none', period: 'not-applicable', status: 'law' }.
 */
export function legalDuty(row: Pick<Criterion, 'id' | 'group' | 'title' | 'source' | 'confidence' | 'covers' | 'note'>): Criterion {
  return { ...row, metric: 'qualitative-duty', period: 'not-applicable', status: 'law', limit: null, direction: 'none' };
}
