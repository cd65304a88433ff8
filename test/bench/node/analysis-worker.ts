/** Worker for the analysis benchmark: analyses its share of the demo copies on "go". */
import { parentPort, workerData } from 'node:worker_threads';
import { analyseSurvey } from '../../../src/analysis/analyse-survey.ts';
import { demoCopies } from './demo-copies.ts';

const { rooms, worker, workers, draws } = workerData as { rooms: number; worker: number; workers: number; draws: number };
const mine = demoCopies(rooms).filter((_, i) => i % workers === worker);
analyseSurvey(mine[0]!, { draws }); // warm-up before "go"
parentPort?.once('message', () => {
  let analysed = 0;
  for (const doc of mine) analysed += analyseSurvey(doc, { draws }).rooms.length;
  parentPort?.postMessage(analysed);
});
parentPort?.postMessage('ready');
