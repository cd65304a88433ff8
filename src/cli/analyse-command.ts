/**
 * `analyse <file.json>... [--json] [--draws N]`: analyse every survey in the files with
 * analyseSurvey (the app's numbers) and print each room's headline figures: a readable table, or
 * with --json one JSON document of per-room results in SI units (m³/s, s⁻¹, ppm) as results.ts
 * defines them. Exit 0 done, 2 bad input (messages as the app's import), 1 internal error.
 *
 * Example: analyse test/fixtures/demo-survey.json prints three tables, one per demo survey.
 */
import { analyseSurvey } from '../analysis/analyse-survey.ts';
import type { AnalysisResults } from '../analysis/results.ts';
import { roomUseLabel, type RoomUse } from '../core/room-uses.ts';
import { reportFigure } from '../report/report-figure.ts';
import type { SurveyDocument } from '../model/survey-document.ts';
import { EXIT, type CommandIo } from './command-io.ts';
import { parseArguments, wholeNumber } from './arguments.ts';
import { readSurveys } from './survey-input.ts';

export const ANALYSE_USAGE = 'usage: analyse <file.json>... [--json] [--draws N]';

function short(f: { value: number | null; low: number | null; high: number | null }): string {
  if (f.value === null) return f.low !== null || f.high !== null ? `${f.low ?? '?'}–${f.high ?? '?'}` : '—';
  return f.low !== null && f.high !== null && f.low !== f.high ? `${f.value} (${f.low}–${f.high})` : String(f.value);
}

/** A plain-text table with columns padded to their widest cell. */
export function textTable(head: string[], rows: string[][]): string {
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) => cells.map((c, i) => c.padEnd(widths[i]!)).join('  ').trimEnd();
  return [line(head), line(widths.map((w) => '-'.repeat(w))), ...rows.map(line)].join('\n');
}

function roomTable(doc: SurveyDocument, results: AnalysisResults): string {
  const rows = results.rooms.map((r) => {
    const h = r.headline;
    return [
      r.clientRef ? `${r.name} (${r.clientRef})` : r.name,
      roomUseLabel(r.use as RoomUse),
      short(reportFigure('', h.supply_m3s, 'flow')),
      short(reportFigure('', h.airChangeRate_perSecond, 'airChanges')),
      h.supplyPerPerson_m3s ? short(reportFigure('', h.supplyPerPerson_m3s, 'flowPerPerson')) : '—',
      h.steadyLevel_ppm ? short(reportFigure('', h.steadyLevel_ppm, 'co2')) : '—',
      h.supply_m3s.basis,
    ];
  });
  return `${doc.survey.title}\n${textTable(['Room', 'Use', 'Outdoor air L/s', 'ACH', 'L/s per person', 'Steady CO2 ppm', 'Basis'], rows)}`;
}

export async function runAnalyseCommand(args: string[], io: CommandIo): Promise<number> {
  const parsed = parseArguments(args, { flags: ['json'], options: ['draws'] });
  const drawsText = parsed.ok ? parsed.options.get('draws') : undefined;
  const draws = drawsText === undefined ? null : wholeNumber('draws', drawsText);
  const problem = !parsed.ok ? parsed.message : parsed.positional.length === 0 ? 'Give at least one survey file.' : draws && !draws.ok ? draws.message : null;
  if (problem || !parsed.ok) {
    io.err(problem ?? '');
    io.err(ANALYSE_USAGE);
    return EXIT.badInput;
  }
  const { positional } = parsed;
  const files: { file: string; docs: SurveyDocument[] }[] = [];
  for (const file of positional) {
    const docs = await readSurveys(file, io);
    if (!docs) return EXIT.badInput;
    files.push({ file, docs });
  }
  try {
    const analysed = files.map(({ file, docs }) => ({ file, surveys: docs.map((doc) => ({ doc, results: analyseSurvey(doc, draws?.ok ? { draws: draws.value } : {}) })) }));
    if (parsed.flags.has('json')) {
      const json = analysed.map(({ file, surveys }) => ({
        file,
        surveys: surveys.map(({ doc, results }) => ({
          surveyId: results.surveyId,
          title: doc.survey.title,
          stamps: results.stamps,
          rooms: results.rooms.map((r) => ({ roomId: r.roomId, name: r.name, clientRef: r.clientRef, areaId: r.areaId, use: r.use, volume_m3: r.volume_m3, headline: r.headline, suggestion: r.suggestion, warnings: r.warnings })),
        })),
      }));
      io.out(`${JSON.stringify(json, null, 2)}\n`);
    } else {
      for (const { file, surveys } of analysed) for (const { doc, results } of surveys) io.out(`${file}: ${roomTable(doc, results)}\n\n`);
    }
    return EXIT.ok;
  } catch (error) {
    io.err(`Internal error while analysing: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
    return EXIT.internal;
  }
}
