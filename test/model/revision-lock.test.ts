import { describe, it, expect } from 'vitest';
import { editableRevision, isIssued } from '../../src/model/revision-lock.ts';

const issued = [{ revision: 1, issuedAt: '2026-01-20T10:00:00Z', issuedBy: 'Demo Surveyor (invented)', note: '' }];

describe('issued revisions', () => {
  it('locks the revision that was issued and moves edits to the next', () => {
    const survey = { revision: 1, issued };
    expect(isIssued(survey)).toBe(true);
    expect(editableRevision(survey)).toEqual({ revision: 2, issued });
  });

  it('leaves a draft revision as it is', () => {
    const survey = { revision: 2, issued };
    expect(isIssued(survey)).toBe(false);
    expect(editableRevision(survey)).toBe(survey);
  });
});
