import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { ASSUMED_LEAKAGE_FACTOR, roomLeakage } from '../../src/core/room-leakage.ts';
import { lblInfiltration, leakageAreaFromAirPermeability } from '../../src/core/lbl-infiltration.ts';
import { leakageDivideBy20 } from '../../src/core/leakage-divide-by-20.ts';
import { COLD_CALM, COLD_WINDY, SCREENING_WEATHER_CASES } from '../../src/core/weather-cases.ts';
import type { LeakageInput } from '../../src/core/airflow-inputs.ts';

const leak = (over: Partial<LeakageInput> = {}): LeakageInput => ({
  id: 'bedroom-leakage',
  source: { basis: 'measured-air-permeability', q50_m3hm2: 10 },
  roomExposedEnvelope_m2: 20,
  storeys: 2,
  shelterClass: 3,
  shelteredSides: 2,
  ...over,
});

describe('roomLeakage (src/core/room-leakage.ts)', () => {
  it('central is LBL on the room’s share; the range is at least ×/÷2 and covers divide-by-20', () => {
    // LBL (ASHRAE HoF via EnergyPlus I/O Reference) and divide-by-20 in SAP form; ×2 per practice.md §1 item 9a.
    const item = roomLeakage(leak(), COLD_WINDY);
    const lbl = lblInfiltration(leakageAreaFromAirPermeability(10, 20), 2, 3, 20, 6);
    const rule = leakageDivideBy20(10, 20, 2, 6);
    approxEqual(item.flow.central, lbl, { rel: 1e-12 });
    expect(item.flow.low).toBeLessThanOrEqual(Math.min(lbl / 2, rule / 2));
    expect(item.flow.high).toBeGreaterThanOrEqual(Math.max(lbl * 2, rule * 2));
    expect(item.warnings).toEqual([]);
    expect(item.countsAsOutdoorAir).toBe(true);
  });

  it('an interior room gets no leakage', () => {
    const item = roomLeakage(leak({ roomExposedEnvelope_m2: 0 }), COLD_CALM);
    expect(item.flow).toEqual({ low: 0, central: 0, high: 0 });
    expect(item.warnings[0]?.code).toBe('leakage-interior-room');
  });

  it('an assumed default is flagged and carries a wider range', () => {
    const item = roomLeakage(leak({ source: { basis: 'assumed', assumed: { by: 'age', ageBand: '1945-1964' } } }), COLD_CALM);
    expect(item.warnings.map((w) => w.code)).toEqual(['leakage-assumed']);
    expect(item.flow.high / item.flow.central).toBeGreaterThanOrEqual(ASSUMED_LEAKAGE_FACTOR);
    expect(item.flow.central / item.flow.low).toBeGreaterThanOrEqual(ASSUMED_LEAKAGE_FACTOR);
  });

  it('spreads a dwelling leakage area by exposed envelope share', () => {
    const item = roomLeakage(
      leak({ source: { basis: 'effective-leakage-area', dwellingLeakageArea_m2: 0.05, dwellingEnvelope_m2: 250 } }),
      COLD_CALM,
    );
    approxEqual(item.flow.central, lblInfiltration(0.05 * (20 / 250), 2, 3, 20, 1), { rel: 1e-12 });
    approxEqual(item.flow.high, 4 * item.flow.low, { rel: 1e-12 });
  });

  it('a test that included neighbours lowers the low end and says so', () => {
    const plain = roomLeakage(leak(), COLD_CALM);
    const flat = roomLeakage(leak({ includesLeakageToNeighbours: true }), COLD_CALM);
    approxEqual(flat.flow.low, plain.flow.low / 2, { rel: 1e-12 });
    expect(flat.warnings[0]?.code).toBe('leakage-includes-neighbours');
  });

  it('property: low ≤ central ≤ high and never NaN for valid input', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 40, noNaN: true }),
        fc.double({ min: 0, max: 200, noNaN: true }),
        fc.constantFrom<1 | 2 | 3>(1, 2, 3),
        fc.constantFrom<1 | 2 | 3 | 4 | 5>(1, 2, 3, 4, 5),
        fc.integer({ min: 0, max: 4 }),
        fc.constantFrom(...SCREENING_WEATHER_CASES),
        (q50, area, storeys, shelterClass, shelteredSides, weather) => {
          const { flow } = roomLeakage(
            leak({ source: { basis: 'measured-air-permeability', q50_m3hm2: q50 }, roomExposedEnvelope_m2: area, storeys, shelterClass, shelteredSides }),
            weather,
          );
          expect(Number.isNaN(flow.low + flow.central + flow.high)).toBe(false);
          expect(flow.low).toBeLessThanOrEqual(flow.central);
          expect(flow.central).toBeLessThanOrEqual(flow.high);
        },
      ),
    );
  });
});
