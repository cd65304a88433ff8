/** The committed fixtures, read as text and as parsed JSON. */
import { readFileSync } from 'node:fs';
import type { SurveyFile } from '../../src/model/survey-file.ts';

export const DEMO_SURVEY_URL = new URL('../fixtures/demo-survey.json', import.meta.url);

/** The text of a fixture under test/fixtures, e.g. 'formats/ventwalk-survey-v1.json'. */
export function fixtureText(path: string): string {
  return readFileSync(new URL(`../fixtures/${path}`, import.meta.url), 'utf8');
}

/** The demo survey file (three invented surveys), as parsed JSON. */
export function demoFile(): SurveyFile {
  return JSON.parse(fixtureText('demo-survey.json')) as SurveyFile;
}
