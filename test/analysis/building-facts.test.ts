/**
 * The survey facts the details and visit screens now edit reach the findings: shelter changes a
 * room's infiltration (the leakage item of its prediction), terrain the wind at the building, and
 * a CO₂ accuracy stated through the instrument form removes the "accuracy assumed" warning.
 * On the invented demo school (test/fixtures/demo-survey.json).
 */
import { describe, it, expect } from 'vitest';
import { analyseSurvey } from '../../src/analysis/analyse-survey.ts';
import type { RoomResults } from '../../src/analysis/results.ts';
import { instrumentDraft, instrumentFromDraft } from '../../src/app/instrument-draft.ts';
import type { Survey } from '../../src/model/survey.ts';
import type { SurveyDocument } from '../../src/model/survey-document.ts';
import { surveyDocumentSchema } from '../../src/model/survey-document.ts';
import { demoFile } from '../support/fixtures.ts';
import { siteInputs } from '../../src/analysis/site-inputs.ts';

const school = (): SurveyDocument => surveyDocumentSchema.parse(demoFile().surveys[0]);
const DRAWS = 200;

function roomWith(facts: Partial<Pick<Survey, 'terrain' | 'shelter'>>, name: string, doc = school()): RoomResults {
  Object.assign(doc.survey, facts);
  return analyseSurvey(doc, { draws: DRAWS }).rooms.find((r) => r.name === name)!;
}
/** The leakage (infiltration) item of the shut-room prediction in each weather case, m³/s. */
const infiltration = (room: RoomResults) =>
  room.scenarios.find((s) => s.id === 'closed')!.cases.map((c) => c.prediction.items.filter((i) => i.mechanism === 'leakage').reduce((a, i) => a + i.central, 0));

describe('building facts in the findings', () => {
  it('shelter changes a room’s infiltration: exposed above some shelter above sheltered, in every weather case', () => {
    // Direction: the LBL wind coefficient falls as the shelter class rises (ASHRAE Handbook—Fundamentals,
    // infiltration chapter, via the EnergyPlus Input-Output Reference; src/core/lbl-infiltration.ts).
    const exposed = infiltration(roomWith({ shelter: 'exposed' }, 'Classroom B2'));
    const normal = infiltration(roomWith({ shelter: 'normal' }, 'Classroom B2'));
    const sheltered = infiltration(roomWith({ shelter: 'sheltered' }, 'Classroom B2'));
    expect(normal.every((q) => q > 0)).toBe(true);
    normal.forEach((q, k) => {
      expect(exposed[k]).toBeGreaterThan(q);
      expect(sheltered[k]).toBeLessThan(q);
    });
    // Classroom B2 has no readings: its headline is the prediction, so the surveyor sees the change.
    const b2 = roomWith({ shelter: 'exposed' }, 'Classroom B2');
    expect(b2.headline.supply_m3s.basis).toBe('predicted');
    expect(b2.headline.supply_m3s.value).not.toBe(roomWith({ shelter: 'sheltered' }, 'Classroom B2').headline.supply_m3s.value);
  });

  it('terrain changes the wind at the building (open country above town above city centre), not the infiltration', () => {
    // BS 5925:1991 terrain factors for the wind at building height, from memory (src/core/reference-wind-speed.ts):
    // rougher terrain, less wind.
    const wind = (terrain: Survey['terrain']) => roomWith({ terrain }, 'Classroom B2').scenarios[0]!.cases.map((c) => c.prediction.windAtHeight_ms);
    const [open, town, city] = [wind('open-country'), wind('urban'), wind('city-centre')];
    town.forEach((u, k) => {
      expect(open[k]).toBeGreaterThan(u);
      expect(city[k]).toBeLessThan(u);
    });
    // The LBL model takes the 10 m wind with its own shelter class (src/core/room-leakage.ts).
    expect(infiltration(roomWith({ terrain: 'open-country' }, 'Classroom B2'))).toEqual(infiltration(roomWith({ terrain: 'city-centre' }, 'Classroom B2')));
  });

  it('a CO₂ meter with no stated accuracy is flagged, and the flag goes once the form states ±(50 ppm + 3 %)', () => {
    const codes = (room: RoomResults) => room.measured.flatMap((m) => m.warnings.map((w) => w.code));
    const doc = school();
    const handheld = doc.instruments[0]!;
    const stated = structuredClone(handheld);
    handheld.accuracy = [];
    const before = analyseSurvey(doc, { draws: DRAWS }).rooms.find((r) => r.name === 'Classroom B1')!;
    expect(codes(before)).toContain('instrument-accuracy-assumed');

    const draft = instrumentDraft(handheld);
    draft.accuracy.co2 = { fixed: 50, percent: 3 }; // the demo handheld's data-sheet figure (invented)
    const result = instrumentFromDraft(draft, handheld, () => 'not used');
    if (!result.ok) throw new Error(result.problems[0]!.message);
    doc.instruments[0] = result.instrument;
    const after = analyseSurvey(doc, { draws: DRAWS }).rooms.find((r) => r.name === 'Classroom B1')!;
    expect(codes(after)).not.toContain('instrument-accuracy-assumed');
    // The same figure as the demo's own record: the form adds nothing of its own.
    const original = roomWith({}, 'Classroom B1', { ...school(), instruments: [stated, ...school().instruments.slice(1)] });
    expect(after.measured.map((m) => m.supply_m3s)).toEqual(original.measured.map((m) => m.supply_m3s));
  });

  it('names each building fact it had to assume, shelter included, and none once all are recorded', () => {
    const note = (facts: Partial<Pick<Survey, 'terrain' | 'shelter' | 'storeys'>>) => {
      const survey = { ...school().survey, terrain: undefined, shelter: undefined, storeys: undefined, ...facts };
      return siteInputs(survey).warnings.find((w) => w.code === 'state-assumed')?.message;
    };
    expect(note({})).toBe(
      'Not recorded, so assumed: urban terrain (for the wind at the building), 2 storeys (for the wind and the stack effect) and some shelter from neighbouring buildings (for the leakage). Record them on the survey details.',
    );
    expect(note({ terrain: 'urban', storeys: 3 })).toBe('Not recorded, so assumed: some shelter from neighbouring buildings (for the leakage). Record it on the survey details.');
    expect(note({ terrain: 'urban', storeys: 3, shelter: 'exposed' })).toBeUndefined();
  });
});
