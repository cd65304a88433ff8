/**
 * One logger file being brought into a room (or kept as the outdoor logger, from the room screen
 * or the visit screen's outdoor section), as runes state: the file is
 * read in the logger worker (its bytes transferred, the series' arrays transferred back), the
 * surveyor's changes (columns, date order, time zone) read it again, each period found is
 * accepted or rejected, and "save" keeps the series with the accepted periods through
 * attach-logger-series.ts. The ingest types the screens need are re-exported here (ui may not
 * import src/ingest).
 */
import type { LoggerAnalysis, LoggerAnalysisOptions } from '../ingest/analyse-logger-file.ts';
import type { ColumnOverrides } from '../ingest/column-detection.ts';
import type { FittedPeriod } from '../ingest/fit-periods.ts';
import { loggerChartData, type LoggerChartData } from '../ingest/logger-chart-data.ts';
import { analyseInWorker } from '../ingest/logger-worker-client.ts';
import type { DateOrder } from '../ingest/time-format-detection.ts';
import { zoneClock } from '../ingest/zone-clock.ts';
import { attachLoggerSeries } from './attach-logger-series.ts';

export type { LoggerAnalysis } from '../ingest/analyse-logger-file.ts';
export type { ColumnChoice, ColumnOverrides, ColumnRole, DetectedColumn, TimeSource } from '../ingest/column-detection.ts';
export type { FittedPeriod } from '../ingest/fit-periods.ts';
export type { DateOrderQuestion, ImportReport } from '../ingest/parse-logger-file.ts';
export type { LoggerChartData } from '../ingest/logger-chart-data.ts';
export type { DateOrder } from '../ingest/time-format-detection.ts';

/** The zone a survey's loggers are read in unless the surveyor changes it. */
export const DEFAULT_ZONE = 'Europe/London';

/** Temporal's clock, where the browser has it (not yet in the TypeScript library). */
type TemporalNow = { Now?: { timeZoneId?: () => string } };

/**
 * The device's own time zone, when the platform names one. Temporal's answer first: asking Intl
 * builds a date formatter, loading the browser's locale data (about 20 ms on a phone, in the
 * middle of drawing the room screen); Temporal reads the zone without it.
 */
export function deviceZone(): string | null {
  try {
    const temporal = (globalThis as { Temporal?: TemporalNow }).Temporal;
    return temporal?.Now?.timeZoneId?.() || Intl.DateTimeFormat().resolvedOptions().timeZone || null;
  } catch {
    return null;
  }
}

/** Facts about the room the fits need: its volume and the survey's outdoor level, when known. No room: the outdoor logger. */
export interface LoggerRoomFacts {
  roomId?: string;
  volume_m3?: number;
  outdoor_ppm?: number;
}

/** UTC seconds of local midnight before `t_s` in `zone` (UTC when the zone is unknown). */
function localMidnight(t_s: number, zone: string): number {
  const offset = zoneClock(zone)?.offsetAt(t_s) ?? 0;
  return Math.floor((t_s + offset) / 86400) * 86400 - offset;
}

export type PeriodDecision = 'accepted' | 'rejected';

export class LoggerImport {
  file = $state.raw<File | null>(null);
  timeZone = $state(DEFAULT_ZONE);
  dateOrder = $state<DateOrder | undefined>(undefined);
  columns = $state<ColumnOverrides>({});
  /** The logger stood outdoors: keep it as the outdoor reference rather than with the room. */
  outdoor = $state(false);
  /** The survey's instrument this logger is, when the surveyor says (its error model then applies); '' when not said. */
  instrumentId = $state('');
  reading = $state(false);
  analysis = $state.raw<LoggerAnalysis | null>(null);
  /** The surveyor's decision on each period, by its index in the analysis. */
  decisions = $state<Record<number, PeriodDecision>>({});
  saving = $state(false);
  saved = $state<string | null>(null);
  saveError = $state<string | null>(null);
  private ticket = 0;
  /** The stored series' id once this file has been saved: saving again replaces it, never adds a second. */
  private savedId: string | undefined;

  /** `outdoor`: start with the outdoor choice made (the visit screen's outdoor logger). */
  constructor(
    private readonly facts: () => LoggerRoomFacts,
    options: { outdoor?: boolean } = {},
  ) {
    this.outdoor = options.outdoor ?? false;
  }

  /** A new file: forget the previous one's choices and read it. */
  async choose(file: File): Promise<void> {
    this.file = file;
    this.savedId = undefined;
    this.dateOrder = undefined;
    this.columns = {};
    this.saved = null;
    this.saveError = null;
    await this.read();
  }

