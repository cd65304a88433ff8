/**
 * Header saves from two forms on one screen (the essentials, the building facts) that start at
 * the same moment both land: each starts from what the one before it wrote (src/app/update-survey-header.ts).
 */
import 'fake-indexeddb/auto';
import { describe, it, expect } from 'vitest';
import { knowHeader, updateSurveyHeader } from '../../src/app/update-survey-header.ts';
import { connection } from '../../src/app/storage-connection.ts';
import { newSurveyRecord } from '../../src/model/survey-defaults.ts';
import { getSurvey, saveSurvey } from '../../src/store/surveys.ts';

describe('saving the survey header', () => {
  it('keeps both of two patches saved at once', async () => {
    const id = '0f0f0003-0000-4000-8000-000000000001';
    const stored = await saveSurvey(connection, newSurveyRecord({ title: 'Block C (invented)', site: '', buildingUse: 'school' }, id, '2026-01-14T09:00:00.000Z'));
    knowHeader(stored);
    await Promise.all([
      updateSurveyHeader(id, { title: 'Block C, ground floor (invented)', buildingUse: 'school' }, new Date('2026-01-14T09:01:00Z')),
      updateSurveyHeader(id, { terrain: 'open-country', shelter: 'exposed', storeys: 2 }, new Date('2026-01-14T09:01:00Z')),
    ]);
    const after = await getSurvey(connection, id);
    expect(after).toMatchObject({ title: 'Block C, ground floor (invented)', terrain: 'open-country', shelter: 'exposed', storeys: 2, updatedAt: '2026-01-14T09:01:00.000Z' });
  });
});
