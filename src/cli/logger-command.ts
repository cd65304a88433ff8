/**
 * `logger <file> [--json] [--outdoor <ppm>] [--volume <m3>] [--tz <zone>] [--date-order day-first|month-first]`:
 * reads a logger file with the importer (src/ingest), prints the detected layout, columns, time
 * format, what was left out, and each period with its fit and suggestion; `--json` prints the
 * same as JSON (without the readings themselves). Exit 0 when read; 2 for bad arguments or a
 * file it cannot read (missing, not text, no table, or a date order it must be told).
 *
 * Example: `npm run cli -- logger room4.csv --volume 150 --outdoor 430 --tz Europe/London`.
 */
import { analyseLoggerFile, type LoggerAnalysis, type LoggerAnalysisOptions } from '../ingest/analyse-logger-file.ts';
import type { FittedPeriod } from '../ingest/fit-periods.ts';
import type { ImportReport } from '../ingest/parse-logger-file.ts';
import { litresPerSecond, perHour } from '../core/units.ts';
import { parseArguments, positiveNumber } from './arguments.ts';
import { EXIT, type CommandIo } from './command-io.ts';

export const LOGGER_USAGE =
  'usage: logger <file> [--json] [--outdoor <ppm>] [--volume <m3>] [--tz <zone>] [--date-order day-first|month-first]';

export async function runLoggerCommand(argv: readonly string[], io: CommandIo): Promise<number> {
  const args = parseArguments(argv, { flags: ['json'], options: ['outdoor', 'volume', 'tz', 'date-order'] });
  if (!args.ok) return usageError(io, args.message);
  if (args.positional.length !== 1) return usageError(io, 'Give exactly one logger file.');
  const path = args.positional[0]!;
  const options: LoggerAnalysisOptions = { timeZone: args.options.get('tz') ?? 'UTC' };
  for (const [name, key] of [['outdoor', 'outdoor_ppm'], ['volume', 'volume_m3']] as const) {
    const text = args.options.get(name);
    if (text === undefined) continue;
    const n = positiveNumber(name, text);
    if (!n.ok) return usageError(io, n.message);
    options[key] = n.value;
  }
  const order = args.options.get('date-order');
  if (order !== undefined) {
    if (order !== 'day-first' && order !== 'month-first') return usageError(io, '--date-order must be day-first or month-first.');
    options.dateOrder = order;
  }
  let bytes: Uint8Array;
  try {
    bytes = await io.readBytes(path);
  } catch (e) {
    const code = (e as { code?: string }).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' ? 'permission denied' : (e as Error).message;
    io.err(`Cannot read ${path}: ${why}.`);
    return EXIT.badInput;
  }
  const analysis = analyseLoggerFile(bytes, options);
  if (analysis.status === 'failed') {
    const where = analysis.error.line ? ` (line ${analysis.error.line})` : analysis.error.column ? ` (column "${analysis.error.column}")` : '';
    io.err(`Cannot read ${path}${where}: ${analysis.error.message}`);
    return EXIT.badInput;
  }
  if (analysis.status === 'ask') {
    const lines = analysis.question.examples.map((e) => `  line ${e.line}: "${e.written}" is ${e.dayFirst} day-first or ${e.monthFirst} month-first`);
    io.err(`Cannot read ${path} without knowing the date order. ${analysis.question.message}\n${lines.join('\n')}\nRun again with --date-order day-first or --date-order month-first.`);
    return EXIT.badInput;
  }
  io.out(args.flags.has('json') ? `${JSON.stringify(jsonView(path, analysis), null, 2)}\n` : textView(path, analysis));
  return EXIT.ok;
}

function usageError(io: CommandIo, message: string): number {
  io.err(message);
  io.err(LOGGER_USAGE);
  return EXIT.badInput;
}

type Analysed = Extract<LoggerAnalysis, { status: 'analysed' }>;

function jsonView(path: string, a: Analysed) {
  const s = a.series;
  return {
    file: path,
    report: a.report,
    readings: {
      count: s.times_s.length,
      from: s.times_s.length ? new Date(s.times_s[0]! * 1000).toISOString() : null,
      to: s.times_s.length ? new Date(s.times_s[s.times_s.length - 1]! * 1000).toISOString() : null,
      co2: s.co2_ppm !== null,
      temperature: s.temp_C !== null,
      relativeHumidity: s.rh_pct !== null,
    },
    record: a.record,
    periods: a.periods.map((p) => ({ ...p, start: new Date(p.start_s * 1000).toISOString(), end: new Date(p.end_s * 1000).toISOString() })),
  };
}

