/**
 * Tests of src/analysis/analyse-survey.ts on the invented demo file (test/fixtures/demo-survey.json):
 * every room gets results, nothing at error severity, the numbers are exactly the engine's own
 * tested functions on inputs rebuilt by hand, and the results are deterministic, independent of
 * the order of rooms and readings, and plain JSON.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyseSurvey } from '../../src/analysis/analyse-survey.ts';
import { seedFromIds } from '../../src/analysis/id-seed.ts';
import type { AnalysisResults } from '../../src/analysis/results.ts';
import { occupantCo2Output } from '../../src/core/co2-generation.ts';
import { fitDecay } from '../../src/core/decay-fit.ts';
import { ENGINE_VERSION } from '../../src/core/engine-version.ts';
import { CRITERIA_DATA_VERSION } from '../../src/core/criteria/criteria-sets.ts';
import { meterErrorFromStatedAccuracy } from '../../src/core/meter-error.ts';
import { outdoorLevel } from '../../src/core/outdoor-level.ts';
import { predictRoomSupplyOverCases } from '../../src/core/room-supply-prediction.ts';
import { STANDARD_PRESSURE_PA } from '../../src/core/units.ts';
import { CURRENT_FORMAT_VERSION } from '../../src/model/migrations.ts';
import type { SurveyDocument } from '../../src/model/survey-document.ts';
import { surveyDocumentSchema } from '../../src/model/survey-document.ts';
import { demoFile } from '../support/fixtures.ts';
import { approxEqual } from '../support/approx-equal.ts';
import { surveyDocument } from '../support/survey-arbitraries.ts';

const DRAWS = 200;
const docs = (): SurveyDocument[] => demoFile().surveys.map((s) => surveyDocumentSchema.parse(s));
const school = () => docs()[0]!;
const byRoom = (r: AnalysisResults) => new Map(r.rooms.map((room) => [room.roomId, room]));

describe('analyseSurvey on the demo file', () => {
  const results = docs().map((doc) => analyseSurvey(doc, { draws: DRAWS }));

  it('gives every room results, with no warning at error severity', () => {
    for (const [k, doc] of docs().entries()) {
      const r = results[k]!;
      expect(r.rooms.map((room) => room.roomId)).toEqual(doc.rooms.map((room) => room.id));
      for (const room of r.rooms) {
        expect(room.scenarios.map((s) => s.id)).toEqual(['as-found', 'closed', 'vents-open', 'windows-open', 'design-occupancy']);
        expect(room.headline.supply_m3s.value).not.toBeNull();
        const all = [...room.warnings, ...room.measured.flatMap((m) => m.warnings)];
        expect(all.filter((w) => w.severity === 'error'), room.name).toEqual([]);
      }
      expect(r.areas.map((a) => a.areaId)).toEqual(doc.areas.map((a) => a.id));
    }
  });

  it('samples the as-found day for drawing, its highest points being the peak figures at the two ends', () => {
    let drawn = 0;
    for (const r of results) {
      for (const room of r.rooms) {
        const [asFound, ...others] = room.scenarios;
        for (const s of others) expect(s.profile?.curve ?? null).toBeNull();
        const profile = asFound!.profile;
        if (!profile) continue;
        const curve = profile.curve!;
        drawn++;
        expect(curve.favourable_ppm).toHaveLength(curve.time_s.length);
        expect(curve.unfavourable_ppm).toHaveLength(curve.time_s.length);
        curve.time_s.forEach((t, i) => {
          if (i > 0) expect(t).toBeGreaterThan(curve.time_s[i - 1]!);
          expect(curve.unfavourable_ppm[i]!).toBeGreaterThanOrEqual(curve.favourable_ppm[i]! - 1e-9);
        });
        // Levels only rise or fall between changes of conditions, and every change is sampled,
        // so the drawn maxima are the peaks the metrics report (internal consistency).
        if (profile.peak_ppm.high !== null) approxEqual(Math.max(...curve.unfavourable_ppm), profile.peak_ppm.high, { rel: 1e-9 });
        if (profile.peak_ppm.low !== null) approxEqual(Math.max(...curve.favourable_ppm), profile.peak_ppm.low, { rel: 1e-9 });
        expect(curve.inUse.length).toBeGreaterThan(0);
      }
    }
    expect(drawn).toBeGreaterThan(3);
  });

  it('stamps the engine, format, analysis and criteria versions', () => {
    expect(results[0]!.stamps).toEqual({ engineVersion: ENGINE_VERSION, formatVersion: CURRENT_FORMAT_VERSION, analysisVersion: '0.3.0', criteria: { setId: 'schools', version: CRITERIA_DATA_VERSION, edits: [] } });
    expect(results[0]!.judgement.ranking).toHaveLength(results[0]!.rooms.length);
  });

  it('is plain JSON: a round trip gives the same object', () => {
    for (const r of results) expect(JSON.parse(JSON.stringify(r))).toEqual(r);
  });

  it('matches fitDecay on Classroom B1’s decay rebuilt by hand', () => {
    const doc = school();
    const room = doc.rooms.find((r) => r.name === 'Classroom B1')!;
    const test = room.tests.find((t) => t.kind === 'decay')!;
    const readings = test.readingIds
      .map((id) => room.readings.find((r) => r.id === id)!)
      .map((r) => ({ time_s: Date.parse(r.time) / 1000, level_ppm: r.co2_ppm! }))
      .sort((a, b) => a.time_s - b.time_s);
    const meter = meterErrorFromStatedAccuracy(50, 3); // the demo handheld's stated accuracy
    const outdoor = outdoorLevel([428, 433], { sameMeterAsRoom: true, meter }); // the two outdoor readings, same meter
    const temps = room.readings.map((r) => r.temp_C!);
    const air = { temp_C: temps.reduce((a, b) => a + b, 0) / temps.length, pressure_Pa: STANDARD_PRESSURE_PA };
    const output = occupantCo2Output(
      [
        { count: 28, ageBand: '6-11', sex: 'mixed', met: 1.2 },
        { count: 1, ageBand: '30-40', sex: 'female', met: 1.6 },
      ],
      air,
    );
    const volume = 7.2 * 7 * 2.9;
    const expected = fitDecay({
      readings,
      uncertainty: {
        volume_m3: volume,
        volumeSd_m3: 0.05 * volume,
        outdoor,
        meter,
        occupants: { count: 29, countSd: 0, perPerson_m3s: output.total_m3s / 29, perPersonRelSd: 0.15 },
      },
      conditions: null,
      seed: seedFromIds(0, room.id, test.id),
      draws: DRAWS,
    });
    const got = results[0]!.rooms.find((r) => r.roomId === room.id)!;
    const m = got.measured.find((x) => x.setId === test.id)!;
    expect(m.method).toBe(expected.method);
    expect(m.supply_m3s).toEqual(expected.supply_m3s);
    expect(m.steadyLevel_ppm).toEqual(expected.steadyLevel_ppm);
    // The decay outranks the build-up fits (best-estimate rule) and is the headline, labelled measured.
    expect(got.bestMeasuredSetId).toBe(test.id);
    expect(got.headline.supply_m3s).toMatchObject({ ...expected.supply_m3s, basis: 'measured' });
  });

  it('predicts a room without readings from its openings, with a measurement to suggest', () => {
    const flats = docs()[1]!;
    const bathroom = analyseSurvey(flats, { draws: DRAWS }).rooms.find((r) => r.name === 'Bathroom')!;
    expect(bathroom.measured).toEqual([]);
    expect(bathroom.headline.supply_m3s.basis).toBe('predicted');
    expect(bathroom.suggestion).toMatch(/fan’s flow/);
    // Its only fan is recorded dead and it has no outside wall: nothing brings in outdoor air, and it says so.
    expect(bathroom.headline.supply_m3s.value).toBe(0);
    expect(bathroom.warnings.map((w) => w.code)).toContain('no-outdoor-air');
  });

  it('gives the predicted as-found supply of a room without a measurement exactly as the engine predicts it', () => {
    const flats = docs()[1]!;
    const kitchen = analyseSurvey(flats, { draws: DRAWS }).rooms.find((r) => r.name === 'Kitchen')!;
    const asFound = kitchen.scenarios[0]!;
    // Rebuilt by hand: the kitchen's measured 18 L/s extract fan running (fans 'on'), window shut, the
    // combustion-air brick never counted, interior room (no exposed wall): only the fan.
    const prediction = predictRoomSupplyOverCases(
      {
        id: kitchen.roomId,
        ceilingHeight_m: 2.4,
        openings: [],
        fans: [{ kind: 'fan', id: 'f', role: 'extract', system: 'local', running: true, measuredFlow_m3s: 0.018 }],
        site: { terrain: 'urban', buildingHeight_m: 9 },
      },
      [{ id: 'x', label: 'x', indoor_C: 20, outdoor_C: 0, windAt10m_ms: 1, assumed: true }],
    );
    const worst = asFound.cases.find((c) => c.weatherId === asFound.worstWeatherId)!;
    expect(worst.supply_m3s).toMatchObject({
      value: prediction.worst.outdoorAir.central,
      low: prediction.worst.outdoorAir.low,
      high: prediction.worst.outdoorAir.high,
      basis: 'predicted',
    });
  });
});

/** Shuffle with a fast-check-chosen permutation. */
function permute<T>(items: readonly T[], keys: readonly number[]): T[] {
  return items
    .map((item, i) => ({ item, key: keys[i % Math.max(1, keys.length)]! + i / 1000 }))
    .sort((a, b) => a.key - b.key)
    .map((x) => x.item);
}

