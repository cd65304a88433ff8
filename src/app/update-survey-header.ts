/**
 * Use case: change some fields of a survey's header. Reads the stored header afresh (rooms and
 * readings saved meanwhile move its last-change time and revision), applies the change, moves an
 * issued revision on, and saves it. Several screens edit the header; none overwrites another's
 * fields with a stale copy.
 */
import type { Survey } from '../model/survey.ts';
import { editableRevision } from '../model/revision-lock.ts';
import { getSurvey, saveSurvey } from '../store/surveys.ts';
import { StorageError } from '../store/connection.ts';
import { connection } from './storage-connection.ts';

export type SurveyPatch = Partial<Omit<Survey, 'id' | 'createdAt' | 'updatedAt' | 'revision' | 'issued'>>;

export async function updateSurveyHeader(surveyId: string, patch: SurveyPatch, now: Date = new Date()): Promise<Survey> {
  const stored = await getSurvey(connection, surveyId);
  if (!stored) throw new StorageError('This survey is no longer on the device', 'failed');
  const changed = now.toISOString();
  const updatedAt = Date.parse(changed) > Date.parse(stored.updatedAt) ? changed : stored.updatedAt;
  return saveSurvey(connection, { ...editableRevision(stored), ...patch, updatedAt });
}
