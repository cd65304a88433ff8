/**
 * An invented outdoor logger series for tests (the model's record, not a file): one point a
 * minute on the demo school's day, CO2 at a steady level ± 3 ppm with every 8th point a spike of
 * 250–450 ppm (a van idling beside it), −3 °C and 91 % relative humidity.
 */
import { createSeededRandom } from '../../src/core/seeded-random.ts';
import type { LoggerSeries } from '../../src/model/logger-series.ts';
import type { SurveyDocument } from '../../src/model/survey-document.ts';

/** 07:00 UTC on the demo school's visit day. */
export const LOGGER_START_MS = Date.UTC(2026, 0, 14, 7, 0);

/** The roof logger: `hours` long from `start_ms` (07:00), at `level` ppm (426), spikes unless `spikes: false`. */
export function roofLogger(options: { level?: number; start_ms?: number; hours?: number; instrumentId?: string; spikes?: boolean } = {}): LoggerSeries {
  const rng = createSeededRandom(7);
  const n = (options.hours ?? 10) * 60;
  const start = options.start_ms ?? LOGGER_START_MS;
  const level = options.level ?? 426;
  return {
    id: 'dea10000-0000-4000-8000-0000000000f1',
    ...(options.instrumentId ? { instrumentId: options.instrumentId } : {}),
    sourceFile: 'roof-logger.csv',
    columns: { time: 'When', co2: 'CO2', temperature: 'Air', relativeHumidity: 'Damp' },
    timeZone: 'Europe/London',
    times_ms: Array.from({ length: n }, (_, i) => start + i * 60_000),
    co2_ppm: Array.from({ length: n }, (_, i) => Math.round(level + 6 * (rng.uniform() - 0.5) + (options.spikes !== false && i % 8 === 0 ? 250 + 200 * rng.uniform() : 0))),
    temp_C: Array.from({ length: n }, () => -3),
    rh_pct: Array.from({ length: n }, () => 91),
    periods: [],
  };
}

/** The survey with the series added. */
export const withLogger = (doc: SurveyDocument, series: LoggerSeries): SurveyDocument => ({ ...doc, series: [...doc.series, series] });
