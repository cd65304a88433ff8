/**
 * Every time writing and file shape of item 1, generated from an invented record that spans the
 * Europe/London clock change of Sunday 27 October 2024 (clocks back at 01:00 UTC): the times read
 * must be the true UTC instants. The file shapes are our own invention; the expectations are
 * our own construction.
 */
import { describe, it, expect } from 'vitest';
import { parseLoggerFile } from '../../src/ingest/parse-logger-file.ts';
import { simulateRoom, writeLoggerFile, type FileShape, type TimeWriting } from '../support/logger-records.ts';

const START = Date.UTC(2024, 9, 26, 20, 0) / 1000; // Saturday 21:00 BST
const record = simulateRoom({
  start_s: START,
  step_s: 60,
  count: 12 * 60,
  volume_m3: 40,
  outdoor_ppm: 420,
  perPerson_m3s: 4e-6,
  timetable: [{ from_s: START, people: 2, supply_m3s: 0.008 }],
  meter: { offset_ppm: 0, gain: 1, noise_ppm: 5 },
  seed: 7,
});

const shapes: Array<[TimeWriting, Partial<FileShape>]> = [
  ['iso-local', { delimiter: ',' }],
  ['iso-offset', { delimiter: '\t', preamble: ['Invented logger', 'Channel list follows'] }],
  ['iso-utc', { delimiter: '|' }],
  ['day-first', { delimiter: ';', decimalComma: true, unitsLine: true }],
  ['dotted-day-first', { delimiter: ';', decimalComma: true, lineEnd: '\r\n' }],
  ['month-first-ampm', { delimiter: ',', fahrenheit: true }],
  ['separate-date-time', { delimiter: ';', decimalComma: true, preamble: ['Room 12', ''] }],
  ['epoch-seconds', { delimiter: ',' }],
  ['epoch-milliseconds', { delimiter: '\t' }],
  ['spreadsheet-days', { delimiter: ';', decimalComma: true }],
];

describe('every time writing across the October clock change', () => {
  for (const [writing, shape] of shapes) {
    it(`${writing} (${JSON.stringify(shape.delimiter)}${shape.decimalComma ? ', decimal comma' : ''})`, () => {
      const text = writeLoggerFile(record, { delimiter: ',', zone: 'Europe/London', writing, ...shape });
      const r = parseLoggerFile(text, { timeZone: 'Europe/London' });
      expect(r.status, JSON.stringify(r.status === 'failed' ? r.error : '')).toBe('parsed');
      if (r.status !== 'parsed') return;
      expect(r.report.kept).toBe(record.times_s.length);
      const worst = Math.max(...record.times_s.map((t, i) => Math.abs(r.series.times_s[i]! - t)));
      // Spreadsheet days are written to 6 decimals (0.09 s).
      expect(worst).toBeLessThan(0.1);
      expect(Array.from(r.series.co2_ppm!)).toEqual(record.readCo2);
      expect(r.series.temp_C![0]).toBeCloseTo(record.temp_C[0]!, 1);
      expect(r.series.rh_pct![5]).toBeCloseTo(record.rh_pct[5]!, 6);
      expect(r.report.decimalSeparator).toBe(shape.decimalComma ? ',' : '.');
      expect(r.report.preambleLines).toBe(shape.preamble?.length ?? 0);
      const local = !['iso-offset', 'iso-utc', 'epoch-seconds', 'epoch-milliseconds'].includes(writing);
      expect(r.report.warnings.some((w) => w.code === 'clock-change-repeated')).toBe(local);
    });
  }
});

