/**
 * What the visit screen says about each outdoor logger on a survey (a series with no room): its
 * file, the first and last time on the logger's own clock, how many points, the median CO2 (and
 * temperature and humidity) over its whole record, and the meter it was said to be. The findings'
 * own outdoor level (over the room measurements) comes from the analysis, not from here.
 *
 * Example: a roof logger read from 07:00 to 16:59 on 14 January, 600 points at about 426 ppm →
 * { file: 'roof.csv', span: 'from 07:00 to 16:59', points: 600, co2_ppm: 426, … }.
 */
import { windowSpanWords } from '../analysis/outdoor-logger-window.ts';
import { percentilesInPlace } from '../core/order-statistics.ts';
import type { LoggerSeries } from '../model/logger-series.ts';
import type { SurveyDocument } from '../model/survey-document.ts';

export interface OutdoorLoggerFacts {
  id: string;
  file: string;
  /** First to last time, on the logger's clock, in words ('from 07:00 to 16:59'). */
  span: string;
  points: number;
  /** Medians over the whole record; null when the file had no such column. */
  co2_ppm: number | null;
  temp_C: number | null;
  rh_pct: number | null;
  /** The instrument's model, when the logger was said to be one of the survey's. */
  meter: string | null;
}

function median(values: readonly number[] | undefined): number | null {
  if (!values || values.length === 0) return null;
  return percentilesInPlace(Float64Array.from(values), values.length, [0.5])[0]!;
}

function factsOf(s: LoggerSeries, doc: SurveyDocument): OutdoorLoggerFacts {
  return {
    id: s.id,
    file: s.sourceFile,
    span: windowSpanWords({ from_ms: s.times_ms[0]!, to_ms: s.times_ms[s.times_ms.length - 1]!, timeZone: s.timeZone }),
    points: s.times_ms.length,
    co2_ppm: median(s.co2_ppm),
    temp_C: median(s.temp_C),
    rh_pct: median(s.rh_pct),
    meter: doc.instruments.find((i) => i.id === s.instrumentId)?.model ?? null,
  };
}

/** The survey's outdoor loggers, in the order they were saved. */
export function outdoorLoggerFacts(doc: SurveyDocument): OutdoorLoggerFacts[] {
  return doc.series.filter((s) => s.roomId === undefined).map((s) => factsOf(s, doc));
}
