import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { roomArb } from '../support/airflow-arbitraries.ts';
import { exampleRoom, exampleVent, exampleWindow } from '../support/airflow-examples.ts';
import { predictRoomSupply, predictRoomSupplyOverCases } from '../../src/core/room-supply-prediction.ts';
import { orificeFlow } from '../../src/core/orifice-flow.ts';
import { combineFlows } from '../../src/core/outdoor-air-combination.ts';
import { COLD_CALM, MILD_CALM, SCREENING_WEATHER_CASES } from '../../src/core/weather-cases.ts';
import type { OpeningInput, RoomAirflowInput } from '../../src/core/airflow-inputs.ts';

/** A bedroom whose only outdoor opening in use is its trickle vent. */
const bedroom = (over: Partial<RoomAirflowInput> = {}): RoomAirflowInput =>
  exampleRoom({
    id: 'flat-7-bedroom-2',
    depth_m: 3.5,
    openings: [
      exampleVent(),
      exampleWindow({ id: 'bed-sash', windowType: 'top-hung', sashHeight_m: 0.5, opening: { by: 'closed' }, centreHeight_m: 1.8 }),
      { kind: 'door-undercut', id: 'bed-door', doorWidth_m: 0.76, gap_m: 0.008 },
    ],
    ...over,
  });

