/**
 * Use case: start the next visit to a building from an earlier survey of it. The earlier survey
 * is read (without photos), copied as model/repeat-visit.ts says — building, areas, rooms,
 * sizes, openings, appliances and occupants; never readings, tests, defects, photos, answers or
 * logger series — checked by the model, and saved as a new survey through the same
 * all-or-nothing import as a backup. The earlier survey is not touched.
 */
import { repeatVisit, type RepeatVisitInput } from '../model/repeat-visit.ts';
import { surveyDocumentSchema } from '../model/survey-document.ts';
import { makeSurveyFile } from '../model/survey-file.ts';
import type { Survey } from '../model/survey.ts';
import { validationProblems, type ValidationProblem } from '../model/validation-problem.ts';
import { importSurveys } from '../store/backup.ts';
import { loadSurvey } from '../store/load-survey.ts';
import { connection } from './storage-connection.ts';
import { deviceStatus } from './device-status.svelte.ts';
import { surveyList } from './survey-list.svelte.ts';

export type RepeatVisitResult = { ok: true; survey: Survey } | { ok: false; problems: ValidationProblem[] };

export async function startRepeatVisit(previousSurveyId: string, input: RepeatVisitInput = {}, now: Date = new Date()): Promise<RepeatVisitResult> {
  const previous = await loadSurvey(connection, previousSurveyId, { photos: false });
  if (!previous) return { ok: false, problems: [{ field: '', message: 'The earlier survey is no longer on this device' }] };
  const stamp = now.toISOString();
  const next = surveyDocumentSchema.safeParse(repeatVisit(previous, () => crypto.randomUUID(), stamp, input));
  if (!next.success) return { ok: false, problems: validationProblems(next.error) };
  await importSurveys(connection, makeSurveyFile([next.data], stamp, __APP_VERSION__), {}, () => crypto.randomUUID());
  void deviceStatus.requestProtection().catch(() => undefined);
  await surveyList.refresh();
  return { ok: true, survey: next.data.survey };
}
