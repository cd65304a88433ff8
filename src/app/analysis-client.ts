/**
 * Talks to the analysis worker: one worker for the app, started on first use; each call posts a
 * snapshot of the document and resolves with that request's results.
 */
import type { AnalysisOptions } from '../analysis/analyse-survey.ts';
import type { AnalysisResults } from '../analysis/results.ts';
import type { SurveyDocument } from '../model/survey-document.ts';

type Reply = { id: number; results?: AnalysisResults; error?: string };

let worker: Worker | undefined;
let nextId = 1;
const waiting = new Map<number, { resolve: (r: AnalysisResults) => void; reject: (e: Error) => void }>();

function theWorker(): Worker {
  if (worker) return worker;
  worker = new Worker(new URL('./analysis-worker.ts', import.meta.url), { type: 'module' });
  worker.onmessage = (event: MessageEvent<Reply>) => {
    const { id, results, error } = event.data;
    const call = waiting.get(id);
    waiting.delete(id);
    if (results) call?.resolve(results);
    else call?.reject(new Error(error ?? 'The analysis gave no results'));
  };
  worker.onerror = (event) => {
    for (const call of waiting.values()) call.reject(new Error(event.message || 'The analysis stopped'));
    waiting.clear();
  };
  return worker;
}

/** Analyse a survey document in the worker. */
export function analyseInWorker(document: SurveyDocument, options?: AnalysisOptions): Promise<AnalysisResults> {
  const id = nextId++;
  return new Promise((resolve, reject) => {
    waiting.set(id, { resolve, reject });
    theWorker().postMessage({ id, document, options });
  });
}
