/**
 * Tests of src/report/report-model.ts: the report's numbers are analyseSurvey's numbers, converted
 * and rounded by src/core/units.ts displayQuantity and nothing else; every room appears once in the
 * ranked table and once as a sheet; without a judgement the report gives no verdict; with one,
 * safety rooms lead. Surveys: the invented demo file, a hand-edited office and generated surveys.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyseSurvey } from '../../src/analysis/analyse-survey.ts';
import type { AnalysisResults, Figure, Ranged } from '../../src/analysis/results.ts';
import { displayQuantity, perHour, type QuantityKind } from '../../src/core/units.ts';
import { surveyDocumentSchema, type SurveyDocument } from '../../src/model/survey-document.ts';
import type { ReportJudgementView, ReportRoomJudgementView } from '../../src/report/judgement-view.ts';
import type { ReportFigure } from '../../src/report/report-figure.ts';
import { buildReport, type ReportModel } from '../../src/report/report-model.ts';
import { demoFile } from '../support/fixtures.ts';
import { surveyDocument } from '../support/survey-arbitraries.ts';

const DRAWS = 100;
const OPTIONS = { issueDate: '2026-01-22', appVersion: '0.1.0' };
const docs = (): SurveyDocument[] => demoFile().surveys.map((s) => surveyDocumentSchema.parse(s));

/** The display value of an SI number by the one rounding rule (air changes come per second). */
function shown(si: number | null, kind: QuantityKind): number | null {
  if (si === null) return null;
  return displayQuantity(kind === 'airChanges' ? perHour(si) : si, kind).value;
}

function expectSame(printed: ReportFigure, figure: Ranged & Partial<Pick<Figure, 'basis'>>, kind: QuantityKind): void {
  expect(printed.value).toBe(shown(figure.value, kind));
  expect(printed.low).toBe(shown(figure.low, kind));
  expect(printed.high).toBe(shown(figure.high, kind));
  if (figure.basis) expect(printed.basis).toBe(figure.basis);
  for (const n of [printed.value, printed.low, printed.high]) if (n !== null) expect(printed.text.replace(/,(?=\d{3})/g, '').replace('−', '-')).toContain(String(n));
}

/** Every printed figure of every room sheet against the results it came from. */
function expectNumbersAreTheAnalysis(model: ReportModel, results: AnalysisResults): void {
  expect(model.rooms.map((r) => r.roomId)).toEqual(results.rooms.map((r) => r.roomId));
  for (const [i, sheet] of model.rooms.entries()) {
    const room = results.rooms[i]!;
    const h = room.headline;
    const [supply, ach, perPerson, steady] = sheet.interpretation.headline;
    expectSame(supply!, h.supply_m3s, 'flow');
    expectSame(ach!, h.airChangeRate_perSecond, 'airChanges');
    if (h.supplyPerPerson_m3s) expectSame(perPerson!, h.supplyPerPerson_m3s, 'flowPerPerson');
    if (h.steadyLevel_ppm) expectSame(steady!, h.steadyLevel_ppm, 'co2');
    const used = room.measured.filter((m) => m.kind !== 'none');
    expect(sheet.measurement.rows).toHaveLength(used.length);
    for (const [k, m] of used.entries()) {
      const row = sheet.measurement.rows[k]!;
      expectSame(row.supply, m.supply_m3s, 'flow');
      expectSame(row.airChanges, m.airChangeRate_perSecond, 'airChanges');
      if (row.perPerson) expectSame(row.perPerson, m.supplyPerPerson_m3s, 'flowPerPerson');
      if (row.steady) expectSame(row.steady, m.steadyLevel_ppm, 'co2');
    }
    expect(sheet.interpretation.scenarios).toHaveLength(room.scenarios.length);
    for (const [k, s] of room.scenarios.entries()) {
      const c = s.cases.find((x) => x.weatherId === s.worstWeatherId)!;
      const row = sheet.interpretation.scenarios[k]!;
      expectSame(row.supply, c.supply_m3s, 'flow');
      if (c.supplyPerPerson_m3s) expectSame(row.perPerson!, c.supplyPerPerson_m3s, 'flowPerPerson');
      if (c.steadyLevel_ppm) expectSame(row.steady!, c.steadyLevel_ppm, 'co2');
    }
  }
  for (const page of model.dwellings) {
    const area = results.areas.find((a) => a.areaId === page.areaId)!;
    expectSame(page.figures[1]!, area.supply_m3s, 'flow');
  }
}

