/**
 * `npx tsx test/support/render-report-pages.ts [outDir]`: writes the demo surveys' reports as PDF
 * and renders every page to a greyscale PNG at 60 dpi with poppler's pdftoppm, to look at them.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { analyseSurvey } from '../../src/analysis/analyse-survey.ts';
import { surveyDocumentSchema } from '../../src/model/survey-document.ts';
import { renderReportPdf } from '../../src/report/pdf/render-report-pdf.ts';
import { buildReport } from '../../src/report/report-model.ts';
import { demoFile } from './fixtures.ts';

const out = process.argv[2] ?? 'report-pages';
mkdirSync(out, { recursive: true });
for (const [i, raw] of demoFile().surveys.entries()) {
  const doc = surveyDocumentSchema.parse(raw);
  const model = buildReport(doc, analyseSurvey(doc), { issueDate: '2026-01-22', appVersion: '0.1.0' });
  const pdf = join(out, model.meta.fileName);
  writeFileSync(pdf, await renderReportPdf(model, { creationDate: new Date('2026-01-22T12:00:00Z') }));
  execFileSync('pdftoppm', ['-png', '-r', '60', '-gray', pdf, join(out, `demo-${i + 1}`)]);
  console.log(`${pdf}: pages rendered as ${join(out, `demo-${i + 1}-*.png`)}`);
}
