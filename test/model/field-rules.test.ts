import { describe, it, expect } from 'vitest';
import { co2Ppm, formatLimit, measure, relativeHumidity } from '../../src/model/field-rules.ts';

describe('field rules', () => {
  it('formats limits the same way on every device', () => {
    expect(formatLimit(10_000)).toBe('10,000');
    expect(formatLimit(0.05)).toBe('0.05');
    expect(formatLimit(1234567.5)).toBe('1,234,567.5');
  });

  it('states the CO₂ range in ppm with a hint to check the meter', () => {
    const result = co2Ppm.safeParse(12_000);
    expect(result.error?.issues[0]?.message).toBe('CO₂ must be between 250 and 10,000 ppm (check the meter and the units it shows)');
    expect(co2Ppm.safeParse(420).success).toBe(true);
  });

  it('keeps relative humidity within 0-100 %', () => {
    expect(relativeHumidity.safeParse(100).success).toBe(true);
    expect(relativeHumidity.safeParse(100.5).error?.issues[0]?.message).toBe('Relative humidity must be between 0 and 100 %');
  });

  it('refuses NaN, infinity and text where a number belongs', () => {
    const height = measure('Room height', 'm', 1.5, 30);
    for (const bad of [Number.NaN, Number.POSITIVE_INFINITY, '2.4', '', null]) {
      expect(height.safeParse(bad).success, String(bad)).toBe(false);
    }
  });

  it('says "more than" for sizes that must not be zero', () => {
    const area = measure('Vent area', 'm²', 0, 1, { aboveMin: true });
    expect(area.safeParse(0).error?.issues[0]?.message).toBe('Vent area must be more than 0 m² and at most 1 m²');
  });
});
