/**
 * A room's readings grouped for the Engine I methods: each test (decay, seeded decay, build-up),
 * each accepted period of a logger series in the room (decay, build-up, steady), and each single
 * occupied reading that belongs to no test (a spot reading).
 *
 * Left out, with a warning:
 * - readings taken with a flame burning (gas hob, unflued heater, candles): their CO2 is not from
 *   people, and a flame's output is not known (practice.md §1 item 13);
 * - readings without CO2;
 * - readings of a test on another meter than most of the test's readings (one meter per fit).
 * Readings are sorted by time (then id), so the order they were stored in never matters.
 *
 * Example: Classroom B1's decay test of 11 readings → one set, setKind 'decay', 11 readings, none excluded.
 */
import type { Conditions, Reading } from '../model/reading.ts';
import type { DocumentRoom, SurveyDocument } from '../model/survey-document.ts';
import { analysisWarning, type AnalysisWarning } from './analysis-warnings.ts';

/** One reading as the fits take it, with the time as recorded. */
export interface SetReading {
  time_s: number;
  level_ppm: number;
  time: string;
}

export interface ReadingSet {
  setId: string;
  source: 'test' | 'logger-period' | 'reading';
  setKind: 'decay' | 'seeded-decay' | 'build-up' | 'steady' | 'spot';
  readings: SetReading[];
  excluded: number;
  instrumentId: string | undefined;
  /** Conditions recorded with the set's first reading; null for a logger period (not recorded). */
  conditions: Conditions | null;
  /** The time of the first reading, ms since 1970. */
  start_ms: number;
  warnings: AnalysisWarning[];
}

const byTime = (a: Reading, b: Reading): number => Date.parse(a.time) - Date.parse(b.time) || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);

/** The most frequent instrument id (ties: the smallest id), undefined when none is recorded. */
function mainInstrument(readings: readonly Reading[]): string | undefined {
  const counts = new Map<string, number>();
  for (const r of readings) if (r.instrumentId) counts.set(r.instrumentId, (counts.get(r.instrumentId) ?? 0) + 1);
  return [...counts].sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : 1))[0]?.[0];
}

function fromReadings(setId: string, source: ReadingSet['source'], setKind: ReadingSet['setKind'], all: readonly Reading[]): ReadingSet {
  const sorted = [...all].sort(byTime);
  const warnings: AnalysisWarning[] = [];
  const flames = sorted.filter((r) => r.conditions.combustion);
  if (flames.length > 0) {
    warnings.push(
      analysisWarning(
        'combustion-readings-excluded',
        'caution',
        `${flames.length} reading(s) taken with a flame burning were left out: a flame adds CO₂ that is not from people.`,
      ),
    );
  }
  const instrumentId = mainInstrument(sorted);
  const otherMeter = sorted.filter((r) => r.instrumentId !== undefined && r.instrumentId !== instrumentId);
  if (otherMeter.length > 0) {
    warnings.push(analysisWarning('mixed-instruments', 'caution', `${otherMeter.length} reading(s) on another meter were left out: one fit, one meter.`));
  }
  const kept = sorted.filter((r) => !r.conditions.combustion && r.co2_ppm !== undefined && !otherMeter.includes(r));
  const first = kept[0] ?? sorted[0];
  return {
    setId,
    source,
    setKind,
    readings: kept.map((r) => ({ time_s: Date.parse(r.time) / 1000, level_ppm: r.co2_ppm!, time: r.time })),
    excluded: sorted.length - kept.length,
    instrumentId,
    conditions: first ? first.conditions : null,
    start_ms: first ? Date.parse(first.time) : 0,
    warnings,
  };
}

/**
 * Every reading set of a room (see the file note), sorted by start time then id.
 * Example: readingSets(classroomB1, document).map((s) => s.setKind) = ['build-up', 'decay'].
 */
export function readingSets(room: DocumentRoom, doc: SurveyDocument): ReadingSet[] {
  const byId = new Map(room.readings.map((r) => [r.id, r]));
  const inTests = new Set<string>();
  const sets: ReadingSet[] = room.tests.map((test) => {
    const readings = test.readingIds.flatMap((id) => {
      inTests.add(id);
      const r = byId.get(id);
      return r ? [r] : [];
    });
    return fromReadings(test.id, 'test', test.kind, readings);
  });
  for (const r of room.readings) {
    if (inTests.has(r.id) || !r.conditions.people.some((p) => p.count > 0)) continue;
    sets.push(fromReadings(r.id, 'reading', 'spot', [r]));
  }
  for (const series of doc.series) {
    if (series.roomId !== room.id || !series.co2_ppm) continue;
    for (const period of series.periods) {
      if (period.kind === 'excluded') continue;
      const readings: SetReading[] = [];
      series.times_ms.forEach((t, i) => {
        if (t >= period.start_ms && t <= period.end_ms) readings.push({ time_s: t / 1000, level_ppm: series.co2_ppm![i]!, time: String(t) });
      });
      sets.push({
        setId: period.id,
        source: 'logger-period',
        setKind: period.kind,
        readings,
        excluded: 0,
        instrumentId: series.instrumentId,
        conditions: null,
        start_ms: period.start_ms,
        warnings: [],
      });
    }
  }
  return sets.sort((a, b) => a.start_ms - b.start_ms || (a.setId < b.setId ? -1 : a.setId > b.setId ? 1 : 0));
}
