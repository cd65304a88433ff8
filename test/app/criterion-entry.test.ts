/**
 * Recorded edits to the criteria are typed in the unit the findings show (src/app/criterion-entry.ts)
 * and stored in SI. Conversion factors from the SI definitions: 1 L = 0.001 m³ and 1 mm² = 1e-6 m²
 * (SI Brochure, 9th edition, 2019, the table of non-SI units accepted for use with the SI; table number from memory); 1 h = 3600 s.
 */
import { describe, it, expect } from 'vitest';
import { criterionEntry } from '../../src/app/criterion-entry.ts';
import { approxEqual } from '../support/approx-equal.ts';
import type { CriterionMetric } from '../../src/core/criteria/criterion.ts';

describe('typing a criterion threshold in the unit shown', () => {
  it('converts each shown unit to the stored SI unit', () => {
    const cases: [CriterionMetric, string, number, number][] = [
      ['flow-per-person', 'L/s per person', 10, 0.01],
      ['flow-per-floor-area', 'L/s per m²', 0.3, 0.0003],
      ['whole-dwelling-flow', 'L/s', 29, 0.029],
      ['ventilator-equivalent-area', 'mm²', 5000, 0.005],
      ['air-change-rate', 'h⁻¹', 4, 4 / 3600],
      ['co2-absolute', 'ppm', 1500, 1500],
      ['surface-rh', '%', 80, 80],
      ['opening-area-fraction', '% of floor area', 5, 0.05],
    ];
    for (const [metric, unit, typed, si] of cases) {
      const entry = criterionEntry(metric);
      expect(entry.unit, metric).toBe(unit);
      approxEqual(entry.toSi(typed), si, { rel: 1e-12 });
      approxEqual(entry.fromSi(si), typed, { rel: 1e-12 });
    }
  });
});
