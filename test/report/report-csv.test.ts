/**
 * Tests of src/report/report-csv.ts: one row per room in the ranked order, the documented columns,
 * quoting by RFC 4180, and the same rounded numbers as the report.
 */
import { describe, expect, it } from 'vitest';
import { analyseSurvey } from '../../src/analysis/analyse-survey.ts';
import { surveyDocumentSchema } from '../../src/model/survey-document.ts';
import { CSV_COLUMNS, roomResultsCsv } from '../../src/report/report-csv.ts';
import { buildReport } from '../../src/report/report-model.ts';
import { demoFile } from '../support/fixtures.ts';

/** A small RFC 4180 reader for the test. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') (cell += '"'), i++;
      else if (ch === '"') quoted = false;
      else cell += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') row.push(cell), (cell = '');
    else if (ch === '\r' && text[i + 1] === '\n') row.push(cell), rows.push(row), (row = []), (cell = ''), i++;
    else cell += ch;
  }
  return rows;
}

describe('roomResultsCsv', () => {
  it('writes one row per room, in the ranked order, with the report’s numbers', () => {
    const doc = surveyDocumentSchema.parse(demoFile().surveys[0]);
    const results = analyseSurvey(doc, { draws: 100 });
    const model = buildReport(doc, results, { issueDate: '2026-01-22', appVersion: '0.1.0' });
    const rows = parseCsv(roomResultsCsv(model, results));
    expect(rows[0]).toEqual([...CSV_COLUMNS]);
    expect(rows.slice(1).map((r) => r[1])).toEqual(model.ranked.rows.map((r) => r.place));
    const col = (name: (typeof CSV_COLUMNS)[number]) => CSV_COLUMNS.indexOf(name);
    for (const row of rows.slice(1)) {
      expect(row).toHaveLength(CSV_COLUMNS.length);
      const sheet = model.rooms.find((s) => s.place === row[1])!;
      const supply = sheet.interpretation.headline[0]!;
      expect(row[col('supply_Ls')]).toBe(String(supply.value));
      expect(row[col('supply_low_Ls')]).toBe(String(supply.low));
      expect(row[col('basis')]).toBe(supply.basis);
    }
  });
});
