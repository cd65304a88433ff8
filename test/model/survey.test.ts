import { describe, it, expect } from 'vitest';
import { surveySchema, newSurveyInputSchema } from '../../src/model/survey.ts';
import { newSurveyRecord, completeSurveyRecord } from '../../src/model/survey-defaults.ts';
import { validationProblems } from '../../src/model/validation-problem.ts';

const valid = newSurveyRecord(
  { title: 'Spring walk-round (invented)', site: 'Brackenford Primary (invented)', buildingUse: 'school' },
  '3f2b7c1e-8d4a-4f6b-9c2d-1a2b3c4d5e6f',
  '2026-11-30T09:00:00+01:00',
);

describe('survey schema', () => {
  it('accepts a new record, which starts at revision 1 with nothing invented', () => {
    expect(surveySchema.parse(valid)).toEqual(valid);
    expect(valid).toMatchObject({ revision: 1, units: 'si', surveyors: [], notes: '', client: '' });
    expect(valid).not.toHaveProperty('storeys');
  });

  it('brings a header stored by the first release up to the current shape', () => {
    const old = { id: valid.id, title: 'Old', site: '', buildingUse: 'office' as const, createdAt: valid.createdAt, updatedAt: valid.updatedAt };
    expect(surveySchema.parse(completeSurveyRecord(old))).toMatchObject({ ...old, revision: 1, issued: [] });
  });

  it('names the field, the problem and the value for bad input', () => {
    const input = { ...valid, title: '', buildingUse: 'castle', createdAt: 'yesterday', storeys: 2.5 };
    const result = surveySchema.safeParse(input);
    expect(result.success).toBe(false);
    const problems = validationProblems(result.error!, input);
    expect(problems.map((p) => p.field).sort()).toEqual(['buildingUse', 'createdAt', 'storeys', 'title']);
    expect(problems.find((p) => p.field === 'title')).toEqual({ field: 'title', message: expect.stringMatching(/title is empty/), value: '' });
    expect(problems.find((p) => p.field === 'storeys')!.message).toBe('Storeys must be a whole number');
  });

  it('says a field is missing rather than that it has the wrong type', () => {
    const { notes: _notes, ...input } = valid;
    const problems = validationProblems(surveySchema.safeParse(input).error!, input);
    expect(problems).toEqual([{ field: 'notes', message: 'is missing' }]);
  });

  it('never treats an empty field as a number or a default', () => {
    expect(newSurveyInputSchema.safeParse({ title: 'x', site: '', buildingUse: '' }).success).toBe(false);
    expect(surveySchema.safeParse({ ...valid, storeys: '' }).success).toBe(false);
  });

  it('keeps hostile text as plain text (the screens escape it)', () => {
    const title = '<img src=x onerror=alert(1)>';
    expect(surveySchema.parse({ ...valid, title }).title).toBe(title);
  });
});
