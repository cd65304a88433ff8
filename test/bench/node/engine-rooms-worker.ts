/** Worker thread for the engine benchmark: runs its share of rooms and posts how many it did. */
import { parentPort, workerData } from 'node:worker_threads';
import { runRooms } from './engine-rooms.ts';

const { from, to } = workerData as { from: number; to: number };
parentPort?.postMessage(runRooms(from, to));
