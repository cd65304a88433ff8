import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { psychrolib } from './psychrolib-reference.ts';
import { mouldRisk, type MouldRiskInput } from '../../src/core/mould-risk.ts';
import { surfaceCondensation } from '../../src/core/condensation-risk.ts';
import { judgeMouldWithObservation } from '../../src/core/observed-mould.ts';
import { constructionTemperatureFactor } from '../../src/core/construction-temperature-factors.ts';
import type { TemperatureFactorEstimate } from '../../src/core/surface-temperature-factor.ts';
import { steadyIndoorHumidity } from '../../src/core/moisture-balance.ts';

const junction: TemperatureFactorEstimate = { value: 0.75, basis: 'measured', label: 'junction' };
const base: MouldRiskInput = { insideTemp_C: 20, insideRh_pct: 60, outsideTemp_C: 5, factor: junction, basis: 'monthly-mean' };

describe('mould risk (ISO 13788 / BS 5250 monthly-mean surface RH 80 %)', () => {
  it('reproduces the mould check of references.md §7.6', () => {
    // references.md §7.6 [D]: θ_si,min 15.44 °C; f_Rsi,min 0.696 at θ_e 5 °C; f 0.75 → 16.25 °C, 75.9 %;
    // at θ_e 0 °C → 15.0 °C, 82.3 %. Paired with psychrolib: θ_si,min is the dew point of p_i/0.8.
    const r = mouldRisk(base);
    approxEqual(r.minimumSurfaceTemp_C, 15.44, { abs: 0.005 });
    approxEqual(r.minimumSurfaceTemp_C, psychrolib.GetTDewPointFromVapPres(20, psychrolib.GetVapPresFromRelHum(20, 0.6) / 0.8), { abs: 1e-3 });
    approxEqual(r.requiredFactor ?? Number.NaN, 0.696, { abs: 5e-4 });
    approxEqual(r.surfaceTemp_C, 16.25, { abs: 1e-9 });
    approxEqual(r.surfaceRh_pct, 75.9, { abs: 0.05 });
    approxEqual(r.surfaceRh_pct, 100 * psychrolib.GetRelHumFromVapPres(16.25, psychrolib.GetVapPresFromRelHum(20, 0.6)), { abs: 1e-9 });
    expect(r.verdict).toBe('no-risk-predicted');
    expect(r.margin).toBeGreaterThan(0);

    const cold = mouldRisk({ ...base, outsideTemp_C: 0 });
    approxEqual(cold.surfaceTemp_C, 15.0, { abs: 1e-9 });
    approxEqual(cold.surfaceRh_pct, 82.3, { abs: 0.05 });
    expect(cold.verdict).toBe('risk');
    expect(cold.margin).toBeLessThan(0);
  });

  it('shows why 0.75 must not stand in for old fabric', () => {
    // practice.md §1.3: at 20 °C / 60 % in, 5 °C out, f 0.48 (solid brick) → surface RH about 99 %.
    const brick = mouldRisk({ ...base, factor: constructionTemperatureFactor('solid-brick') });
    approxEqual(brick.surfaceRh_pct, 99, { abs: 0.5 });
    expect(brick.verdict).toBe('risk');
    expect(brick.warnings.map((w) => w.code)).toContain('factor-from-construction');
    const assumed = mouldRisk({ ...base, factor: { value: 0.75, basis: 'design-minimum', label: 'IP 1/06 design minimum' } });
    expect(assumed.warnings.map((w) => w.code)).toContain('factor-assumed');
  });

  it('never reports low risk from a spot reading', () => {
    const spot = mouldRisk({ ...base, basis: 'spot' });
    expect(spot.verdict).toBe('not-established');
    expect(spot.summary).toMatch(/cannot show that mould risk is low/);
    expect(spot.warnings.map((w) => w.code)).toContain('spot-reading');
    // A spot reading that already gives 80 % or more still shows the risk.
    expect(mouldRisk({ ...base, basis: 'spot', outsideTemp_C: 0 }).verdict).toBe('risk');
  });

  it('has no required factor, and no NaN, when inside is not warmer than outside', () => {
    const r = mouldRisk({ ...base, outsideTemp_C: 20 });
    expect(r.requiredFactor).toBeNull();
    expect(r.margin).toBeNull();
    expect(Number.isNaN(r.surfaceRh_pct)).toBe(false);
  });
});

