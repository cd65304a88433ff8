/**
 * Runs a share of a benchmark's work in each of the machine's cores with worker threads. Each
 * worker loads its TypeScript entry through tsx, says it is ready, and starts only on "go": the
 * loading is timed apart from the work (a browser or the command line loads the code once).
 * The engine itself stays single-threaded and pure; this only splits independent rooms or surveys.
 *
 * A worker entry reads `workerData`, waits for one message, does its work and posts a number.
 */
import { availableParallelism } from 'node:os';
import { pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';

export interface PoolRun {
  workers: number;
  startup_s: number;
  work_s: number;
  /** What each worker posted back, in order. */
  results: number[];
}

export async function runInWorkers(entry: URL, shares: (worker: number, workers: number) => unknown): Promise<PoolRun> {
  const workers = Math.max(1, Math.min(availableParallelism(), 8));
  const href = pathToFileURL(entry.pathname).href;
  const bootstrap = `import('tsx/esm/api').then(({ register }) => { register(); return import(${JSON.stringify(href)}); })`;
  const startup0 = performance.now();
  const pool = await Promise.all(
    Array.from({ length: workers }, (_, w) => {
      const worker = new Worker(bootstrap, { eval: true, workerData: shares(w, workers) });
      return new Promise<Worker>((resolve, reject) => {
        worker.once('message', () => resolve(worker));
        worker.once('error', reject);
      });
    }),
  );
  const startup_s = (performance.now() - startup0) / 1000;
  const t0 = performance.now();
  const results = await Promise.all(
    pool.map(
      (worker) =>
        new Promise<number>((resolve, reject) => {
          worker.once('message', (done: number) => resolve(done));
          worker.once('error', reject);
          worker.postMessage('go');
        }),
    ),
  );
  const work_s = (performance.now() - t0) / 1000;
  await Promise.all(pool.map((w) => w.terminate()));
  return { workers, startup_s, work_s, results };
}