  /** Read the file again with the surveyor's changes. */
  async read(): Promise<void> {
    if (!this.file) return;
    const ticket = ++this.ticket;
    this.reading = true;
    const { volume_m3, outdoor_ppm } = this.facts();
    const options: LoggerAnalysisOptions = {
      timeZone: this.timeZone,
      ...(this.dateOrder ? { dateOrder: this.dateOrder } : {}),
      columns: $state.snapshot(this.columns) as ColumnOverrides,
      ...(volume_m3 && volume_m3 > 0 ? { volume_m3 } : {}),
      ...(outdoor_ppm !== undefined ? { outdoor_ppm } : {}),
    };
    const analysis = await analyseInWorker(this.file, options);
    if (ticket !== this.ticket) return;
    this.analysis = analysis;
    this.decisions = {};
    this.reading = false;
  }

  setColumns(change: ColumnOverrides): void {
    this.columns = { ...this.columns, ...change };
    void this.read();
  }

  setDateOrder(order: DateOrder): void {
    this.dateOrder = order;
    void this.read();
  }

  setTimeZone(zone: string): void {
    this.timeZone = zone.trim();
    void this.read();
  }

  decide(index: number, decision: PeriodDecision): void {
    this.decisions[index] = decision;
    this.saved = null;
  }

  get periods(): FittedPeriod[] {
    return this.analysis?.status === 'analysed' ? this.analysis.periods : [];
  }

  get acceptedCount(): number {
    return Object.values(this.decisions).filter((d) => d === 'accepted').length;
  }

  /**
   * What the shared chart draws: the CO2 readings, the periods shaded and the fitted curves,
   * with times counted from local midnight of the first reading's day in the logger's zone (so
   * the chart's clock labels read as the wall clock: "10:00", "day 2 03:00").
   */
  chart(): LoggerChartData | null {
    const analysis = this.analysis;
    if (analysis?.status !== 'analysed' || !analysis.series.co2_ppm || analysis.series.times_s.length === 0) return null;
    const { outdoor_ppm } = this.facts();
    const data = loggerChartData(analysis.series, 'co2', analysis.periods, outdoor_ppm !== undefined ? { outdoor_ppm } : {});
    const origin = localMidnight(analysis.series.times_s[0]!, analysis.report.timeZone);
    return {
      ...data,
      series: data.series.map((s) => ({ ...s, times_s: Float64Array.from(s.times_s, (t) => t - origin) })),
      periods: data.periods.map((p) => ({ ...p, from_s: p.from_s - origin, to_s: p.to_s - origin })),
    };
  }

  /** A period's start and end in the chart's clock (see chart()). */
  chartTimes(period: FittedPeriod): { from_s: number; to_s: number } {
    const analysis = this.analysis;
    if (analysis?.status !== 'analysed' || analysis.series.times_s.length === 0) return { from_s: 0, to_s: 0 };
    const origin = localMidnight(analysis.series.times_s[0]!, analysis.report.timeZone);
    return { from_s: period.start_s - origin, to_s: period.end_s - origin };
  }

  /** Keep the series and the accepted periods with the room (or as the outdoor reference). */
  async save(): Promise<void> {
    const analysis = this.analysis;
    if (analysis?.status !== 'analysed' || !this.file) return;
    const roomId = this.facts().roomId;
    if (!this.outdoor && !roomId) {
      this.saveError = 'Not saved: this logger has no room here; tick “This is the outdoor logger” or import it on its room.';
      return;
    }
    this.saving = true;
    this.saveError = null;
    const accepted = analysis.periods.filter((_, i) => this.decisions[i] === 'accepted');
    const result = await attachLoggerSeries({
      ...(this.savedId ? { id: this.savedId } : {}),
      fileName: this.file.name,
      series: analysis.series,
      report: analysis.report,
      ...(this.outdoor ? {} : { roomId }),
      ...(this.instrumentId ? { instrumentId: this.instrumentId } : {}),
      accepted: this.outdoor ? [] : accepted,
    });
    this.saving = false;
    if (!result.ok) {
      this.saveError = result.message;
      return;
    }
    this.savedId = result.id;
    const where = this.outdoor ? 'as the outdoor logger' : `with this room, ${accepted.length} accepted period${accepted.length === 1 ? '' : 's'}`;
    this.saved = [`Saved ${this.file.name} ${where}.`, ...result.warnings].join(' ');
  }
}
