/**
 * Which column of a logger file holds what: the time (one column, or a date column and a time
 * column), CO2 in ppm, temperature in °C or °F, relative humidity in % (or as a fraction). Each
 * column is scored from its name, its written unit and its values; the best column takes each
 * role, one role per column. Every column comes back with its guess, a confidence from 0 to 1,
 * the reason and a preview of its first cells, so the surveyor can change the choice.
 *
 * Plausible ranges are common practice (no published source): indoor CO2 250–10 000 ppm (the
 * model's range), temperature −30–60 °C, humidity 0–100 %.
 *
 * Example: names ['Date', 'Time', 'CO2 (ppm)', 'Temp [°F]'] over rows like
 * ['27/10/2024', '1:05 PM', '812', '68.5'] → time: date column 0 with time column 1, co2: 2,
 * temperature: 3 in °F.
 */
import { cellKind } from './cell-kind.ts';
import { parseDecimalNumber, type DecimalSeparator } from './decimal-number.ts';
import { readDateTimeText, readTimeOfDayText } from './date-time-text.ts';
import { numericTimeKind } from './time-format-detection.ts';

export type ColumnRole = 'time' | 'date' | 'time-of-day' | 'co2' | 'temperature' | 'relative-humidity' | 'other';

export interface DetectedColumn {
  index: number;
  name: string;
  unit: string;
  role: ColumnRole;
  /** 0–1. */
  confidence: number;
  reason: string;
  /** The first few cells as written. */
  preview: string[];
}

/** Where the times come from. */
export type TimeSource = { kind: 'single'; column: number } | { kind: 'date-and-time'; date: number; time: number };

/** The chosen columns (indexes from 0) and how to read them. */
export interface ColumnChoice {
  time: TimeSource;
  co2: number | null;
  temperature: number | null;
  relativeHumidity: number | null;
  temperatureUnit: 'C' | 'F';
  /** Humidity written as a fraction 0–1 rather than %. */
  humidityAsFraction: boolean;
}

/** A caller's changes to the guess; null removes a role. */
export interface ColumnOverrides {
  time?: TimeSource;
  co2?: number | null;
  temperature?: number | null;
  relativeHumidity?: number | null;
  temperatureUnit?: 'C' | 'F';
}

const TIME_NAME = /time|date|stamp|zeit|datum|heure|fecha|hora|tijd|clock/i;
const CO2_NAME = /co2|co₂|carbon\s*dioxide/i;
const TEMP_NAME = /temp|°\s*[cf]\b|deg\s*[cf]\b|^t$/i;
const RH_NAME = /\brh\b|rh%|%rh|humid|feucht|^h$/i;
const PPM_UNIT = /ppm/i;
const C_UNIT = /^(°|º|deg)?\s*c$|°\s*c\b/i;
const F_UNIT = /^(°|º|deg)?\s*f$|°\s*f\b/i;
const PERCENT_UNIT = /%/;

interface ColumnStats {
  numbers: number[];
  dateTime: number;
  dateOnly: number;
  timeOnly: number;
  filled: number;
}

function statsOf(rows: readonly (readonly string[])[], c: number, decimal: DecimalSeparator): ColumnStats {
  const s: ColumnStats = { numbers: [], dateTime: 0, dateOnly: 0, timeOnly: 0, filled: 0 };
  for (const row of rows) {
    const cell = row[c] ?? '';
    const kind = cellKind(cell);
    if (kind === 'empty') continue;
    s.filled++;
    if (kind === 'number') {
      const v = parseDecimalNumber(cell, decimal);
      if (Number.isFinite(v)) s.numbers.push(v);
    } else if (kind === 'date-time') {
      const d = readDateTimeText(cell);
      if (d) {
        if (d.hasTime) s.dateTime++;
        else s.dateOnly++;
      } else if (readTimeOfDayText(cell)) s.timeOnly++;
    }
  }
  return s;
}

