/**
 * The demo survey file: current with its builder, valid, said to be invented, and physically
 * plausible — decays fall exponentially towards an outdoor level of about 420-440 ppm and
 * build-ups rise towards the level their occupancy implies.
 */
import { describe, it, expect } from 'vitest';
import { fitStraightLine } from '../../src/core/straight-line-fit.ts';
import { readSurveyFile } from '../../src/model/survey-file.ts';
import { buildDemoSurveyFile } from '../support/demo-survey-builder.ts';
import { demoFile, fixtureText } from '../support/fixtures.ts';

const file = demoFile();
const surveys = file.surveys;
const rooms = surveys.flatMap((s) => s.rooms.map((room) => ({ survey: s, room })));
const minutesOf = (iso: string, from: string) => (Date.parse(iso) - Date.parse(from)) / 60_000;

describe('demo survey file', () => {
  it('is current with its builder (run `npm run demo` after changing it)', () => {
    expect(fixtureText('demo-survey.json')).toBe(`${JSON.stringify(buildDemoSurveyFile(), null, 1)}\n`);
  });

  it('is a valid survey file that says its data are invented', () => {
    expect(readSurveyFile(file).ok).toBe(true);
    for (const s of surveys) {
      expect(s.survey.notes).toMatch(/INVENTED DATA/);
      expect(s.survey.site).toMatch(/\(invented\)/);
    }
  });

  it('has the rooms the demo promises', () => {
    const all = rooms.map(({ room }) => room);
    expect(all.filter((r) => r.use === 'classroom').length).toBeGreaterThanOrEqual(3);
    expect(all.some((r) => r.openings.some((o) => o.type === 'window' && o.operability === 'seized'))).toBe(true);
    expect(all.some((r) => r.use === 'bedroom' && r.defects.some((d) => d.kind === 'mould'))).toBe(true);
    expect(all.some((r) => r.use === 'wet-room' && r.defects.some((d) => d.kind === 'fan-dead'))).toBe(true);
    expect(all.some((r) => r.appliances.some((a) => a.flue === 'open-flued'))).toBe(true);
    expect(all.some((r) => r.use === 'office')).toBe(true);
    const kinds = new Set(all.flatMap((r) => r.tests.map((t) => t.kind)));
    expect([...kinds].sort()).toEqual(['build-up', 'decay', 'seeded-decay']);
    expect(all.some((r) => r.readings.length === 1)).toBe(true); // spot readings
    expect(surveys.some((s) => s.series.length > 0)).toBe(true);
  });

  it('reads outdoor CO₂ at 420-440 ppm, start and end (practice note: expect about 420-440 ppm)', () => {
    for (const s of surveys) {
      const moments = s.survey.outdoorReadings.map((r) => r.moment).sort();
      expect(moments).toEqual(['end', 'start']);
      for (const r of s.survey.outdoorReadings) {
        expect(r.co2_ppm).toBeGreaterThanOrEqual(420);
        expect(r.co2_ppm).toBeLessThanOrEqual(440);
      }
    }
  });

  it('has decays that are straight on a log plot of the excess over outdoor (ASTM E741 regression form)', () => {
    for (const { survey, room } of rooms) {
      const outdoor = survey.survey.outdoorReadings[0]!.co2_ppm!;
      for (const test of room.tests.filter((t) => t.kind !== 'build-up')) {
        const readings = test.readingIds.map((id) => room.readings.find((r) => r.id === id)!);
        const t = readings.map((r) => minutesOf(r.time, readings[0]!.time) / 60);
        const y = readings.map((r) => Math.log(r.co2_ppm! - outdoor));
        const fit = fitStraightLine(t, y);
        const airChanges = -fit.slope;
        // Rooms closed up in winter: about 0.2-3 air changes per hour (common practice (no published source)).
        expect(airChanges, `${room.name}`).toBeGreaterThan(0.2);
        expect(airChanges, `${room.name}`).toBeLessThan(3);
        // Residuals of a few percent: meter noise, not a bent curve.
        expect(fit.residualSd, `${room.name}`).toBeLessThan(0.03);
      }
    }
  });

  it('has build-ups that rise while people are in and stay below 5,000 ppm', () => {
    for (const { room } of rooms) {
      for (const test of room.tests.filter((t) => t.kind === 'build-up')) {
        const levels = test.readingIds.map((id) => room.readings.find((r) => r.id === id)!.co2_ppm!);
        expect(levels.at(-1)! - levels[0]!, room.name).toBeGreaterThan(300);
        expect(Math.max(...levels)).toBeLessThan(5_000);
        expect(room.readings.find((r) => r.id === test.readingIds[1])!.conditions.people.some((p) => p.count > 0)).toBe(true);
      }
    }
  });

  it('has a logger decay period that falls towards outdoor', () => {
    const series = surveys.flatMap((s) => s.series)[0]!;
    const decay = series.periods.find((p) => p.kind === 'decay')!;
    const inside = series.times_ms.flatMap((t, i) => (t >= decay.start_ms && t <= decay.end_ms ? [series.co2_ppm![i]!] : []));
    expect(inside.length).toBeGreaterThan(20);
    expect(inside[0]! - inside.at(-1)!).toBeGreaterThan(200);
    expect(Math.min(...inside)).toBeGreaterThan(430);
  });
});
