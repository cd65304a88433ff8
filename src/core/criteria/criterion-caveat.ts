/**
 * The caveat a report prints beside a value that has not been checked against its document.
 */
import type { Criterion } from './criterion.ts';

/**
 * "not yet confirmed against <document, edition>" for a value from memory; "seen only in a
 * secondary summary, not yet confirmed against <document, edition>" for a secondary one; and
 * an empty string for a confirmed value.
 * Example: for ADF continuous extract (from memory) →
 * 'not yet confirmed against Approved Document F, Volume 1: dwellings (2021 (in force 15 June 2022))'.
 */
export function criterionCaveat(criterion: Pick<Criterion, 'confidence' | 'source'>): string {
  const doc = `${criterion.source.document} (${criterion.source.edition})`;
  if (criterion.confidence === 'from memory') return `not yet confirmed against ${doc}`;
  if (criterion.confidence === 'secondary') return `seen only in a secondary summary, not yet confirmed against ${doc}`;
  return '';
}
