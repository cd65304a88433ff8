import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import {
  airChangesPerHour,
  cubicMetresPerHour,
  displayQuantity,
  fahrenheit,
  flowFromAirChanges,
  fromFahrenheit,
  fromLitresPerSecond,
  fromSquareMillimetres,
  litresPerSecond,
  litresPerSecondPerPerson,
  LPS_PER_CFM,
  roundToStep,
  squareMillimetres,
} from '../../src/core/units.ts';

describe('units', () => {
  it('converts flows between m³/s, L/s and m³/h', () => {
    // 1 m³ = 1000 L and 1 h = 3600 s (SI definitions).
    expect(litresPerSecond(0.05)).toBe(50);
    expect(fromLitresPerSecond(50)).toBe(0.05);
    approxEqual(cubicMetresPerHour(0.05), 180, { abs: 1e-9 });
  });

  it('gives air changes per hour as Q/V × 3600', () => {
    // references.md §7.2 (derived): 100 L/s in a 151.2 m³ classroom is λ = 2.381 h⁻¹.
    approxEqual(airChangesPerHour(0.1, 151.2), 2.381, { abs: 5e-4 });
    // references.md §7.6: 0.5 ACH in a 30 m³ bedroom is 15 m³/h = 4.167 L/s.
    approxEqual(litresPerSecond(flowFromAirChanges(0.5, 30)), 4.167, { abs: 5e-4 });
    expect(airChangesPerHour(0.1, 0)).toBeNaN();
  });

  it('gives L/s per person and refuses a room with nobody in it', () => {
    expect(litresPerSecondPerPerson(0.1, 20)).toBe(5);
    expect(litresPerSecondPerPerson(0.1, 0)).toBeNaN();
  });

  it('converts vent areas to mm²', () => {
    // Undercut of 7600 mm² (Approved Document F 2021, practice.md §2.1, from memory).
    expect(squareMillimetres(fromSquareMillimetres(7600))).toBeCloseTo(7600, 9);
  });

  it('uses the exact international foot for cfm', () => {
    // 1 ft = 0.3048 m exactly (1959 international yard and pound); 1 cfm = 0.471947443 L/s.
    approxEqual(LPS_PER_CFM, 0.471947443, { abs: 1e-9 });
    expect(displayQuantity(fromLitresPerSecond(LPS_PER_CFM * 100), 'flow', 'imperial')).toEqual({
      value: 100,
      unit: 'cfm',
      step: 1,
    });
  });

  it('converts temperatures by the scale definitions', () => {
    expect(fahrenheit(20)).toBe(68);
    expect(fromFahrenheit(212)).toBe(100);
  });

  it('rounds report values to the trade steps', () => {
    // CO2 to 10 ppm, L/s to 0.5, ACH to 0.1: common practice (no published source), practice.md §3.
    expect(displayQuantity(1316.47, 'co2')).toEqual({ value: 1320, unit: 'ppm', step: 10 });
    expect(displayQuantity(0.05231, 'flow').value).toBe(52.5);
    expect(displayQuantity(2.3809, 'airChanges').value).toBe(2.4);
    expect(roundToStep(0.1 + 0.2, 0.1)).toBe(0.3);
    expect(roundToStep(Number.NaN, 10)).toBeNaN();
  });
});