describe('buildReport on the demo surveys', () => {
  for (const doc of docs()) {
    it(`prints the analysis's own numbers for "${doc.survey.title}"`, () => {
      const results = analyseSurvey(doc, { draws: DRAWS });
      const model = buildReport(doc, results, OPTIONS);
      expectNumbersAreTheAnalysis(model, results);
      expect(model.ranked.rows.map((r) => r.roomId).sort()).toEqual(results.rooms.map((r) => r.roomId).sort());
      expect(model.ranked.rows.map((r) => r.rank)).toEqual(results.rooms.map((_, i) => i + 1));
      expect(model.meta.versions).toEqual(expect.arrayContaining([['Engine', results.stamps.engineVersion], ['Analysis', results.stamps.analysisVersion]]));
    });
  }

  it('without a judgement gives no verdict, ranks by air per person at the low end, and says so', () => {
    const doc = docs()[1]!;
    const results = analyseSurvey(doc, { draws: DRAWS });
    // As if the criteria judgement had not run (judgement: null): the report must not invent one.
    const model = buildReport(doc, results, { ...OPTIONS, judgement: null });
    expect(model.summary.judgementAvailable).toBe(false);
    expect(model.summary.basis).toMatch(/judgement was not available/);
    expect(model.ranked.rows.every((r) => r.priority === 'not-judged')).toBe(true);
    const low = model.ranked.rows.map((r) => results.rooms.find((x) => x.roomId === r.roomId)!.headline.supplyPerPerson_m3s).map((f) => (f ? (f.low ?? f.value) : null));
    const known = low.filter((x): x is number => x !== null);
    expect(known).toEqual([...known].sort((a, b) => a - b));
    expect(low.indexOf(null) === -1 || low.slice(low.indexOf(null)).every((x) => x === null)).toBe(true);
    // Safety observations recorded on the day (the demo kitchen's open-flued boiler) lead the summary.
    expect(model.summary.safety.some((s) => /open-flued/.test(s.text) && !s.judged)).toBe(true);
    // Wording rules (practice.md §3).
    const all = JSON.stringify(model);
    for (const banned of [/non-compliant/i, /lifestyle/i, /ASHRAE 1000/i, /\bfails?\b/i]) expect(all).not.toMatch(banned);
  });

  it('with a judgement lists safety rooms first and prints checks with status and period', () => {
    const doc = docs()[0]!;
    const results = analyseSurvey(doc, { draws: DRAWS });
    const [a, b, c] = results.rooms;
    const room = (priority: ReportRoomJudgementView['priority'], rank: number): ReportRoomJudgementView => ({
      priority,
      priorityWords: priority === 'act-now' ? 'Act now' : 'Plan an improvement',
      urgency: priority === 'act-now' ? 'immediate' : 'planned',
      rank,
      reasons: [],
      checks: [
        {
          criterionId: 'x',
          title: 'Daily mean CO2 in teaching hours',
          source: 'Invented test document (2026)',
          status: 'design-guidance-new-work',
          role: 'benchmark',
          period: 'occupied-day-mean',
          metric: 'co2-absolute',
          caveat: '',
          limit: 1500,
          value: { value: 1612, low: 1490, high: 1800 },
          outcome: 'uncertain',
          words: 'The range straddles the limit.',
          settleBy: 'A 20-minute decay test would decide this.',
        },
      ],
      moisture: [],
      safety: priority === 'act-now' ? ['Test safety item'] : [],
      fixes: [{ title: 'Open the vents', extraSupply_m3s: 0.0523, items: ['two vents'], safetyNotes: [], urgency: 'weeks' }],
    });
    const judgement: ReportJudgementView = {
      criteriaVersion: 'test v1',
      rooms: new Map([
        [a!.roomId, room('plan-improvement', 3)],
        [b!.roomId, room('plan-improvement', 2)],
        [c!.roomId, room('act-now', 1)],
      ]),
      areas: new Map(),
    };
    const model = buildReport(doc, results, { ...OPTIONS, judgement });
    expect(model.ranked.rows.map((r) => r.roomId)).toEqual([c!.roomId, b!.roomId, a!.roomId]);
    expect(model.ranked.rows[0]!.criterion).toContain('design guidance for new work');
    expect(model.ranked.rows[0]!.value).toBe('about 1610 ppm (range 1490–1800)');
    expect(model.ranked.rows[0]!.limit).toBe('1500 ppm');
    expect(model.ranked.rows[0]!.fix).toBe('Open the vents: about 52.5 L/s more (two vents)');
    expect(model.summary.safety[0]).toMatchObject({ text: 'Test safety item', judged: true });
  });
});

