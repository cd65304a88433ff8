import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { moistureActivityForMet, personMoistureOutput } from '../../src/core/moisture-generation.ts';
import { gramsPerHour } from '../../src/core/units.ts';

describe('personMoistureOutput', () => {
  it('gives the published per-person rates in kg/s with their sources', () => {
    // BS 5250, person asleep 40 g/h — from memory (references.md §6.2).
    approxEqual(gramsPerHour(personMoistureOutput('asleep').typical_kgs), 40, { abs: 1e-9 });
    // IEA Annex 14 (1990) via a secondary table: sedentary 40-60 g/h, strenuous 120-200 g/h.
    const sedentary = personMoistureOutput('sedentary');
    approxEqual(gramsPerHour(sedentary.low_kgs), 40, { abs: 1e-9 });
    approxEqual(gramsPerHour(sedentary.high_kgs), 60, { abs: 1e-9 });
    expect(sedentary.source).toMatch(/Annex 14/);
    approxEqual(gramsPerHour(personMoistureOutput('strenuous').high_kgs), 200, { abs: 1e-9 });
  });

  it('classes activity by met (common practice (no published source))', () => {
    expect(moistureActivityForMet(0.95)).toBe('asleep');
    expect(moistureActivityForMet(1.2)).toBe('sedentary');
    expect(moistureActivityForMet(2.0)).toBe('average');
    expect(moistureActivityForMet(3.5)).toBe('strenuous');
  });
});
