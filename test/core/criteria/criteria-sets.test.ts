/**
 * Each criterion's value, metric, averaging period, status, confidence and source, row by row.
 * The values are those of references.md §5 and practice.md §4; the source named in each row is
 * where the value comes from, and its confidence tag says how far it was checked.
 */
import { describe, it, expect } from 'vitest';
import { allCriteria, listCriteriaSets, CRITERIA_DATA_VERSION } from '../../../src/core/criteria/criteria-sets.ts';
import type { Criterion } from '../../../src/core/criteria/criterion.ts';
import { approxEqual } from '../../support/approx-equal.ts';
import { displayQuantity, litresPerSecond, perHour, squareMillimetres } from '../../../src/core/units.ts';

type Row = [id: string, limit: number | null, metric: Criterion['metric'], period: Criterion['period'], status: Criterion['status'], confidence: Criterion['confidence'], source: RegExp];

function byId(id: string): Criterion {
  const c = allCriteria().find((x) => x.id === id);
  if (!c) throw new Error(`no criterion ${id}`);
  return c;
}

/** The limit in the unit people quote it in (ppm, L/s, mm², h⁻¹, %). */
function quoted(c: Criterion): number | null {
  if (c.limit === null) return null;
  switch (c.metric) {
    case 'flow-per-person':
    case 'flow-per-person-and-area':
    case 'flow-per-floor-area':
    case 'whole-dwelling-flow':
    case 'extract-flow':
      return litresPerSecond(c.limit);
    case 'ventilator-equivalent-area':
    case 'door-undercut-area':
      return squareMillimetres(c.limit);
    case 'air-change-rate':
      return perHour(c.limit);
    default:
      return c.limit;
  }
}

function checkRows(rows: readonly Row[]): void {
  for (const [id, limit, metric, period, status, confidence, source] of rows) {
    const c = byId(id);
    const q = quoted(c);
    if (limit === null) expect(q, id).toBeNull();
    else approxEqual(q ?? Number.NaN, limit, { abs: 1e-9 }, id);
    expect({ id, metric: c.metric, period: c.period, status: c.status, confidence: c.confidence }).toEqual({ id, metric, period, status, confidence });
    expect(`${c.source.document} ${c.source.edition} ${c.source.clause ?? ''}`, id).toMatch(source);
  }
}

