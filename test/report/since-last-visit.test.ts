/**
 * The report's "Since the last visit" section, from a repeat visit of the demo school in which
 * Classroom B3 was given eight background vents: the section lists that room with its supply
 * "higher / better", prints the comparison's own figures (never recomputed), and the PDF carries
 * the section after the summary. A survey without a previous one has no such section.
 */
import { describe, expect, it } from 'vitest';
import { analyseSurvey } from '../../src/analysis/analyse-survey.ts';
import { compareVisits } from '../../src/analysis/compare-visits.ts';
import { repeatVisit } from '../../src/model/repeat-visit.ts';
import { renderReportPdf } from '../../src/report/pdf/render-report-pdf.ts';
import { buildReport } from '../../src/report/report-model.ts';
import { reportFigure } from '../../src/report/report-figure.ts';
import { demoFile } from '../support/fixtures.ts';
import { pdfPages } from '../support/pdf-text.ts';

function ids(): () => string {
  let n = 0;
  return () => `f0000000-0000-4000-8000-${(++n).toString(16).padStart(12, '0')}`;
}

describe('since the last visit, in the report', async () => {
  const newId = ids();
  const v1 = demoFile().surveys[0]!;
  const v2 = repeatVisit(v1, newId, '2026-04-20T08:00:00Z');
  const v3 = repeatVisit(v2, newId, '2026-09-21T08:00:00Z');
  v3.rooms[2]!.openings.push({ type: 'vent', id: newId(), count: 8, facing: 'NE', condition: '', kind: 'background-vent', purpose: 'room', labelArea_m2: 0.005, labelAreaIs: 'equivalent', operability: 'opens' });
  const [r2, r3] = [analyseSurvey(v2, { draws: 200 }), analyseSurvey(v3, { draws: 200 })];
  const comparison = compareVisits({ document: v2, results: r2 }, { document: v3, results: r3 });
  const model = buildReport(v3, r3, { issueDate: '2026-09-21', appVersion: '0.1.0', previousVisit: comparison });
  const section = model.sinceLastVisit!;

  it('lists the edited room with its supply higher / better and its overall outcome', () => {
    expect(section.rooms.map((r) => r.room.split(' (')[0])).toEqual(v3.rooms.map((r) => r.name));
    const b3 = section.rooms[2]!;
    expect(b3.supply).toMatch(/: higher \/ better$/);
    expect(b3.overall).toBe('better');
    for (const other of [section.rooms[0]!, section.rooms[1]!]) expect(other.supply).toMatch(/no clear change$/);
    expect(section.counts).toContainEqual(['better', 1]);
    expect(section.basis).toContain(v2.survey.title);
  });

  it('prints the comparison’s own figures, converted and rounded, then → now', () => {
    const change = comparison.rooms[2]!.supply_m3s;
    const text = (f: NonNullable<typeof change.before>) => reportFigure('', { value: f.value, low: f.low, high: f.high, basis: f.basis! }, 'flow').text;
    expect(section.rooms[2]!.supply).toBe(`${text(change.before!)} → ${text(change.after!)}: higher / better`);
  });

  it('draws the section in the PDF after the summary', async () => {
    const pages = (await pdfPages(await renderReportPdf(model, { creationDate: new Date('2026-09-21T12:00:00Z') }))).map((p) => p.replace(/\s+/g, ' '));
    const since = pages.findIndex((p) => p.includes('Since the last visit'));
    const summary = pages.findIndex((p) => p.includes('Summary'));
    expect(since).toBeGreaterThan(summary);
    expect(pages[since]).toContain('higher / better');
  });

  it('has no such section without a previous visit', () => {
    expect(buildReport(v1, analyseSurvey(v1, { draws: 100 }), { issueDate: '2026-01-22', appVersion: '0.1.0' }).sinceLastVisit).toBeNull();
  });
});
