/**
 * Room moisture and mould (src/core/judgement/room-moisture.ts, room-moisture-release.ts): the
 * verdict against psychrolib-backed surface RH, observed mould winning, the supply that holds a
 * wall below 80 %, and the property that more moisture never lowers the mould risk.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { roomMoisture, supplyForSurfaceBelowMould, type RoomMoistureInput } from '../../../src/core/judgement/room-moisture.ts';
import { roomMoistureRelease } from '../../../src/core/judgement/room-moisture-release.ts';
import { constructionTemperatureFactor } from '../../../src/core/construction-temperature-factors.ts';
import { UK_COLDEST_MONTH_SCREENING } from '../../../src/core/coldest-month-humidity.ts';
import { fromGramsPerHour } from '../../../src/core/units.ts';
import { psychrolib } from '../psychrolib-reference.ts';
import { approxEqual } from '../../support/approx-equal.ts';

const brick = constructionTemperatureFactor('solid-brick');
const base = (over: Partial<RoomMoistureInput> = {}): RoomMoistureInput => ({
  volume_m3: 30,
  roomTemp_C: 18,
  supply: { favourable: 0.006, central: 0.005, unfavourable: 0.004 },
  source: { low: 8e-6, typical: 1e-5, high: 1.2e-5 },
  wall: brick,
  glazing: constructionTemperatureFactor('double-glazing-early'),
  observed: { mould: false, condensation: false },
  ...over,
});

/** Surface RH (%) by psychrolib: room humidity ratio from a mass balance, then p_w at the surface temperature. */
function psychrolibSurfaceRh(t_in: number, q: number, g: number, f: number): number {
  const m = UK_COLDEST_MONTH_SCREENING;
  const p = 101325;
  const wOut = psychrolib.GetHumRatioFromRelHum(m.temp_C, m.rh_pct / 100, p);
  // Dry air per m³ of supply warmed to room temperature: ρ_da = 1/v (psychrolib's specific volume per kg dry air).
  const rhoDa = 1 / psychrolib.GetMoistAirVolume(t_in, wOut, p);
  const wIn = wOut + g / (rhoDa * q);
  const pw = psychrolib.GetVapPresFromHumRatio(wIn, p);
  const surface = m.temp_C + f * (t_in - m.temp_C);
  return 100 * Math.min(1, pw / psychrolib.GetSatVapPres(surface));
}

describe('room moisture and mould', () => {
  it('gives the wall surface RH at both ends as psychrolib does (ASHRAE HoF 2017 ch. 1)', () => {
    const r = roomMoisture(base());
    approxEqual(r.wallSurfaceRh_pct.unfavourable!, psychrolibSurfaceRh(18, 0.004, 1.2e-5, brick.low), { abs: 0.05 });
    approxEqual(r.wallSurfaceRh_pct.favourable!, psychrolibSurfaceRh(18, 0.006, 8e-6, brick.high), { abs: 0.05 });
    const verdict = r.wallSurfaceRh_pct.favourable! >= 80 ? 'risk' : r.wallSurfaceRh_pct.unfavourable! < 80 ? 'no-risk-predicted' : 'uncertain';
    expect(r.mould.verdict).toBe(verdict);
  });

  it('lets observed mould win over a prediction of no risk (practice.md §3)', () => {
    const dry = base({ supply: { favourable: 0.05, central: 0.04, unfavourable: 0.03 }, wall: constructionTemperatureFactor('insulated-modern-wall') });
    expect(roomMoisture(dry).mould.verdict).toBe('no-risk-predicted');
    const seen = roomMoisture({ ...dry, observed: { mould: true, where: 'window reveal', condensation: false } });
    expect(seen.mould.verdict).toBe('mould-observed');
    expect(seen.mould.basis).toBe('observed');
    expect(seen.warnings.map((w) => w.code)).toContain('observed-mould');
  });

  it('does not predict mould without a known wall, and says what to record', () => {
    const r = roomMoisture(base({ wall: null }));
    expect(r.mould.verdict).toBe('not-established');
    expect(r.mould.reason).toMatch(/Record the wall or measure/);
  });

  it('finds the supply that puts the wall exactly at 80 % (balance inverted)', () => {
    const q = supplyForSurfaceBelowMould(18, UK_COLDEST_MONTH_SCREENING, brick.low, 1.2e-5)!;
    approxEqual(psychrolibSurfaceRh(18, q, 1.2e-5, brick.low), 80, { abs: 0.01 });
    // A surface colder than the outdoor air can hold at 80 % cannot be helped by air at all.
    expect(supplyForSurfaceBelowMould(18, { temp_C: 4, rh_pct: 95, source: 'test' }, 0, 1e-5)).toBeNull();
  });

  it('property: more moisture never lowers the mould risk', () => {
    const rank = { 'no-risk-predicted': 0, uncertain: 1, risk: 2, 'not-established': -1, 'mould-observed': 3 } as const;
    fc.assert(
      fc.property(fc.double({ min: 1e-7, max: 5e-5, noNaN: true }), fc.double({ min: 1, max: 4, noNaN: true }), fc.double({ min: 0.001, max: 0.05, noNaN: true }), (g, k, q) => {
        const at = (s: number) => roomMoisture(base({ source: { low: s * 0.8, typical: s, high: s * 1.2 }, supply: { favourable: q * 1.2, central: q, unfavourable: q * 0.8 } }));
        const a = at(g);
        const b = at(g * k);
        return rank[b.mould.verdict] >= rank[a.mould.verdict] && (b.wallSurfaceRh_pct.unfavourable ?? 100) >= (a.wallSurfaceRh_pct.unfavourable ?? 100) - 1e-9;
      }),
      { numRuns: 200 },
    );
  });

  it('adds people and activities over the day (BS 5250 person asleep 40 g/h, from memory)', () => {
    const r = roomMoistureRelease([{ count: 2, met: 0.95, hoursPerDay: 8.5 }], []);
    approxEqual(r.typical, (2 * fromGramsPerHour(40) * 8.5) / 24, { rel: 1e-12 });
    const kitchen = roomMoistureRelease([], [{ kind: 'cooking', multiplier: 1, basis: 'assumed', why: 'kitchen' }]);
    // BS 5250 cooking by electricity 2 kg/day (from memory).
    approxEqual(kitchen.typical * 86400, 2, { rel: 1e-12 });
    expect(kitchen.low).toBeLessThan(kitchen.typical);
    expect(kitchen.high).toBeGreaterThan(kitchen.typical);
  });
});
