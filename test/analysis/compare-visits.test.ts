/**
 * Since last visit on the demo school: visit 1 is the demo (measured rooms), visit 2 starts from
 * it, visit 3 from visit 2 with Classroom B3 given eight background vents. Rooms are paired by
 * previousRoomId; "changed" only when the intervals do not overlap; a measurement is never
 * compared with a prediction; priority, mould and fixes come from the judgement when there is one.
 */
import { describe, it, expect } from 'vitest';
import { repeatVisit } from '../../src/model/repeat-visit.ts';
import { analyseSurvey } from '../../src/analysis/analyse-survey.ts';
import { compareFigures, compareVisits, type VisitInput } from '../../src/analysis/compare-visits.ts';
import { judgementFacts } from '../../src/analysis/judgement-facts.ts';
import { fixFollowUp } from '../../src/analysis/fix-follow-up.ts';
import type { AnalysisResults } from '../../src/analysis/results.ts';
import type { SurveyDocument } from '../../src/model/survey-document.ts';
import { demoFile } from '../support/fixtures.ts';

function ids(): () => string {
  let n = 0;
  return () => `e0000000-0000-4000-8000-${(++n).toString(16).padStart(12, '0')}`;
}

const analysed = (document: SurveyDocument): VisitInput => ({ document, results: analyseSurvey(document, { draws: 200 }) });

function visits() {
  const newId = ids();
  const v1 = demoFile().surveys[0]!;
  const v2 = repeatVisit(v1, newId, '2026-04-20T08:00:00Z');
  const v3 = repeatVisit(v2, newId, '2026-09-21T08:00:00Z');
  // Between visits 2 and 3 the school fitted eight background vents in Classroom B3.
  v3.rooms[2]!.openings.push({ type: 'vent', id: newId(), count: 8, facing: 'NE', condition: '', kind: 'background-vent', purpose: 'room', labelArea_m2: 0.005, labelAreaIs: 'equivalent', operability: 'opens' });
  return { v1, v2, v3 };
}

/** Give every room of analysed results a judgement shaped like the criteria engine's (or none). */
function judged(input: VisitInput, byRoom: (roomId: string) => object | null): VisitInput {
  const results = structuredClone(input.results) as unknown as { rooms: { roomId: string; judgement: unknown }[] };
  for (const room of results.rooms) room.judgement = byRoom(room.roomId);
  return { document: input.document, results: results as unknown as AnalysisResults };
}

