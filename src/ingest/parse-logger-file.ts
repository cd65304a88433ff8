/**
 * Read any CSV-like file a logger writes into a typed series in SI units (times in epoch
 * seconds UTC; CO2 in ppm, temperature in °C, relative humidity in %), with a report of
 * everything detected (delimiter, decimal mark, preamble, header and units lines, columns with
 * confidence and preview, time format, time zone, clock changes) and everything dropped
 * (malformed rows by line, duplicate and out-of-order rows). Pure: the same code runs in the
 * browser's module worker and in Node for the command line.
 *
 * Results, never exceptions: 'parsed' with the series; 'ask' when the date order cannot be told
 * from the file (the caller asks and passes `dateOrder`); 'failed' with a message naming the
 * line or column and the problem.
 *
 * Line numbers count every line of the file from 1 (a quoted cell holding a line break would
 * shift later numbers; loggers do not write those).
 *
 * Example: parseLoggerFile('Time;CO2 (ppm)\n27/10/2024 00:00;812\n27/10/2024 00:01;815\n',
 * { timeZone: 'Europe/London' }) → status 'parsed', times [1729983600, 1729983660] (23:00Z and
 * 23:01Z on the 26th, British Summer Time), co2_ppm [812, 815], delimiter ';'.
 */
import Papa from 'papaparse';
import { fromFahrenheit } from '../core/units.ts';
import { detectColumns, type ColumnChoice, type ColumnOverrides, type DetectedColumn } from './column-detection.ts';
import { dateTimeColumns, HAS_TIME, readDateTimeInto, readTimeOfDayText, TWELVE_HOUR, type DateTimeColumns } from './date-time-text.ts';
import { parseDecimalNumber, type DecimalSeparator } from './decimal-number.ts';
import { detectDecimalSeparator } from './decimal-separator-detection.ts';
import { detectDelimiter, type Delimiter } from './delimiter-detection.ts';
import { detectTableLayout } from './header-detection.ts';
import { ingestWarning, type IngestWarning } from './ingest-warnings.ts';
import { orderSeries, type OrderingReport } from './series-ordering.ts';
import {
  dateOrderLabel,
  dayOfDate,
  numericTimeKind,
  numericTimeSeconds,
  resolveDateOrder,
  type DateOrder,
  type NumericTimeKind,
} from './time-format-detection.ts';
import { zoneClock, type ZoneClock } from './zone-clock.ts';

export interface LoggerFileOptions {
  /** IANA zone of the logger's clock (the survey's zone); default 'UTC'. */
  timeZone?: string;
  /** The date order, when the surveyor has answered the question. */
  dateOrder?: DateOrder;
  /** Changes to the guessed columns. */
  columns?: ColumnOverrides;
}

/** The readings, SI, in time order with unique times. Value columns absent from the file are null. */
export interface LoggerSeriesData {
  times_s: Float64Array;
  co2_ppm: Float64Array | null;
  temp_C: Float64Array | null;
  rh_pct: Float64Array | null;
  /** The file line each reading came from. */
  lines: Uint32Array;
}

/** How the times were read. */
export interface DetectedTimeFormat {
  kind: 'written' | NumericTimeKind;
  order: DateOrder | null;
  /** How the order was settled. */
  orderFrom: 'year-first' | 'values' | 'sequence' | 'given' | null;
  twelveHour: boolean;
  /** Times carried their own UTC offset (then the zone is not needed for them). */
  offsetInFile: boolean;
  separateDateAndTime: boolean;
  /** In words, for the report. */
  description: string;
}

/** A row left out, by line. */
export interface DroppedRow {
  line: number;
  problem: string;
}

/** Everything detected, as far as it got. */
export interface ImportReport {
  encoding?: string;
  delimiter: Delimiter | null;
  delimiterConfidence: number;
  decimalSeparator: DecimalSeparator | null;
  /** Lines before the header (or the data). */
  preambleLines: number;
  headerLine: number | null;
  unitsLine: number | null;
  /** Line of the first data row. */
  firstDataLine: number | null;
  columns: DetectedColumn[];
  choice: ColumnChoice | null;
  timeFormat: DetectedTimeFormat | null;
  timeZone: string;
  /** Data rows read (kept + dropped). */
  rowsRead: number;
  /** Readings kept. */
  kept: number;
  malformed: DroppedRow[];
  /** All malformed rows; `malformed` lists the first 200. */
  malformedCount: number;
  ordering: OrderingReport | null;
  /** Lines whose local time occurred twice or never (first 50 of each). */
  repeatedLocalTimes: number[];
  skippedLocalTimes: number[];
  warnings: IngestWarning[];
}

