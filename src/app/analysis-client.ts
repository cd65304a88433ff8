/**
 * Talks to the analysis worker: one worker for the app, started on first use. A call names the
 * stored survey (the worker reads it) or hands over a plain document (a projection), receives
 * the rooms' results in batches (`onRooms`, each its own small task) and resolves with the
 * whole results.
 */
import type { AnalysisOptions } from '../analysis/analyse-survey.ts';
import type { AnalysisResults, RoomResults } from '../analysis/results.ts';
import type { SurveyDocument } from '../model/survey-document.ts';
import type { AnalysisRequest } from './analysis-worker.ts';

type Reply = { id: number; rooms?: RoomResults[]; results?: AnalysisResults; error?: string };
interface Call {
  rooms: RoomResults[];
  onRooms?: (rooms: RoomResults[]) => void;
  resolve: (r: AnalysisResults) => void;
  reject: (e: Error) => void;
}

let worker: Worker | undefined;
let nextId = 1;
const waiting = new Map<number, Call>();

function theWorker(): Worker {
  if (worker) return worker;
  worker = new Worker(new URL('./analysis-worker.ts', import.meta.url), { type: 'module' });
  worker.onmessage = (event: MessageEvent<Reply>) => {
    const { id, rooms, results, error } = event.data;
    const call = waiting.get(id);
    if (!call) return;
    if (rooms) {
      call.rooms.push(...rooms);
      call.onRooms?.(rooms);
      return;
    }
    waiting.delete(id);
    if (results) call.resolve({ ...results, rooms: call.rooms });
    else call.reject(new Error(error ?? 'The analysis gave no results'));
  };
  worker.onerror = (event) => {
    for (const call of waiting.values()) call.reject(new Error(event.message || 'The analysis stopped'));
    waiting.clear();
  };
  return worker;
}

/** Analyse a stored survey (by id) or a plain document in the worker. */
export function analyseInWorker(
  what: { surveyId: string } | { document: SurveyDocument },
  onRooms?: (rooms: RoomResults[]) => void,
  options?: AnalysisOptions,
): Promise<AnalysisResults> {
  const id = nextId++;
  return new Promise((resolve, reject) => {
    waiting.set(id, { rooms: [], onRooms, resolve, reject });
    theWorker().postMessage({ id, ...what, options } satisfies AnalysisRequest);
  });
}
