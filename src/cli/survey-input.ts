/**
 * Read survey files for a command: the same checks and the same messages as the app's import
 * (src/model/survey-file.ts readSurveyFile and its validation problems), each problem printed as
 * "<file>: <field>: <message> (found <value>)".
 *
 * Example: a file with an empty survey title gives
 * 'demo.json: surveys.0.survey.title: Survey title is empty: give the survey a name (found "")'.
 */
import { readSurveyFile } from '../model/survey-file.ts';
import { surveyDocumentSchema, type SurveyDocument } from '../model/survey-document.ts';
import type { ValidationProblem } from '../model/validation-problem.ts';
import type { CommandIo } from './command-io.ts';

/** Problems printed in full; the rest are counted. */
export const PROBLEMS_SHOWN = 20;

function found(value: unknown): string {
  const text = JSON.stringify(value);
  if (text === undefined) return '';
  return ` (found ${text.length > 60 ? `${text.slice(0, 57)}…` : text})`;
}

/** One problem as a line. */
export function problemLine(file: string, p: ValidationProblem): string {
  return `${file}: ${p.field ? `${p.field}: ` : ''}${p.message}${'value' in p ? found(p.value) : ''}`;
}

/** The surveys of a file, or null after printing why it was refused. */
export async function readSurveys(path: string, io: CommandIo): Promise<SurveyDocument[] | null> {
  let text: string;
  try {
    text = await io.readFile(path);
  } catch (error) {
    io.err(`${path}: the file could not be read: ${error instanceof Error ? error.message : String(error)}`);
    return null;
  }
  const result = readSurveyFile(text);
  if (!result.ok) {
    for (const p of result.problems.slice(0, PROBLEMS_SHOWN)) io.err(problemLine(path, p));
    if (result.problems.length > PROBLEMS_SHOWN) io.err(`${path}: and ${result.problems.length - PROBLEMS_SHOWN} more problems`);
    io.err(`${path}: not a usable survey file; nothing was analysed.`);
    return null;
  }
  if (result.file.surveys.length === 0) {
    io.err(`${path}: the file holds no surveys.`);
    return null;
  }
  return result.file.surveys.map((s) => surveyDocumentSchema.parse(s));
}