describe('predictRoomSupply (src/core/room-supply-prediction.ts)', () => {
  it('a bedroom with only a trickle vent gets the vent’s orifice flow; the undercut is not added', () => {
    const p = predictRoomSupply(bedroom(), COLD_CALM);
    approxEqual(p.outdoorAir.central, orificeFlow(0.008, p.envelopePressure_Pa), { rel: 1e-12 });
    expect(p.items.map((i) => i.itemId)).toEqual(['bed-vent', 'bed-sash', 'bed-door']);
    expect(p.items[2]!.countsAsOutdoorAir).toBe(false);
    expect(p.items[2]!.flow.central).toBeGreaterThan(0);
    expect(p.mode).toBe('none');
    expect(p.warnings.map((w) => w.code)).toContain('screening-weather-case');
    expect(p.combination).toMatch(/ASHRAE/);
  });

  it('practice.md §5: a trickle vent gives a few L/s where a classroom needs ~150 L/s', () => {
    // practice.md §5: an 8000 mm² trickle vent passes ≈6 L/s at 1 Pa (common practice (no published source)).
    const p = predictRoomSupply(bedroom(), COLD_CALM);
    expect(p.outdoorAir.central * 1000).toBeGreaterThan(3);
    expect(p.outdoorAir.high * 1000).toBeLessThan(15);
  });

  it('a running extract fan combines with natural flow by the stated rule', () => {
    const fan = { kind: 'fan' as const, id: 'ensuite-fan', role: 'extract' as const, system: 'local' as const, running: true, measuredFlow_m3s: 0.008 };
    const p = predictRoomSupply(bedroom({ fans: [fan] }), COLD_CALM);
    const natural = predictRoomSupply(bedroom(), COLD_CALM).outdoorAir.central;
    approxEqual(p.outdoorAir.central, combineFlows(0, 0.008, natural), { rel: 1e-12 });
    const off = predictRoomSupply(bedroom({ fans: [{ ...fan, running: false }] }), COLD_CALM);
    approxEqual(off.outdoorAir.central, natural, { rel: 1e-12 });
  });

  it('a room with nothing to bring in outdoor air says so', () => {
    const p = predictRoomSupply(bedroom({ openings: [] }), MILD_CALM);
    expect(p.outdoorAir).toEqual({ low: 0, central: 0, high: 0 });
    expect(p.warnings.map((w) => w.code)).toContain('no-outdoor-air');
  });

  it('over the screening cases, mild and calm is the worst for a vent-only room (practice.md §1 item 9c)', () => {
    // practice.md §1 item 9c: "mild/calm is usually the worst" (common practice (no published source)).
    const r = predictRoomSupplyOverCases(bedroom());
    expect(r.predictions.map((p) => p.weather.id)).toEqual(['cold-calm', 'cold-windy', 'mild-calm']);
    expect(r.worst.weather.id).toBe('mild-calm');
    for (const p of r.predictions) expect(r.worst.outdoorAir.central).toBeLessThanOrEqual(p.outdoorAir.central);
  });

  it('property: low ≤ central ≤ high and never NaN, for any valid room and case', () => {
    fc.assert(
      fc.property(roomArb, fc.constantFrom(...SCREENING_WEATHER_CASES), (room, weather) => {
        const p = predictRoomSupply(room, weather);
        const checks = [p.outdoorAir, ...p.items.map((i) => i.flow)];
        for (const f of checks) {
          expect(Number.isNaN(f.low) || Number.isNaN(f.central) || Number.isNaN(f.high)).toBe(false);
          expect(f.low).toBeLessThanOrEqual(f.central * (1 + 1e-12));
          expect(f.central).toBeLessThanOrEqual(f.high * (1 + 1e-12));
          expect(f.low).toBeGreaterThanOrEqual(0);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('property: opening windows further or enlarging vents never gives less outdoor air', () => {
    const enlarge = (o: OpeningInput, extra: number): OpeningInput => {
      if (o.kind === 'window') {
        if (o.opening.by === 'angle') return { ...o, opening: { by: 'angle', angle_deg: o.opening.angle_deg + extra * 90 } };
        if (o.opening.by === 'stroke') return { ...o, opening: { by: 'stroke', stroke_m: o.opening.stroke_m + extra } };
        return o;
      }
      if (o.kind === 'background-vent' || o.kind === 'air-brick') return { ...o, labelArea_m2: o.labelArea_m2 + extra / 100 };
      return o;
    };
    fc.assert(
      fc.property(roomArb, fc.double({ min: 0, max: 1, noNaN: true }), fc.constantFrom(...SCREENING_WEATHER_CASES), (room, extra, weather) => {
        const before = predictRoomSupply(room, weather).outdoorAir;
        const after = predictRoomSupply({ ...room, openings: room.openings.map((o) => enlarge(o, extra)) }, weather).outdoorAir;
        for (const end of ['low', 'central', 'high'] as const) expect(after[end]).toBeGreaterThanOrEqual(before[end] * (1 - 1e-9));
      }),
      { numRuns: 300 },
    );
  });

  it('property: blocked or seized sashes, sub-floor or combustion-air bricks and undercuts never add outdoor air', () => {
    fc.assert(
      fc.property(roomArb, fc.constantFrom(...SCREENING_WEATHER_CASES), (room, weather) => {
        const p = predictRoomSupply(room, weather);
        room.openings.forEach((o, i) => {
          const item = p.items[i]!;
          const blockedSash = o.kind === 'window' && (o.condition === 'blocked' || o.condition === 'seized');
          const notRoomBrick = o.kind === 'air-brick' && (o.purpose === 'sub-floor' || o.purpose === 'combustion-air');
          if (blockedSash || notRoomBrick) expect(item.flow.high).toBe(0);
          if (notRoomBrick || o.kind === 'door-undercut' || o.kind === 'transfer-grille') expect(item.countsAsOutdoorAir).toBe(false);
        });
        // Removing every such item leaves the outdoor total unchanged.
        const kept = room.openings.filter(
          (o) =>
            !(o.kind === 'window' && (o.condition === 'blocked' || o.condition === 'seized')) &&
            !(o.kind === 'air-brick' && (o.purpose === 'sub-floor' || o.purpose === 'combustion-air')) &&
            o.kind !== 'door-undercut' &&
            o.kind !== 'transfer-grille',
        );
        const without = predictRoomSupply({ ...room, openings: kept }, weather).outdoorAir;
        approxEqual(p.outdoorAir.central, without.central, { rel: 1e-12, abs: 1e-15 });
        approxEqual(p.outdoorAir.high, without.high, { rel: 1e-12, abs: 1e-15 });
      }),
      { numRuns: 300 },
    );
  });
});
