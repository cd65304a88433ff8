/**
 * Property tests of the survey-to-airflow mapping (src/analysis/room-airflow-input.ts with
 * opening-inputs.ts, room-state.ts and cross-path.ts), each run through the engine's
 * room prediction: more open area never gives less air; a blocked sash never adds air; a cross
 * path with its door shut never uses the cross forms. Rooms are invented (a flat of two rooms
 * on opposite facades).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { roomAirflowContext, roomAirflowInput } from '../../src/analysis/room-airflow-input.ts';
import { stateFromConditions, windowsOpenState } from '../../src/analysis/room-state.ts';
import { siteInputs } from '../../src/analysis/site-inputs.ts';
import { predictRoomSupply } from '../../src/core/room-supply-prediction.ts';
import { SCREENING_WEATHER_CASES } from '../../src/core/weather-cases.ts';
import type { Opening } from '../../src/model/opening.ts';
import type { Conditions } from '../../src/model/reading.ts';
import type { DocumentRoom, SurveyDocument } from '../../src/model/survey-document.ts';
import { demoFile } from '../support/fixtures.ts';

const flats = (): SurveyDocument => demoFile().surveys[1]! as SurveyDocument;
const AREA = 'dea10000-0000-4000-8000-000000000044';

function sash(id: string, facing: 'N' | 'S', over: Partial<Extract<Opening, { type: 'window' }>> = {}): Opening {
  return {
    type: 'window',
    id,
    count: 1,
    facing,
    condition: '',
    style: 'hinged',
    hinge: 'side',
    sashWidth_m: 0.55,
    sashHeight_m: 1.0,
    sillHeight_m: 0.9,
    headHeight_m: 1.9,
    openingAngle_deg: 30,
    restrictor: 'no',
    operability: 'opens',
    ...over,
  };
}

function conditions(over: Partial<Conditions>): Conditions {
  return { people: [], windows: 'all-closed', doors: 'closed', fans: 'none', heating: 'on', combustion: false, ...over };
}

function room(id: string, openings: Opening[], readings: DocumentRoom['readings'] = []): DocumentRoom {
  const base = flats().rooms[0]!;
  return { ...base, id, areaId: AREA, openings, readings, tests: [], defects: [], occupants: [] };
}

/** Predicted supplies (low, central, high) of a room in a state, over the screening cases. */
function predicted(doc: SurveyDocument, r: DocumentRoom, state: ReturnType<typeof windowsOpenState>, time_ms: number | null = null) {
  const ctx = roomAirflowContext(r, doc, siteInputs(doc.survey));
  const { input } = roomAirflowInput(ctx, state, time_ms);
  return SCREENING_WEATHER_CASES.map((c) => predictRoomSupply(input, c));
}

describe('survey-to-airflow mapping', () => {
  it('more open area never gives less predicted air (windows open, any angles and sizes)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 90, noNaN: true }),
        fc.double({ min: 0, max: 60, noNaN: true }),
        fc.double({ min: 0.2, max: 1.5, noNaN: true }),
        fc.integer({ min: 1, max: 4 }),
        (angle, extra, width, count) => {
          const doc = flats();
          const small = room('dea10000-0000-4000-8000-0000000000f1', [sash('dea10000-0000-4000-8000-0000000000f2', 'N', { openingAngle_deg: angle, sashWidth_m: width, count })]);
          const large = room('dea10000-0000-4000-8000-0000000000f1', [sash('dea10000-0000-4000-8000-0000000000f2', 'N', { openingAngle_deg: Math.min(90, angle + extra), sashWidth_m: width, count })]);
          const a = predicted(doc, small, windowsOpenState(small));
          const b = predicted(doc, large, windowsOpenState(large));
          a.forEach((p, k) => {
            expect(b[k]!.outdoorAir.low).toBeGreaterThanOrEqual(p.outdoorAir.low - 1e-12);
            expect(b[k]!.outdoorAir.central).toBeGreaterThanOrEqual(p.outdoorAir.central - 1e-12);
            expect(b[k]!.outdoorAir.high).toBeGreaterThanOrEqual(p.outdoorAir.high - 1e-12);
          });
        },
      ),
      { numRuns: 60, seed: 11 },
    );
  });

  it('a blocked or seized sash never adds air, even with every window open', () => {
    fc.assert(
      fc.property(fc.constantFrom('blocked', 'seized'), fc.double({ min: 1, max: 90, noNaN: true }), (operability, angle) => {
        const doc = flats();
        const other = sash('dea10000-0000-4000-8000-0000000000f3', 'N');
        const without = room('dea10000-0000-4000-8000-0000000000f1', [other]);
        const withStuck = room('dea10000-0000-4000-8000-0000000000f1', [other, sash('dea10000-0000-4000-8000-0000000000f4', 'N', { operability, openingAngle_deg: angle })]);
        const a = predicted(doc, without, windowsOpenState(without));
        const b = predicted(doc, withStuck, windowsOpenState(withStuck));
        a.forEach((p, k) => expect(b[k]!.outdoorAir).toEqual(p.outdoorAir));
      }),
      { numRuns: 30, seed: 12 },
    );
  });

  it('a cross path through a shut door never uses the cross forms; an open one may', () => {
    fc.assert(
      fc.property(fc.constantFrom<'closed' | 'open'>('closed', 'open'), fc.double({ min: 5, max: 90, noNaN: true }), (doors, angle) => {
        const doc = flats();
        const time = '2026-01-21T10:00:00Z';
        const near = room('dea10000-0000-4000-8000-0000000000f1', [sash('dea10000-0000-4000-8000-0000000000f2', 'N', { openingAngle_deg: angle })]);
        // The far room, on the opposite facade, with its window recorded open at the same moment.
        const far = room('dea10000-0000-4000-8000-0000000000f5', [sash('dea10000-0000-4000-8000-0000000000f6', 'S')], [
          { id: 'dea10000-0000-4000-8000-0000000000f7', time, note: '', co2_ppm: 600, conditions: conditions({ windows: 'all-open' }) },
        ]);
        const withFar = { ...doc, rooms: [near, far] };
        const state = stateFromConditions(near, conditions({ windows: 'all-open', doors }));
        for (const p of predicted(withFar, near, state, Date.parse(time))) {
          const codes = p.warnings.map((w) => w.code);
          if (doors === 'closed') {
            expect(p.mode).toBe('single-sided');
            expect(codes).not.toContain('cross-through-other-rooms');
          } else {
            expect(codes).toContain('cross-through-other-rooms');
          }
        }
      }),
      { numRuns: 30, seed: 13 },
    );
  });

  it('never counts a combustion-air vent or a door undercut as outdoor air', () => {
    const doc = flats();
    const kitchen = doc.rooms.find((r) => r.name === 'Kitchen')!;
    for (const p of predicted(doc, kitchen, windowsOpenState(kitchen))) {
      const brick = p.items.find((i) => i.itemId === 'dea10000-0000-4000-8000-000000000067')!;
      expect(brick.countsAsOutdoorAir).toBe(false);
      expect(brick.flow.central).toBe(0);
    }
    const bathroom = doc.rooms.find((r) => r.name === 'Bathroom')!;
    for (const p of predicted(doc, bathroom, windowsOpenState(bathroom))) {
      expect(p.items.find((i) => i.mechanism === 'internal-transfer')!.countsAsOutdoorAir).toBe(false);
      expect(p.outdoorAir.high).toBe(0);
    }
  });
});
