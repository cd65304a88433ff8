import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { activityMoistureOutput, MOISTURE_ACTIVITY_KINDS, moistureOverPeriod } from '../../src/core/activity-moisture.ts';
import { householdMoisture } from '../../src/core/household-moisture.ts';
import { coldestMonthIndoorHumidity, UK_COLDEST_MONTH_SCREENING } from '../../src/core/coldest-month-humidity.ts';
import { personMoistureOutput } from '../../src/core/moisture-generation.ts';
import { flowFromAirChanges, gramsPerHour } from '../../src/core/units.ts';

describe('activity moisture', () => {
  it('gives the published rates with their sources', () => {
    // IEA Annex 14 (1990) table via a reproduced handbook table (references.md §6.2, secondary source):
    // shower ≈ 2500 g/h, bath ≈ 700 g/h, cooking 600–1500 g/h, laundry dripping 100–500 g/h, plants 7–15 g/h.
    approxEqual(gramsPerHour(activityMoistureOutput('shower').typical_kgs), 2500, { abs: 1e-9 });
    approxEqual(gramsPerHour(activityMoistureOutput('bath').typical_kgs), 700, { abs: 1e-9 });
    approxEqual(gramsPerHour(activityMoistureOutput('cooking').low_kgs), 600, { abs: 1e-9 });
    approxEqual(gramsPerHour(activityMoistureOutput('cooking').high_kgs), 1500, { abs: 1e-9 });
    approxEqual(gramsPerHour(activityMoistureOutput('laundry-drying-dripping').high_kgs), 500, { abs: 1e-9 });
    approxEqual(gramsPerHour(activityMoistureOutput('pot-plants').low_kgs), 7, { abs: 1e-9 });
    // BS 5250 daily amounts (from memory): cooking 2 kg/day electric, 3 kg/day gas.
    expect(activityMoistureOutput('cooking').dailyAmount_kg).toBe(2);
    expect(activityMoistureOutput('cooking-gas').dailyAmount_kg).toBe(3);
    // UK social-landlord advice page (references.md §6.2, confirmed): drying a load indoors ≈ 9 pints = 5.1 kg.
    approxEqual(activityMoistureOutput('laundry-drying-dripping').dailyAmount_kg ?? 0, 9 * 0.568, { abs: 0.02 });
    for (const kind of MOISTURE_ACTIVITY_KINDS) {
      const a = activityMoistureOutput(kind);
      expect(a.low_kgs <= a.typical_kgs && a.typical_kgs <= a.high_kgs, kind).toBe(true);
      expect(a.source, kind).toMatch(/secondary source|from memory|confirmed/);
    }
  });

  it('adds up a day of events', () => {
    // Arithmetic: 10 min at 2500 g/h = 0.4167 kg; 2 people asleep 8 h at 40 g/h (BS 5250, from memory) = 0.64 kg.
    const day = moistureOverPeriod([
      { rate_kgs: activityMoistureOutput('shower').typical_kgs, duration_s: 600 },
      { rate_kgs: 2 * personMoistureOutput('asleep').typical_kgs, duration_s: 8 * 3600 },
    ]);
    approxEqual(day.total_kg, 0.41667 + 0.64, { abs: 1e-4 });
    approxEqual(day.meanRate_kgs, day.total_kg / 86400, { rel: 1e-12 });
  });
});

describe('household moisture (BS 5250 occupancy classes)', () => {
  it('gives the table values', () => {
    // BS 5250:2002 Table 1 (from memory); 9 kg/day for a wet one-person household also in a surveyors' article (secondary source).
    expect(householdMoisture(1, 'wet').perDay_kg).toBe(9);
    expect(householdMoisture(4, 'moist').perDay_kg).toBe(10);
    expect(householdMoisture(2, 'dry').perDay_kg).toBe(4);
    expect(householdMoisture(6, 'wet').perDay_kg).toBe(16);
    approxEqual(householdMoisture(4, 'moist').meanRate_kgs, 10 / 86400, { rel: 1e-12 });
    expect(householdMoisture(4, 'moist').source).toMatch(/from memory/);
  });

  it('uses the nearest row outside 1–6 people and says so', () => {
    expect(householdMoisture(8, 'dry')).toMatchObject({ perDay_kg: 7, clamped: true });
    expect(householdMoisture(3, 'dry').clamped).toBe(false);
  });
});

describe('coldest-month humidity', () => {
  const flat = { volume_m3: 120, supply_m3s: flowFromAirChanges(0.5, 120), roomTemp_C: 20, source_kgs: 10 / 86400 };

  it('uses the labelled screening month when no local means are given', () => {
    const r = coldestMonthIndoorHumidity(flat);
    expect(r.month).toBe(UK_COLDEST_MONTH_SCREENING);
    expect(r.month.source).toMatch(/Assumed screening case.*from memory/);
    expect(r.warnings.map((w) => w.code)).toContain('screening-case');
    approxEqual(r.relativeHumidity_pct, 69.8, { abs: 0.05 }); // [D] from the balance, checked against psychrolib in moisture-balance.test.ts
  });

  it('uses local monthly means when given, without the screening warning', () => {
    const r = coldestMonthIndoorHumidity({ ...flat, month: { temp_C: 2, rh_pct: 90, source: 'local station, January mean' } });
    expect(r.warnings.map((w) => w.code)).not.toContain('screening-case');
    expect(r.relativeHumidity_pct).toBeLessThan(coldestMonthIndoorHumidity(flat).relativeHumidity_pct);
  });
});
