/**
 * Logger import speed: a 100,000-row file generated here (an invented school room logged every
 * 10 s, about 12 days: semicolon-delimited, decimal comma, a preamble, day-first local times in
 * Europe/London), then: papaparse alone parsing it; our import (detection, time zone, series);
 * period finding; the fits; the whole analyseLoggerFile; the ratio to papaparse; and the
 * memory the result holds. A second line does the same for a one-minute logger (about 69 days,
 * six times as many periods to fit). Medians of several runs after a warm-up.
 */
import Papa from 'papaparse';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import type { BenchContext } from '../bench-context.ts';
import { analyseLoggerFile } from '../../../src/ingest/analyse-logger-file.ts';
import { parseLoggerFile } from '../../../src/ingest/parse-logger-file.ts';
import { findPeriods } from '../../../src/ingest/period-finding.ts';
import { fitPeriods } from '../../../src/ingest/fit-periods.ts';
import { schoolDays, simulateRoom, writeLoggerFile } from '../../support/logger-records.ts';

const ROWS = 100_000;

function inventFile(step_s: number): string {
  const day0 = Date.UTC(2024, 9, 1) / 1000;
  const days = Array.from({ length: Math.ceil((ROWS * step_s) / 86400) + 1 }, (_, k) => day0 + k * 86400);
  const record = simulateRoom({
    start_s: day0,
    step_s,
    count: ROWS,
    volume_m3: 150,
    outdoor_ppm: 420,
    perPerson_m3s: 4.5e-6,
    timetable: schoolDays(days, { people: 28, occupiedSupply_m3s: 0.09, emptySupply_m3s: 0.02 }),
    meter: { offset_ppm: 15, gain: 1.02, noise_ppm: 8 },
    seed: 3,
  });
  return writeLoggerFile(record, { delimiter: ';', decimalComma: true, preamble: ['Invented logger export', 'Room 4B'], writing: 'day-first', zone: 'Europe/London' });
}

function median(times: number[]): number {
  return [...times].sort((a, b) => a - b)[Math.floor(times.length / 2)]!;
}

function timed<T>(runs: number, work: () => T): { ms: number; result: T } {
  let result = work(); // warm-up
  const times: number[] = [];
  for (let r = 0; r < runs; r++) {
    const t0 = performance.now();
    result = work();
    times.push(performance.now() - t0);
  }
  return { ms: median(times), result };
}

/** A garbage collection on demand, for retained-memory figures (Node's flag set at run time). */
function collector(): () => void {
  setFlagsFromString('--expose-gc');
  return runInNewContext('gc') as () => void;
}

export default async function ingestBench(ctx: BenchContext): Promise<void> {
  const gc = collector();
  for (const step of [10, 60]) {
    const text = inventFile(step);
    const options = { timeZone: 'Europe/London', volume_m3: 150, outdoor_ppm: 443 };
    // Memory (heap plus array buffers): the growth over one cold analysis before any collection
    // of its garbage (a collection may still run inside it, so this is a floor of the peak), and
    // what the result holds after a collection.
    const used = () => process.memoryUsage().heapUsed + process.memoryUsage().arrayBuffers;
    gc();
    const before = used();
    let kept: unknown = analyseLoggerFile(text, options);
    const grown = used() - before;
    gc();
    const retained = used() - before;
    kept = null;
    const papa = timed(7, () => Papa.parse<string[]>(text, { delimiter: ';' }).data.length);
    const parsed = timed(7, () => parseLoggerFile(text, options));
    if (parsed.result.status !== 'parsed') throw new Error('bench file not parsed');
    const { times_s, co2_ppm } = parsed.result.series;
    const found = timed(7, () => findPeriods(times_s, co2_ppm!, options));
    const fitted = timed(3, () => fitPeriods(times_s, co2_ppm!, found.result, options));
    const whole = timed(3, () => analyseLoggerFile(text, options));
    ctx.report(`logger file: ${ROWS} rows every ${step} s (${(text.length / 1e6).toFixed(1)} MB)`, {
      periods: fitted.result.length,
      papaparse_ms: papa.ms,
      import_ms: parsed.ms,
      find_ms: found.ms,
      fit_ms: fitted.ms,
      total_ms: whole.ms,
      import_over_papaparse: parsed.ms / papa.ms,
      total_over_papaparse: whole.ms / papa.ms,
      memory_growth_MB: grown / 1e6,
      result_held_MB: retained / 1e6,
    });
    if (whole.result.status !== 'analysed' || kept !== null) throw new Error('bench file not analysed');
  }
}
