/**
 * The weather cases a prediction is evaluated over. U_10 is unknown on site and opening formulas
 * are ±30–50 % at best, so a room is judged over a few stated cases rather than one guess
 * (practice.md §1 item 9c: cold/calm, cold/windy, mild/calm; mild/calm is usually the worst).
 *
 * The temperatures and wind speeds below are our own assumed screening cases, not published
 * design conditions: indoor 20 °C throughout; "cold" 0 °C outdoors; "mild" 15 °C; "calm" 1 m/s
 * and "windy" 6 m/s meteorological wind at 10 m.
 */

/** One weather case. Temperatures in °C, wind in m/s at 10 m in open country. */
export interface WeatherCase {
  id: string;
  /** Plain-English name for screens and the report. */
  label: string;
  indoor_C: number;
  outdoor_C: number;
  windAt10m_ms: number;
  /** True for our screening assumptions (not observed weather). */
  assumed: boolean;
}

/** Cold and calm: stack-driven only. */
export const COLD_CALM: WeatherCase = Object.freeze({
  id: 'cold-calm',
  label: 'cold and calm (0 °C outside, 20 °C inside, 1 m/s wind)',
  indoor_C: 20,
  outdoor_C: 0,
  windAt10m_ms: 1,
  assumed: true,
});

/** Cold and windy: stack and wind both strong. */
export const COLD_WINDY: WeatherCase = Object.freeze({
  id: 'cold-windy',
  label: 'cold and windy (0 °C outside, 20 °C inside, 6 m/s wind)',
  indoor_C: 20,
  outdoor_C: 0,
  windAt10m_ms: 6,
  assumed: true,
});

/** Mild and calm: little stack and little wind, usually the worst case. */
export const MILD_CALM: WeatherCase = Object.freeze({
  id: 'mild-calm',
  label: 'mild and calm (15 °C outside, 20 °C inside, 1 m/s wind)',
  indoor_C: 20,
  outdoor_C: 15,
  windAt10m_ms: 1,
  assumed: true,
});

/** A non-empty list of weather cases. */
export type WeatherCases = readonly [WeatherCase, ...WeatherCase[]];

/**
 * The screening cases every room prediction is evaluated over.
 * Example: SCREENING_WEATHER_CASES.map((c) => c.id) = ['cold-calm', 'cold-windy', 'mild-calm'].
 */
export const SCREENING_WEATHER_CASES: WeatherCases = Object.freeze([COLD_CALM, COLD_WINDY, MILD_CALM] as const);

/**
 * Inside-outside temperature difference of a case, K (absolute value).
 * Source: the Δθ of the BS 5925 stack forms (references.md §3.2).
 * Example: temperatureDifference(COLD_CALM) = 20.
 */
export function temperatureDifference(weather: WeatherCase): number {
  return Math.abs(weather.indoor_C - weather.outdoor_C);
}

/**
 * Mean of the inside and outside temperatures, °C (the θ̄ of the BS 5925 stack forms).
 * Source: BS 5925 stack forms (references.md §3.2).
 * Example: meanTemperature(MILD_CALM) = 17.5.
 */
export function meanTemperature(weather: WeatherCase): number {
  return (weather.indoor_C + weather.outdoor_C) / 2;
}