/** What to ask when the date order cannot be told: the first dates read both ways. */
export interface DateOrderQuestion {
  kind: 'date-order';
  message: string;
  examples: Array<{ line: number; written: string; dayFirst: string; monthFirst: string }>;
}

export type LoggerFileResult =
  | { status: 'parsed'; series: LoggerSeriesData; report: ImportReport }
  | { status: 'ask'; question: DateOrderQuestion; report: ImportReport }
  | { status: 'failed'; error: IngestWarning; report: ImportReport };

const SAMPLE_LINES = 200;
const LISTED_ROWS = 200;
const EARLIEST_S = 946_684_800; // 2000-01-01 UTC, the model's earliest logger time
const LATEST_S = 7_258_118_400; // 2200-01-01 UTC

function emptyReport(timeZone: string): ImportReport {
  return {
    delimiter: null,
    delimiterConfidence: 0,
    decimalSeparator: null,
    preambleLines: 0,
    headerLine: null,
    unitsLine: null,
    firstDataLine: null,
    columns: [],
    choice: null,
    timeFormat: null,
    timeZone,
    rowsRead: 0,
    kept: 0,
    malformed: [],
    malformedCount: 0,
    ordering: null,
    repeatedLocalTimes: [],
    skippedLocalTimes: [],
    warnings: [],
  };
}

function firstLines(text: string, count: number): string[] {
  const out: string[] = [];
  let start = 0;
  while (out.length < count && start < text.length) {
    let end = text.indexOf('\n', start);
    if (end < 0) end = text.length;
    out.push(text.slice(start, end).replace(/\r$/, ''));
    start = end + 1;
  }
  return out.flatMap((l) => l.split('\r'));
}

function isBlank(row: readonly string[]): boolean {
  return row.length === 1 && row[0]!.trim() === '';
}

/** Read a logger file's text. */
export function parseLoggerFile(text: string, options: LoggerFileOptions = {}): LoggerFileResult {
  const timeZone = options.timeZone ?? 'UTC';
  const report = emptyReport(timeZone);
  const fail = (error: IngestWarning): LoggerFileResult => ({ status: 'failed', error, report });
  if (text.trim() === '') return fail(ingestWarning('empty-file', 'The file is empty.'));
  const delimiterFound = detectDelimiter(firstLines(text, SAMPLE_LINES));
  if (!delimiterFound) {
    return fail(ingestWarning('no-data-rows', 'No line of the file splits into two or more columns by comma, semicolon, tab or bar.'));
  }
  report.delimiter = delimiterFound.delimiter;
  report.delimiterConfidence = delimiterFound.confidence;
  const rows = Papa.parse<string[]>(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text, { delimiter: delimiterFound.delimiter }).data;
  const layout = detectTableLayout(rows.slice(0, SAMPLE_LINES), delimiterFound.fields);
  if (!layout) {
    return fail(
      ingestWarning('no-data-rows', `No data rows were found in the first ${SAMPLE_LINES} lines: a data row has a time and at least one number.`),
    );
  }
  report.preambleLines = layout.preambleLines;
  report.headerLine = layout.headerRow === null ? null : layout.headerRow + 1;
  report.unitsLine = layout.unitsRow === null ? null : layout.unitsRow + 1;
  report.firstDataLine = layout.dataStart + 1;

  const dataRows: number[] = [];
  for (let r = layout.dataStart; r < rows.length; r++) if (!isBlank(rows[r]!)) dataRows.push(r);
  const sampleIdx = dataRows.length > 250 ? [...dataRows.slice(0, 200), ...dataRows.slice(-50)] : dataRows;
  const sample = sampleIdx.map((r) => rows[r]!);
  const decimal = detectDecimalSeparator(sample).decimal;
  report.decimalSeparator = decimal;
  const detection = detectColumns(layout.names, layout.units, sample, decimal, options.columns);
  report.columns = detection.columns;
  for (const note of detection.assumptions) report.warnings.push(ingestWarning('unit-assumed', note));
  const choice = detection.choice;
  if (!choice) {
    const hasTime = detection.columns.some((c) => c.role === 'time' || c.role === 'date');
    return fail(
      hasTime
        ? ingestWarning('no-value-column', 'No column of CO2, temperature or humidity readings was recognised: choose the columns.')
        : ingestWarning('no-time-column', 'No column of dates and times was recognised: choose the time column (or a date and a time column).'),
    );
  }
  report.choice = choice;
  const zone = zoneClock(timeZone);
  if (!zone) return fail(ingestWarning('unknown-time-zone', `"${timeZone}" is not a time zone name this device knows (for example Europe/London).`));
  report.timeZone = zone.zone;
  return readRows(rows, dataRows, choice, decimal, zone, options, layout.names, report);
}