describe('date order', () => {
  const file = (dates: string[]) => `Time,CO2\n${dates.map((d, i) => `${d},${800 + i}`).join('\n')}\n`;

  it('settles day-first or month-first from a number above 12', () => {
    const dayFirst = parseLoggerFile(file(['12/10/2024 10:00', '13/10/2024 10:00']));
    expect(dayFirst.status === 'parsed' && dayFirst.report.timeFormat?.order).toBe('day-first');
    const monthFirst = parseLoggerFile(file(['10/12/2024 10:00', '10/13/2024 10:00']));
    expect(monthFirst.status === 'parsed' && monthFirst.report.timeFormat?.order).toBe('month-first');
  });

  it('asks when every date reads both ways, and uses the answer', () => {
    const text = file(['05/06/2024 10:00', '05/06/2024 10:01', '05/06/2024 10:02']);
    const r = parseLoggerFile(text);
    expect(r.status).toBe('ask');
    if (r.status === 'ask') expect(r.question.examples[0]).toMatchObject({ line: 2, dayFirst: '2024-06-05', monthFirst: '2024-05-06' });
    const answered = parseLoggerFile(text, { dateOrder: 'month-first' });
    expect(answered.status === 'parsed' && answered.series.times_s[0]).toBe(Date.UTC(2024, 4, 6, 10) / 1000);
  });

  it('settles it from consecutive days with a note', () => {
    const r = parseLoggerFile(file(['01/10/2024 23:59', '02/10/2024 00:00', '03/10/2024 00:00']));
    expect(r.status === 'parsed' && r.report.timeFormat?.order).toBe('day-first');
    expect(r.report.warnings.map((w) => w.code)).toContain('date-order-from-sequence');
  });

  it('refuses dates that are day-first and month-first at once', () => {
    const r = parseLoggerFile(file(['13/10/2024 10:00', '10/13/2024 10:00']));
    expect(r).toMatchObject({ status: 'failed', error: { code: 'date-order-inconsistent' } });
  });
});

describe('rows left out, sorted and reported', () => {
  it('lists malformed rows by line, sorts out-of-order rows and drops repeated times', () => {
    const text = [
      'Time;CO2 (ppm)',
      '2024-03-01 10:00:00;800',
      '2024-03-01 10:02:00;820',
      '2024-03-01 10:01:00;810',
      'garbage line',
      '2024-03-01 10:03:00;abc',
      '2024-03-01 10:02:00;821',
      '2024-03-01 10:04:00;',
      '1999-12-31 23:00:00;800',
    ].join('\n');
    const r = parseLoggerFile(text, { timeZone: 'UTC' });
    expect(r.status).toBe('parsed');
    if (r.status !== 'parsed') return;
    expect(Array.from(r.series.times_s).map((t) => (t - Date.UTC(2024, 2, 1, 10) / 1000) / 60)).toEqual([0, 1, 2, 4]);
    expect(r.series.co2_ppm![3]).toBeNaN();
    expect(r.report.malformed.map((m) => m.line)).toEqual([5, 6, 9]);
    expect(r.report.malformed[1]!.problem).toBe('"abc" in "CO2 (ppm)" is not a number');
    expect(r.report.malformed[2]!.problem).toMatch(/before 2000/);
    expect(r.report.ordering).toMatchObject({ outOfOrder: 1, duplicates: 1, conflicting: 1, duplicateLines: [7] });
    expect(r.report.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(['malformed-row', 'out-of-order', 'duplicate-time', 'missing-value']));
  });

  it('reports local times that never occur (clocks forward in March)', () => {
    const text = 'Time,CO2\n2024-03-31 00:59:00,800\n2024-03-31 01:30:00,805\n2024-03-31 02:00:00,810\n';
    const r = parseLoggerFile(text, { timeZone: 'Europe/London' });
    expect(r.status === 'parsed' && r.report.skippedLocalTimes).toEqual([3]);
    expect(r.report.warnings.map((w) => w.code)).toContain('clock-change-skipped');
  });

  it('fails with a clear message for an unknown zone, an empty file and a file with no table', () => {
    expect(parseLoggerFile('Time,CO2\n2024-01-01 00:00,800\n2024-01-01 00:01,801\n', { timeZone: 'Mars/Olympus' })).toMatchObject({
      status: 'failed',
      error: { code: 'unknown-time-zone' },
    });
    expect(parseLoggerFile('  \n')).toMatchObject({ status: 'failed', error: { code: 'empty-file' } });
    expect(parseLoggerFile('hello world\nthis is prose\n')).toMatchObject({ status: 'failed', error: { code: 'no-data-rows' } });
  });
});