describe('criteria sets', () => {
  it('lists three sets with unique ids and a data version', () => {
    expect(listCriteriaSets().map((s) => s.id)).toEqual(['schools', 'dwellings', 'workplaces']);
    const ids = allCriteria().map((c) => c.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(CRITERIA_DATA_VERSION).toBe(1);
  });

  it('gives every numeric criterion a direction and every duty none', () => {
    for (const c of allCriteria()) {
      if (c.metric === 'qualitative-duty') expect([c.limit, c.direction, c.period], c.id).toEqual([null, 'none', 'not-applicable']);
      else expect(c.limit !== null && c.direction !== 'none', c.id).toBe(true);
    }
  });
});

describe('schools set', () => {
  it('has the BB101 (2018) rows: daily mean over teaching hours and a 20-consecutive-minute cap', () => {
    // BB101 (2018) CO2 criteria: references.md §5.2 (CIBSE Journal 2018 summaries, secondary) and
    // practice.md §4 (all recalled from memory). Secondary where a summary showed the value, else from memory.
    const BB = /BB101.*2018/;
    checkRows([
      ['bb101-2018-co2-mean-new-natural', 1500, 'co2-absolute', 'occupied-day-mean', 'design-guidance-new-work', 'secondary', BB],
      ['bb101-2018-co2-cap-new-natural', 2000, 'co2-absolute', '20-consecutive-minutes', 'design-guidance-new-work', 'secondary', BB],
      ['bb101-2018-co2-mean-new-mechanical', 1000, 'co2-absolute', 'occupied-day-mean', 'design-guidance-new-work', 'secondary', BB],
      ['bb101-2018-co2-cap-new-mechanical', 1500, 'co2-absolute', '20-consecutive-minutes', 'design-guidance-new-work', 'from memory', BB],
      ['bb101-2018-co2-mean-new-hybrid', 1500, 'co2-absolute', 'occupied-day-mean', 'design-guidance-new-work', 'from memory', BB],
      ['bb101-2018-co2-cap-new-hybrid', 2000, 'co2-absolute', '20-consecutive-minutes', 'design-guidance-new-work', 'from memory', BB],
      ['bb101-2018-co2-mean-refurbished-natural', 1750, 'co2-absolute', 'occupied-day-mean', 'design-guidance-new-work', 'secondary', BB],
      ['bb101-2018-co2-cap-refurbished-natural', 2000, 'co2-absolute', '20-consecutive-minutes', 'design-guidance-new-work', 'from memory', BB],
      ['bb101-2018-co2-mean-refurbished-mechanical', 1350, 'co2-absolute', 'occupied-day-mean', 'design-guidance-new-work', 'from memory', BB],
      ['bb101-2018-co2-cap-refurbished-mechanical', 2000, 'co2-absolute', '20-consecutive-minutes', 'design-guidance-new-work', 'from memory', BB],
      ['bb101-2018-co2-mean-refurbished-hybrid', 1750, 'co2-absolute', 'occupied-day-mean', 'design-guidance-new-work', 'from memory', BB],
      ['bb101-2018-co2-cap-refurbished-hybrid', 2000, 'co2-absolute', '20-consecutive-minutes', 'design-guidance-new-work', 'from memory', BB],
      // BB101 (2018) rates, references.md §5.2 (secondary): 5 L/s per person daily minimum, 8 L/s per person purge.
      ['bb101-2018-min-rate', 5, 'flow-per-person', 'occupied-day-mean', 'design-guidance-new-work', 'secondary', BB],
      ['bb101-2018-purge-rate', 8, 'flow-per-person', 'when-running', 'design-guidance-new-work', 'secondary', BB],
      // School Premises (England) Regulations 2012: a duty without a number (practice.md §4, from memory).
      ['school-premises-2012-ventilation', null, 'qualitative-duty', 'not-applicable', 'law', 'from memory', /School Premises.*2012/],
    ]);
  });
});

describe('workplaces set', () => {
  it('has HSE 800/1500 "consistently", the Workplace Regulations ACoP, ADF Vol 2 and EN 16798-1 with its area term', () => {
    checkRows([
      // HSE CO2 monitoring guidance (hse.gov.uk, confirmed; references.md §5.4).
      ['hse-co2-well-ventilated', 800, 'co2-absolute', 'consistently', 'benchmark', 'confirmed', /HSE/],
      ['hse-co2-action', 1500, 'co2-absolute', 'consistently', 'guidance', 'confirmed', /HSE/],
      // Workplace Regulations 1992 reg. 6 ACoP: 5–8 L/s per person (from memory; practice.md §4).
      ['workplace-regs-acop-fresh-air', 5, 'flow-per-person', 'occupied-day-mean', 'approved-code-of-practice', 'from memory', /Workplace.*1992.*regulation 6/],
      // ADF 2021 Vol 2 offices 10 L/s per person (from memory; references.md §5.1).
      ['adf-2021-v2-office-rate', 10, 'flow-per-person', 'continuous', 'statutory-guidance', 'from memory', /Approved Document F, Volume 2.*2021/],
      // EN 16798-1:2019 Annex B non-residential ΔCO2 550/800/1350 (confirmed; references.md §5.3).
      ['en16798-nonres-co2-i', 550, 'co2-above-outdoor', 'occupied-period-mean', 'benchmark', 'confirmed', /EN 16798-1 2019 Annex B/],
      ['en16798-nonres-co2-ii', 800, 'co2-above-outdoor', 'occupied-period-mean', 'benchmark', 'confirmed', /EN 16798-1 2019 Annex B/],
      ['en16798-nonres-co2-iii', 1350, 'co2-above-outdoor', 'occupied-period-mean', 'benchmark', 'confirmed', /EN 16798-1 2019 Annex B/],
      // EN 16798-1 q_p 10/7/4 L/s per person plus q_B 1.0/0.7/0.4 L/s per m² (low-polluting), from memory.
      ['en16798-rate-i', 10, 'flow-per-person-and-area', 'occupied-period-mean', 'benchmark', 'from memory', /EN 16798-1/],
      ['en16798-rate-ii', 7, 'flow-per-person-and-area', 'occupied-period-mean', 'benchmark', 'from memory', /EN 16798-1/],
      ['en16798-rate-iii', 4, 'flow-per-person-and-area', 'occupied-period-mean', 'benchmark', 'from memory', /EN 16798-1/],
    ]);
    expect(['i', 'ii', 'iii'].map((k) => litresPerSecond(byId(`en16798-rate-${k}`).areaTerm_m3s_m2 ?? 0))).toEqual([1, 0.7, 0.4]);
    // The bands assume about 20 L/h per person (from memory; practice.md §1.7) = 0.0056 L/s.
    approxEqual(litresPerSecond(byId('en16798-nonres-co2-ii').assumedCo2Output_m3s ?? 0), 0.0056, { abs: 5e-5 });
  });
});

describe('dwellings set', () => {
  it('has ADF 2021 Vol 1 as statutory guidance for new work, with the sources of references.md §5.1', () => {
    const ADF = /Approved Document F, Volume 1.*2021/;
    checkRows([
      // Whole-dwelling rates 19/25/31/37/43 L/s by bedrooms and 0.3 L/s per m² (secondary summaries of ADF 2021).
      ['adf-2021-whole-dwelling-1-bed', 19, 'whole-dwelling-flow', 'continuous', 'statutory-guidance', 'secondary', ADF],
      ['adf-2021-whole-dwelling-2-bed', 25, 'whole-dwelling-flow', 'continuous', 'statutory-guidance', 'secondary', ADF],
      ['adf-2021-whole-dwelling-3-bed', 31, 'whole-dwelling-flow', 'continuous', 'statutory-guidance', 'secondary', ADF],
      ['adf-2021-whole-dwelling-4-bed', 37, 'whole-dwelling-flow', 'continuous', 'statutory-guidance', 'secondary', ADF],
      ['adf-2021-whole-dwelling-5-bed', 43, 'whole-dwelling-flow', 'continuous', 'statutory-guidance', 'secondary', ADF],
      ['adf-2021-whole-dwelling-per-area', 0.3, 'flow-per-floor-area', 'continuous', 'statutory-guidance', 'secondary', ADF],
      // Intermittent extract (secondary): kitchen with hood 30, kitchen 60, utility 30, bathroom 15, WC 6 L/s.
      ['adf-2021-intermittent-extract-kitchen-hood', 30, 'extract-flow', 'when-running', 'statutory-guidance', 'secondary', ADF],
      ['adf-2021-intermittent-extract-kitchen', 60, 'extract-flow', 'when-running', 'statutory-guidance', 'secondary', ADF],
      ['adf-2021-intermittent-extract-utility', 30, 'extract-flow', 'when-running', 'statutory-guidance', 'secondary', ADF],
      ['adf-2021-intermittent-extract-bathroom', 15, 'extract-flow', 'when-running', 'statutory-guidance', 'secondary', ADF],
      ['adf-2021-intermittent-extract-toilet', 6, 'extract-flow', 'when-running', 'statutory-guidance', 'secondary', ADF],
      // Continuous extract high rates 13/8/8/6 L/s (from memory).
      ['adf-2021-continuous-extract-kitchen', 13, 'extract-flow', 'when-running', 'statutory-guidance', 'from memory', ADF],
      ['adf-2021-continuous-extract-utility', 8, 'extract-flow', 'when-running', 'statutory-guidance', 'from memory', ADF],
      ['adf-2021-continuous-extract-bathroom', 8, 'extract-flow', 'when-running', 'statutory-guidance', 'from memory', ADF],
      ['adf-2021-continuous-extract-toilet', 6, 'extract-flow', 'when-running', 'statutory-guidance', 'from memory', ADF],
      // Background ventilators with replacement windows 8000/8000/4000 mm² (secondary: LABC summaries).
      ['adf-2021-background-vent-habitable', 8000, 'ventilator-equivalent-area', 'design-provision', 'statutory-guidance', 'secondary', ADF],
      ['adf-2021-background-vent-kitchen', 8000, 'ventilator-equivalent-area', 'design-provision', 'statutory-guidance', 'secondary', ADF],
      ['adf-2021-background-vent-bathroom', 4000, 'ventilator-equivalent-area', 'design-provision', 'statutory-guidance', 'secondary', ADF],
      // Purge 1/20 of floor area or about 4 ACH (from memory, references.md §3.4 and practice.md §4); undercut 7600 mm² (practice.md §2.1).
      ['adf-2021-purge-window', 1 / 20, 'opening-area-fraction', 'design-provision', 'statutory-guidance', 'from memory', ADF],
      ['adf-2021-purge-mechanical', 4, 'air-change-rate', 'when-running', 'statutory-guidance', 'from memory', ADF],
      ['adf-2021-door-undercut', 7600, 'door-undercut-area', 'design-provision', 'statutory-guidance', 'from memory', ADF],
    ]);
    for (const c of allCriteria().filter((x) => x.id.startsWith('adf-2021-') && !x.id.startsWith('adf-2021-v2'))) {
      expect(c.covers.situations, c.id).not.toContain('existing');
    }
  });

  it('has the risk-based duties for existing and rented homes, with no CO2 number', () => {
    // practice.md §1.11 and §4: hazard rating, fitness for habitation, social-landlord timescales (from memory).
    checkRows([
      ['hhsrs-damp-mould', null, 'qualitative-duty', 'not-applicable', 'law', 'secondary', /Housing Act 2004/],
      ['fitness-for-habitation', null, 'qualitative-duty', 'not-applicable', 'law', 'secondary', /Fitness for Human Habitation\) Act 2018/],
      ['social-landlord-damp-mould-timescales', null, 'qualitative-duty', 'not-applicable', 'law', 'from memory', /Social Housing/],
      // ISO 13788 / BS 5250 monthly-mean surface RH 80 % (BS 5250:2011 Annex D read; references.md §6.3).
      ['bs5250-surface-rh', 80, 'surface-rh', 'monthly-mean', 'guidance', 'secondary', /BS 5250.*Annex D/],
      // EN 16798-1 residential ΔCO2 380/550/950 as bedroom benchmarks (from memory; references.md §5.3).
      ['en16798-res-co2-i', 380, 'co2-above-outdoor', 'occupied-period-mean', 'benchmark', 'from memory', /EN 16798-1/],
      ['en16798-res-co2-ii', 550, 'co2-above-outdoor', 'occupied-period-mean', 'benchmark', 'from memory', /EN 16798-1/],
      ['en16798-res-co2-iii', 950, 'co2-above-outdoor', 'occupied-period-mean', 'benchmark', 'from memory', /EN 16798-1/],
    ]);
    const homes = allCriteria().filter((c) => c.covers.buildingUses.includes('dwelling'));
    expect(homes.filter((c) => c.metric === 'co2-absolute' && c.status !== 'benchmark')).toEqual([]);
  });

  it('keeps display units to units.ts', () => {
    expect(displayQuantity(byId('adf-2021-background-vent-habitable').limit ?? 0, 'ventArea')).toEqual({ value: 8000, unit: 'mm²', step: 100 });
  });
});
