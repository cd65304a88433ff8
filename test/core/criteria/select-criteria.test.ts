import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../../support/approx-equal.ts';
import { selectCriteria, type RoomContext } from '../../../src/core/criteria/select-criteria.ts';
import { allCriteria } from '../../../src/core/criteria/criteria-sets.ts';
import { applyCriterionEdits } from '../../../src/core/criteria/criterion-edits.ts';
import { criterionCaveat } from '../../../src/core/criteria/criterion-caveat.ts';
import {
  flowPerPersonForCo2Excess,
  rescaleCriterionForOccupants,
  rescaledCo2Excess,
} from '../../../src/core/criteria/rescale-co2-band.ts';
import { occupantCo2Output } from '../../../src/core/co2-generation.ts';
import { litresPerSecond } from '../../../src/core/units.ts';

const ROOM_USES = ['classroom', 'hall', 'office', 'meeting-room', 'bedroom', 'living-room', 'kitchen', 'wet-room', 'toilet', 'utility', 'circulation', 'store', 'other', 'whole-dwelling'];
const NEW_WORK = ['statutory-guidance', 'design-guidance-new-work'];

function ids(ctx: RoomContext, role: string): string[] {
  return selectCriteria(ctx).selected.filter((s) => s.role === role).map((s) => s.criterion.id);
}

