/**
 * The importer never crashes: random bytes and random CSV-like text give either a series or a
 * failure with a clear message (fast-check; our own properties).
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { analyseLoggerFile, type LoggerAnalysis } from '../../src/ingest/analyse-logger-file.ts';

function wellFormed(a: LoggerAnalysis): void {
  if (a.status === 'failed') {
    expect(a.error.code).not.toBe('internal-error');
    expect(a.error.message.length).toBeGreaterThan(10);
  } else if (a.status === 'ask') {
    expect(a.question.examples.length).toBeGreaterThan(0);
  } else {
    expect(a.series.times_s.length).toBe(a.report.kept);
    for (let i = 1; i < a.series.times_s.length; i++) expect(a.series.times_s[i]!).toBeGreaterThan(a.series.times_s[i - 1]!);
  }
}

const cell = fc.oneof(
  fc.integer({ min: 300, max: 3000 }).map(String),
  fc.double({ min: -40, max: 120, noNaN: true }).map((v) => v.toFixed(2)),
  fc.double({ min: -40, max: 120, noNaN: true }).map((v) => v.toFixed(1).replace('.', ',')),
  fc.date({ min: new Date('2000-01-02'), max: new Date('2199-12-30'), noInvalidDate: true }).map((d) => d.toISOString()),
  fc.date({ min: new Date('2000-01-02'), max: new Date('2199-12-30'), noInvalidDate: true }).map((d) => `${d.getUTCDate()}/${d.getUTCMonth() + 1}/${d.getUTCFullYear()} ${d.getUTCHours()}:${String(d.getUTCMinutes()).padStart(2, '0')}`),
  fc.integer({ min: 946_684_800, max: 7_258_118_399 }).map(String),
  fc.constantFrom('', 'CO2', 'Temp °C', 'RH%', 'Time', '"quoted, cell"', '"', 'NaN', '-', '12:30 PM', '13:61'),
  fc.string({ maxLength: 8 }),
);
const csvLike = fc
  .tuple(fc.constantFrom(',', ';', '\t', '|'), fc.array(fc.array(cell, { minLength: 1, maxLength: 6 }), { maxLength: 40 }), fc.constantFrom('\n', '\r\n', '\r'))
  .map(([d, rows, end]) => rows.map((r) => r.join(d)).join(end));

describe('the importer never crashes', () => {
  it('on random bytes', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 2000 }), fc.constantFrom('UTC', 'Europe/London', 'America/New_York'), (bytes, timeZone) => {
        wellFormed(analyseLoggerFile(bytes, { timeZone }));
      }),
      { numRuns: 300 },
    );
  });

  it('on random CSV-like text', () => {
    fc.assert(
      fc.property(csvLike, fc.constantFrom('UTC', 'Europe/London', 'Australia/Lord_Howe'), (text, timeZone) => {
        wellFormed(analyseLoggerFile(text, { timeZone, volume_m3: 50 }));
      }),
      { numRuns: 400 },
    );
  });

  it('on a valid file with random lines broken', () => {
    const lines = ['Time,CO2 (ppm)', ...Array.from({ length: 120 }, (_, i) => `2024-02-0${1 + Math.floor(i / 60)} 10:${String(i % 60).padStart(2, '0')}:00,${1200 - 4 * i}`)];
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.nat(lines.length - 1), fc.string({ maxLength: 12 })), { maxLength: 10 }), (breaks) => {
        const copy = [...lines];
        for (const [at, junk] of breaks) copy[at] = junk;
        wellFormed(analyseLoggerFile(copy.join('\n'), { timeZone: 'UTC' }));
      }),
      { numRuns: 200 },
    );
  });
});
