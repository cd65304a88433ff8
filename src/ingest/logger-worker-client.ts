/**
 * The page's side of the logger worker: `analyseInWorker(file, options)` sends a file's bytes
 * to a module worker (transferred, not copied) and resolves with the analysis. One worker is
 * started on first use and kept; requests are matched to replies by id. If the worker fails to
 * start or crashes, pending requests resolve as 'failed' with the reason, never reject.
 *
 * Example: `const analysis = await analyseInWorker(droppedFile, { timeZone: 'Europe/London' });`
 */
import type { LoggerAnalysis, LoggerAnalysisOptions } from './analyse-logger-file.ts';
import { ingestWarning } from './ingest-warnings.ts';
import type { LoggerWorkerReply, LoggerWorkerRequest } from './logger-worker.ts';

let worker: Worker | null = null;
let nextId = 1;
const pending = new Map<number, (analysis: LoggerAnalysis) => void>();

function failAll(reason: string): void {
  for (const [id, resolve] of pending) {
    pending.delete(id);
    resolve({ status: 'failed', error: ingestWarning('internal-error', reason), report: null });
  }
  worker?.terminate();
  worker = null;
}

function started(): Worker {
  if (worker) return worker;
  worker = new Worker(new URL('./logger-worker.ts', import.meta.url), { type: 'module' });
  worker.onmessage = (event: MessageEvent<LoggerWorkerReply>) => {
    const resolve = pending.get(event.data.id);
    pending.delete(event.data.id);
    resolve?.(event.data.analysis);
  };
  worker.onerror = (event) => failAll(`The file reader stopped: ${event.message || 'unknown fault'}.`);
  return worker;
}

/** Read and analyse a logger file in the worker. */
export async function analyseInWorker(file: Blob | ArrayBuffer, options: LoggerAnalysisOptions = {}): Promise<LoggerAnalysis> {
  const bytes = file instanceof ArrayBuffer ? file : await file.arrayBuffer();
  return new Promise((resolve) => {
    const id = nextId++;
    pending.set(id, resolve);
    try {
      const request: LoggerWorkerRequest = { id, bytes, options };
      started().postMessage(request, [bytes]);
    } catch (e) {
      failAll(`The file reader could not start: ${e instanceof Error ? e.message : String(e)}.`);
    }
  });
}

/** Stop the worker (e.g. when leaving the import screen); a later call starts a new one. */
export function stopLoggerWorker(): void {
  failAll('The file reader was stopped.');
}