describe('selectCriteria', () => {
  it('never gives an existing home new-build guidance as a pass/fail limit (practice.md §1.11)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...ROOM_USES),
        fc.constantFrom('natural' as const, 'mechanical' as const, 'hybrid' as const, 'unknown' as const),
        fc.constantFrom(undefined, 'owner-occupied' as const, 'private-rented' as const, 'social-rented' as const),
        (roomUse, ventilation, tenure) => {
          const ctx: RoomContext = { buildingUse: 'dwelling', roomUse, situation: 'existing', ventilation, ...(tenure ? { tenure } : {}) };
          return selectCriteria(ctx).selected.every((s) => s.role !== 'limit' || (!NEW_WORK.includes(s.criterion.status) && !s.criterion.id.startsWith('adf')));
        },
      ),
      { numRuns: 300 },
    );
  });

  it('shows ADF to an existing rented flat as a labelled benchmark with the hazard duties', () => {
    const ctx: RoomContext = { buildingUse: 'dwelling', roomUse: 'bedroom', situation: 'existing', ventilation: 'natural', tenure: 'private-rented' };
    const r = selectCriteria(ctx);
    expect(ids(ctx, 'duty')).toEqual(['hhsrs-damp-mould', 'fitness-for-habitation']);
    const vent = r.selected.find((s) => s.criterion.id === 'adf-2021-background-vent-habitable');
    expect(vent?.role).toBe('benchmark');
    expect(vent?.label).toMatch(/^Benchmark: what current guidance sets for new or refurbished homes .*not a requirement for this existing building$/);
    expect(r.warnings.map((w) => w.code)).toContain('new-work-guidance-as-benchmark');
    expect(ids(ctx, 'benchmark')).toContain('en16798-res-co2-ii');
  });

  it('applies ADF as a limit to new work', () => {
    const ctx: RoomContext = { buildingUse: 'dwelling', roomUse: 'wet-room', situation: 'new', ventilation: 'mechanical' };
    expect(ids(ctx, 'limit')).toEqual(expect.arrayContaining(['adf-2021-intermittent-extract-bathroom', 'adf-2021-continuous-extract-bathroom']));
    expect(ids({ ...ctx, ventilation: 'natural' }, 'limit')).not.toContain('adf-2021-continuous-extract-bathroom');
  });

  it('gives the whole-dwelling rates to the whole dwelling only', () => {
    const whole = ids({ buildingUse: 'dwelling', roomUse: 'whole-dwelling', situation: 'new', ventilation: 'natural' }, 'limit');
    expect(whole).toContain('adf-2021-whole-dwelling-3-bed');
    expect(whole).not.toContain('bs5250-surface-rh');
    expect(ids({ buildingUse: 'dwelling', roomUse: 'bedroom', situation: 'new', ventilation: 'natural' }, 'limit')).not.toContain('adf-2021-whole-dwelling-3-bed');
  });

  it('picks the BB101 row for the situation and ventilation, and falls back to refurbishment rows for an existing school', () => {
    const newNatural: RoomContext = { buildingUse: 'school', roomUse: 'classroom', situation: 'new', ventilation: 'natural' };
    expect(ids(newNatural, 'limit')).toEqual(expect.arrayContaining(['bb101-2018-co2-mean-new-natural', 'bb101-2018-co2-cap-new-natural', 'hse-co2-action']));
    const existing = { ...newNatural, situation: 'existing' as const };
    expect(ids(existing, 'limit').filter((id) => id.startsWith('bb101'))).toEqual([]);
    expect(ids(existing, 'benchmark')).toEqual(expect.arrayContaining(['bb101-2018-co2-mean-refurbished-natural', 'bb101-2018-co2-cap-refurbished-natural']));
    expect(ids(existing, 'benchmark')).not.toContain('bb101-2018-co2-mean-new-natural');
    const refurbMech = { ...newNatural, situation: 'refurbished' as const, ventilation: 'mechanical' as const };
    expect(ids(refurbMech, 'limit')).toContain('bb101-2018-co2-mean-refurbished-mechanical');
  });

  it('shows ventilation-specific rows as benchmarks when the type is unknown', () => {
    const r = selectCriteria({ buildingUse: 'school', roomUse: 'classroom', situation: 'new', ventilation: 'unknown' });
    expect(r.selected.filter((s) => s.criterion.id.startsWith('bb101-2018-co2')).every((s) => s.role === 'benchmark')).toBe(true);
    expect(r.warnings.map((w) => w.code)).toContain('ventilation-unknown');
  });

  it('lists tenure-only duties with their condition when tenure is unknown', () => {
    const r = selectCriteria({ buildingUse: 'dwelling', roomUse: 'bedroom', situation: 'existing', ventilation: 'natural' });
    expect(r.selected.find((s) => s.criterion.id === 'fitness-for-habitation')?.label).toMatch(/tenure not recorded/);
    expect(r.warnings.map((w) => w.code)).toContain('tenure-unknown');
    expect(ids({ buildingUse: 'dwelling', roomUse: 'bedroom', situation: 'existing', ventilation: 'natural', tenure: 'owner-occupied' }, 'duty')).toEqual(['hhsrs-damp-mould']);
  });

  it('gives every selection a caveat for unconfirmed values', () => {
    for (const s of selectCriteria({ buildingUse: 'office', roomUse: 'office', situation: 'new', ventilation: 'mechanical' }).selected) {
      expect(s.caveat === '', s.criterion.id).toBe(s.criterion.confidence === 'confirmed');
    }
  });
});

describe('criterionCaveat', () => {
  it('says "not yet confirmed against <document>" for a value from memory', () => {
    const c = allCriteria().find((x) => x.id === 'adf-2021-continuous-extract-kitchen');
    expect(c && criterionCaveat(c)).toBe('not yet confirmed against Approved Document F, Volume 1: dwellings (2021 (in force 15 June 2022))');
    const s = allCriteria().find((x) => x.id === 'bb101-2018-co2-mean-new-natural');
    expect(s && criterionCaveat(s)).toMatch(/^seen only in a secondary summary, not yet confirmed against BB101/);
    const h = allCriteria().find((x) => x.id === 'hse-co2-action');
    expect(h && criterionCaveat(h)).toBe('');
  });
});

