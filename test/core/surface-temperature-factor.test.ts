import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import {
  measuredTemperatureFactor,
  surfaceTemperature,
  temperatureFactorFromU,
  SURFACE_RESISTANCE_GLAZING_M2K_W,
  SURFACE_RESISTANCE_MOULD_M2K_W,
} from '../../src/core/surface-temperature-factor.ts';
import { CONSTRUCTIONS, constructionTemperatureFactor } from '../../src/core/construction-temperature-factors.ts';
import { CRITICAL_FACTORS, criticalFactorUseFor, criticalTemperatureFactor } from '../../src/core/critical-temperature-factor.ts';

describe('temperature factor from U and R_si', () => {
  it('uses R_si 0.25 for mould and 0.13 for glazing', () => {
    // ISO 13788 / BS 5250 surface resistances for mould and glazing checks (from memory; practice.md §1.3).
    expect(SURFACE_RESISTANCE_MOULD_M2K_W).toBe(0.25);
    expect(SURFACE_RESISTANCE_GLAZING_M2K_W).toBe(0.13);
  });

  it('gives the factors of practice.md §1.3 for the listed constructions', () => {
    // f_Rsi = 1 − U·R_si (formula sure). U-values typical UK figures (from memory).
    // practice.md §1.3: solid brick U≈2.1 → f≈0.48; unfilled cavity ≈0.63; single glazing ≈0.26.
    approxEqual(temperatureFactorFromU(2.1), 0.475, { abs: 1e-12 });
    approxEqual(constructionTemperatureFactor('solid-brick').value, 0.48, { abs: 0.006 });
    approxEqual(constructionTemperatureFactor('unfilled-cavity').value, 0.63, { abs: 0.006 });
    approxEqual(constructionTemperatureFactor('single-glazing').value, 0.26, { abs: 0.002 });
    // Double glazing and insulated walls (U from memory): the factor rises as U falls.
    approxEqual(constructionTemperatureFactor('double-glazing-low-e').value, 1 - 1.4 * 0.13, { abs: 1e-12 });
    approxEqual(constructionTemperatureFactor('insulated-modern-wall').value, 1 - 0.25 * 0.25, { abs: 1e-12 });
  });

  it('never reaches the 0.75 design minimum for solid brick, stone or unfilled cavity', () => {
    // BRE IP 1/06: 0.75 is the design minimum for new junctions, not the factor of old fabric (practice.md §1.3).
    for (const kind of ['solid-brick', 'solid-stone', 'unfilled-cavity'] as const) {
      expect(constructionTemperatureFactor(kind).high, kind).toBeLessThan(0.75);
    }
  });

  it('keeps its ranges ordered and names each source', () => {
    for (const c of CONSTRUCTIONS) {
      const f = constructionTemperatureFactor(c.kind);
      expect(f.low <= f.value && f.value <= f.high, c.kind).toBe(true);
      expect(c.source, c.kind).toMatch(/from memory/);
      expect(f.basis).toBe('construction');
    }
  });

  it('places the surface between outside and inside', () => {
    // θ_si = θ_e + f·(θ_i − θ_e), the definition of f_Rsi (ISO 13788), references.md §7.6: f 0.75 at 20/5 °C → 16.25 °C.
    approxEqual(surfaceTemperature(0.75, 20, 5), 16.25, { abs: 1e-12 });
    approxEqual(surfaceTemperature(0.75, 20, 0), 15.0, { abs: 1e-12 });
  });
});

describe('measured temperature factor', () => {
  it('is labelled indicative and accepted with a large difference', () => {
    // Definition f = (θ_si − θ_e)/(θ_i − θ_e) (ISO 13788); 10 K rule is common practice (no published source).
    const r = measuredTemperatureFactor(12.4, 20, 4);
    approxEqual(r.value ?? Number.NaN, 0.525, { abs: 1e-12 });
    expect(r.method).toMatch(/indicative/);
    expect(r.warnings.map((w) => w.code)).toEqual(['not-steady-heating']);
  });

  it('warns when inside is less than 10 K above outside', () => {
    const r = measuredTemperatureFactor(17, 20, 12);
    expect(r.warnings.map((w) => w.code)).toContain('small-temperature-difference');
  });

  it('gives no value, without NaN, when inside is not warmer than outside', () => {
    const r = measuredTemperatureFactor(15, 15, 15);
    expect(r.value).toBeNull();
    expect(r.warnings.map((w) => w.code)).toContain('small-temperature-difference');
  });

  it('warns when the surface lies outside the air temperatures', () => {
    expect(measuredTemperatureFactor(22, 20, 5).warnings.map((w) => w.code)).toContain('factor-out-of-range');
  });
});

describe('BRE IP 1/06 critical factors', () => {
  it('gives the design minimum by use', () => {
    // BRE IP 1/06: dwellings, residential, schools 0.75 (confirmed via a BBA report, references.md §6.3);
    // storage 0.30, offices/retail 0.50, humid 0.80, very humid 0.90 (from memory, practice.md §1.6).
    expect(criticalTemperatureFactor('dwellings-residential-schools')).toMatchObject({ factor: 0.75, confidence: 'confirmed' });
    expect(criticalTemperatureFactor('storage')).toMatchObject({ factor: 0.3, confidence: 'from memory' });
    expect(criticalTemperatureFactor('offices-retail').factor).toBe(0.5);
    expect(criticalTemperatureFactor('humid-buildings').factor).toBe(0.8);
    expect(criticalTemperatureFactor('very-humid-buildings').factor).toBe(0.9);
    expect(CRITICAL_FACTORS).toHaveLength(5);
    expect(criticalFactorUseFor('school')).toBe('dwellings-residential-schools');
    expect(criticalFactorUseFor('office')).toBe('offices-retail');
    expect(criticalFactorUseFor('other')).toBeUndefined();
  });
});
