import { describe, it, expect } from 'vitest';
import {
  COLD_CALM,
  meanTemperature,
  MILD_CALM,
  SCREENING_WEATHER_CASES,
  temperatureDifference,
} from '../../src/core/weather-cases.ts';

describe('weather cases (src/core/weather-cases.ts)', () => {
  it('names the three screening cases of practice.md §1 item 9c, all marked assumed', () => {
    // practice.md §1 item 9c: cold/calm, cold/windy, mild/calm (common practice (no published source)).
    expect(SCREENING_WEATHER_CASES.map((c) => c.id)).toEqual(['cold-calm', 'cold-windy', 'mild-calm']);
    for (const c of SCREENING_WEATHER_CASES) expect(c.assumed).toBe(true);
    const [cold, windy, mild] = SCREENING_WEATHER_CASES;
    expect(windy!.windAt10m_ms).toBeGreaterThan(cold!.windAt10m_ms);
    expect(temperatureDifference(mild!)).toBeLessThan(temperatureDifference(cold!));
  });

  it('gives Δθ and θ̄ for the BS 5925 stack forms', () => {
    expect(temperatureDifference(COLD_CALM)).toBe(20);
    expect(meanTemperature(MILD_CALM)).toBe(17.5);
  });
});