describe('applyCriterionEdits', () => {
  const edit = { criterionId: 'hse-co2-action', field: 'limit' as const, oldValue: 1500, newValue: 1200, by: 'A. Surveyor', reason: 'client target for this school', at: '2025-01-14' };

  it('applies an edit to a copy and records who, what, why, old and new', () => {
    const base = allCriteria();
    const r = applyCriterionEdits(base, [edit]);
    const edited = r.criteria.find((c) => c.id === 'hse-co2-action');
    expect(edited?.limit).toBe(1200);
    expect(edited?.edits).toEqual([edit]);
    expect(r.applied).toEqual([edit]);
    expect(base.find((c) => c.id === 'hse-co2-action')?.limit).toBe(1500);
    expect(r.criteria.filter((c) => c.edits.length > 0)).toHaveLength(1);
  });

  it('skips stale and unknown edits with warnings', () => {
    const r = applyCriterionEdits(allCriteria(), [
      { ...edit, oldValue: 1000 },
      { ...edit, criterionId: 'no-such' },
      { criterionId: 'bb101-2018-co2-mean-new-natural', field: 'period', oldValue: 'occupied-day-mean', newValue: '8-hours', by: 'B', reason: 'test' },
    ]);
    expect(r.warnings.map((w) => w.code)).toEqual(['edit-stale-value', 'edit-unknown-criterion']);
    expect(r.criteria.find((c) => c.id === 'hse-co2-action')?.limit).toBe(1500);
    expect(r.criteria.find((c) => c.id === 'bb101-2018-co2-mean-new-natural')?.period).toBe('8-hours');
  });
});

describe('rescaling CO2 bands for children and sleepers (practice.md §1.7)', () => {
  it('pupils aged 6–11: category II ΔC 800 means about 3.9 L/s per pupil, not 7', () => {
    // Pupils' output from Persily & de Jonge 2017 with Schofield BMR (co2-generation.ts), mixed 6–11 at 1.2 met, 20 °C:
    // about 0.0031 L/s (practice.md §1.7, arithmetic [sure]).
    const pupil = occupantCo2Output([{ count: 1, ageBand: '6-11', sex: 'mixed', met: 1.2 }], { temp_C: 20, pressure_Pa: 101325 }).total_m3s;
    approxEqual(litresPerSecond(pupil), 0.0031, { abs: 5e-5 });
    approxEqual(litresPerSecond(flowPerPersonForCo2Excess(800, 3.1e-6)), 3.875, { abs: 1e-9 });
    approxEqual(litresPerSecond(flowPerPersonForCo2Excess(800, pupil)), 3.9, { abs: 0.1 });
    const band = allCriteria().find((c) => c.id === 'en16798-nonres-co2-ii');
    if (!band) throw new Error('missing band');
    const r = rescaleCriterionForOccupants(band, 3.1e-6, 'pupils aged 6–11');
    approxEqual(litresPerSecond(r.unscaledFlowPerPerson_m3s ?? 0), 3.875, { abs: 1e-9 });
    // The band's own air per person for adults at 20 L/h (from memory): 0.00556/800e-6 ≈ 7 L/s.
    approxEqual(litresPerSecond(r.flowPerPerson_m3s ?? 0), 7, { abs: 0.1 });
    approxEqual(r.criterion.limit ?? 0, rescaledCo2Excess(800, 0.02 / 3600, 3.1e-6), { rel: 1e-12 });
    approxEqual(r.criterion.limit ?? 0, 446.4, { abs: 0.05 });
    expect(r.criterion.note).toMatch(/Rescaled for pupils aged 6–11: 446 ppm instead of 800 ppm/);
    expect(band.limit).toBe(800);
  });

  it('refuses to rescale absolute bands', () => {
    const bb = allCriteria().find((c) => c.id === 'bb101-2018-co2-mean-new-natural');
    if (!bb) throw new Error('missing');
    const r = rescaleCriterionForOccupants(bb, 3.1e-6, 'pupils');
    expect(r.criterion).toBe(bb);
    expect(r.warnings.map((w) => w.code)).toEqual(['not-rescalable']);
  });
});