function readRows(
  rows: readonly string[][],
  dataRows: readonly number[],
  choice: ColumnChoice,
  decimal: DecimalSeparator,
  zone: ZoneClock,
  options: LoggerFileOptions,
  names: readonly string[],
  report: ImportReport,
): LoggerFileResult {
  const timeCols = choice.time.kind === 'single' ? [choice.time.column] : [choice.time.date, choice.time.time];
  const valueCols = [choice.co2, choice.temperature, choice.relativeHumidity];
  const needed = Math.max(...timeCols, ...valueCols.map((c) => c ?? -1)) + 1;
  const timeCell = (row: readonly string[]) => row[timeCols[0]!] ?? '';
  // Numbers or written dates: decided on the sample the columns were guessed from.
  const numericKind =
    choice.time.kind === 'single'
      ? numericTimeKind(dataRows.slice(0, 200).map((r) => parseDecimalNumber(timeCell(rows[r]!), decimal)))
      : null;
  const n = dataRows.length;
  const local = new Float64Array(n);
  const written = dateTimeColumns(numericKind ? 0 : n);
  const values = valueCols.map((c) => (c === null ? null : new Float64Array(n)));
  const lines = new Uint32Array(n);
  let count = 0;
  let twelveHour = false;
  let offsetInFile = false;
  let missing = 0;
  const drop = (line: number, problem: string) => {
    if (report.malformed.length < LISTED_ROWS) report.malformed.push({ line, problem });
    report.malformedCount++;
  };
  rowLoop: for (const r of dataRows) {
    const row = rows[r]!;
    const line = r + 1;
    if (row.length < needed) {
      drop(line, `has ${row.length} field${row.length === 1 ? '' : 's'}; at least ${needed} are needed`);
      continue;
    }
    if (numericKind) {
      const v = parseDecimalNumber(timeCell(row), decimal);
      if (!Number.isFinite(v)) {
        drop(line, `time "${timeCell(row)}" in "${names[timeCols[0]!]}" is not a number`);
        continue;
      }
      local[count] = numericTimeSeconds(numericKind, v);
    } else {
      let ok: boolean;
      if (choice.time.kind === 'single') ok = readDateTimeInto(timeCell(row), written, count);
      else {
        const clock = readTimeOfDayText(row[choice.time.time] ?? '');
        ok = clock !== null && readDateTimeInto(row[choice.time.date] ?? '', written, count) && !(written.flags[count]! & HAS_TIME);
        if (ok) {
          written.seconds[count] = clock!.seconds;
          written.flags[count] = HAS_TIME | (clock!.twelveHour ? TWELVE_HOUR : 0);
        }
      }
      if (!ok) {
        const cells = timeCols.map((c) => `"${row[c] ?? ''}"`).join(' ');
        drop(line, `time ${cells} in "${timeCols.map((c) => names[c]).join('" and "')}" is not a date and time`);
        continue;
      }
      twelveHour ||= (written.flags[count]! & TWELVE_HOUR) !== 0;
      offsetInFile ||= !Number.isNaN(written.offset_s[count]!);
    }
    for (let k = 0; k < 3; k++) {
      const c = valueCols[k]!;
      if (c === null) continue;
      const cell = row[c] ?? '';
      const v = parseDecimalNumber(cell, decimal);
      if (Number.isNaN(v) && cell.trim() !== '') {
        drop(line, `"${cell}" in "${names[c]}" is not a number`);
        continue rowLoop;
      }
      if (Number.isNaN(v)) missing++;
      values[k]![count] = v;
    }
    lines[count] = line;
    count++;
  }
  report.rowsRead = dataRows.length;
  if (count === 0) {
    const first = report.malformed[0];
    const why = first ? ` The first, line ${first.line}, ${first.problem}.` : '';
    return { status: 'failed', error: ingestWarning('unreadable-times', `No data row had a readable time and values.${why}`, first ? { line: first.line } : {}), report };
  }
  if (missing > 0) report.warnings.push(ingestWarning('missing-value', `${missing} empty cell(s) in the chosen columns are left as gaps.`));

  let order: DateOrder | null = null;
  let orderFrom: DetectedTimeFormat['orderFrom'] = null;
  if (!numericKind) {
    const resolved = resolveDateOrder(written, count, options.dateOrder);
    if (resolved.status === 'inconsistent') {
      return {
        status: 'failed',
        error: ingestWarning('date-order-inconsistent', 'The dates have numbers above 12 in both the first and second place, so they are not one date format.', {
          column: names[timeCols[0]!],
        }),
        report,
      };
    }
    if (resolved.status === 'ambiguous') return { status: 'ask', question: dateOrderQuestion(written, lines, timeCols, rows), report };
    order = resolved.order;
    orderFrom = resolved.how;
    if (resolved.how === 'sequence') {
      report.warnings.push(
        ingestWarning('date-order-from-sequence', `No day above 12 settles the date order; ${dateOrderLabel(order)} keeps the readings on consecutive days. Check the first and last dates.`),
      );
    }
  }
  report.timeFormat = {
    kind: numericKind ?? 'written',
    order,
    orderFrom,
    twelveHour,
    offsetInFile,
    separateDateAndTime: choice.time.kind === 'date-and-time',
    description: describeFormat(numericKind, order, twelveHour, offsetInFile, choice.time.kind === 'date-and-time'),
  };

  // Local wall-clock → UTC, then range check.
  const times = new Float64Array(count);
  let previous = -Infinity;
  let kept = 0;
  const keep = new Uint8Array(count);
  let lastDate: [number, number, number] = [NaN, NaN, NaN];
  let lastDay = NaN;
  for (let i = 0; i < count; i++) {
    let utc: number;
    if (numericKind === 'epoch-seconds' || numericKind === 'epoch-milliseconds') utc = local[i]!;
    else {
      let localSeconds = local[i]!;
      let offset = NaN;
      if (!numericKind) {
        // Consecutive rows mostly share a date: reuse its day number.
        if (written.first[i] !== lastDate[0] || written.second[i] !== lastDate[1] || written.third[i] !== lastDate[2]) {
          lastDate = [written.first[i]!, written.second[i]!, written.third[i]!];
          lastDay = dayOfDate(lastDate[0], lastDate[1], lastDate[2], order!);
        }
        localSeconds = lastDay * 86400 + written.seconds[i]!;
        offset = written.offset_s[i]!;
      }
      if (Number.isNaN(localSeconds)) {
        drop(lines[i]!, `date "${rows[lines[i]! - 1]![timeCols[0]!]}" does not exist as ${dateOrderLabel(order ?? 'year-first')}`);
        continue;
      }
      if (!Number.isNaN(offset)) utc = localSeconds - offset;
      else {
        const converted = zone.toUtc(localSeconds, previous);
        utc = converted.utc_s;
        if (converted.kind === 'repeated' && report.repeatedLocalTimes.length < 50) report.repeatedLocalTimes.push(lines[i]!);
        if (converted.kind === 'skipped' && report.skippedLocalTimes.length < 50) report.skippedLocalTimes.push(lines[i]!);
      }
    }
    if (!(utc >= EARLIEST_S && utc < LATEST_S)) {
      drop(lines[i]!, `time is ${utc < EARLIEST_S ? 'before 2000' : 'after 2200'}: check the logger’s clock and the time format`);
      continue;
    }
    times[i] = utc;
    previous = utc;
    keep[i] = 1;
    kept++;
  }
  clockChangeNotes(report, zone.zone);
  const pack = (a: Float64Array | Uint32Array) => {
    if (kept === a.length) return a;
    const out = a instanceof Float64Array ? new Float64Array(kept) : new Uint32Array(kept);
    let j = 0;
    for (let i = 0; i < count; i++) if (keep[i]) out[j++] = a[i]!;
    return out;
  };
  const trimmed = (a: Float64Array | null) => (a ? (pack(a.subarray(0, count)) as Float64Array) : null);
  const ordered = orderSeries({
    times_s: pack(times) as Float64Array,
    values: values.map(trimmed),
    lines: pack(lines.subarray(0, count)) as Uint32Array,
  });
  report.ordering = ordered.report;
  orderingNotes(report);
  if (report.malformedCount > 0) {
    const first = report.malformed[0]!;
    report.warnings.push(
      ingestWarning('malformed-row', `${report.malformedCount} row(s) were left out; the first, line ${first.line}, ${first.problem}.`, { line: first.line }),
    );
  }
  const [co2, temp, rh] = ordered.columns.values as [Float64Array | null, Float64Array | null, Float64Array | null];
  if (temp && choice.temperatureUnit === 'F') {
    for (let i = 0; i < temp.length; i++) temp[i] = fromFahrenheit(temp[i]!);
    report.warnings.push(ingestWarning('fahrenheit-converted', 'Temperatures were read in °F and converted to °C.'));
  }
  if (rh && choice.humidityAsFraction) {
    for (let i = 0; i < rh.length; i++) rh[i] = rh[i]! * 100;
    report.warnings.push(ingestWarning('fraction-humidity-converted', 'Humidity was written as fractions of 1 and converted to %.'));
  }
  report.kept = ordered.columns.times_s.length;
  if (report.kept === 0) {
    return { status: 'failed', error: ingestWarning('unreadable-times', 'No row had a readable time and value.'), report };
  }
  return { status: 'parsed', series: { times_s: ordered.columns.times_s, co2_ppm: co2, temp_C: temp, rh_pct: rh, lines: ordered.columns.lines }, report };
}

