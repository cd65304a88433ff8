/**
 * Predicted outdoor-air supply for 5,000 invented rooms over the three screening weather cases:
 * rooms per second. Rooms come from the property-test generator with a fixed seed, so every run
 * measures the same work.
 */
import fc from 'fast-check';
import type { BenchContext } from '../bench-context.ts';
import { roomArb } from '../../support/airflow-arbitraries.ts';
import { predictRoomSupplyOverCases } from '../../../src/core/room-supply-prediction.ts';
import { SCREENING_WEATHER_CASES } from '../../../src/core/weather-cases.ts';

const ROOMS = 5000;
const REPEATS = 5;

export default async function airflowBench(ctx: BenchContext): Promise<void> {
  const rooms = fc.sample(roomArb, { numRuns: ROOMS, seed: 20240 });
  let sink = 0;
  const runOnce = (): number => {
    const start = performance.now();
    for (const room of rooms) sink += predictRoomSupplyOverCases(room, SCREENING_WEATHER_CASES).worst.outdoorAir.central;
    return performance.now() - start;
  };
  runOnce(); // warm-up
  const times = Array.from({ length: REPEATS }, runOnce).sort((a, b) => a - b);
  const median = times[Math.floor(REPEATS / 2)]!;
  ctx.report('room supply prediction (5,000 rooms × 3 weather cases)', {
    rooms: ROOMS,
    cases: SCREENING_WEATHER_CASES.length,
    median_ms: median,
    best_ms: times[0]!,
    rooms_per_s: (ROOMS / median) * 1000,
    predictions_per_s: ((ROOMS * SCREENING_WEATHER_CASES.length) / median) * 1000,
    checksum: Number.isFinite(sink) ? 'finite' : 'NOT FINITE',
  });
}