describe('buildReport on other surveys', () => {
  it('a hand-edited office (one room, 12 people) prints the analysis’s numbers', () => {
    const office = docs()[2]!;
    const room = office.rooms[0]!;
    const doc = surveyDocumentSchema.parse({
      ...office,
      areas: [],
      rooms: [{ ...room, areaId: undefined, name: 'Small office', clientRef: 'S-1', geometry: { kind: 'box', length_m: 6, width_m: 5, height_m: 2.6 }, occupants: [{ ...room.occupants[0]!, count: 12 }], readings: room.readings.map((r) => ({ ...r, conditions: { ...r.conditions, people: [{ groupId: room.occupants[0]!.id, count: 12 }] } })) }],
    });
    const results = analyseSurvey(doc, { draws: DRAWS });
    const model = buildReport(doc, results, OPTIONS);
    expectNumbersAreTheAnalysis(model, results);
    expect(model.rooms[0]!.title).toBe('Small office (S-1)');
  });

  it('generated surveys print the analysis’s numbers', () => {
    fc.assert(
      fc.property(surveyDocument(9), (raw) => {
        const doc = surveyDocumentSchema.parse(raw);
        const results = analyseSurvey(doc, { draws: 20 });
        expectNumbersAreTheAnalysis(buildReport(doc, results, OPTIONS), results);
      }),
      { numRuns: 15, seed: 8 },
    );
  });

  it('discloses the surveyor’s recorded edits to the criteria beside the criteria table, in the unit shown', () => {
    const doc = docs()[0]!;
    doc.survey.criteria = { setId: 'schools', version: '1', overrides: [{ thresholdId: 'hse-co2-action', value: 1200, reason: 'stricter client brief (invented)' }] };
    const results = analyseSurvey(doc, { draws: DRAWS });
    const model = buildReport(doc, results, OPTIONS);
    expect(model.criteria.note).toMatch(/Changed for this survey: .+ — limit 1200 ppm instead of 1500 ppm \(stricter client brief \(invented\)\)\.$/);
    expect(buildReport(docs()[0]!, analyseSurvey(docs()[0]!, { draws: DRAWS }), OPTIONS).criteria.note).not.toMatch(/Changed for this survey/);
  });

  it('puts the safety items first in “What to do” when there are any, and not otherwise', () => {
    for (const doc of docs()) {
      const model = buildReport(doc, analyseSurvey(doc, { draws: DRAWS }), OPTIONS);
      const first = model.summary.actions[0];
      if (model.summary.safety.length > 0) expect(first).toEqual({ urgency: 'immediate', text: 'The safety items above, before anything else: each says what to do and who should do it.' });
      else expect(model.summary.actions.some((a) => a.text.startsWith('The safety items above'))).toBe(false);
    }
    expect(docs().some((doc) => buildReport(doc, analyseSurvey(doc, { draws: DRAWS }), OPTIONS).summary.safety.length > 0)).toBe(true);
  });
});
