/**
 * Sized fixes and their safety gates (src/core/judgement/size-fixes.ts, fix-options.ts,
 * safety-gates.ts): every offered fix, applied and re-assessed independently, meets its target
 * at the unfavourable end of the worst weather case; trivial options are never offered; each
 * gate blocks the unsafe option; a larger fix never leaves a worse room.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { RoomAirflowInput } from '../../../src/core/airflow-inputs.ts';
import { addFan, addVents, openVents, repairFans } from '../../../src/core/judgement/fix-options.ts';
import { safetyGates, type GateFacts } from '../../../src/core/judgement/safety-gates.ts';
import { sizeFixes, type FixOption, type FixSizingInput } from '../../../src/core/judgement/size-fixes.ts';
import { predictRoomSupplyOverCases } from '../../../src/core/room-supply-prediction.ts';
import { SCREENING_WEATHER_CASES } from '../../../src/core/weather-cases.ts';
import { fromLitresPerSecond } from '../../../src/core/units.ts';

const SAFE: GateFacts = { openFlued: false, openFluedSolidFuel: false, builtBefore2000: false, groundFloor: false, aboveGroundFloor: false, outsideWall: true, escapeRoute: false };
const WALL = { length_m: 7.2, facing_deg: 225 };

/** An invented classroom: a shut and a blocked trickle vent, a dead extract fan, no leakage entry. */
function room(): RoomAirflowInput {
  return {
    id: 'room',
    ceilingHeight_m: 2.9,
    openings: [
      { kind: 'background-vent', id: 'shut', labelArea_m2: 0.005, areaBasis: 'equivalent', condition: 'closed', facing_deg: 225, centreHeight_m: 2.6 },
      { kind: 'background-vent', id: 'blocked', labelArea_m2: 0.005, areaBasis: 'equivalent', condition: 'blocked', facing_deg: 225, centreHeight_m: 2.6 },
    ],
    fans: [{ kind: 'fan', id: 'dead', role: 'extract', system: 'local', running: false, ratedFlow_m3s: 0.015 }],
    site: { terrain: 'urban', buildingHeight_m: 6 },
  };
}

const input = (over: Partial<FixSizingInput> = {}): FixSizingInput => ({
  cases: SCREENING_WEATHER_CASES,
  winter: room(),
  anchor: null,
  target_m3s: fromLitresPerSecond(10),
  targetReason: 'test',
  extractRoom: true,
  shutVentIds: ['shut'],
  blockedVentIds: ['blocked'],
  deadExtractFans: [{ id: 'dead', flow_m3s: 0.015 }],
  outsideWall: WALL,
  occupancy: null,
  stuckWindows: 0,
  gates: SAFE,
  ...over,
});

const lowest = (r: RoomAirflowInput) => Math.min(...predictRoomSupplyOverCases(r, SCREENING_WEATHER_CASES).predictions.map((p) => p.outdoorAir.low));

/** The option applied again to the input by hand. */
function applied(o: FixOption, x: FixSizingInput): RoomAirflowInput {
  switch (o.kind) {
    case 'open-shut-vents':
      return openVents(x.winter, x.shutVentIds);
    case 'unblock-vents':
      return openVents(x.winter, x.blockedVentIds);
    case 'repair-extract-fan':
      return repairFans(x.winter, [{ id: 'dead', flow_m3s: fromLitresPerSecond(o.quantity.value) }]);
    case 'add-background-vents':
      return addVents(x.winter, o.quantity.value, WALL);
    case 'add-extract-fan':
      return addFan(x.winter, 'extract', fromLitresPerSecond(o.quantity.value));
    case 'add-supply-unit':
      return addFan(x.winter, 'supply', fromLitresPerSecond(o.quantity.value));
    default:
      return x.winter;
  }
}