function localTime(zone: string): (t: number) => string {
  const f = new Intl.DateTimeFormat('en-GB', { timeZone: zone, hourCycle: 'h23', year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit' });
  return (t) => {
    const p = Object.fromEntries(f.formatToParts(t * 1000).map((x) => [x.type, x.value]));
    return `${p.year}-${p.month}-${p.day} ${p.hour}:${p.minute}`;
  };
}

function layoutLines(r: ImportReport): string[] {
  const delimiter = r.delimiter === '\t' ? 'tab' : `"${r.delimiter}"`;
  const parts = [`delimiter ${delimiter}`, `decimal mark "${r.decimalSeparator}"`];
  if (r.preambleLines) parts.push(`${r.preambleLines} line(s) before the table`);
  if (r.headerLine) parts.push(`header on line ${r.headerLine}`);
  if (r.unitsLine) parts.push(`units on line ${r.unitsLine}`);
  parts.push(`data from line ${r.firstDataLine}`);
  const columns = r.columns.map(
    (c) => `  ${String(c.index + 1).padStart(2)} ${c.name.padEnd(22)} ${c.role.padEnd(17)} ${c.confidence.toFixed(2)}  ${c.reason || '-'}  [${c.preview.slice(0, 3).join(' | ')}]`,
  );
  return [`Layout: ${parts.join(', ')}`, 'Columns (number, name, guess, confidence, why, first cells):', ...columns];
}

function figure(value: number | null, low: number | null, high: number | null, scale: (x: number) => number, digits: number, unit: string): string {
  if (value === null) return '';
  const range = low !== null && high !== null ? ` (${scale(low).toFixed(digits)}–${scale(high).toFixed(digits)})` : '';
  return `${scale(value).toFixed(digits)}${range} ${unit}`;
}

function periodLine(p: FittedPeriod, k: number, show: (t: number) => string): string {
  const what = p.kind === 'excluded' ? `excluded (${p.exclusion})` : p.kind;
  const fit = p.fit
    ? [
        figure(p.fit.airChangeRate_perSecond.value, p.fit.airChangeRate_perSecond.low, p.fit.airChangeRate_perSecond.high, perHour, 2, 'ACH'),
        figure(p.fit.supply_m3s.value, p.fit.supply_m3s.low, p.fit.supply_m3s.high, litresPerSecond, 1, 'L/s'),
      ]
        .filter(Boolean)
        .join(', ')
    : '';
  const verdict = p.kind === 'excluded' ? '' : `${p.suggestion.accept ? 'accept' : 'reject'}: ${p.suggestion.reason}`;
  return `  ${String(k + 1).padStart(3)} ${what.padEnd(20)} ${show(p.start_s)} → ${show(p.end_s).slice(11)}  ${fit}${fit ? '  ' : ''}${verdict || p.note}`;
}

function textView(path: string, a: Analysed): string {
  const r = a.report;
  const show = localTime(r.timeZone);
  const s = a.series;
  const out = [`File: ${path}`, ...layoutLines(r)];
  out.push(`Times: ${r.timeFormat?.description ?? '?'}; time zone ${r.timeZone}`);
  out.push(
    `Readings: ${r.kept} kept of ${r.rowsRead} data rows${s.times_s.length ? `, ${show(s.times_s[0]!)} to ${show(s.times_s[s.times_s.length - 1]!)}` : ''}`,
  );
  for (const d of r.malformed.slice(0, 10)) out.push(`  left out line ${d.line}: ${d.problem}`);
  if (r.malformedCount > 10) out.push(`  … and ${r.malformedCount - 10} more`);
  if (r.warnings.length) out.push('Notes:', ...r.warnings.map((w) => `  - ${w.message}`));
  if (a.record) out.push(`Record: noise ${a.record.noise_ppm.toFixed(1)} ppm, baseline ${Math.round(a.record.baseline_ppm)} ppm, a reading every ${Math.round(a.record.step_s)} s`);
  if (!s.co2_ppm) out.push('No CO2 column: no periods to fit.');
  else out.push(`Periods (${a.periods.length}; times in ${r.timeZone}):`, ...a.periods.map((p, k) => periodLine(p, k, show)));
  return `${out.join('\n')}\n`;
}