function describeFormat(numeric: NumericTimeKind | null, order: DateOrder | null, twelveHour: boolean, offset: boolean, separate: boolean): string {
  if (numeric === 'epoch-seconds') return 'seconds since 1970-01-01 UTC';
  if (numeric === 'epoch-milliseconds') return 'milliseconds since 1970-01-01 UTC';
  if (numeric === 'spreadsheet-days') return 'spreadsheet serial days (days since 1899-12-30, local time)';
  const parts = [dateOrderLabel(order ?? 'year-first')];
  parts.push(twelveHour ? 'with 12-hour AM/PM times' : 'with 24-hour times');
  if (separate) parts.push('in separate date and time columns');
  parts.push(offset ? 'carrying their UTC offset' : 'in local time');
  return parts.join(' ');
}

function clockChangeNotes(report: ImportReport, zone: string): void {
  const [rep, skip] = [report.repeatedLocalTimes, report.skippedLocalTimes];
  if (rep.length) {
    report.warnings.push(
      ingestWarning('clock-change-repeated', `Local times from line ${rep[0]} occur twice in ${zone} (the clocks went back); each was placed after the reading before it.`, { line: rep[0]! }),
    );
  }
  if (skip.length) {
    report.warnings.push(
      ingestWarning('clock-change-skipped', `Local times from line ${skip[0]} never occur in ${zone} (the clocks went forward): the logger may not change its clock; they were read with the offset before the change.`, { line: skip[0]! }),
    );
  }
}

