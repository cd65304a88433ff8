/**
 * Tests of src/report/pdf/render-report-pdf.ts, reading the PDF back with pdfjs-dist: every room
 * has its sheet, the ranked table is in the model's order, the criteria's sources and statuses,
 * the cautions and the sign-off are printed, pages are numbered "page X of Y", units print as
 * they should, and a fixed creation date gives the same bytes twice.
 */
import { describe, expect, it } from 'vitest';
import { analyseSurvey } from '../../src/analysis/analyse-survey.ts';
import { surveyDocumentSchema, type SurveyDocument } from '../../src/model/survey-document.ts';
import { renderReportPdf } from '../../src/report/pdf/render-report-pdf.ts';
import { pdfText } from '../../src/report/pdf/pdf-text.ts';
import { buildReport, type ReportModel } from '../../src/report/report-model.ts';
import { demoFile } from '../support/fixtures.ts';
import { pdfPages } from '../support/pdf-text.ts';

const CREATED = new Date('2026-01-22T12:00:00Z');
const docs = (): SurveyDocument[] => demoFile().surveys.map((s) => surveyDocumentSchema.parse(s));

async function report(doc: SurveyDocument): Promise<{ model: ReportModel; bytes: Uint8Array; pages: string[] }> {
  const model = buildReport(doc, analyseSurvey(doc, { draws: 100 }), { issueDate: '2026-01-22', appVersion: '0.1.0' });
  const bytes = await renderReportPdf(model, { creationDate: CREATED });
  return { model, bytes, pages: await pdfPages(bytes) };
}

/** Text without line breaks and with runs of spaces closed, for phrase searches. */
const flat = (s: string) => s.replace(/\s+/g, ' ');

describe('the PDF report of the demo flats', async () => {
  const { model, bytes, pages } = await report(docs()[1]!);
  const all = flat(pages.join('\n'));

  it('has a front page naming the client, site, reference, visit and surveyor', () => {
    const front = flat(pages[0]!);
    for (const text of [model.front.client, model.front.site, model.meta.reference, 'Ventilation findings report', '21 January 2026, 09:30 to 13:15 UTC', 'Demo Surveyor (invented)']) expect(front).toContain(text);
  });

  it('numbers every page "page X of Y" and repeats the header', () => {
    pages.forEach((p, i) => expect(flat(p)).toContain(`page ${i + 1} of ${pages.length}`));
    for (const p of pages.slice(1)) expect(flat(p)).toContain(model.meta.reference);
    expect(pages.length).toBeGreaterThanOrEqual(4 + model.rooms.length);
  });

  it('gives every room a sheet of at most two pages, each step named', () => {
    const starts = model.rooms.map((r) => pages.findIndex((p) => flat(p).includes(`Room: ${pdfText(r.place)}`)));
    expect(starts.every((s) => s > 0)).toBe(true);
    const ends = [...starts.slice(1), pages.findIndex((p) => /Dwelling: |Instruments/.test(p))];
    starts.forEach((s, i) => expect(ends[i]! - s).toBeLessThanOrEqual(2));
    for (const step of ['1 Observation', '2 Measurement', '3 Interpretation', '4 Recommendation', 'Moisture and mould']) {
      expect(all.split(step).length - 1).toBe(model.rooms.length);
    }
  });

  it('prints the ranked table in the model’s order', () => {
    const page = flat(pages.find((p) => p.includes('Rooms to fix, in order'))!);
    const at = model.ranked.rows.map((r) => page.indexOf(pdfText(r.place)));
    expect(at.every((x) => x >= 0)).toBe(true);
    expect(at).toEqual([...at].sort((a, b) => a - b));
  });

  it('prints criteria sources and statuses, the limitations, cautions and sign-off', () => {
    expect(all).toContain('Housing Act 2004');
    expect(all).toMatch(/law \(duty\)/);
    expect(all).toContain('not yet confirmed against');
    for (const caution of [...model.limitations, ...model.cautions]) expect(all).toContain(flat(pdfText(caution)).slice(0, 60));
    for (const text of ['Sign-off', 'Prepared by', 'Checked by', 'no financial interest']) expect(all).toContain(text);
  });

  it('prints units as they should and writes CO2 plainly', () => {
    expect(all).toMatch(/\d m²/);
    expect(all).toMatch(/\d m³/);
    expect(all).toMatch(/\d °C/);
    expect(all).toContain('±');
    expect(all).toContain('CO2');
    expect(all).not.toMatch(/[₂⁻]/);
  });

  it('gives the same bytes for the same model and creation date', async () => {
    const again = await renderReportPdf(model, { creationDate: CREATED });
    expect(Buffer.from(again).equals(Buffer.from(bytes))).toBe(true);
  });
});

describe('the PDF report of the demo school', () => {
  it('draws the logger record in the appendix and the day chart on the measured room', async () => {
    const { pages } = await report(docs()[0]!);
    const all = flat(pages.join('\n'));
    expect(all).toContain('Appendix: logger records');
    expect(all).toContain('The day in this room: CO2 predicted and read on 14 January 2026');
    expect(all).toMatch(/CO2 over the day as predicted from the room’s recorded periods \(.+\), a screening estimate: solid line at the low end of the supply \(highest [\d,]+ ppm\)/);
    // Recorded values print as typed, without binary noise from arithmetic.
    expect(all).not.toMatch(/\d\.\d{6,}/);
    expect(all).toMatch(/shaded: the periods accepted for analysis \(build-up/);
  });

  it('stops with an AbortError when cancelled between room sheets, and reports progress', async () => {
    const doc = docs()[0]!;
    const model = buildReport(doc, analyseSurvey(doc, { draws: 50 }), { issueDate: '2026-01-22', appVersion: '0.1.0' });
    const controller = new AbortController();
    const seen: number[] = [];
    const run = renderReportPdf(model, { creationDate: CREATED, signal: controller.signal, onProgress: (done) => { seen.push(done); if (done === 2) controller.abort(); } });
    await expect(run).rejects.toMatchObject({ name: 'AbortError' });
    expect(seen).toEqual([1, 2]);
  });
});

describe('pdfText', () => {
  it('keeps the code page and replaces what the built-in fonts cannot print', () => {
    expect(pdfText('CO₂ ≤ 1500 ppm, 0.5 h⁻¹, 3 m² ± 2 °C – ok…')).toBe('CO2 <= 1500 ppm, 0.5 /h, 3 m² ± 2 °C – ok…');
    expect(pdfText('λ → x ✓')).toBe('lambda -> x ?');
  });
});
