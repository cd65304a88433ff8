import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { windowArb } from '../support/airflow-arbitraries.ts';
import { bearingDifference, roomNaturalVentilation } from '../../src/core/room-natural-ventilation.ts';
import { singleSidedFlow } from '../../src/core/single-sided-ventilation.ts';
import { referenceWindSpeed } from '../../src/core/reference-wind-speed.ts';
import { COLD_CALM, COLD_WINDY, SCREENING_WEATHER_CASES } from '../../src/core/weather-cases.ts';
import { exampleRoom, exampleWindow } from '../support/airflow-examples.ts';

describe('roomNaturalVentilation (src/core/room-natural-ventilation.ts)', () => {
  it('one sash is single-sided by BS 5925, its range covering de Gids & Phaff and ±50 %', () => {
    const r = roomNaturalVentilation(exampleRoom(), COLD_CALM);
    expect(r.mode).toBe('single-sided');
    const item = r.items[0]!;
    const bs = singleSidedFlow(
      [{ area_m2: 0.42402, openingHeight_m: 1.0, centreHeight_m: 1.5 }],
      referenceWindSpeed(1, 'urban', 6),
      20,
      10,
    ).flow;
    approxEqual(item.flow.central, bs, { rel: 1e-4 });
    expect(item.flow.low).toBeLessThanOrEqual(bs * 0.5);
    expect(item.flow.high).toBeGreaterThanOrEqual(bs * 1.5);
    expect(item.mechanism).toBe('single-sided');
    expect(item.method).toMatch(/BS 5925 single-sided/);
  });

  it('windows on two facades of the room ventilate across it', () => {
    const r = roomNaturalVentilation(exampleRoom({ openings: [exampleWindow(), exampleWindow({ id: 'north-sash', facing_deg: 0 })] }), COLD_WINDY);
    expect(r.mode).toBe('cross');
    expect(r.warnings.map((w) => w.code)).toContain('cross-pressure-assumed');
    const single = roomNaturalVentilation(exampleRoom({ openings: [exampleWindow(), exampleWindow({ id: 'b', facing_deg: 200 })] }), COLD_WINDY);
    expect(single.mode).toBe('single-sided');
  });

  it('a path through other rooms counts only with its doors open, and its low end stays single-sided', () => {
    const path = { internalPathOpen: true, farOpenArea_m2: 0.4, farFacing_deg: 0, internalOpeningArea_m2: 1.6 };
    const open = roomNaturalVentilation(exampleRoom({ crossPath: path }), COLD_WINDY);
    const shut = roomNaturalVentilation(exampleRoom({ crossPath: { ...path, internalPathOpen: false } }), COLD_WINDY);
    expect(open.mode).toBe('cross');
    expect(open.warnings.map((w) => w.code)).toContain('cross-through-other-rooms');
    expect(shut.mode).toBe('single-sided');
    expect(shut.warnings.map((w) => w.code)).toContain('cross-path-closed');
    approxEqual(open.items[0]!.flow.low, shut.items[0]!.flow.low, { rel: 1e-12 });
    expect(open.items[0]!.flow.central).toBeGreaterThanOrEqual(shut.items[0]!.flow.central);
  });

  it('warns when the room is deeper than its ventilation reaches (CIBSE AM10, from memory)', () => {
    const r = roomNaturalVentilation(exampleRoom({ depth_m: 7 }), COLD_CALM);
    expect(r.warnings.map((w) => w.code)).toContain('beyond-single-sided-depth');
  });

  it('vents use the envelope pressure; undercuts are capacity only', () => {
    const r = roomNaturalVentilation(
      exampleRoom({
        openings: [
          { kind: 'background-vent', id: 'v', labelArea_m2: 0.008, areaBasis: 'equivalent', condition: 'open', facing_deg: 180, centreHeight_m: 2.1 },
          { kind: 'door-undercut', id: 'd', doorWidth_m: 0.76, gap_m: 0.01 },
        ],
      }),
      COLD_CALM,
    );
    expect(r.mode).toBe('none');
    expect(r.items[0]!.method).toContain(`${Math.round(r.envelopePressure.total_Pa * 100) / 100} Pa`);
    expect(r.items[1]!.countsAsOutdoorAir).toBe(false);
  });

  it('bearingDifference wraps round north', () => {
    expect(bearingDifference(350, 20)).toBe(30);
    expect(bearingDifference(0, 180)).toBe(180);
    expect(bearingDifference(-90, 270)).toBe(0);
  });

  it('property: a cross path with a door shut never uses the cross formula', () => {
    fc.assert(
      fc.property(
        fc.array(windowArb, { minLength: 1, maxLength: 4 }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        fc.constantFrom(...SCREENING_WEATHER_CASES),
        (windows, far, weather) => {
          // All the room's own windows face one way; only the shut path could make it cross.
          const oneWay = windows.map((w) => ({ ...w, facing_deg: 90 }));
          const r = roomNaturalVentilation(
            exampleRoom({ openings: oneWay, crossPath: { internalPathOpen: false, farOpenArea_m2: far, farFacing_deg: 270, internalOpeningArea_m2: 1.8 } }),
            weather,
          );
          expect(r.mode).not.toBe('cross');
          for (const item of r.items) expect(item.mechanism).not.toBe('cross');
        },
      ),
    );
  });
});
