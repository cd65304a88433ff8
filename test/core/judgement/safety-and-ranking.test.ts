/**
 * Safety items, priority and ranking (src/core/judgement/safety-items.ts, priority.ts,
 * rank-rooms.ts): each safety rule on an invented room; safety ranked above all else; the
 * ranking a total order, stable under input order; reasons that never blame a way of life.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { safetyItems, type SafetyAppliance, type SafetyFacts } from '../../../src/core/judgement/safety-items.ts';
import { PRIORITY_LEVELS, roomPriority } from '../../../src/core/judgement/priority.ts';
import { compareRooms, rankRooms, severityOf, type RankFacts } from '../../../src/core/judgement/rank-rooms.ts';

const boiler: SafetyAppliance = { id: 'b', label: 'gas boiler', flue: 'open-flued', solidFuel: false, cooker: false, ventPresent: 'yes', ventClear: 'yes', coAlarmPresent: 'yes', coAlarmTested: 'yes' };
const facts = (over: Partial<SafetyFacts> = {}): SafetyFacts => ({ appliances: [], extractInDwelling: 0, blockedCombustionAirVents: 0, deadExtractFans: 0, mouldSeen: false, ...over });
const codes = (f: SafetyFacts) => safetyItems(f).map((i) => i.code);

describe('safety items', () => {
  it('names each hazard of practice.md §2 item 2 and §3', () => {
    expect(codes(facts({ appliances: [{ ...boiler, coAlarmPresent: 'no' }] }))).toEqual(['no-co-alarm']);
    expect(codes(facts({ appliances: [{ ...boiler, coAlarmPresent: 'not-checked' }] }))).toEqual(['no-co-alarm']);
    expect(codes(facts({ appliances: [{ ...boiler, cooker: true, flue: 'flueless', coAlarmPresent: 'no' }] }))).toEqual([]);
    expect(codes(facts({ appliances: [{ ...boiler, coAlarmTested: 'no' }] }))).toEqual(['co-alarm-not-working']);
    expect(codes(facts({ appliances: [{ ...boiler, ventClear: 'no' }] }))).toEqual(['combustion-air-blocked']);
    expect(codes(facts({ appliances: [{ ...boiler, ventPresent: 'no' }] }))).toEqual(['combustion-air-missing']);
    expect(codes(facts({ appliances: [boiler], extractInDwelling: 1 }))).toEqual(['open-flue-with-extract']);
    expect(codes(facts({ appliances: [{ ...boiler, flue: 'room-sealed' }], extractInDwelling: 2 }))).toEqual([]);
    expect(codes(facts({ appliances: [{ ...boiler, flue: 'flueless', label: 'bottled-gas heater' }] }))).toEqual(['flueless-heater']);
    expect(codes(facts({ deadExtractFans: 1, mouldSeen: true }))).toEqual(['dead-extract-with-mould']);
    expect(codes(facts({ deadExtractFans: 1 }))).toEqual([]);
    expect(codes(facts({ blockedCombustionAirVents: 1 }))).toEqual(['combustion-air-blocked']);
  });
});

describe('priority', () => {
  const quiet = { safety: [], checks: [], mould: { verdict: 'no-risk-predicted' as const, reason: '' }, glazing: { verdict: 'dry' as const, reason: '' }, extraNeeded_m3s: 0 };
  it('puts safety first, then mould seen, and never says "no action" beside mould', () => {
    expect(roomPriority({ ...quiet, safety: safetyItems(facts({ deadExtractFans: 1, mouldSeen: true })) }).level).toBe('act-now');
    const mould = roomPriority({ ...quiet, mould: { verdict: 'mould-observed', reason: 'Mould was seen.' } });
    expect(mould.level).toBe('act-within-weeks');
    expect(mould.reasons[0]).toMatchObject({ kind: 'fact', basis: 'observed' });
    expect(roomPriority(quiet).level).toBe('no-action-found');
    expect(roomPriority(quiet).reasons.at(-1)!.text).toMatch(/not a statement that the room has no problem/);
    expect(roomPriority({ ...quiet, mould: { verdict: 'uncertain', reason: 'spans 80 %' } })).toMatchObject({ level: 'plan-improvement', reasons: [{ kind: 'opinion', basis: 'predicted' }] });
  });

  it('has four levels in our own words, each with a meaning', () => {
    expect(PRIORITY_LEVELS.map((l) => l.words)).toEqual(['Act now', 'Act within weeks', 'Plan an improvement', 'No action found']);
    for (const l of PRIORITY_LEVELS) expect(l.meaning.length).toBeGreaterThan(20);
  });

  it('never blames the occupants’ way of life', () => {
    const all = roomPriority({ ...quiet, safety: safetyItems(facts({ appliances: [{ ...boiler, ventClear: 'no', coAlarmPresent: 'no' }], extractInDwelling: 1, deadExtractFans: 1, mouldSeen: true })), mould: { verdict: 'mould-observed', reason: 'Mould was seen.' }, extraNeeded_m3s: 0.01 });
    for (const r of all.reasons) expect(r.text).not.toMatch(/lifestyle|habit|behaviou?r|tenant/i);
  });
});

describe('ranking', () => {
  const level = fc.constantFrom(...PRIORITY_LEVELS.map((l) => l.level));
  const room = fc.record({ id: fc.string({ minLength: 1, maxLength: 4 }), safetyItems: fc.nat({ max: 3 }), level, severity: fc.double({ min: 0, max: 1e4, noNaN: true }) });
  const rooms = fc.uniqueArray(room, { selector: (r) => r.id, maxLength: 20 });

  it('property: a total order (antisymmetric, transitive, total), stable under input order', () => {
    fc.assert(
      fc.property(rooms, fc.nat(), (list, seed) => {
        for (const a of list) for (const b of list) {
          if (a.id !== b.id) expect(Math.sign(compareRooms(a, b))).toBe(-Math.sign(compareRooms(b, a)));
          if (a.id !== b.id) expect(compareRooms(a, b)).not.toBe(0);
        }
        const ranked = rankRooms(list);
        for (let i = 1; i < ranked.length; i++) expect(compareRooms(ranked[i - 1]!, ranked[i]!)).toBeLessThan(0);
        const shuffled = [...list].sort((x, y) => ((x.id.charCodeAt(0) * 31 + seed) % 7) - ((y.id.charCodeAt(0) * 31 + seed) % 7));
        expect(rankRooms(shuffled).map((r) => r.id)).toEqual(ranked.map((r) => r.id));
      }),
      { numRuns: 200 },
    );
  });

  it('ranks any safety item above any priority or severity', () => {
    const a: RankFacts = { id: 'z', safetyItems: 1, level: 'plan-improvement', severity: 0 };
    const b: RankFacts = { id: 'a', safetyItems: 0, level: 'act-within-weeks', severity: 1e6 };
    expect(rankRooms([b, a]).map((r) => r.id)).toEqual(['z', 'a']);
    // Severity: 96.5 L/s short × 29 people (the documented measure).
    expect(severityOf(0.0965, 29, 0)).toBeCloseTo(2798.5, 6);
  });
});
