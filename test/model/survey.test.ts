import { describe, it, expect } from 'vitest';
import { surveySchema, newSurveyInputSchema } from '../../src/model/survey.ts';
import { validationProblems } from '../../src/model/validation-problem.ts';

const valid = {
  id: '3f2b7c1e-8d4a-4f6b-9c2d-1a2b3c4d5e6f',
  title: 'Spring walk-round (invented)',
  site: 'Brackenford Primary (invented)',
  buildingUse: 'school',
  createdAt: '2026-11-30T09:00:00Z',
  updatedAt: '2026-11-30T09:00:00+01:00',
};

describe('survey schema', () => {
  it('accepts a complete record', () => {
    expect(surveySchema.parse(valid)).toEqual(valid);
  });

  it('names the field and the problem for bad input', () => {
    const result = surveySchema.safeParse({ ...valid, title: '', buildingUse: 'castle', createdAt: 'yesterday' });
    expect(result.success).toBe(false);
    const problems = validationProblems(result.error!);
    expect(problems.map((p) => p.field).sort()).toEqual(['buildingUse', 'createdAt', 'title']);
    expect(problems.find((p) => p.field === 'title')!.message).toMatch(/title is empty/);
  });

  it('never treats an empty field as a number or a default', () => {
    const result = newSurveyInputSchema.safeParse({ title: 'x', site: '', buildingUse: '' });
    expect(result.success).toBe(false);
  });

  it('keeps hostile text as plain text (the screens escape it)', () => {
    const title = '<img src=x onerror=alert(1)>';
    expect(surveySchema.parse({ ...valid, title }).title).toBe(title);
  });
});
