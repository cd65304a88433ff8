/**
 * The analysis, off the page's thread: a module worker that runs analyseSurvey on the survey
 * document it is sent and posts the results back with the request's number. Typing never waits
 * for it, and the engine stays out of the start-up JavaScript.
 */
import { analyseSurvey, type AnalysisOptions } from '../analysis/analyse-survey.ts';
import type { SurveyDocument } from '../model/survey-document.ts';

export interface AnalysisRequest {
  id: number;
  document: SurveyDocument;
  options?: AnalysisOptions;
}

self.onmessage = (event: MessageEvent<AnalysisRequest>) => {
  const { id, document, options } = event.data;
  try {
    self.postMessage({ id, results: analyseSurvey(document, options) });
  } catch (error) {
    self.postMessage({ id, error: error instanceof Error ? error.message : String(error) });
  }
};
