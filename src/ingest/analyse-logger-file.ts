/**
 * A logger file from bytes (or text) to fitted periods in one call: decode, parse and detect
 * (parse-logger-file.ts), find the periods of the CO2 record (period-finding.ts) and fit them
 * (fit-periods.ts). The worker and the command line both call this, so they give the same
 * answer. Never throws: a failure the code did not foresee comes back as an 'internal-error'
 * result naming the file, rather than crashing a worker or the command line.
 *
 * Example: analyseLoggerFile(bytesOfAWeekAtOneMinute, { timeZone: 'Europe/London',
 * volume_m3: 150 }) → status 'analysed', about 35 periods with fits and suggestions.
 */
import { decodeFileBytes } from './decode-file-bytes.ts';
import { fitPeriods, type FitOptions, type FittedPeriod } from './fit-periods.ts';
import { ingestWarning, type IngestWarning } from './ingest-warnings.ts';
import { parseLoggerFile, type DateOrderQuestion, type ImportReport, type LoggerFileOptions, type LoggerSeriesData } from './parse-logger-file.ts';
import { findPeriods, type PeriodFindingOptions } from './period-finding.ts';

export type LoggerAnalysisOptions = LoggerFileOptions & PeriodFindingOptions & FitOptions;

/** What the record says about itself, beside the periods. */
export interface RecordFigures {
  /** Noise of the readings about their running median, ppm. */
  noise_ppm: number;
  /** The level excess is measured from, ppm (outdoor given, or the record's 2nd percentile). */
  baseline_ppm: number;
  /** Usual time between readings, s. */
  step_s: number;
}

export type LoggerAnalysis =
  | { status: 'analysed'; series: LoggerSeriesData; report: ImportReport; record: RecordFigures | null; periods: FittedPeriod[] }
  | { status: 'ask'; question: DateOrderQuestion; report: ImportReport }
  | { status: 'failed'; error: IngestWarning; report: ImportReport | null };

export function analyseLoggerFile(input: string | Uint8Array, options: LoggerAnalysisOptions = {}): LoggerAnalysis {
  try {
    let text: string;
    if (typeof input === 'string') text = input;
    else {
      const decoded = decodeFileBytes(input);
      if (!decoded.ok) return { status: 'failed', error: decoded.error, report: null };
      text = decoded.text;
    }
    const parsed = parseLoggerFile(text, options);
    if (parsed.status !== 'parsed') return parsed;
    const { series, report } = parsed;
    if (!series.co2_ppm) return { status: 'analysed', series, report, record: null, periods: [] };
    const finding = findPeriods(series.times_s, series.co2_ppm, options);
    const periods = fitPeriods(series.times_s, series.co2_ppm, finding, options);
    return { status: 'analysed', series, report, record: { noise_ppm: finding.noise_ppm, baseline_ppm: finding.baseline_ppm, step_s: finding.step_s }, periods };
  } catch (e) {
    const detail = e instanceof Error ? e.message : String(e);
    return { status: 'failed', error: ingestWarning('internal-error', `The file could not be read (an unexpected fault: ${detail}).`), report: null };
  }
}
