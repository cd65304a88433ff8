/**
 * Use cases for keeping personal data no longer than needed: the period the surveyor keeps
 * surveys on the phone (remembered in the store's meta), the surveys past it, and deleting a
 * survey's photos while keeping its measurements.
 */
import { listSurveys } from '../store/surveys.ts';
import { readMeta, writeMeta } from '../store/meta.ts';
import { deleteSurveyPhotos } from '../store/photos.ts';
import { connection } from './storage-connection.ts';
import { surveysPastRetention, type PastRetention } from './retention-reminder.ts';

/** The chosen period in months, or undefined when none was chosen. */
export async function readRetentionMonths(): Promise<number | undefined> {
  return readMeta(connection, 'retentionMonths');
}

/** Choose the period (whole months, 1-120), or undefined to stop the reminder. */
export async function chooseRetentionMonths(months: number | undefined): Promise<void> {
  if (months !== undefined && !(Number.isInteger(months) && months >= 1 && months <= 120)) {
    throw new RangeError('Keep surveys for a whole number of months from 1 to 120');
  }
  await writeMeta(connection, 'retentionMonths', months);
}

/** Surveys kept longer than the chosen period (none when no period is chosen). */
export async function retentionReminder(now: Date = new Date()): Promise<PastRetention[]> {
  const [months, surveys] = await Promise.all([readRetentionMonths(), listSurveys(connection)]);
  return surveysPastRetention(surveys, months, now);
}

/** Delete every photo of a survey, keeping everything else; returns how many were deleted. */
export async function deletePhotosOf(surveyId: string, now: Date = new Date()): Promise<number> {
  return deleteSurveyPhotos(connection, surveyId, now.toISOString());
}
