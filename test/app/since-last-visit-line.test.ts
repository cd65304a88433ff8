/**
 * The one line a room card shows since the last visit: it words compareVisits' outcomes (never
 * compares anything itself), naming priority and mould risk only when they moved.
 */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { roomChangeLine, type RoomChange } from '../../src/app/since-last-visit.ts';

const figure = (outcome: RoomChange['supply_m3s']['outcome'], better: boolean | null = null): RoomChange['supply_m3s'] => ({ before: null, after: null, outcome, better, basisChanged: false });
const room = (over: Partial<RoomChange>): RoomChange => ({
  roomId: 'r',
  previousRoomId: 'p',
  name: 'Classroom B3',
  clientRef: '',
  supply_m3s: figure('no-clear-change'),
  steadyCo2_ppm: figure('no-clear-change'),
  mouldRisk: { before: null, after: null, outcome: 'not-compared', wallSurfaceRh_pct: null },
  priority: { before: 'act-within-weeks', after: 'act-within-weeks', outcome: 'same' },
  fixes: [],
  fixesDone: 'no-fix-recommended',
  overall: 'no-clear-change',
  ...over,
});

describe('the since-last-visit line', () => {
  it('gives the clear changes with which way is better', () => {
    const line = roomChangeLine(room({ supply_m3s: figure('higher', true), steadyCo2_ppm: figure('lower', true), overall: 'better' }));
    expect(line).toBe('Since last visit: better. Supply higher (better), steady CO₂ lower (better).');
  });

  it('names a priority that moved, and says "not compared" where the figures could not be', () => {
    const line = roomChangeLine(room({ supply_m3s: figure('not-compared'), steadyCo2_ppm: figure('not-compared'), priority: { before: 'planned', after: 'act-within-weeks', outcome: 'worse' }, overall: 'worse' }));
    expect(line).toBe('Since last visit: worse. Supply not compared, steady CO₂ not compared, priority worse.');
  });

  it('says a new room has nothing to compare', () => {
    expect(roomChangeLine(room({ previousRoomId: null, overall: 'new-room' }))).toBe('Since last visit: a new room this time, nothing to compare.');
  });
});