function median(values: readonly number[]): number {
  if (values.length === 0) return NaN;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)]!;
}

function share(count: number, s: ColumnStats): number {
  return s.filled ? count / s.filled : 0;
}

type ValueRole = 'co2' | 'temperature' | 'relative-humidity';

/** Score of a column for a value role, with its reason. */
function valueScore(role: ValueRole, name: string, unit: string, s: ColumnStats): { score: number; reason: string } {
  const numeric = share(s.numbers.length, s);
  if (numeric < 0.5) return { score: 0, reason: 'not numbers' };
  const lo = Math.min(...s.numbers);
  const hi = Math.max(...s.numbers);
  const mid = median(s.numbers);
  const reasons: string[] = [];
  let score = 0;
  const nameMatch = role === 'co2' ? CO2_NAME.test(name) : role === 'temperature' ? TEMP_NAME.test(name) : RH_NAME.test(name);
  const text = `${name} ${unit}`;
  const unitMatch =
    role === 'co2' ? PPM_UNIT.test(text) : role === 'temperature' ? C_UNIT.test(unit) || F_UNIT.test(unit) || /°\s*[CF]/i.test(name) : PERCENT_UNIT.test(text) && !PPM_UNIT.test(text);
  if (nameMatch) {
    score += 0.55;
    reasons.push('name');
  }
  if (unitMatch) {
    score += 0.3;
    reasons.push('unit');
  }
  const plausible =
    role === 'co2' ? lo >= 100 && hi <= 50_000 && mid >= 250 : role === 'temperature' ? lo >= -40 && hi <= 150 : lo >= 0 && hi <= 100;
  if (plausible) {
    score += nameMatch || unitMatch ? 0.15 : role === 'co2' ? 0.4 : role === 'temperature' && mid >= 5 && mid <= 35 ? 0.3 : role === 'relative-humidity' && mid >= 20 && mid <= 95 ? 0.25 : 0;
    reasons.push('values in range');
  } else {
    score *= 0.6;
    reasons.push('values out of the usual range');
  }
  return { score: Math.min(1, score), reason: reasons.join(', ') };
}

function timeScore(name: string, s: ColumnStats, first: boolean): { role: ColumnRole; score: number; reason: string } {
  const named = TIME_NAME.test(name);
  const bonus = named ? 0.25 : first ? 0.1 : 0;
  const dt = share(s.dateTime, s);
  if (dt >= 0.8) return { role: 'time', score: Math.min(1, 0.7 * dt + bonus), reason: `dates with times${named ? ', name' : ''}` };
  if (share(s.dateOnly, s) >= 0.8) return { role: 'date', score: 0.6 + bonus, reason: 'dates without times' };
  if (share(s.timeOnly, s) >= 0.8) return { role: 'time-of-day', score: 0.6 + bonus, reason: 'times of day without dates' };
  if (share(s.numbers.length, s) >= 0.8 && numericTimeKind(s.numbers) && (named || first)) {
    return { role: 'time', score: 0.5 + bonus, reason: `numbers in the range of ${numericTimeKind(s.numbers)}${named ? ', name' : ''}` };
  }
  return { role: 'other', score: 0, reason: '' };
}

export interface ColumnDetection {
  columns: DetectedColumn[];
  /** Null when no time column or no value column was found (and none was given). */
  choice: ColumnChoice | null;
  /** Notes on assumptions (a unit taken from the values). */
  assumptions: string[];
}

