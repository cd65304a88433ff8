/**
 * Use case: copy a whole survey (every record with a new id, photos included) as a new survey
 * titled "… (copy)", to start a similar job or a revisit from it.
 */
import { MAX_NAME_LENGTH } from '../model/survey.ts';
import { withFreshIds } from '../model/fresh-ids.ts';
import { makeSurveyFile } from '../model/survey-file.ts';
import { loadSurvey } from '../store/load-survey.ts';
import { importSurveys } from '../store/backup.ts';
import { connection } from './storage-connection.ts';
import { surveyList } from './survey-list.svelte.ts';

export async function duplicateSurvey(surveyId: string, now: Date = new Date()): Promise<void> {
  const doc = await loadSurvey(connection, surveyId, { photos: true });
  if (!doc) throw new Error('This survey is no longer on the device');
  const copy = withFreshIds(doc, () => crypto.randomUUID());
  const title = `${doc.survey.title} (copy)`;
  const stamp = now.toISOString();
  copy.survey = { ...copy.survey, title: title.length <= MAX_NAME_LENGTH ? title : doc.survey.title, createdAt: stamp, updatedAt: stamp };
  await importSurveys(connection, makeSurveyFile([copy], stamp, __APP_VERSION__), {}, () => crypto.randomUUID());
  await surveyList.refresh();
}
