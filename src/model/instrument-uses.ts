/**
 * Where an instrument is referred to in a survey: readings, outdoor readings, fan tests,
 * whole-dwelling terminals, logger files and other instruments' side-by-side checks. An
 * instrument still referred to cannot be removed without losing what those records were
 * measured with (and the file would no longer be valid), so removal is offered only at zero.
 *
 * Example: instrumentUses(doc, handheldId) → { readings: 22, outdoorReadings: 2, fanTests: 0,
 * terminals: 0, loggerFiles: 0, checks: 1 }; instrumentUseWords(that) = '22 readings, 2 outdoor
 * readings and 1 side-by-side check of another meter'.
 */

/** The parts of a survey that can refer to an instrument (structural, so the store can pass its records). */
export interface InstrumentReferrers {
  outdoorReadings: readonly { instrumentId?: string | undefined }[];
  instruments: readonly { id: string; checks: readonly { referenceInstrumentId?: string | undefined }[] }[];
  readings: readonly { instrumentId?: string | undefined }[];
  rooms: readonly { openings: readonly object[] }[];
  areas: readonly { dwelling?: { system?: { terminals: readonly { instrumentId?: string | undefined }[] } | undefined } | undefined }[];
  series: readonly { instrumentId?: string | undefined }[];
}

export interface InstrumentUses {
  readings: number;
  outdoorReadings: number;
  fanTests: number;
  terminals: number;
  loggerFiles: number;
  checks: number;
}

const count = <T>(list: readonly T[], uses: (x: T) => boolean) => list.reduce((n, x) => n + (uses(x) ? 1 : 0), 0);

export function instrumentUses(parts: InstrumentReferrers, instrumentId: string): InstrumentUses {
  return {
    readings: count(parts.readings, (r) => r.instrumentId === instrumentId),
    outdoorReadings: count(parts.outdoorReadings, (r) => r.instrumentId === instrumentId),
    fanTests: parts.rooms.reduce((n, room) => n + count(room.openings, (o) => (o as { measuredWith?: string }).measuredWith === instrumentId), 0),
    terminals: parts.areas.reduce((n, a) => n + count(a.dwelling?.system?.terminals ?? [], (t) => t.instrumentId === instrumentId), 0),
    loggerFiles: count(parts.series, (s) => s.instrumentId === instrumentId),
    checks: parts.instruments.reduce((n, i) => n + (i.id === instrumentId ? 0 : count(i.checks, (c) => c.referenceInstrumentId === instrumentId)), 0),
  };
}

const WORDS: Record<keyof InstrumentUses, [string, string]> = {
  readings: ['reading', 'readings'],
  outdoorReadings: ['outdoor reading', 'outdoor readings'],
  fanTests: ['fan test', 'fan tests'],
  terminals: ['terminal flow', 'terminal flows'],
  loggerFiles: ['logger file', 'logger files'],
  checks: ['side-by-side check of another meter', 'side-by-side checks of other meters'],
};

/** The uses in words ('' when there are none). */
export function instrumentUseWords(uses: InstrumentUses): string {
  const parts = (Object.keys(WORDS) as (keyof InstrumentUses)[]).filter((k) => uses[k] > 0).map((k) => `${uses[k]} ${WORDS[k][uses[k] === 1 ? 0 : 1]}`);
  return parts.length <= 1 ? (parts[0] ?? '') : `${parts.slice(0, -1).join(', ')} and ${parts.at(-1)}`;
}
