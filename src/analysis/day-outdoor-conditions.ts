/**
 * The day's outdoor temperature and humidity, each with where it came from, in this order:
 * 1. what the surveyor recorded in the survey's weather (never overridden);
 * 2. the mean of the visit's outdoor readings that hold it;
 * 3. the median of the outdoor logger over the room measurements (outdoor-logger-window.ts; a
 *    logger that did not run then is not the day's weather and is not used).
 * °C and % relative humidity.
 *
 * Example: no weather typed, no outdoor reading with a temperature, an outdoor logger at 2.8 to
 * 3.6 °C during the measurements → temp_C { value: 3.2, basis: 'outdoor-logger', words: 'median of
 * the outdoor logger “roof.csv” from 08:40 to 16:10' }.
 */
import { percentilesInPlace } from '../core/order-statistics.ts';
import type { SurveyDocument } from '../model/survey-document.ts';
import { outdoorLoggerWindow, windowSpanWords, type LoggerChannel } from './outdoor-logger-window.ts';
import type { DayOutdoorValue, DayOutdoorConditions } from './results.ts';

function dayValue(doc: SurveyDocument, recorded: number | undefined, field: 'temp_C' | 'rh_pct', channel: LoggerChannel): DayOutdoorValue | null {
  if (recorded !== undefined) return { value: recorded, basis: 'recorded', words: 'as recorded' };
  const readings = doc.survey.outdoorReadings.flatMap((r) => (r[field] === undefined ? [] : [r[field]]));
  if (readings.length > 0) {
    const n = readings.length;
    return { value: readings.reduce((a, b) => a + b, 0) / n, basis: 'outdoor-readings', words: `mean of ${n} outdoor reading${n === 1 ? '' : 's'}` };
  }
  const logger = outdoorLoggerWindow(doc, channel);
  if (!logger || logger.covers === 'whole-record') return null;
  const [median] = percentilesInPlace(Float64Array.from(logger.values), logger.values.length, [0.5]);
  return { value: median!, basis: 'outdoor-logger', words: `median of the outdoor logger “${logger.sourceFile}” ${windowSpanWords(logger)}` };
}

/** The day's outdoor temperature and humidity (see the file note). */
export function dayOutdoorConditions(doc: SurveyDocument): DayOutdoorConditions {
  const w = doc.survey.weather;
  return { temp_C: dayValue(doc, w.outdoorTemp_C, 'temp_C', 'temp_C'), rh_pct: dayValue(doc, w.outdoorRh_pct, 'rh_pct', 'rh_pct') };
}
