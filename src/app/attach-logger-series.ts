/**
 * Keep an analysed logger file with the survey: the series (times and values as the model
 * holds them) and the periods the surveyor accepted, attached to a room or, for the outdoor
 * logger, to no room (the outdoor reference). Saved as one record through the open survey, so
 * the findings run again and pick up the accepted periods as measurements.
 *
 * Example: attachLoggerSeries({ fileName: 'room4.csv', series, report, roomId: 'r1',
 * accepted: [decay] }) → { ok: true, leftOut: 0, warnings: [] } and the room's findings gain a
 * measured supply from the decay.
 */
import type { FittedPeriod } from '../ingest/fit-periods.ts';
import type { ImportReport, LoggerSeriesData } from '../ingest/parse-logger-file.ts';
import { loggerSeriesRecord } from '../ingest/logger-series-record.ts';
import { surveyWalk } from './survey-walk.svelte.ts';

export interface AttachLoggerInput {
  /** The series' id when saving it again (a changed choice replaces the stored record). */
  id?: string;
  fileName: string;
  series: LoggerSeriesData;
  report: ImportReport;
  /** The room the logger stood in; absent for the outdoor logger. */
  roomId?: string;
  /** The survey's instrument the logger is, when known. */
  instrumentId?: string;
  accepted: readonly FittedPeriod[];
}

export type AttachLoggerResult = { ok: true; id: string; leftOut: number; warnings: string[] } | { ok: false; message: string };

export async function attachLoggerSeries(input: AttachLoggerInput, newId: () => string = () => crypto.randomUUID()): Promise<AttachLoggerResult> {
  const built = loggerSeriesRecord({
    id: input.id ?? newId(),
    sourceFile: input.fileName,
    series: input.series,
    report: input.report,
    ...(input.roomId ? { roomId: input.roomId } : {}),
    ...(input.instrumentId ? { instrumentId: input.instrumentId } : {}),
    periods: input.accepted.map((p) => ({ id: newId(), kind: p.kind, start_s: p.start_s, end_s: p.end_s, note: p.note.slice(0, 500) })),
  });
  if (!built.ok) return { ok: false, message: built.error.message };
  try {
    await surveyWalk.saveSeries(built.record);
  } catch (error) {
    return { ok: false, message: `Not saved: ${error instanceof Error ? error.message : String(error)}` };
  }
  return { ok: true, id: built.record.id, leftOut: built.leftOut, warnings: built.warnings.map((w) => w.message) };
}
