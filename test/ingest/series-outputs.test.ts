/**
 * What the importer hands on: the model's logger-series record (it must pass the model's own
 * schema), the vapour-pressure excess by local day, and chart data the shared chart accepts.
 * Invented records; expectations our own construction unless a source is named.
 */
import { describe, it, expect } from 'vitest';
import { analyseLoggerFile } from '../../src/ingest/analyse-logger-file.ts';
import { loggerSeriesRecord } from '../../src/ingest/logger-series-record.ts';
import { vapourExcessByDay } from '../../src/ingest/vapour-excess-by-day.ts';
import { loggerChartData } from '../../src/ingest/logger-chart-data.ts';
import { loggerSeriesSchema } from '../../src/model/logger-series.ts';
import { timeChart } from '../../src/chart/time-chart.ts';
import { approxEqual } from '../support/approx-equal.ts';
import { schoolRoom, writeLoggerFile } from '../support/logger-records.ts';

const DAY0 = Date.UTC(2024, 0, 8) / 1000;
const record = schoolRoom({ start_s: DAY0, days: 2, step_s: 120, volume_m3: 60, people: 10, occupiedSupply_m3s: 0.03, emptySupply_m3s: 0.01, seed: 5 });
const text = writeLoggerFile(record, { delimiter: ',', writing: 'iso-local', zone: 'Europe/London' });
const analysis = analyseLoggerFile(text, { timeZone: 'Europe/London', volume_m3: 60, outdoor_ppm: 420 });
if (analysis.status !== 'analysed') throw new Error('not analysed');

describe('the model record', () => {
  it('passes the survey file schema, with accepted periods in ms', () => {
    const accepted = analysis.periods.filter((p) => p.suggestion.accept).map((p, k) => ({ id: `00000000-0000-4000-8000-00000000000${k % 10}`, kind: p.kind, start_s: p.start_s, end_s: p.end_s, note: p.suggestion.reason }));
    const built = loggerSeriesRecord({ id: '11111111-1111-4111-8111-111111111111', sourceFile: 'room4.csv', series: analysis.series, report: analysis.report, periods: accepted.slice(0, 3) });
    expect(built.ok).toBe(true);
    if (!built.ok) return;
    expect(loggerSeriesSchema.safeParse(built.record).success).toBe(true);
    expect(built.record.columns).toEqual({ time: 'Timestamp', co2: 'CO2 (ppm)', temperature: 'Air temp [°C]', relativeHumidity: 'Humidity (%RH)' });
    expect(built.record.times_ms[0]).toBe(DAY0 * 1000);
    expect(built.record.timeZone).toBe('Europe/London');
    expect(built.record.periods[0]!.start_ms).toBe(Math.round(accepted[0]!.start_s * 1000));
  });

  it('leaves out readings the model would refuse, and says how many', () => {
    const co2 = Float64Array.from(analysis.series.co2_ppm!);
    co2[3] = NaN;
    co2[4] = 20_000;
    const built = loggerSeriesRecord({ id: '11111111-1111-4111-8111-111111111111', sourceFile: 'x.csv', series: { ...analysis.series, co2_ppm: co2 }, report: analysis.report });
    expect(built.ok && built.leftOut).toBe(2);
    expect(built.ok && loggerSeriesSchema.safeParse(built.record).success).toBe(true);
  });
  it('keeps an outdoor logger’s winter temperatures that a room’s logger could not hold', () => {
    // −35 °C outdoors is within the outdoor range (−50 to 50 °C), outside the indoor one (−30 to 60 °C).
    const temp = Float64Array.from(analysis.series.temp_C!, () => -35);
    const series = { ...analysis.series, temp_C: temp };
    const outdoor = loggerSeriesRecord({ id: '11111111-1111-4111-8111-111111111111', sourceFile: 'roof.csv', series, report: analysis.report });
    expect(outdoor.ok && outdoor.leftOut).toBe(0);
    expect(outdoor.ok && loggerSeriesSchema.safeParse(outdoor.record).success).toBe(true);
    const inRoom = loggerSeriesRecord({ id: '11111111-1111-4111-8111-111111111111', sourceFile: 'room.csv', series, report: analysis.report, roomId: '22222222-2222-4222-8222-222222222222' });
    expect(inRoom.ok && inRoom.leftOut).toBe(series.times_s.length);
  });
});

describe('vapour-pressure excess by local day', () => {
  it('matches the engine’s worked example for constant conditions', () => {
    // 20 °C / 60 % inside, 5 °C / 85 % outside: 661.6 Pa (the example in core/vapour-pressure-excess.ts).
    const n = 48;
    const times = Float64Array.from({ length: n }, (_, i) => DAY0 + i * 3600);
    const inside = { times_s: times, temp_C: new Float64Array(n).fill(20), rh_pct: new Float64Array(n).fill(60) };
    const r = vapourExcessByDay(inside, { kind: 'constant', temp_C: 5, rh_pct: 85 }, 'Europe/London');
    if ('error' in r) throw new Error(r.error.message);
    expect(r.dayLabels).toEqual(['2024-01-08', '2024-01-09']);
    for (const d of r.result.days) approxEqual(d.excess_Pa, 661.6, { abs: 0.1 });
  });

  it('pairs an outdoor series by time and counts local days in the zone', () => {
    const n = 24;
    const times = Float64Array.from({ length: n }, (_, i) => Date.UTC(2024, 6, 1, 0, 30) / 1000 + i * 3600);
    const inside = { times_s: times, temp_C: new Float64Array(n).fill(21), rh_pct: new Float64Array(n).fill(55) };
    const outTimes = Float64Array.from({ length: 13 }, (_, i) => Date.UTC(2024, 6, 1) / 1000 + i * 7200);
    const outdoor = { kind: 'series' as const, times_s: outTimes, temp_C: new Float64Array(13).fill(15), rh_pct: new Float64Array(13).fill(70) };
    const r = vapourExcessByDay(inside, outdoor, 'Europe/London');
    if ('error' in r) throw new Error(r.error.message);
    // 00:30 UTC is 01:30 BST on 1 July; the last inside reading (23:30 UTC) is past local midnight.
    expect(r.dayLabels).toEqual(['2024-07-01', '2024-07-02']);
    expect(r.unpaired).toBe(0);
    // An outdoor record that stops at 10:00 UTC pairs inside readings up to 11:00 only.
    const short = vapourExcessByDay(inside, { ...outdoor, times_s: outTimes.subarray(0, 6), temp_C: outdoor.temp_C.subarray(0, 6), rh_pct: outdoor.rh_pct.subarray(0, 6) }, 'Europe/London');
    if ('error' in short) throw new Error(short.error.message);
    expect(short.unpaired).toBe(13);
    expect(short.warnings.map((w) => w.code)).toContain('outdoor-series-short');
  });
});

describe('chart data', () => {
  it('is accepted by the shared time chart, with shaded periods and fitted curves', () => {
    const data = loggerChartData(analysis.series, 'co2', analysis.periods, { outdoor_ppm: 420 });
    expect(data.series[0]!.values).toBe(analysis.series.co2_ppm);
    expect(data.series.length).toBe(1 + analysis.periods.filter((p) => p.curve).length);
    expect(data.periods.some((p) => /^decay \d\.\d\d ACH$/.test(p.label))).toBe(true);
    const geometry = timeChart({ width: 360, height: 200, ...data });
    expect(geometry.periods.length).toBe(analysis.periods.length);
    expect(geometry.series.length).toBe(data.series.length);
    expect(loggerChartData(analysis.series, 'temperature').yLabel).toBe('Temperature (°C)');
  });
});
