/**
 * Use case: load the demo surveys (our own invented school, flats and office) from the app's
 * copy of the demo file, checked like any backup, and imported in one transaction. Loading it
 * again adds copies beside the ones already loaded; nothing on the device is replaced.
 */
import { readSurveyFile } from '../model/survey-file.ts';
import { importSurveys, planImport, type ClashChoice } from '../store/backup.ts';
import { connection } from './storage-connection.ts';
import { surveyList } from './survey-list.svelte.ts';

/** Where the app's copy of test/fixtures/demo-survey.json is served (kept identical by a test). */
export const DEMO_URL = './demo-survey.json';

export async function loadDemo(): Promise<number> {
  const response = await fetch(DEMO_URL);
  if (!response.ok) throw new Error(`The demo file could not be read (${response.status})`);
  const result = readSurveyFile(await response.text());
  if (!result.ok) throw new Error(`The demo file has problems: ${result.problems[0]?.message ?? 'unknown'}`);
  const plan = await planImport(connection, result.file);
  const choices: Record<string, ClashChoice> = Object.fromEntries(plan.filter((p) => p.onDevice).map((p) => [p.surveyId, 'keep-both']));
  const imported = await importSurveys(connection, result.file, choices, () => crypto.randomUUID());
  await surveyList.refresh();
  return imported.length;
}
