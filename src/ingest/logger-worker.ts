/**
 * The module worker that reads logger files off the page's thread: it receives the file's bytes
 * (transferred, not copied) and the options, runs analyseLoggerFile, and posts the result back
 * with the series' typed arrays transferred, so 100,000 readings never cross to the page one by
 * one. One request at a time per message; replies carry the request's id.
 *
 * Started by logger-worker-client.ts with
 * `new Worker(new URL('./logger-worker.ts', import.meta.url), { type: 'module' })`.
 */
import { analyseLoggerFile, type LoggerAnalysis, type LoggerAnalysisOptions } from './analyse-logger-file.ts';

/** A request to the worker. */
export interface LoggerWorkerRequest {
  id: number;
  bytes: ArrayBuffer;
  options: LoggerAnalysisOptions;
}

/** The worker's reply. */
export interface LoggerWorkerReply {
  id: number;
  analysis: LoggerAnalysis;
}

/** The buffers of a result's typed arrays, to transfer rather than copy. */
export function transferables(analysis: LoggerAnalysis): ArrayBuffer[] {
  if (analysis.status !== 'analysed') return [];
  const s = analysis.series;
  return [s.times_s, s.co2_ppm, s.temp_C, s.rh_pct, s.lines].flatMap((a) => (a ? [a.buffer as ArrayBuffer] : []));
}

self.onmessage = (event: MessageEvent<LoggerWorkerRequest>) => {
  const { id, bytes, options } = event.data;
  const analysis = analyseLoggerFile(new Uint8Array(bytes), options);
  const reply: LoggerWorkerReply = { id, analysis };
  self.postMessage(reply, { transfer: transferables(analysis) });
};
