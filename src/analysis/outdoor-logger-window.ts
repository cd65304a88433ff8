/**
 * The outdoor logger's points that stand for the outdoor air of the room measurements: a logger
 * series with no room (the outdoor reference) holding the channel asked for (CO2 by default;
 * temperature or humidity for the day's conditions), cut to the time span of the survey's room
 * measurements.
 *
 * - Span: from the first to the last room CO2 measurement (readings with CO2, and the accepted
 *   periods of loggers in rooms), widened by 30 minutes each side, so the outdoor air the rooms
 *   drew just before and the outdoor checks at the start and end fall inside (common practice (no
 *   published source)). No room measurement yet: the recorded visits (start to end).
 * - For one measurement (a decay, a build-up): the points from 15 minutes before its first reading
 *   to 15 minutes after its last, so the level is the one the room drew while it was measured —
 *   outdoor CO2 moves through a day (traffic, the morning's still air) (common practice (no
 *   published source)); fewer than 5 points there: the survey-wide window stands.
 * - Several outdoor loggers with the channel: the one with most points in the span (then the smaller id).
 * - Fewer than 5 points in the span (the logger was not running then): its whole record, marked
 *   so; the outdoor level then prefers spot readings when there are any, and warns.
 * Times in ms since 1970 (UTC); values as the logger read them, ppm.
 *
 * Example: a roof logger at one point a minute from 08:00 to 17:00 and room readings from 09:10
 * to 15:40 → its 451 points from 08:40 to 16:10, covers 'measurements'.
 */
import { warn, type EngineWarning } from '../core/warnings.ts';
import type { SurveyDocument } from '../model/survey-document.ts';

/** Margin either side of the room measurements, ms (see the file note). */
export const OUTDOOR_SPAN_MARGIN_MS = 30 * 60_000;
/** Margin either side of one measurement, ms (see the file note). */
export const OUTDOOR_SET_MARGIN_MS = 15 * 60_000;
/** Fewest points in the span for the logger to stand for it. */
export const MIN_OUTDOOR_LOGGER_POINTS = 5;

/** The outdoor logger's points for the measurements, and where they came from. */
export interface OutdoorLoggerWindow {
  seriesId: string;
  sourceFile: string;
  instrumentId: string | undefined;
  timeZone: string;
  /** The channel's values as the logger read them (ppm, °C or %). */
  values: number[];
  /** First and last point used, ms since 1970. */
  from_ms: number;
  to_ms: number;
  /**
   * 'measurement': the points around one measurement; 'measurements' or 'visit': the points of
   * that span; 'whole-record': the span was not covered.
   */
  covers: 'measurement' | 'measurements' | 'visit' | 'whole-record';
  warnings: EngineWarning[];
}

/** The room measurements' span (ms), widened by the margin; else the visits'; else null. */
function measurementSpan(doc: SurveyDocument): { from_ms: number; to_ms: number; kind: 'measurements' | 'visit' } | null {
  const times: number[] = [];
  for (const room of doc.rooms) for (const r of room.readings) if (r.co2_ppm !== undefined) times.push(Date.parse(r.time));
  for (const s of doc.series) if (s.roomId !== undefined) for (const p of s.periods) if (p.kind !== 'excluded') times.push(p.start_ms, p.end_ms);
  const valid = times.filter(Number.isFinite);
  if (valid.length > 0) {
    return { from_ms: Math.min(...valid) - OUTDOOR_SPAN_MARGIN_MS, to_ms: Math.max(...valid) + OUTDOOR_SPAN_MARGIN_MS, kind: 'measurements' };
  }
  const visits = doc.survey.visits.filter((v) => v.end).map((v) => [Date.parse(v.start), Date.parse(v.end!)] as const);
  if (visits.length === 0) return null;
  return { from_ms: Math.min(...visits.map((v) => v[0])), to_ms: Math.max(...visits.map((v) => v[1])), kind: 'visit' };
}

/** Indexes of a series' points inside [from, to]. */
function inside(times_ms: readonly number[], from_ms: number, to_ms: number): number[] {
  const picked: number[] = [];
  times_ms.forEach((t, i) => {
    if (t >= from_ms && t <= to_ms) picked.push(i);
  });
  return picked;
}

/**
 * The outdoor logger's CO2 points around one measurement (first to last reading, ms since 1970,
 * widened by OUTDOOR_SET_MARGIN_MS), or null when no outdoor logger has 5 points there.
 * Example: a roof logger at one point a minute and a decay from 10:00 to 10:20 → its 51 points
 * from 09:45 to 10:35, covers 'measurement'.
 */
