/**
 * Worker thread for the engine benchmark: loads, says it is ready, waits for "go", runs its share
 * of rooms and posts how many it did. Loading (TypeScript through tsx) is kept out of the timing.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { runRooms } from './engine-rooms.ts';

const { from, to } = workerData as { from: number; to: number };
parentPort?.once('message', () => parentPort?.postMessage(runRooms(from, to)));
parentPort?.postMessage('ready');
