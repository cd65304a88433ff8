/**
 * The instrument form's rules (src/app/instrument-draft.ts, accuracy-words.ts): stated accuracy as
 * ± (fixed part + % of reading) per quantity, both parts or neither, units as the form shows them,
 * the baseline answer for CO₂ meters only, and a changed instrument keeping its id and checks.
 */
import { describe, it, expect } from 'vitest';
import { accuracyWords } from '../../src/app/accuracy-words.ts';
import { instrumentDraft, instrumentFromDraft } from '../../src/app/instrument-draft.ts';
import type { Instrument } from '../../src/model/instrument.ts';
import { approxEqual } from '../support/approx-equal.ts';

const ID = '0f0f0001-0000-4000-8000-000000000001';
const newId = () => ID;
const draft = () => ({ ...instrumentDraft(), model: 'Handheld CO₂ meter (invented)' });

describe('instrument form rules', () => {
  it('a new CO₂ meter with its maker’s accuracy becomes a valid record', () => {
    const d = draft();
    d.accuracy.co2 = { fixed: 50, percent: 3 };
    d.accuracy.temperature = { fixed: 0.5, percent: 0 };
    d.calibratedOn = '2025-09-02';
    d.autoBaselineOff = 'yes';
    const result = instrumentFromDraft(d, undefined, newId);
    expect(result).toEqual({
      ok: true,
      instrument: {
        id: ID,
        model: 'Handheld CO₂ meter (invented)',
        serial: '',
        measures: ['co2', 'temperature', 'relative-humidity'],
        accuracy: [
          { quantity: 'co2', plusMinus: 50, percentOfReading: 3 },
          { quantity: 'temperature', plusMinus: 0.5, percentOfReading: 0 },
        ],
        calibratedOn: '2025-09-02',
        autoBaselineOff: true,
        checks: [],
        notes: '',
      },
    });
  });

  it('refuses one part without the other, naming the quantity and the part, so a forgotten part never narrows the uncertainty', () => {
    const d = draft();
    d.accuracy.co2 = { fixed: undefined, percent: 3 };
    d.accuracy['relative-humidity'] = { fixed: 3, percent: undefined };
    const result = instrumentFromDraft(d, undefined, newId);
    expect(result.ok).toBe(false);
    expect(!result.ok && result.problems).toEqual([
      { field: 'accuracy.co2.fixed', message: 'CO₂ accuracy: the fixed part (ppm) is empty — type 0 if the maker states none' },
      { field: 'accuracy.relative-humidity.percent', message: 'Relative humidity accuracy: the percent of reading is empty — type 0 if the maker states none' },
    ]);
  });

  it('passes the schema’s own limits back by quantity and part', () => {
    const d = draft();
    d.accuracy.co2 = { fixed: 50, percent: 150 };
    const result = instrumentFromDraft(d, undefined, newId);
    expect(!result.ok && result.problems).toEqual([
      { field: 'accuracy.co2.percent', message: 'CO₂: Accuracy (percent of reading) must be between 0 and 100 %', value: 150 },
    ]);
  });

  it('needs a model and something measured', () => {
    const result = instrumentFromDraft({ ...instrumentDraft(), measures: [] }, undefined, newId);
    expect(!result.ok && result.problems.map((p) => p.field)).toEqual(['model', 'measures']);
  });

  it('types airflow accuracy in L/s and stores m³/s, and shows it back in L/s', () => {
    const d = { ...draft(), measures: ['airflow' as const] };
    d.accuracy.airflow = { fixed: 2, percent: 5 };
    const result = instrumentFromDraft(d, undefined, newId);
    if (!result.ok) throw new Error(result.problems[0]!.message);
    const [stated] = result.instrument.accuracy;
    approxEqual(stated!.plusMinus, 0.002, { rel: 1e-12 }, '2 L/s in m³/s'); // 1 m³ = 1000 L (the litre's SI definition, BIPM SI Brochure 9th ed., table 8)
    expect(instrumentDraft(result.instrument).accuracy.airflow).toEqual({ fixed: 2, percent: 5 });
    expect(accuracyWords(stated!)).toBe('Airflow (fan flow) ±(2 L/s + 5 % of reading)');
  });

  it('keeps the baseline answer only for a meter that measures CO₂, and drops accuracy for quantities no longer measured', () => {
    const d = draft();
    d.autoBaselineOff = 'no';
    d.accuracy.co2 = { fixed: 50, percent: 3 };
    d.measures = ['temperature'];
    const result = instrumentFromDraft(d, undefined, newId);
    if (!result.ok) throw new Error(result.problems[0]!.message);
    expect(result.instrument.autoBaselineOff).toBeUndefined();
    expect(result.instrument.accuracy).toEqual([]);
  });

  it('a changed instrument keeps its id, side-by-side checks and notes, and round-trips through the form unchanged', () => {
    const existing: Instrument = {
      id: '0f0f0001-0000-4000-8000-000000000009',
      model: 'Wall logger (invented)',
      serial: 'L-17',
      measures: ['co2', 'temperature'],
      accuracy: [{ quantity: 'co2', plusMinus: 30, percentOfReading: 3 }],
      calibratedOn: '2025-06-18',
      autoBaselineOff: false,
      checks: [{ time: '2026-01-14T08:10:00+00:00', quantity: 'co2', reference: 'outdoor air', offset: 12 }],
      notes: 'Kept in the van',
    };
    const unchanged = instrumentFromDraft(instrumentDraft(existing), existing, () => 'not used');
    expect(unchanged).toEqual({ ok: true, instrument: existing });
    const d = instrumentDraft(existing);
    d.accuracy.temperature = { fixed: 0.3, percent: 0 };
    const changed = instrumentFromDraft(d, existing, () => 'not used');
    expect(changed.ok && changed.instrument.accuracy).toEqual([...existing.accuracy, { quantity: 'temperature', plusMinus: 0.3, percentOfReading: 0 }]);
    expect(changed.ok && changed.instrument.checks).toEqual(existing.checks);
  });

  it('words a stated accuracy as makers write it', () => {
    expect(accuracyWords({ quantity: 'co2', plusMinus: 50, percentOfReading: 3 })).toBe('CO₂ ±(50 ppm + 3 % of reading)');
    expect(accuracyWords({ quantity: 'temperature', plusMinus: 0.5, percentOfReading: 0 })).toBe('Temperature ±0.5 °C');
    expect(accuracyWords({ quantity: 'relative-humidity', plusMinus: 3, percentOfReading: 0 })).toBe('Relative humidity ±3 % RH');
    expect(accuracyWords({ quantity: 'airflow', plusMinus: 0, percentOfReading: 5 })).toBe('Airflow (fan flow) ±5 % of reading');
  });
});
