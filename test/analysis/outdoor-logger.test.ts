/**
 * The outdoor logger in the analysis (src/analysis/outdoor-logger-window.ts, meter-inputs.ts
 * outdoorFor, day-outdoor-conditions.ts) on the invented demo school, with an invented outdoor
 * logger added: which source sets the outdoor level, that spikes do not drag it, that a logger
 * that did not run during the measurements gives way to the spot readings, and that what the
 * surveyor typed for the day's weather is kept. Expectations are our own construction; the
 * median itself is checked against jstat in test/core/outdoor-logger-level.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { analyseSurvey } from '../../src/analysis/analyse-survey.ts';
import { outdoorFor } from '../../src/analysis/meter-inputs.ts';
import { outdoorLoggerAround, outdoorLoggerWindow, OUTDOOR_SET_MARGIN_MS, OUTDOOR_SPAN_MARGIN_MS } from '../../src/analysis/outdoor-logger-window.ts';
import type { SurveyDocument } from '../../src/model/survey-document.ts';
import { surveyDocumentSchema } from '../../src/model/survey-document.ts';
import { demoFile } from '../support/fixtures.ts';
import { approxEqual } from '../support/approx-equal.ts';
import { LOGGER_START_MS as START, roofLogger, withLogger } from '../support/outdoor-logger-series.ts';

const DRAWS = 50;
const HANDHELD = 'dea10000-0000-4000-8000-000000000001';
const school = (): SurveyDocument => surveyDocumentSchema.parse(demoFile().surveys[0]);


describe('the outdoor logger in the analysis', () => {
  const plain = analyseSurvey(school(), { draws: DRAWS });

  it('leaves a survey without one as it was (spot readings only)', () => {
    expect(outdoorLoggerWindow(school())).toBeNull();
    expect(plain.outdoor.source).toBe('2 outdoor readings on another meter');
    expect(plain.outdoor.readings).toBe(2);
    expect(outdoorFor(HANDHELD, school().survey, school().instruments, null)).toEqual(outdoorFor(HANDHELD, school().survey, school().instruments));
  });

  it('cuts the logger to the room measurements, 30 minutes either side', () => {
    const doc = withLogger(school(), roofLogger());
    const w = outdoorLoggerWindow(doc)!;
    expect(w.covers).toBe('measurements');
    const times = doc.rooms.flatMap((r) => r.readings.filter((x) => x.co2_ppm !== undefined).map((x) => Date.parse(x.time)));
    for (const s of doc.series) if (s.roomId) for (const p of s.periods) times.push(p.start_ms, p.end_ms);
    expect(w.from_ms).toBe(Math.max(START, Math.min(...times) - OUTDOOR_SPAN_MARGIN_MS));
    expect(w.to_ms).toBe(Math.min(START + 599 * 60_000, Math.max(...times) + OUTDOOR_SPAN_MARGIN_MS));
  });

  it('sets the survey’s outdoor level from the logger’s median, not dragged by spikes, and says so', () => {
    const r = analyseSurvey(withLogger(school(), roofLogger()), { draws: DRAWS });
    expect(r.outdoor.source).toMatch(/^outdoor logger “roof-logger\.csv”: median of \d+ points \(middle half 42\d–42\d ppm\), from \d\d:\d\d to \d\d:\d\d; 2 outdoor readings kept as a check$/);
    // 426 ± 3 ppm between spikes; one point in 8 is 250–450 ppm higher (a mean would be near 470).
    approxEqual(r.outdoor.value_ppm, 426, { abs: 3 });
    expect(r.outdoor.sd_ppm).toBeGreaterThan(25); // the logger's meter is not recorded: ±(50 ppm + 3 %) assumed
    expect(r.warnings.map((w) => w.code)).not.toContain('outdoor-sources-disagree');
  });

  it('keeps the spot readings on the room meter for the room’s own fits, the logger as a check', () => {
    const doc = withLogger(school(), roofLogger());
    const o = outdoorFor(HANDHELD, doc.survey, doc.instruments, outdoorLoggerWindow(doc));
    expect(o.sameMeterAsRoom).toBe(true);
    expect(o.value_ppm).toBe(430.5); // the two outdoor readings, 428 and 433 ppm, on the handheld
    expect(o.source).toBe('2 outdoor readings on the room meter; outdoor logger “roof-logger.csv” kept as a check');
  });

  it('uses the logger on the room’s scale only when it is the room’s meter', () => {
    const doc = withLogger(school(), roofLogger({ instrumentId: HANDHELD }));
    const o = outdoorFor(HANDHELD, doc.survey, doc.instruments, outdoorLoggerWindow(doc));
    expect(o.sameMeterAsRoom).toBe(true);
    expect(o.source).toMatch(/^outdoor logger “roof-logger\.csv”: median of \d+ points \(.*\) on the room meter, from/);
    const other = outdoorFor('dea10000-0000-4000-8000-000000000003', doc.survey, doc.instruments, outdoorLoggerWindow(doc));
    expect(other.sameMeterAsRoom).toBe(false);
  });

  it('replaces the assumed default when no outdoor reading was taken', () => {
    const bare = school();
    const doc = withLogger({ ...bare, survey: { ...bare.survey, outdoorReadings: [] } }, roofLogger({ level: 455, spikes: false }));
    const r = analyseSurvey(doc, { draws: DRAWS });
    expect(analyseSurvey({ ...bare, survey: { ...bare.survey, outdoorReadings: [] } }, { draws: DRAWS }).warnings.map((w) => w.code)).toContain('outdoor-assumed');
    expect(r.warnings.map((w) => w.code)).not.toContain('outdoor-assumed');
    approxEqual(r.outdoor.value_ppm, 455, { abs: 3 });
    expect(r.outdoor.source).not.toContain('check');
    // Every measured estimate in the rooms now uses the logger.
    const measured = r.rooms.flatMap((room) => room.measured);
    expect(measured.length).toBeGreaterThan(0);
    for (const m of measured) expect(m.outdoor.source).toMatch(/^outdoor logger “roof-logger\.csv”/);
  });

  it('gives way to the spot readings, and warns, when the logger did not run during the measurements', () => {
    const doc = withLogger(school(), roofLogger({ start_ms: Date.UTC(2026, 0, 15, 7, 0) }));
    const r = analyseSurvey(doc, { draws: DRAWS });
    expect(r.outdoor.source).toBe('2 outdoor readings on another meter; outdoor logger “roof-logger.csv” kept as a check');
    expect(r.warnings.map((w) => w.code)).toContain('outdoor-logger-outside-measurements');
  });

  it('warns when the logger and the spot readings disagree beyond their uncertainty', () => {
    const r = analyseSurvey(withLogger(school(), roofLogger({ level: 560, spikes: false })), { draws: DRAWS });
    const codes = r.warnings.map((w) => w.code);
    expect(codes).toContain('outdoor-sources-disagree');
    expect(codes).toContain('outdoor-reading-unusual');
  });

  it('takes the day’s outdoor conditions from the logger only where the surveyor recorded none', () => {
    const typed = analyseSurvey(withLogger(school(), roofLogger()), { draws: DRAWS });
    expect(typed.dayOutdoor.temp_C).toEqual({ value: 4.5, basis: 'recorded', words: 'as recorded' });
    const bare = school();
    const untyped = { ...bare, survey: { ...bare.survey, outdoorReadings: [], weather: { ...bare.survey.weather, outdoorTemp_C: undefined, outdoorRh_pct: undefined } } };
    expect(analyseSurvey(untyped, { draws: DRAWS }).dayOutdoor).toEqual({ temp_C: null, rh_pct: null });
    const r = analyseSurvey(withLogger(untyped, roofLogger()), { draws: DRAWS });
    expect(r.dayOutdoor.temp_C).toMatchObject({ value: -3, basis: 'outdoor-logger' });
    expect(r.dayOutdoor.rh_pct!.words).toMatch(/^median of the outdoor logger “roof-logger\.csv” from \d\d:\d\d to \d\d:\d\d$/);
    expect(r.dayWeather?.outdoor_C).toBe(-3);
    expect(r.dayWeather?.label).toContain('by the outdoor logger');
  });

  it('gives each measurement the outdoor level logged while it was measured, not the day’s', () => {
    // An invented day: 470 ppm outdoors until noon (still morning air), 420 ppm after; no spot readings.
    const doc = withLogger(school(), roofLogger({ spikes: false, level: 420 }));
    const series = doc.series.at(-1)!;
    const noon = Date.UTC(2026, 0, 14, 12, 0);
    series.co2_ppm = series.co2_ppm!.map((v, i) => (series.times_ms[i]! < noon ? v + 50 : v));
    doc.survey.outdoorReadings = [];
    const r = analyseSurvey(doc, { draws: DRAWS });
    const decays = r.rooms.flatMap((room) => room.measured.filter((m) => m.method.startsWith('decay')).map((m) => ({ room: room.name, m })));
    expect(decays.length).toBeGreaterThan(1);
    // A set's times are ISO for readings, ms since 1970 (as text) for a logger period.
    const ms = (t: string | null) => (Number.isNaN(Date.parse(t!)) ? Number(t) : Date.parse(t!));
    for (const { m } of decays) {
      const morning = ms(m.to) < noon;
      expect(ms(m.from) < noon).toBe(morning); // no decay of the demo runs across noon
      approxEqual(m.outdoor.value_ppm, morning ? 470 : 420, { abs: 4 });
      expect(m.outdoor.source).toMatch(/^outdoor logger “roof-logger\.csv”: median of \d+ points/);
    }
    // The window around one measurement: 15 minutes either side of its first and last reading.
    const w = outdoorLoggerAround(doc, Date.UTC(2026, 0, 14, 10, 0), Date.UTC(2026, 0, 14, 10, 20))!;
    expect(w.covers).toBe('measurement');
    expect([w.from_ms, w.to_ms]).toEqual([Date.UTC(2026, 0, 14, 10, 0) - OUTDOOR_SET_MARGIN_MS, Date.UTC(2026, 0, 14, 10, 20) + OUTDOOR_SET_MARGIN_MS]);
    expect(w.values).toHaveLength(51);
    expect(outdoorLoggerAround(doc, Date.UTC(2026, 0, 15, 10, 0), Date.UTC(2026, 0, 15, 10, 20))).toBeNull();
  });
});