describe('mould risk properties', () => {
  const arbitraryInput = fc.record({
    insideTemp_C: fc.double({ min: 10, max: 28, noNaN: true }),
    insideRh_pct: fc.double({ min: 5, max: 95, noNaN: true }),
    outsideTemp_C: fc.double({ min: -20, max: 15, noNaN: true }),
    f: fc.double({ min: 0.1, max: 0.98, noNaN: true }),
  });

  it('more moisture never lowers the surface RH', () => {
    fc.assert(
      fc.property(arbitraryInput, fc.double({ min: 0, max: 30, noNaN: true }), (x, extra) => {
        const f = { value: x.f, basis: 'measured' as const, label: '' };
        const a = mouldRisk({ ...x, factor: f, basis: 'monthly-mean' });
        const b = mouldRisk({ ...x, insideRh_pct: Math.min(100, x.insideRh_pct + extra), factor: f, basis: 'monthly-mean' });
        const rank = { 'no-risk-predicted': 0, 'not-established': 0, risk: 1 };
        return b.surfaceRh_pct >= a.surfaceRh_pct && rank[b.verdict] >= rank[a.verdict];
      }),
    );
  });

  it('more moisture released in the room never lowers the surface RH (balance then mould check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 5e-4, noNaN: true }),
        fc.double({ min: 0, max: 5e-4, noNaN: true }),
        fc.double({ min: 1e-3, max: 0.2, noNaN: true }),
        fc.double({ min: -10, max: 12, noNaN: true }),
        fc.double({ min: 0.2, max: 0.95, noNaN: true }),
        (source, extra, supply, tOut, f) => {
          const room = { volume_m3: 40, supply_m3s: supply, outdoorTemp_C: tOut, outdoorRh_pct: 85, roomTemp_C: 19 };
          const surfaceRh = (g: number) =>
            mouldRisk({
              insideTemp_C: 19,
              insideRh_pct: steadyIndoorHumidity({ ...room, source_kgs: g }).relativeHumidity_pct,
              outsideTemp_C: tOut,
              factor: { value: f, basis: 'measured', label: '' },
              basis: 'monthly-mean',
            }).surfaceRh_pct;
          return surfaceRh(source + extra) >= surfaceRh(source);
        },
      ),
    );
  });

  it('a higher temperature factor never raises the surface RH (inside at least as warm as outside)', () => {
    // When outside is warmer (summer) a higher factor moves the surface towards the cooler inside air instead.
    fc.assert(
      fc.property(arbitraryInput, fc.double({ min: 0, max: 0.5, noNaN: true }), (x, more) => {
        fc.pre(x.outsideTemp_C <= x.insideTemp_C);
        const a = mouldRisk({ ...x, factor: { value: x.f, basis: 'measured', label: '' }, basis: 'monthly-mean' });
        const b = mouldRisk({ ...x, factor: { value: Math.min(1, x.f + more), basis: 'measured', label: '' }, basis: 'monthly-mean' });
        return b.surfaceRh_pct <= a.surfaceRh_pct;
      }),
    );
  });

  it('never gives NaN for valid input', () => {
    fc.assert(
      fc.property(arbitraryInput, fc.constantFrom('monthly-mean' as const, 'spot' as const), (x, basis) => {
        const r = mouldRisk({ ...x, factor: { value: x.f, basis: 'measured', label: '' }, basis });
        const c = surfaceCondensation(x.insideTemp_C, x.insideRh_pct, x.outsideTemp_C, { value: x.f, basis: 'measured', label: '' });
        return [r.surfaceTemp_C, r.surfaceRh_pct, r.minimumSurfaceTemp_C, r.requiredFactor ?? 0, r.margin ?? 0, c.surfaceRh_pct, c.marginAboveDewPoint_K].every(
          (v) => !Number.isNaN(v),
        );
      }),
    );
  });
});

describe('surface condensation (instantaneous, 100 %)', () => {
  it('finds condensation on single glazing and none on low-e glazing', () => {
    // Surface at or below the air's dew point (ISO 13788 low-inertia criterion, from memory);
    // dew point of 20 °C / 60 % is 12.0 °C (references.md §7.6, paired with psychrolib in psychrometrics.test.ts).
    const single = surfaceCondensation(20, 60, 0, constructionTemperatureFactor('single-glazing'));
    approxEqual(single.surfaceTemp_C, 5.18, { abs: 1e-9 });
    approxEqual(single.dewPoint_C, 12.01, { abs: 0.005 });
    expect(single.condenses).toBe(true);
    expect(single.surfaceRh_pct).toBeGreaterThan(100);
    const lowE = surfaceCondensation(20, 60, 0, constructionTemperatureFactor('double-glazing-low-e'));
    expect(lowE.condenses).toBe(false);
    expect(lowE.marginAboveDewPoint_K).toBeGreaterThan(0);
  });
});

describe('observed mould wins', () => {
  it('returns the observed state with a reason, whatever the prediction', () => {
    // practice.md §3 and §5: never "low mould risk" beside a photo of mould.
    const predicted = mouldRisk(base);
    const judged = judgeMouldWithObservation(predicted, { mouldSeen: true, where: 'bedroom ceiling corner' });
    expect(judged.verdict).toBe('mould-observed');
    expect(judged.reason).toMatch(/Mould was seen \(bedroom ceiling corner\)/);
    expect(judged.warnings.map((w) => w.code)).toContain('observed-mould');
    expect(judged.predicted).toBe(predicted);
  });

  it('keeps the prediction when no mould was seen', () => {
    const predicted = mouldRisk({ ...base, outsideTemp_C: 0 });
    expect(judgeMouldWithObservation(predicted, { mouldSeen: false }).verdict).toBe('risk');
  });

  it('adds no disagreement warning when the prediction already showed risk', () => {
    const judged = judgeMouldWithObservation(mouldRisk({ ...base, outsideTemp_C: 0 }), { mouldSeen: true });
    expect(judged.verdict).toBe('mould-observed');
    expect(judged.warnings.map((w) => w.code)).not.toContain('observed-mould');
  });
});