describe('since last visit', () => {
  const { v1, v2, v3 } = visits();
  const [a1, a2, a3] = [analysed(v1), analysed(v2), analysed(v3)];
  // Figures alone: whatever the criteria engine adds is set aside for these.
  const [u2, u3] = [judged(a2, () => null), judged(a3, () => null)];

  it('shows the edited room’s supply rising beyond its interval, and no clear change in the others', () => {
    const comparison = compareVisits(u2, u3);
    expect(comparison.rooms.map((r) => [r.name, r.previousRoomId])).toEqual(v3.rooms.map((r) => [r.name, r.previousRoomId]));
    const [b1, b2, b3] = comparison.rooms;
    expect(b3!.supply_m3s).toMatchObject({ outcome: 'higher', better: true, basisChanged: false });
    expect(b3!.supply_m3s.after!.low!).toBeGreaterThan(b3!.supply_m3s.before!.high!);
    expect(b3!.overall).toBe('better');
    for (const room of [b1!, b2!]) {
      expect(room.supply_m3s.outcome).toBe('no-clear-change');
      expect(room.steadyCo2_ppm.outcome).toBe('no-clear-change');
      expect(room.overall).toBe('no-clear-change');
    }
    expect(comparison.counts).toEqual({ better: 1, worse: 0, mixed: 0, 'no-clear-change': 2, 'new-room': 0 });
    expect(comparison).toMatchObject({ previousSurveyId: v2.survey.id, previousTitle: v2.survey.title, roomsNotRevisited: [] });
  });

  it('never compares last visit’s measurement with this visit’s prediction', () => {
    const comparison = compareVisits(a1, a2);
    const measuredThen = comparison.rooms.filter((r) => r.supply_m3s.before?.basis === 'measured');
    expect(measuredThen.length).toBeGreaterThan(0);
    for (const room of measuredThen) expect(room.supply_m3s).toMatchObject({ outcome: 'not-compared', basisChanged: true, better: null });
  });

  it('says "not compared" for priority and mould, and "not judged" for fixes, without a judgement', () => {
    const room = compareVisits(u2, u3).rooms[2]!;
    expect(room.priority).toEqual({ before: null, after: null, outcome: 'not-compared' });
    expect(room.mouldRisk.outcome).toBe('not-compared');
    expect(room.fixesDone).toBe('not-judged');
  });

  it('lists a room new on this visit and a room not revisited', () => {
    const v3b = structuredClone(v3);
    const { previousRoomId: _gone, ...added } = v3b.rooms.pop()!;
    v3b.rooms.push(added);
    const comparison = compareVisits(a2, analysed(v3b));
    expect(comparison.rooms.at(-1)).toMatchObject({ previousRoomId: null, overall: 'new-room' });
    expect(comparison.roomsNotRevisited.map((r) => r.name)).toEqual(['Classroom B3']);
  });

  it('reads priority, mould and the recommended fixes from the judgement, and says whether a fix was done', () => {
    const b3Before = v2.rooms[2]!.id;
    const before = judged(a2, (roomId) => ({
      priority: { level: roomId === b3Before ? 'act-within-weeks' : 'plan-improvement', words: 'x' },
      rank: 1,
      moisture: { mould: { verdict: 'uncertain' }, wallSurfaceRh_pct: { favourable: 70, central: 78, unfavourable: 86 } },
      fixes: roomId === b3Before ? { options: [{ kind: 'add-background-vents', title: 'Fit 8 background vents' }, { kind: 'add-supply-unit', title: 'Fit a supply unit' }], supporting: [] } : null,
    }));
    const after = judged(a3, () => ({
      priority: { level: 'plan-improvement', words: 'x' },
      rank: 2,
      moisture: { mould: { verdict: 'no-risk-predicted' }, wallSurfaceRh_pct: { favourable: 60, central: 64, unfavourable: 68 } },
      fixes: null,
    }));
    const room = compareVisits(before, after).rooms[2]!;
    expect(room.priority).toEqual({ before: 'act-within-weeks', after: 'plan-improvement', outcome: 'better' });
    expect(room.mouldRisk).toMatchObject({ before: 'uncertain', after: 'no-risk-predicted', outcome: 'better', wallSurfaceRh_pct: { outcome: 'lower', better: true } });
    expect(room.fixes.map((f) => [f.kind, f.status])).toEqual([
      ['add-background-vents', 'done'],
      ['add-supply-unit', 'not-done'],
    ]);
    expect(room.fixesDone).toBe('done');
    expect(room.overall).toBe('better');
    expect(compareVisits(before, after).rooms[0]!.fixesDone).toBe('no-fix-recommended');
  });
});

describe('comparison rules', () => {
  const r = (low: number, high: number) => ({ value: (low + high) / 2, low, high, basis: 'predicted' as const });

  it('calls a change only when the intervals do not overlap', () => {
    expect(compareFigures(r(10, 20), r(19, 40), true).outcome).toBe('no-clear-change');
    expect(compareFigures(r(10, 20), r(21, 40), true)).toMatchObject({ outcome: 'higher', better: true });
    expect(compareFigures(r(800, 900), r(1000, 1200), false)).toMatchObject({ outcome: 'higher', better: false });
    expect(compareFigures(r(10, 20), { value: 30, low: null, high: null, basis: 'predicted' }, true).outcome).toBe('not-compared');
  });

  it('reads no judgement as nothing judged', () => {
    expect(judgementFacts({ judgement: null })).toEqual({ judged: false, priority: null, mould: null, fixes: [] });
  });

  it('follows up a shut vent, a dead fan and a fix it cannot read', () => {
    const flats = demoFile().surveys[1]!;
    const [bedroom, , bathroom] = flats.rooms;
    const next = repeatVisit(flats, ids(), '2026-04-20T08:00:00Z');
    expect(fixFollowUp({ kind: 'open-shut-vents', title: 'Open the vent' }, bedroom!, next.rooms[0]!)).toMatchObject({ status: 'done', evidence: 'vents recorded shut: 1 last visit, 0 now' });
    const stillShut = { ...next.rooms[0]!, defects: [{ ...bedroom!.defects[1]!, id: 'e1000000-0000-4000-8000-000000000001' }] };
    expect(fixFollowUp({ kind: 'open-shut-vents', title: 'Open the vent' }, bedroom!, stillShut).status).toBe('not-done');
    expect(fixFollowUp({ kind: 'repair-extract-fan', title: 'Repair the fan' }, bathroom!, next.rooms[2]!).status).toBe('done');
    expect(fixFollowUp({ kind: 'something-new', title: 'x' }, bathroom!, next.rooms[2]!).status).toBe('cannot-tell');
  });
});