function orderingNotes(report: ImportReport): void {
  const o = report.ordering!;
  if (o.outOfOrder) report.warnings.push(ingestWarning('out-of-order', `${o.outOfOrder} row(s) were earlier than the row before; the readings were sorted by time.`));
  if (o.duplicates) {
    const differ = o.conflicting ? `, ${o.conflicting} of them with different values (the first was kept)` : '';
    report.warnings.push(
      ingestWarning('duplicate-time', `${o.duplicates} row(s) repeated a time already read${differ}; first at line ${o.duplicateLines[0]}.`, { line: o.duplicateLines[0]! }),
    );
  }
}

function dateOrderQuestion(dates: DateTimeColumns, lines: Uint32Array, timeCols: readonly number[], rows: readonly string[][]): DateOrderQuestion {
  const show = (i: number, order: DateOrder) => {
    const day = dayOfDate(dates.first[i]!, dates.second[i]!, dates.third[i]!, order);
    return Number.isNaN(day) ? 'no such date' : new Date(day * 86400_000).toISOString().slice(0, 10);
  };
  return {
    kind: 'date-order',
    message: 'Every date could be read day-first or month-first. Which does the logger write?',
    examples: [0, 1, 2].filter((i) => i < lines.length && lines[i]! > 0).map((i) => ({
      line: lines[i]!,
      written: timeCols.map((c) => rows[lines[i]! - 1]![c]).join(' '),
      dayFirst: show(i, 'day-first'),
      monthFirst: show(i, 'month-first'),
    })),
  };
}
