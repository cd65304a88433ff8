/**
 * Judging without misuse (src/core/judgement/judge-criterion.ts, interval-outcome.ts): one test
 * per misuse of practice.md §4 showing the judge refuses it and says why. Criteria are the
 * shipped rows (test/core/criteria/criteria-sets.test.ts checks their sources and periods).
 */
import { describe, expect, it } from 'vitest';
import { allCriteria } from '../../../src/core/criteria/criteria-sets.ts';
import { selectCriteria, type SelectedCriterion } from '../../../src/core/criteria/select-criteria.ts';
import { judgeCriterion, type JudgeContext, type MetricEvidence } from '../../../src/core/judgement/judge-criterion.ts';
import { intervalOutcome } from '../../../src/core/judgement/interval-outcome.ts';
import { EN_16798_ASSUMED_CO2_OUTPUT_M3S } from '../../../src/core/criteria/en-16798-bands.ts';
import { fromLitresPerSecond } from '../../../src/core/units.ts';
import { approxEqual } from '../../support/approx-equal.ts';

const byId = (id: string) => allCriteria().find((c) => c.id === id)!;
const asLimit = (id: string): SelectedCriterion => ({ criterion: byId(id), role: 'limit', label: byId(id).title, caveat: '', reason: 'test' });
const SETTLE = 'A 20-minute decay test would decide this.';
const ctx = (evidence: MetricEvidence[], extra: Partial<JudgeContext> = {}): JudgeContext => ({
  evidence,
  outdoor_ppm: 420,
  occupants: { count: 28, outputPerPerson_m3s: 3.1e-6, label: 'pupils aged 6–11' },
  floorArea_m2: 50,
  settleBy: SETTLE,
  ...extra,
});
const spot = (ppm: number): MetricEvidence => ({ metric: 'co2-absolute', period: 'instant', favourable: ppm, central: ppm, unfavourable: ppm, basis: 'measured', describe: 'a spot reading' });
const dayMean = (lo: number, hi: number): MetricEvidence => ({ metric: 'co2-absolute', period: 'occupied-day-mean', favourable: lo, central: null, unfavourable: hi, basis: 'estimated-from-measurements', describe: 'the day profile mean' });

describe('interval outcome', () => {
  it('meets only when the unfavourable end meets, fails only when the favourable end fails', () => {
    expect(intervalOutcome({ favourable: 900, central: 1000, unfavourable: 1100 }, 1500, 'at-most').outcome).toBe('meets');
    expect(intervalOutcome({ favourable: 1600, central: 1700, unfavourable: 1800 }, 1500, 'at-most').outcome).toBe('does-not-meet');
    expect(intervalOutcome({ favourable: 1200, central: 1500, unfavourable: 2100 }, 1750, 'at-most')).toEqual({ outcome: 'uncertain', margin: { atFavourable: 550, atUnfavourable: -350 } });
    expect(intervalOutcome({ favourable: 0.006, central: null, unfavourable: null }, 0.005, 'at-least').outcome).toBe('uncertain');
  });
});

