/**
 * Use case: start a survey. Validates what was typed, gives the survey an id and timestamps,
 * saves it durably, and after the first real save asks the browser to protect stored data.
 * Returns the saved survey, or the problems with what was typed (nothing is saved then).
 */
import { newSurveyInputSchema, type NewSurveyInput, type Survey } from '../model/survey.ts';
import { newSurveyRecord } from '../model/survey-defaults.ts';
import { validationProblems, type ValidationProblem } from '../model/validation-problem.ts';
import { saveSurvey } from '../store/surveys.ts';
import { connection } from './storage-connection.ts';
import { deviceStatus } from './device-status.svelte.ts';

export type NewSurveyResult = { ok: true; survey: Survey } | { ok: false; problems: ValidationProblem[] };

/** Essentials chosen on the start form besides title, site and use (each may be left unset). */
export type NewSurveyChoices = Pick<Survey, 'ventilation' | 'criteria'>;

export async function startSurvey(input: NewSurveyInput, now: Date = new Date(), choices: NewSurveyChoices = {}): Promise<NewSurveyResult> {
  const parsed = newSurveyInputSchema.safeParse(input);
  if (!parsed.success) return { ok: false, problems: validationProblems(parsed.error) };
  const chosen = Object.fromEntries(Object.entries(choices).filter(([, v]) => v !== undefined));
  const survey = await saveSurvey(connection, { ...newSurveyRecord(parsed.data, crypto.randomUUID(), now.toISOString()), ...chosen });
  void deviceStatus.requestProtection();
  return { ok: true, survey };
}