describe('analyseSurvey is deterministic and order-free', () => {
  it('gives the same results twice', () => {
    const doc = school();
    expect(analyseSurvey(doc, { draws: 50 })).toEqual(analyseSurvey(doc, { draws: 50 }));
  });

  it('does not depend on the order of rooms or readings (results equal by room id)', () => {
    const all = docs();
    const reference = all.map((doc) => analyseSurvey(doc, { draws: 50 }));
    fc.assert(
      fc.property(fc.nat({ max: all.length - 1 }), fc.array(fc.integer(), { minLength: 1, maxLength: 12 }), (k, keys) => {
        const doc = all[k]!;
        const shuffled: SurveyDocument = {
          ...doc,
          rooms: permute(doc.rooms, keys).map((room) => ({ ...room, readings: permute(room.readings, [...keys].reverse()) })),
        };
        const got = analyseSurvey(shuffled, { draws: 50 });
        const want = reference[k]!;
        const gotRooms = byRoom(got);
        for (const [id, room] of byRoom(want)) expect(gotRooms.get(id)).toEqual(room);
        expect(got.areas).toEqual(want.areas);
        expect(got.warnings).toEqual(want.warnings);
      }),
      { numRuns: 12, seed: 5 },
    );
  });
});

describe('analyseSurvey on any valid survey', () => {
  it('never throws, and gives plain JSON without NaN or Infinity', () => {
    fc.assert(
      fc.property(surveyDocument(7), (raw) => {
        const doc = surveyDocumentSchema.parse(raw);
        const r = analyseSurvey(doc, { draws: 40 });
        expect(r.rooms).toHaveLength(doc.rooms.length);
        expect(JSON.parse(JSON.stringify(r))).toEqual(r);
      }),
      { numRuns: 40, seed: 21 },
    );
  });
});
