/**
 * The survey model's logger-series record (src/model/logger-series.ts) from a parsed file: the
 * source file name, the column map (names as written), the time zone, times in ms, values in
 * ppm, °C and %, and the periods the surveyor accepted. Readings the model would refuse (a gap
 * in any kept column, a value outside the model's range: the outdoor temperature range for the
 * outdoor logger, no room) are left out and counted, so the record
 * always passes the model's schema; more points than the model holds is an error.
 *
 * Example: a parsed file of 3 readings with CO2 [812, NaN, 815] → times_ms of the 1st and 3rd
 * readings, co2_ppm [812, 815], left out 1.
 */
import { acceptedPeriodSchema, MAX_SERIES_POINTS, temperatureRuleFor, type LoggerSeries } from '../model/logger-series.ts';
import { co2Ppm, relativeHumidity } from '../model/field-rules.ts';
import { ingestWarning, type IngestWarning } from './ingest-warnings.ts';
import type { ImportReport, LoggerSeriesData } from './parse-logger-file.ts';
import type { PeriodKind } from './period-finding.ts';

/** A period the surveyor accepted: kind, start and end (s, UTC) and a note. */
export interface AcceptedPeriodInput {
  id: string;
  kind: PeriodKind;
  start_s: number;
  end_s: number;
  note: string;
}

export interface LoggerSeriesRecordInput {
  id: string;
  sourceFile: string;
  series: LoggerSeriesData;
  report: ImportReport;
  roomId?: string;
  instrumentId?: string;
  periods?: readonly AcceptedPeriodInput[];
}

export type LoggerSeriesRecordResult = { ok: true; record: LoggerSeries; leftOut: number; warnings: IngestWarning[] } | { ok: false; error: IngestWarning };

/** The model's accepted period from a period the surveyor accepted (times to ms). */
export function acceptedPeriodRecord(p: AcceptedPeriodInput): LoggerSeries['periods'][number] {
  return acceptedPeriodSchema.parse({ id: p.id, kind: p.kind, start_ms: Math.round(p.start_s * 1000), end_ms: Math.round(p.end_s * 1000), note: p.note });
}

export function loggerSeriesRecord(input: LoggerSeriesRecordInput): LoggerSeriesRecordResult {
  const { series, report } = input;
  const choice = report.choice;
  if (!choice) return { ok: false, error: ingestWarning('no-time-column', 'The file was not read, so there is no series to keep.') };
  const nameOf = (c: number | null) => (c === null ? undefined : report.columns[c]?.name);
  const time = choice.time.kind === 'single' ? nameOf(choice.time.column)! : `${nameOf(choice.time.date)} + ${nameOf(choice.time.time)}`;
  const channels = [
    [series.co2_ppm, co2Ppm],
    [series.temp_C, temperatureRuleFor(input.roomId || undefined)],
    [series.rh_pct, relativeHumidity],
  ] as const;
  const keep: number[] = [];
  for (let i = 0; i < series.times_s.length; i++) {
    if (channels.every(([values, rule]) => !values || rule.safeParse(values[i]).success)) keep.push(i);
  }
  if (keep.length > MAX_SERIES_POINTS) {
    return {
      ok: false,
      error: ingestWarning('too-many-points', `The file holds ${keep.length} readings; a series keeps at most ${MAX_SERIES_POINTS}. Split the file or export a longer logging interval.`),
    };
  }
  const pick = (values: Float64Array | null) => (values ? keep.map((i) => values[i]!) : undefined);
  const leftOut = series.times_s.length - keep.length;
  const warnings = leftOut
    ? [ingestWarning('value-out-of-range', `${leftOut} reading(s) with an empty cell or a value outside the range the survey file accepts were left out of the stored series.`)]
    : [];
  const record: LoggerSeries = {
    id: input.id,
    ...(input.roomId ? { roomId: input.roomId } : {}),
    ...(input.instrumentId ? { instrumentId: input.instrumentId } : {}),
    sourceFile: input.sourceFile,
    columns: {
      time,
      ...(choice.co2 !== null ? { co2: nameOf(choice.co2) } : {}),
      ...(choice.temperature !== null ? { temperature: nameOf(choice.temperature) } : {}),
      ...(choice.relativeHumidity !== null ? { relativeHumidity: nameOf(choice.relativeHumidity) } : {}),
    },
    timeZone: report.timeZone,
    times_ms: keep.map((i) => Math.round(series.times_s[i]! * 1000)),
    ...(series.co2_ppm ? { co2_ppm: pick(series.co2_ppm) } : {}),
    ...(series.temp_C ? { temp_C: pick(series.temp_C) } : {}),
    ...(series.rh_pct ? { rh_pct: pick(series.rh_pct) } : {}),
    periods: (input.periods ?? []).map(acceptedPeriodRecord),
  };
  return { ok: true, record, leftOut, warnings };
}
