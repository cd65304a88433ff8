/**
 * The weather cases a survey's predictions are run over, and the weather of the visit itself.
 *
 * - Cases: the survey's stated design weather cases (indoor 20 °C, as the engine's screening
 *   cases), or else the engine's SCREENING_WEATHER_CASES. Both are assumptions, not observations.
 * - The visit: the day's outdoor temperature (as recorded, else the outdoor readings' mean, else the
 *   outdoor logger's median: day-outdoor-conditions.ts)
 *   and the recorded wind in words, turned into a 10 m wind speed by our reading of the Beaufort
 *   scale: calm 0.5, light 2.5, moderate 6.5, strong 12 m/s (common practice (no published
 *   source); from memory). Indoor: the room's own temperature. Used to reconcile measurements
 *   with predictions for the day they were made; null when temperature or wind is missing.
 *
 * Example: weatherCases(survey with no design cases).cases.map((c) => c.id) = ['cold-calm', 'cold-windy', 'mild-calm'].
 */
import { SCREENING_WEATHER_CASES, type WeatherCase, type WeatherCases } from '../core/weather-cases.ts';
import type { Survey } from '../model/survey.ts';
import type { DayOutdoorValue, WeatherCaseResult } from './results.ts';

/** Indoor temperature of the stated design cases, °C (as the engine's screening cases). */
export const DESIGN_CASE_INDOOR_C = SCREENING_WEATHER_CASES[0].indoor_C;

/** 10 m wind for the recorded wind in words, m/s (see the file note). */
export const WIND_IN_WORDS_MS: Readonly<Record<NonNullable<Survey['weather']['wind']>, number>> = {
  calm: 0.5,
  light: 2.5,
  moderate: 6.5,
  strong: 12,
};

/** The cases and where they came from. */
export function weatherCases(survey: Survey): { cases: WeatherCases; source: 'survey' | 'screening' } {
  const stated = [...survey.designWeather].map(
    (d): WeatherCase => ({
      id: d.id,
      label: d.name,
      indoor_C: DESIGN_CASE_INDOOR_C,
      outdoor_C: d.outdoorTemp_C,
      windAt10m_ms: d.windSpeed_ms,
      assumed: true,
    }),
  );
  const [first, ...rest] = stated;
  return first ? { cases: [first, ...rest], source: 'survey' } : { cases: SCREENING_WEATHER_CASES, source: 'screening' };
}

/**
 * The visit's weather as a case at a room temperature (°C), or null when not recorded. The
 * outdoor temperature is the day's (day-outdoor-conditions.ts: as recorded, else the outdoor
 * readings' mean, else the outdoor logger's median); the wind only as recorded.
 * Example: 4.5 °C outside, light wind, room at 20.4 °C → { outdoor_C: 4.5, windAt10m_ms: 2.5, indoor_C: 20.4 }.
 */
export function dayWeatherCase(survey: Survey, indoor_C: number, outdoorTemp: DayOutdoorValue | null): WeatherCase | null {
  const wind = survey.weather.wind;
  if (outdoorTemp === null || wind === undefined) return null;
  const outdoor = outdoorTemp.value;
  return {
    id: 'day-of-visit',
    label: `the day of the visit (${outdoor.toFixed(1)} °C outside${outdoorTemp.basis === 'outdoor-logger' ? ' by the outdoor logger' : ''}, ${wind} wind)`,
    indoor_C,
    outdoor_C: outdoor,
    windAt10m_ms: WIND_IN_WORDS_MS[wind],
    assumed: false,
  };
}

/** A case as the results list it. */
export function weatherCaseResult(c: WeatherCase, source: WeatherCaseResult['source']): WeatherCaseResult {
  return { id: c.id, label: c.label, indoor_C: c.indoor_C, outdoor_C: c.outdoor_C, windAt10m_ms: c.windAt10m_ms, source };
}