describe('sizeFixes', () => {
  it('offers only fixes that, re-assessed, meet the target at the unfavourable end, least invasive first', () => {
    for (const ls of [3, 10, 20, 45]) {
      const x = input({ target_m3s: fromLitresPerSecond(ls) });
      const plan = sizeFixes(x);
      expect(plan.options.length, `${ls} L/s`).toBeGreaterThan(0);
      for (const o of plan.options) {
        expect(lowest(applied(o, x)), `${o.title}`).toBeGreaterThanOrEqual(x.target_m3s);
        expect(o.supplyAfter_m3s).toBeGreaterThanOrEqual(x.target_m3s);
      }
      const order = plan.options.map((o) => o.invasiveness);
      expect(order).toEqual([...order].sort((a, b) => a - b));
    }
  });

  it('never offers a physically trivial option: a classroom needing 150 L/s gets no trickle vents (practice.md §5: 8000 mm² ≈ 6 L/s at 1 Pa)', () => {
    const plan = sizeFixes(input({ target_m3s: fromLitresPerSecond(150), extractRoom: false }));
    expect(plan.options.map((o) => o.kind)).not.toContain('add-background-vents');
    expect(plan.options.map((o) => o.kind)).not.toContain('open-shut-vents');
    expect(plan.notOffered.find((n) => n.kind === 'add-background-vents')!.why).toMatch(/not offered as the fix/);
    expect(plan.options.map((o) => o.kind)).toContain('add-supply-unit');
  });

  it('offers an occupancy limit only when it keeps at least half the room in use', () => {
    const occupancy = { count: 30, targetFor: (n: number) => fromLitresPerSecond(5 * n) };
    const plan = sizeFixes(input({ target_m3s: fromLitresPerSecond(150), extractRoom: false, occupancy, winter: addFan(room(), 'supply', fromLitresPerSecond(100)) }));
    const limit = plan.options.find((o) => o.kind === 'limit-occupancy')!;
    expect(limit.quantity.value).toBeGreaterThanOrEqual(15);
    expect(occupancy.targetFor(limit.quantity.value)).toBeLessThanOrEqual(plan.current_m3s);
    expect(occupancy.targetFor(limit.quantity.value + 1)).toBeGreaterThan(plan.current_m3s);
  });

  it('anchors a measured room: the fix adds only what the engine predicts it adds', () => {
    const measured = { low: 0.04, central: 0.05, high: 0.06 };
    const x = input({ anchor: { state: room(), measured }, target_m3s: 0.06, extractRoom: false, deadExtractFans: [] });
    for (const o of sizeFixes(x).options) {
      if (o.kind === 'limit-occupancy') continue;
      const before = predictRoomSupplyOverCases(room(), SCREENING_WEATHER_CASES).predictions;
      const after = predictRoomSupplyOverCases(applied(o, x), SCREENING_WEATHER_CASES).predictions;
      const expected = Math.min(...after.map((p, k) => measured.low + Math.min(p.outdoorAir.low - before[k]!.outdoorAir.low, p.outdoorAir.central - before[k]!.outdoorAir.central, p.outdoorAir.high - before[k]!.outdoorAir.high)));
      expect(o.supplyAfter_m3s).toBeCloseTo(expected, 12);
    }
  });

  it('property: a larger fix never leaves a worse room (more vents, a bigger fan)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 7 }), fc.double({ min: 0.001, max: 0.3, noNaN: true }), fc.double({ min: 1, max: 3, noNaN: true }), (n, q, k) => {
        return lowest(addVents(room(), n + 1, WALL)) >= lowest(addVents(room(), n, WALL)) && lowest(addFan(room(), 'supply', q * k)) >= lowest(addFan(room(), 'supply', q)) && lowest(addFan(room(), 'extract', q * k)) >= lowest(addFan(room(), 'extract', q));
      }),
      { numRuns: 100 },
    );
  });

  it('lists freeing a stuck window as airing only, never as the winter fix', () => {
    const plan = sizeFixes(input({ stuckWindows: 1 }));
    expect(plan.options.map((o) => o.title).join(' ')).not.toMatch(/window/i);
    expect(plan.supporting.find((s) => s.kind === 'free-window-for-airing')!.title).toMatch(/airing only, not the winter fix/);
    expect(plan.caution).toMatch(/opening windows is for airing, not the winter fix/);
  });
});

describe('safety gates (practice.md §2 items 2 and 10)', () => {
  it('requires a spillage test before more extract with an open-flued appliance', () => {
    const plan = sizeFixes(input({ gates: { ...SAFE, openFlued: true } }));
    const extract = plan.options.filter((o) => o.kind === 'repair-extract-fan' || o.kind === 'add-extract-fan');
    expect(extract.length).toBeGreaterThan(0);
    for (const o of extract) expect(o.gates.map((g) => g.code)).toContain('spillage-test');
  });

  it('blocks any extract fan with an open-flued solid-fuel appliance', () => {
    const plan = sizeFixes(input({ gates: { ...SAFE, openFlued: true, openFluedSolidFuel: true } }));
    expect(plan.options.filter((o) => o.kind === 'repair-extract-fan' || o.kind === 'add-extract-fan')).toEqual([]);
    expect(plan.notOffered.map((n) => n.kind)).toEqual(expect.arrayContaining(['repair-extract-fan', 'add-extract-fan']));
  });

  it('never adjusts a combustion-air vent', () => {
    expect(safetyGates('open-shut-vents', { ...SAFE, touchesCombustionAir: true }).filter((g) => g.blocking).map((g) => g.code)).toEqual(['combustion-air-never-adjusted']);
  });

  it('never removes a restrictor above the ground floor or where the floor is unknown', () => {
    expect(safetyGates('remove-restrictor', { ...SAFE, aboveGroundFloor: true }).some((g) => g.blocking && g.code === 'keep-restrictors')).toBe(true);
    expect(safetyGates('remove-restrictor', { ...SAFE, aboveGroundFloor: 'unknown' }).some((g) => g.blocking)).toBe(true);
    expect(safetyGates('remove-restrictor', SAFE).some((g) => g.blocking)).toBe(false);
  });

  it('never undercuts a door on an escape route, and always says to check for a fire door', () => {
    expect(safetyGates('undercut-door', { ...SAFE, escapeRoute: true })[0]).toMatchObject({ code: 'fire-door', blocking: true });
    expect(safetyGates('undercut-door', SAFE)[0]).toMatchObject({ code: 'fire-door', blocking: false });
  });

  it('makes no opening without an outside wall or into an escape route', () => {
    const plan = sizeFixes(input({ outsideWall: null, extractRoom: false, gates: { ...SAFE, outsideWall: false } }));
    expect(plan.options.map((o) => o.kind)).not.toContain('add-background-vents');
    expect(plan.options.map((o) => o.kind)).not.toContain('add-supply-unit');
    expect(safetyGates('add-background-vents', { ...SAFE, escapeRoute: true }).some((g) => g.code === 'escape-route' && g.blocking)).toBe(true);
  });

  it('asks for an asbestos check before drilling in a building from before 2000 or of unknown age', () => {
    for (const builtBefore2000 of [true, 'unknown'] as const) expect(safetyGates('add-background-vents', { ...SAFE, builtBefore2000 }).map((g) => g.code)).toContain('asbestos-check');
    expect(safetyGates('add-background-vents', SAFE).map((g) => g.code)).not.toContain('asbestos-check');
  });

  it('notes radon where extract rises on a ground floor', () => {
    expect(safetyGates('add-extract-fan', { ...SAFE, groundFloor: true }).map((g) => g.code)).toContain('radon');
    expect(safetyGates('add-extract-fan', SAFE).map((g) => g.code)).not.toContain('radon');
  });
});
