/**
 * Issued revisions are locked: once the findings of revision n have been issued, changes go
 * into revision n + 1, so what was issued can always be told apart from what came after.
 *
 * Example: a survey at revision 2 with revision 2 issued is locked; editableRevision gives it
 * revision 3. A survey at revision 3 (not yet issued) is returned unchanged.
 */
import type { Survey } from './survey.ts';

/** True when the revision being worked on has been issued. */
export function isIssued(survey: Pick<Survey, 'revision' | 'issued'>): boolean {
  return survey.issued.some((r) => r.revision === survey.revision);
}

/** The survey ready for an edit: unchanged while its revision is a draft, the next revision once issued. */
export function editableRevision<T extends Pick<Survey, 'revision' | 'issued'>>(survey: T): T {
  return isIssued(survey) ? { ...survey, revision: survey.revision + 1 } : survey;
}