export function outdoorLoggerAround(doc: SurveyDocument, from_ms: number, to_ms: number): OutdoorLoggerWindow | null {
  const [lo, hi] = [from_ms - OUTDOOR_SET_MARGIN_MS, to_ms + OUTDOOR_SET_MARGIN_MS];
  const ranked = doc.series
    .filter((s) => s.roomId === undefined && (s.co2_ppm?.length ?? 0) > 0)
    .map((s) => ({ s, picked: inside(s.times_ms, lo, hi) }))
    .sort((a, b) => b.picked.length - a.picked.length || (a.s.id < b.s.id ? -1 : 1));
  const best = ranked[0];
  if (!best || best.picked.length < MIN_OUTDOOR_LOGGER_POINTS) return null;
  const { s, picked } = best;
  return {
    seriesId: s.id,
    sourceFile: s.sourceFile,
    instrumentId: s.instrumentId,
    timeZone: s.timeZone,
    values: picked.map((i) => s.co2_ppm![i]!),
    from_ms: s.times_ms[picked[0]!]!,
    to_ms: s.times_ms[picked[picked.length - 1]!]!,
    covers: 'measurement',
    warnings: [],
  };
}

/** A logger channel: CO2 (ppm), temperature (°C) or relative humidity (%). */
export type LoggerChannel = 'co2_ppm' | 'temp_C' | 'rh_pct';
const CHANNEL_WORDS: Readonly<Record<LoggerChannel, string>> = { co2_ppm: 'CO₂', temp_C: 'temperature', rh_pct: 'humidity' };

/**
 * The outdoor logger's points of a channel for the survey's measurements, or null when no
 * outdoor logger with that channel is on the survey (see the file note).
 */
export function outdoorLoggerWindow(doc: SurveyDocument, channel: LoggerChannel = 'co2_ppm'): OutdoorLoggerWindow | null {
  const outdoor = doc.series.filter((s) => s.roomId === undefined && (s[channel]?.length ?? 0) > 0);
  if (outdoor.length === 0) return null;
  const span = measurementSpan(doc);
  const ranked = outdoor
    .map((s) => ({ s, picked: span ? inside(s.times_ms, span.from_ms, span.to_ms) : [] }))
    .sort((a, b) => b.picked.length - a.picked.length || (a.s.id < b.s.id ? -1 : 1));
  const { s, picked } = ranked[0]!;
  const covered = span !== null && picked.length >= MIN_OUTDOOR_LOGGER_POINTS;
  const indexes = covered ? picked : s.times_ms.map((_, i) => i);
  const warnings: EngineWarning[] = [];
  if (!covered && span) {
    warnings.push(
      warn(
        'outdoor-logger-outside-measurements',
        `The outdoor logger “${s.sourceFile}” has ${picked.length === 0 ? 'no' : `only ${picked.length}`} ${CHANNEL_WORDS[channel]} point${picked.length === 1 ? '' : 's'} during the room ${span.kind === 'visit' ? 'visit' : 'measurements'}: check its clock and time zone. Its whole record is used only when nothing else was recorded.`,
      ),
    );
  }
  return {
    seriesId: s.id,
    sourceFile: s.sourceFile,
    instrumentId: s.instrumentId,
    timeZone: s.timeZone,
    values: indexes.map((i) => s[channel]![i]!),
    from_ms: s.times_ms[indexes[0]!]!,
    to_ms: s.times_ms[indexes[indexes.length - 1]!]!,
    covers: covered ? span.kind : 'whole-record',
    warnings,
  };
}

/** Clock time (24 h) of `t_ms` in `zone`, with the day when `withDay`; UTC when the zone is unknown. */
function clockIn(t_ms: number, zone: string, withDay: boolean): string {
  const options: Intl.DateTimeFormatOptions = { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', ...(withDay ? { day: 'numeric', month: 'short' } : {}) };
  try {
    return new Intl.DateTimeFormat('en-GB', { ...options, timeZone: zone }).format(t_ms);
  } catch {
    return `${new Intl.DateTimeFormat('en-GB', { ...options, timeZone: 'UTC' }).format(t_ms)} UTC`;
  }
}

/**
 * The window's time span in words, on the logger's clock.
 * Example: points from 08:40 to 16:10 on one day in Europe/London → 'from 08:40 to 16:10'.
 */
export function windowSpanWords(w: Pick<OutdoorLoggerWindow, 'from_ms' | 'to_ms' | 'timeZone'>): string {
  const sameDay = clockIn(w.from_ms, w.timeZone, true).replace(/\d\d:\d\d/, '') === clockIn(w.to_ms, w.timeZone, true).replace(/\d\d:\d\d/, '');
  return `from ${clockIn(w.from_ms, w.timeZone, !sameDay)} to ${clockIn(w.to_ms, w.timeZone, !sameDay)}`;
}
