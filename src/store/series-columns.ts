/**
 * A logger series' columns as stored (Float64Array, compact and exact) and as in the survey
 * file (plain number arrays). Float64 holds every JSON number exactly, so a round trip is exact.
 */
import type { LoggerSeries } from '../model/logger-series.ts';
import type { SeriesRecord } from './schema.ts';

const COLUMNS = ['co2_ppm', 'temp_C', 'rh_pct'] as const;

/** Columns to Float64Array (surveyId and position are added by the caller). */
export function toSeriesRecord(series: LoggerSeries): Omit<SeriesRecord, 'surveyId' | 'position'> {
  const record: Record<string, unknown> = { ...series, times_ms: Float64Array.from(series.times_ms) };
  for (const key of COLUMNS) if (series[key]) record[key] = Float64Array.from(series[key]);
  return record as Omit<SeriesRecord, 'surveyId' | 'position'>;
}

/** A stored series back to plain arrays, without the store's own fields. */
export function fromSeriesRecord(record: SeriesRecord): LoggerSeries {
  const { surveyId: _survey, position: _position, ...rest } = record;
  const series: Record<string, unknown> = { ...rest, times_ms: Array.from(record.times_ms) };
  for (const key of COLUMNS) if (record[key]) series[key] = Array.from(record[key]);
  return series as LoggerSeries;
}
