/**
 * The analysis, off the page's thread: a module worker that reads the survey as stored (its own
 * IndexedDB connection: the stored survey is the checked one, and the page need not copy it),
 * runs analyseSurvey and posts the results back with the request's number. Rooms' results are
 * posted in small batches before the rest, so the page never spends long reading one message,
 * and the engine stays out of the start-up JavaScript.
 */
import { analyseSurvey, type AnalysisOptions } from '../analysis/analyse-survey.ts';
import type { SurveyDocument } from '../model/survey-document.ts';
import { Connection } from '../store/connection.ts';
import { loadSurvey } from '../store/load-survey.ts';

export interface AnalysisRequest {
  id: number;
  /** The survey to read from storage, or a document to analyse as it is (a projection). */
  surveyId?: string;
  document?: SurveyDocument;
  options?: AnalysisOptions;
}

/** Rooms' results per message. */
export const ROOMS_PER_MESSAGE = 10;

const connection = new Connection();

self.onmessage = async (event: MessageEvent<AnalysisRequest>) => {
  const { id, surveyId, document, options } = event.data;
  try {
    const doc = document ?? (surveyId ? await loadSurvey(connection, surveyId, { photos: false }) : undefined);
    if (!doc) throw new Error('This survey is no longer on the device');
    const results = analyseSurvey(doc, options);
    for (let i = 0; i < results.rooms.length; i += ROOMS_PER_MESSAGE) {
      self.postMessage({ id, rooms: results.rooms.slice(i, i + ROOMS_PER_MESSAGE) });
    }
    self.postMessage({ id, results: { ...results, rooms: [] } });
  } catch (error) {
    self.postMessage({ id, error: error instanceof Error ? error.message : String(error) });
  }
};