describe('judgeCriterion refuses each misuse (practice.md §4)', () => {
  it('never judges a spot reading against a daily mean (BB101 daily mean over the teaching day)', () => {
    const check = judgeCriterion(asLimit('bb101-2018-co2-mean-refurbished-natural'), ctx([spot(1200)]));
    expect(check.outcome).toBe('not-assessed');
    expect(check.why).toMatch(/mean over the occupied day.*a single reading.*cannot show/);
    expect(check.settleBy).toBe(SETTLE);
  });

  it('never judges a spot reading against a 20-consecutive-minute cap', () => {
    const check = judgeCriterion(asLimit('bb101-2018-co2-cap-refurbished-natural'), ctx([spot(2500)]));
    expect(check.outcome).toBe('not-assessed');
    expect(check.why).toMatch(/20 consecutive minutes/);
  });

  it('uses the day profile instead of a spot reading, and says so', () => {
    const check = judgeCriterion(asLimit('bb101-2018-co2-mean-refurbished-natural'), ctx([spot(2500), dayMean(1100, 1400)]));
    expect(check.outcome).toBe('meets');
    expect(check.why).toMatch(/Judged on the day profile mean.*a single reading cannot show a mean over the occupied day, so it was not used/);
  });

  it('never compares an absolute reading with a band above outdoor; without outdoor it is not assessed', () => {
    // EN 16798-1 category II, 800 ppm above outdoor (Annex B, confirmed): an occupied mean of 1000–1150 ppm
    // with outdoor 420 is an excess of 580–730 ppm, which meets 800 for adults; compared as absolute it would not.
    const adults = { count: 10, outputPerPerson_m3s: EN_16798_ASSUMED_CO2_OUTPUT_M3S, label: 'adults' };
    const check = judgeCriterion(asLimit('en16798-nonres-co2-ii'), ctx([{ ...dayMean(1000, 1150), period: 'occupied-period-mean' }], { occupants: adults }));
    expect(check.outcome).toBe('meets');
    expect(check.value!.unfavourable).toBe(730);
    expect(check.why).toMatch(/outdoor level \(420 ppm\) was taken off/);
    const none = judgeCriterion(asLimit('en16798-nonres-co2-ii'), ctx([dayMean(1000, 1150)], { occupants: adults, outdoor_ppm: null }));
    expect(none.outcome).toBe('not-assessed');
    expect(none.why).toMatch(/no outdoor level/);
  });

  it('rescales an adult band for children (practice.md §1.7: 800 ppm → about 446 ppm for 3.1e-6 m³/s per pupil)', () => {
    const check = judgeCriterion(asLimit('en16798-nonres-co2-ii'), ctx([dayMean(900, 1000)]));
    approxEqual(check.limit!, (800 * 3.1e-6) / EN_16798_ASSUMED_CO2_OUTPUT_M3S, { rel: 1e-12 });
    approxEqual(check.limit!, 446.4, { abs: 0.1 });
    // An excess of 480–580 ppm would meet 800 ppm for adults but not the band rescaled for pupils.
    expect(check.outcome).toBe('does-not-meet');
    expect(check.why).toMatch(/rescaled to 446 ppm/);
  });

  it('calls a straddling interval uncertain and names the measurement that would settle it', () => {
    const check = judgeCriterion(asLimit('bb101-2018-co2-mean-refurbished-natural'), ctx([dayMean(1300, 2100)]));
    expect(check.outcome).toBe('uncertain');
    expect(check.settleBy).toBe(SETTLE);
    expect(check.margin).toEqual({ atFavourable: 450, atUnfavourable: -350 });
  });

  it('judges a per-person rate per person, and the EN 16798-1 rate with its per-area term', () => {
    const flow: MetricEvidence = { metric: 'outdoor-air-flow', period: 'continuous', favourable: 0.06, central: 0.054, unfavourable: 0.048, basis: 'measured', describe: 'supply' };
    const acop = judgeCriterion(asLimit('workplace-regs-acop-fresh-air'), ctx([flow]));
    approxEqual(acop.value!.unfavourable!, 0.048 / 28, { rel: 1e-12 });
    expect(acop.outcome).toBe('does-not-meet');
    const en = judgeCriterion(asLimit('en16798-rate-ii'), ctx([flow]));
    // EN 16798-1 q_p 7 L/s per person + q_B 0.7 L/s per m² (from memory): 28 × 7 + 50 × 0.7 = 231 L/s.
    approxEqual(en.limit!, fromLitresPerSecond(231), { rel: 1e-12 });
  });

  it('shows new-work guidance on an existing home as a benchmark, never as a failure (practice.md §1.11)', () => {
    const selected = selectCriteria({ buildingUse: 'dwelling', roomUse: 'bedroom', situation: 'existing', ventilation: 'natural' }).selected;
    const vent = selected.find((s) => s.criterion.id === 'adf-2021-background-vent-habitable')!;
    expect(vent.role).toBe('benchmark');
    const area: MetricEvidence = { metric: 'ventilator-equivalent-area', period: 'design-provision', favourable: 0.0025, central: 0.0025, unfavourable: 0.0025, basis: 'measured', describe: 'vents' };
    const check = judgeCriterion(vent, ctx([area]));
    expect(check.outcome).toBe('does-not-meet');
    expect(check.statement).toMatch(/^Below what current guidance sets for new or refurbished homes/);
    for (const s of selected) expect(judgeCriterion(s, ctx([area, dayMean(900, 1500)])).statement).not.toMatch(/fail/i);
  });

  it('does not judge a purge-by-fan air change rate from a window-opening flow', () => {
    const windows: MetricEvidence = { metric: 'outdoor-air-flow', period: 'when-running', favourable: 0.1, central: 0.08, unfavourable: 0.05, basis: 'predicted', describe: 'windows open' };
    expect(judgeCriterion(asLimit('adf-2021-purge-mechanical'), ctx([windows])).outcome).toBe('not-assessed');
  });

  it('gives duties no pass or fail', () => {
    const check = judgeCriterion({ ...asLimit('hhsrs-damp-mould'), role: 'duty' }, ctx([]));
    expect(check.outcome).toBe('not-assessed');
    expect(check.why).toMatch(/competent person/);
  });
});
