/**
 * Layout and column detection on small files of our own invented shapes (no real logger's
 * export format). The expected answers are our own construction.
 */
import { describe, it, expect } from 'vitest';
import { detectDelimiter } from '../../src/ingest/delimiter-detection.ts';
import { detectDecimalSeparator } from '../../src/ingest/decimal-separator-detection.ts';
import { parseDecimalNumber } from '../../src/ingest/decimal-number.ts';
import { detectTableLayout } from '../../src/ingest/header-detection.ts';
import { detectColumns } from '../../src/ingest/column-detection.ts';
import { decodeFileBytes } from '../../src/ingest/decode-file-bytes.ts';
import { cellKind } from '../../src/ingest/cell-kind.ts';
import { rollingMedian } from '../../src/ingest/rolling-median.ts';

describe('delimiter and decimal mark', () => {
  it('prefers the semicolon that splits decimal-comma rows into typed fields', () => {
    const lines = ['Time;CO2;Temp', '27/10/2024 00:00;812;21,5', '27/10/2024 00:01;815;21,4', '27/10/2024 00:02;818;21,4'];
    expect(detectDelimiter(lines)).toMatchObject({ delimiter: ';', fields: 3 });
    expect(detectDecimalSeparator(lines.slice(1).map((l) => l.split(';'))).decimal).toBe(',');
  });

  it('finds tab, bar and comma, and obeys a sep= line', () => {
    expect(detectDelimiter(['a\tb', '2024-01-01 00:00\t800', '2024-01-01 00:01\t801'])?.delimiter).toBe('\t');
    expect(detectDelimiter(['a|b', '2024-01-01 00:00|800', '2024-01-01 00:01|801'])?.delimiter).toBe('|');
    expect(detectDelimiter(['a,b', '2024-01-01 00:00,800.5', '2024-01-01 00:01,801.5'])?.delimiter).toBe(',');
    expect(detectDelimiter(['sep=;', 'a;b', '1;2'])).toMatchObject({ delimiter: ';', declared: true });
    expect(detectDelimiter(['just words', 'no columns here'])).toBeNull();
  });

  it('reads numbers with either mark and never turns empty text into 0', () => {
    expect(parseDecimalNumber('21,5', ',')).toBe(21.5);
    expect(parseDecimalNumber('1.234,5', ',')).toBe(1234.5);
    expect(parseDecimalNumber('1,234.5', '.')).toBe(1234.5);
    expect(parseDecimalNumber('-12.5', '.')).toBe(-12.5);
    expect(parseDecimalNumber(' 812 ', '.')).toBe(812);
    expect(parseDecimalNumber('', '.')).toBeNaN();
    expect(parseDecimalNumber('0x10', '.')).toBeNaN();
    expect(parseDecimalNumber('21,5', '.')).toBeNaN();
  });

  it('classifies cells', () => {
    expect(cellKind('27/10/2024 01:30')).toBe('date-time');
    expect(cellKind('21,5')).toBe('number');
    expect(cellKind('CO2 (ppm)')).toBe('text');
    expect(cellKind('  ')).toBe('empty');
  });
});

describe('preamble, header and units line', () => {
  it('finds the header after a preamble and a units line under it', () => {
    const rows = [['Invented export'], ['Site', 'Room 4'], [''], ['Time', 'CO2', 'Temp'], ['', 'ppm', '°C'], ['27/10/2024 00:00', '812', '19.5'], ['27/10/2024 00:01', '815', '19.5'], ['27/10/2024 00:02', '815', '19.6']];
    const layout = detectTableLayout(rows, 3)!;
    expect(layout).toMatchObject({ preambleLines: 3, headerRow: 3, unitsRow: 4, dataStart: 5 });
    expect(layout.names).toEqual(['Time', 'CO2', 'Temp']);
    expect(layout.units).toEqual(['', 'ppm', '°C']);
  });

  it('takes units from brackets in names and names unnamed columns', () => {
    const withUnits = detectTableLayout([['Time', 'CO2 (ppm)', 'Temp [°F]'], ['2024-01-01 00:00', '800', '68'], ['2024-01-01 00:01', '801', '68'], ['2024-01-01 00:02', '801', '68']], 3)!;
    expect(withUnits.units).toEqual(['', 'ppm', '°F']);
    const bare = detectTableLayout([['2024-01-01 00:00', '800'], ['2024-01-01 00:01', '801'], ['2024-01-01 00:02', '802']], 2)!;
    expect(bare.headerRow).toBeNull();
    expect(bare.names).toEqual(['Column 1', 'Column 2']);
  });
});

describe('columns', () => {
  const rows = [
    ['27/10/2024', '1:05 PM', '812', '68.5', '45'],
    ['27/10/2024', '1:06 PM', '815', '68.6', '46'],
  ];

  it('guesses date and time columns, CO2, °F temperature and humidity, with confidence and preview', () => {
    const d = detectColumns(['Date', 'Time', 'CO2 (ppm)', 'Temp [°F]', 'RH (%)'], ['', '', 'ppm', '°F', '%'], rows, '.');
    expect(d.choice).toMatchObject({ time: { kind: 'date-and-time', date: 0, time: 1 }, co2: 2, temperature: 3, relativeHumidity: 4, temperatureUnit: 'F' });
    expect(d.columns[2]).toMatchObject({ role: 'co2', preview: ['812', '815'] });
    expect(d.columns[2]!.confidence).toBeGreaterThan(0.8);
  });

  it('guesses from values alone with lower confidence, and takes the caller’s changes', () => {
    const d = detectColumns(['Column 1', 'Column 2', 'Column 3', 'Column 4', 'Column 5'], ['', '', '', '', ''], rows, '.');
    expect(d.choice?.co2).toBe(2);
    expect(d.columns[2]!.confidence).toBeLessThan(0.8);
    const changed = detectColumns(['Date', 'Time', 'CO2', 'Temp', 'RH'], ['', '', '', '', ''], rows, '.', { co2: null, temperatureUnit: 'C' });
    expect(changed.choice).toMatchObject({ co2: null, temperatureUnit: 'C' });
  });

  it('reads humidity written as fractions and says so', () => {
    const d = detectColumns(['Time', 'CO2', 'RH'], ['', '', ''], [['2024-01-01 00:00', '800', '0.45'], ['2024-01-01 00:01', '801', '0.46']], '.');
    expect(d.choice?.humidityAsFraction).toBe(true);
    expect(d.assumptions.join(' ')).toMatch(/fractions/);
  });
});

describe('bytes to text', () => {
  it('reads UTF-8, UTF-16 with a mark, and single-byte text with a degree sign', () => {
    expect(decodeFileBytes(new TextEncoder().encode('Temp °C'))).toMatchObject({ ok: true, text: 'Temp °C', encoding: 'utf-8' });
    expect(decodeFileBytes(Uint8Array.of(0x32, 0x31, 0xb0, 0x43))).toMatchObject({ ok: true, text: '21°C', encoding: 'windows-1252' });
    expect(decodeFileBytes(Uint8Array.of(0xff, 0xfe, 0x41, 0, 0x3b, 0, 0x42, 0))).toMatchObject({ ok: true, text: 'A;B' });
    expect(decodeFileBytes(Uint8Array.of(0x89, 0x50, 0x4e, 0x47, 0, 0, 1, 7, 0, 9))).toMatchObject({ ok: false, error: { code: 'not-text' } });
  });
});

describe('running median', () => {
  it('ignores a short excursion and follows the level', () => {
    expect(Array.from(rollingMedian(Float64Array.of(800, 805, 560, 810, 815), 2))).toEqual([800, 802.5, 805, 807.5, 810]);
  });
});
