/**
 * `report <file.json> --out <file.pdf> [--csv <file.csv>] [--survey N] [--issue-date YYYY-MM-DD]
 * [--draws N]`: the same report the app makes (analyseSurvey, buildReport, renderReportPdf), and
 * optionally the per-room results CSV. A file of several surveys gives one report each, named
 * <out>-1.pdf, <out>-2.pdf… unless --survey picks one (counted from 1). --issue-date fixes the
 * issue and creation dates, so the same file gives the same bytes. Exit 0 done, 2 bad input
 * (messages as the app's import), 1 internal error.
 */
import { readFileSync } from 'node:fs';
import { analyseSurvey } from '../analysis/analyse-survey.ts';
import { renderReportPdf } from '../report/pdf/render-report-pdf.ts';
import { roomResultsCsv } from '../report/report-csv.ts';
import { buildReport } from '../report/report-model.ts';
import { EXIT, type CommandIo } from './command-io.ts';
import { parseArguments, wholeNumber } from './arguments.ts';
import { readSurveys } from './survey-input.ts';

export const REPORT_USAGE = 'usage: report <file.json> --out <file.pdf> [--csv <file.csv>] [--survey N] [--issue-date YYYY-MM-DD] [--draws N]';

const APP_VERSION = (JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string }).version;

/** The n-th output name when a file holds several surveys: out.pdf → out-2.pdf. */
function numbered(path: string, n: number, several: boolean): string {
  if (!several) return path;
  const dot = path.lastIndexOf('.');
  return dot > path.lastIndexOf('/') ? `${path.slice(0, dot)}-${n}${path.slice(dot)}` : `${path}-${n}`;
}

export async function runReportCommand(args: string[], io: CommandIo): Promise<number> {
  const parsed = parseArguments(args, { flags: [], options: ['out', 'csv', 'survey', 'issue-date', 'draws'] });
  if (!parsed.ok) {
    io.err(parsed.message);
    io.err(REPORT_USAGE);
    return EXIT.badInput;
  }
  const { positional, options } = parsed;
  const out = options.get('out');
  const csv = options.get('csv');
  const issue = options.get('issue-date');
  const whole = (name: string) => {
    const text = options.get(name);
    return text === undefined ? null : wholeNumber(name, text);
  };
  const pickArg = whole('survey');
  const drawsArg = whole('draws');
  const problems = [
    positional.length !== 1 ? 'Give exactly one survey file.' : '',
    out === undefined ? '--out <file.pdf> is needed.' : '',
    pickArg && !pickArg.ok ? pickArg.message : '',
    drawsArg && !drawsArg.ok ? drawsArg.message : '',
    issue !== undefined && (!/^\d{4}-\d{2}-\d{2}$/.test(issue) || Number.isNaN(Date.parse(issue))) ? '--issue-date must be a date such as 2026-01-22.' : '',
  ].filter(Boolean);
  if (problems.length) {
    for (const p of problems) io.err(p);
    io.err(REPORT_USAGE);
    return EXIT.badInput;
  }
  const pick = pickArg?.ok ? pickArg.value : null;
  const draws = drawsArg?.ok ? drawsArg.value : null;
  const file = positional[0]!;
  const docs = await readSurveys(file, io);
  if (!docs) return EXIT.badInput;
  if (pick && pick > docs.length) {
    io.err(`${file}: holds ${docs.length} survey${docs.length === 1 ? '' : 's'}; --survey ${pick} is not one of them`);
    return EXIT.badInput;
  }
  const chosen = pick ? [{ doc: docs[pick - 1]!, n: pick }] : docs.map((doc, i) => ({ doc, n: i + 1 }));
  const several = chosen.length > 1;
  const created = issue !== undefined ? new Date(`${issue}T12:00:00Z`) : new Date();
  try {
    for (const { doc, n } of chosen) {
      const results = analyseSurvey(doc, draws ? { draws } : {});
      const model = buildReport(doc, results, { issueDate: created.toISOString().slice(0, 10), appVersion: APP_VERSION });
      const pdf = await renderReportPdf(model, { creationDate: created });
      const pdfPath = numbered(out!, n, several);
      await io.writeFile(pdfPath, pdf);
      io.out(`${pdfPath}: report of "${doc.survey.title}", ${model.rooms.length} rooms, ${pdf.length} bytes\n`);
      if (csv !== undefined) {
        const csvPath = numbered(csv, n, several);
        await io.writeFile(csvPath, roomResultsCsv(model, results));
        io.out(`${csvPath}: per-room results\n`);
      }
    }
    return EXIT.ok;
  } catch (error) {
    io.err(`Internal error while making the report: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
    return EXIT.internal;
  }
}