/** Guess the columns from names, units and a sample of data rows, then apply the caller's changes. */
export function detectColumns(
  names: readonly string[],
  units: readonly string[],
  rows: readonly (readonly string[])[],
  decimal: DecimalSeparator,
  overrides: ColumnOverrides = {},
): ColumnDetection {
  const stats = names.map((_, c) => statsOf(rows, c, decimal));
  const columns: DetectedColumn[] = names.map((name, index) => ({
    index,
    name,
    unit: units[index] ?? '',
    role: 'other',
    confidence: 0,
    reason: '',
    preview: rows.slice(0, 5).map((r) => r[index] ?? ''),
  }));
  // Time first: it is the column the rest hangs on.
  const timeGuesses = names.map((name, c) => timeScore(name, stats[c]!, c === 0));
  for (const [c, g] of timeGuesses.entries()) if (g.role !== 'other') Object.assign(columns[c]!, { role: g.role, confidence: g.score, reason: g.reason });
  const best = (role: ColumnRole) =>
    columns.filter((col) => col.role === role).sort((a, b) => b.confidence - a.confidence)[0]?.index ?? null;
  let time: TimeSource | null = null;
  const single = best('time');
  const date = best('date');
  const clock = best('time-of-day');
  if (single !== null) time = { kind: 'single', column: single };
  else if (date !== null && clock !== null) time = { kind: 'date-and-time', date, time: clock };
  const timeColumns = new Set(time ? (time.kind === 'single' ? [time.column] : [time.date, time.time]) : []);
  for (const col of columns) if (!timeColumns.has(col.index) && col.role !== 'other') Object.assign(col, { role: 'other', confidence: 0, reason: '' });

  // Value roles: best pairs first.
  const pairs: Array<{ c: number; role: ValueRole; score: number; reason: string }> = [];
  for (const [c, name] of names.entries()) {
    if (timeColumns.has(c)) continue;
    for (const role of ['co2', 'temperature', 'relative-humidity'] as const) {
      const { score, reason } = valueScore(role, name, units[c] ?? '', stats[c]!);
      if (score >= 0.3) pairs.push({ c, role, score, reason });
    }
  }
  pairs.sort((a, b) => b.score - a.score);
  const taken = new Map<ValueRole, number>();
  for (const p of pairs) {
    if (taken.has(p.role) || columns[p.c]!.role !== 'other') continue;
    taken.set(p.role, p.c);
    Object.assign(columns[p.c]!, { role: p.role, confidence: p.score, reason: p.reason });
  }

  const assumptions: string[] = [];
  const pick = (role: ValueRole, given: number | null | undefined) => (given === undefined ? (taken.get(role) ?? null) : given);
  const chosenTime = overrides.time ?? time;
  const co2 = pick('co2', overrides.co2);
  const temperature = pick('temperature', overrides.temperature);
  const relativeHumidity = pick('relative-humidity', overrides.relativeHumidity);
  let temperatureUnit: 'C' | 'F' = 'C';
  if (overrides.temperatureUnit) temperatureUnit = overrides.temperatureUnit;
  else if (temperature !== null) {
    const written = `${units[temperature] ?? ''} ${names[temperature] ?? ''}`;
    if (F_UNIT.test(units[temperature] ?? '') || /°\s*F|deg\s*F|fahrenheit|(^|[\s_\-])F$/i.test(written)) temperatureUnit = 'F';
    else if (!(C_UNIT.test(units[temperature] ?? '') || /°\s*C|deg\s*C|celsius|(^|[\s_\-])C$/i.test(written)) && median(stats[temperature]?.numbers ?? []) > 45) {
      temperatureUnit = 'F';
      assumptions.push(`"${names[temperature]}" has no unit and its values are too high for °C: read as °F.`);
    }
  }
  const humidityAsFraction = relativeHumidity !== null && (stats[relativeHumidity]?.numbers.length ?? 0) > 0 && Math.max(...stats[relativeHumidity]!.numbers) <= 1;
  if (humidityAsFraction) assumptions.push(`"${names[relativeHumidity!]}" holds values from 0 to 1: read as fractions and shown in %.`);
  const hasValue = co2 !== null || temperature !== null || relativeHumidity !== null;
  return {
    columns,
    choice: chosenTime && hasValue ? { time: chosenTime, co2, temperature, relativeHumidity, temperatureUnit, humidityAsFraction } : null,
    assumptions,
  };
}
