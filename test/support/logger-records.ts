/**
 * Invented logger records for the importer's tests and benchmark: a room's true CO2 from a
 * timetable of occupants and air supplies (exact pieces of the mass balance, core/balance.ts),
 * read by a meter with its own offset, gain and noise, then written out as text in one of our own
 * invented file shapes. The timetables and file shapes are our own construction, not any
 * logger's export format.
 */
import { levelAfter } from '../../src/core/balance.ts';
import { createSeededRandom } from '../../src/core/seeded-random.ts';

/** One stretch of the timetable: from this time (s, UTC) until the next entry. */
export interface TimetableEntry {
  from_s: number;
  people: number;
  supply_m3s: number;
}

export interface RoomRecordSpec {
  start_s: number;
  step_s: number;
  count: number;
  volume_m3: number;
  outdoor_ppm: number;
  /** CO2 output per person, m³/s. */
  perPerson_m3s: number;
  timetable: readonly TimetableEntry[];
  meter: { offset_ppm: number; gain: number; noise_ppm: number };
  seed: number;
  /** Times (s, UTC) of door-open dips: the reading drops by `size` ppm for `length_s`. */
  doorOpenings?: ReadonlyArray<{ at_s: number; length_s: number; size_ppm: number }>;
  /** Windows with no readings (the logger was moved or its battery swapped). */
  gaps?: ReadonlyArray<{ from_s: number; to_s: number }>;
}

export interface RoomRecord {
  times_s: number[];
  trueCo2: number[];
  readCo2: number[];
  temp_C: number[];
  rh_pct: number[];
}

function entryAt(timetable: readonly TimetableEntry[], t: number): TimetableEntry {
  let current = timetable[0]!;
  for (const e of timetable) if (e.from_s <= t) current = e;
  return current;
}

/** Simulate the record: exact balance from reading to reading (timetable changes fall on reading times). */
export function simulateRoom(spec: RoomRecordSpec): RoomRecord {
  const rng = createSeededRandom(spec.seed);
  const out: RoomRecord = { times_s: [], trueCo2: [], readCo2: [], temp_C: [], rh_pct: [] };
  let level = spec.outdoor_ppm;
  for (let k = 0; k < spec.count; k++) {
    const t = spec.start_s + k * spec.step_s;
    if (k > 0) {
      const e = entryAt(spec.timetable, t - spec.step_s);
      level = levelAfter(
        { volume_m3: spec.volume_m3, supply_m3s: e.supply_m3s, outdoor_ppm: spec.outdoor_ppm, source_m3s: e.people * spec.perPerson_m3s },
        level,
        spec.step_s,
      );
    }
    if (spec.gaps?.some((g) => t >= g.from_s && t < g.to_s)) continue;
    const door = spec.doorOpenings?.find((d) => t >= d.at_s && t < d.at_s + d.length_s);
    const read = spec.meter.gain * (level - (door?.size_ppm ?? 0)) + spec.meter.offset_ppm + spec.meter.noise_ppm * rng.normal();
    const people = entryAt(spec.timetable, t).people;
    out.times_s.push(t);
    out.trueCo2.push(level);
    out.readCo2.push(Math.round(read));
    out.temp_C.push(Math.round((19 + 0.1 * people + 0.3 * rng.normal()) * 10) / 10);
    out.rh_pct.push(Math.round((50 + 0.3 * people + rng.normal()) * 10) / 10);
  }
  return out;
}

/** A school-style day repeated: pupils arrive, leave for lunch, return and leave; empty nights. */
export function schoolDays(dayStarts_s: readonly number[], options: { people: number; occupiedSupply_m3s: number; emptySupply_m3s: number }): TimetableEntry[] {
  const h = 3600;
  const out: TimetableEntry[] = [];
  for (const d of dayStarts_s) {
    out.push({ from_s: d, people: 0, supply_m3s: options.emptySupply_m3s });
    out.push({ from_s: d + 9 * h, people: options.people, supply_m3s: options.occupiedSupply_m3s });
    out.push({ from_s: d + 12 * h, people: 0, supply_m3s: options.emptySupply_m3s });
    out.push({ from_s: d + 13 * h, people: options.people, supply_m3s: options.occupiedSupply_m3s });
    out.push({ from_s: d + 15.5 * h, people: 0, supply_m3s: options.emptySupply_m3s });
  }
  return out;
}

/**
 * An invented school room over whole days: outdoor 420 ppm, 4.5e-6 m³/s of CO2 per pupil
 * (a seated child or adult, within references.md §1.3's range), an exact meter with 6 ppm noise
 * unless one is given, pupils on the schoolDays timetable.
 */
export function schoolRoom(o: {
  start_s: number;
  days: number;
  step_s: number;
  volume_m3: number;
  people: number;
  occupiedSupply_m3s: number;
  emptySupply_m3s: number;
  seed: number;
  meter?: RoomRecordSpec['meter'];
}): RoomRecord {
  const dayStarts = Array.from({ length: o.days + 1 }, (_, k) => o.start_s + k * 86400);
  return simulateRoom({
    start_s: o.start_s,
    step_s: o.step_s,
    count: Math.round((o.days * 86400) / o.step_s),
    volume_m3: o.volume_m3,
    outdoor_ppm: 420,
    perPerson_m3s: 4.5e-6,
    timetable: schoolDays(dayStarts, o),
    meter: o.meter ?? { offset_ppm: 0, gain: 1, noise_ppm: 6 },
    seed: o.seed,
  });
}

/** Local wall-clock parts of a UTC instant in a zone (test-side, independent of the importer's code path). */
const formats = new Map<string, Intl.DateTimeFormat>();
export function localParts(utc_s: number, zone: string): { y: number; mo: number; d: number; h: number; mi: number; s: number } {
  let f = formats.get(zone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-GB', { timeZone: zone, hourCycle: 'h23', year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', second: '2-digit' });
    formats.set(zone, f);
  }
  const p = Object.fromEntries(f.formatToParts(new Date(utc_s * 1000)).map((x) => [x.type, x.value]));
  return { y: Number(p.year), mo: Number(p.month), d: Number(p.day), h: Number(p.hour), mi: Number(p.minute), s: Number(p.second) };
}

const pad = (n: number, w = 2) => String(n).padStart(w, '0');

/** Our own invented time writings. */
export type TimeWriting =
  | 'iso-local'
  | 'iso-offset'
  | 'iso-utc'
  | 'day-first'
  | 'month-first-ampm'
  | 'dotted-day-first'
  | 'separate-date-time'
  | 'epoch-seconds'
  | 'epoch-milliseconds'
  | 'spreadsheet-days';

/** The time cell(s) for a UTC instant. */
export function writeTime(utc_s: number, writing: TimeWriting, zone: string): string[] {
  const l = localParts(utc_s, zone);
  const offsetMin = Math.round((Date.UTC(l.y, l.mo - 1, l.d, l.h, l.mi, l.s) / 1000 - utc_s) / 60);
  switch (writing) {
    case 'iso-local':
      return [`${l.y}-${pad(l.mo)}-${pad(l.d)} ${pad(l.h)}:${pad(l.mi)}:${pad(l.s)}`];
    case 'iso-offset': {
      const sign = offsetMin < 0 ? '-' : '+';
      const a = Math.abs(offsetMin);
      return [`${l.y}-${pad(l.mo)}-${pad(l.d)}T${pad(l.h)}:${pad(l.mi)}:${pad(l.s)}${sign}${pad(Math.floor(a / 60))}:${pad(a % 60)}`];
    }
    case 'iso-utc':
      return [new Date(utc_s * 1000).toISOString()];
    case 'day-first':
      return [`${pad(l.d)}/${pad(l.mo)}/${l.y} ${pad(l.h)}:${pad(l.mi)}`];
    case 'dotted-day-first':
      return [`${pad(l.d)}.${pad(l.mo)}.${l.y} ${pad(l.h)}:${pad(l.mi)}:${pad(l.s)}`];
    case 'month-first-ampm': {
      const h12 = l.h % 12 === 0 ? 12 : l.h % 12;
      return [`${l.mo}/${l.d}/${l.y} ${h12}:${pad(l.mi)}:${pad(l.s)} ${l.h < 12 ? 'AM' : 'PM'}`];
    }
    case 'separate-date-time':
      return [`${pad(l.d)}/${pad(l.mo)}/${l.y}`, `${pad(l.h)}:${pad(l.mi)}:${pad(l.s)}`];
    case 'epoch-seconds':
      return [String(utc_s)];
    case 'epoch-milliseconds':
      return [String(utc_s * 1000)];
    case 'spreadsheet-days':
      return [(Date.UTC(l.y, l.mo - 1, l.d, l.h, l.mi, l.s) / 86400_000 + 25569).toFixed(6)];
  }
}

export interface FileShape {
  delimiter: ',' | ';' | '\t' | '|';
  decimalComma?: boolean;
  preamble?: string[];
  /** Units in a line of their own under the header instead of in the names. */
  unitsLine?: boolean;
  fahrenheit?: boolean;
  writing: TimeWriting;
  zone: string;
  lineEnd?: '\n' | '\r\n';
}

/** Write a record as the text of an invented logger file. */
export function writeLoggerFile(record: RoomRecord, shape: FileShape): string {
  const d = shape.delimiter;
  const num = (v: number) => (shape.decimalComma ? String(v).replace('.', ',') : String(v));
  const timeNames = shape.writing === 'separate-date-time' ? ['Date', 'Clock'] : ['Timestamp'];
  const tempUnit = shape.fahrenheit ? '°F' : '°C';
  const names = shape.unitsLine ? [...timeNames, 'CO2', 'Air temp', 'Humidity'] : [...timeNames, 'CO2 (ppm)', `Air temp [${tempUnit}]`, 'Humidity (%RH)'];
  const lines = [...(shape.preamble ?? []), names.join(d)];
  if (shape.unitsLine) lines.push([...timeNames.map(() => ''), 'ppm', tempUnit, '%'].join(d));
  for (let i = 0; i < record.times_s.length; i++) {
    const temp = shape.fahrenheit ? Math.round((record.temp_C[i]! * 9) / 5 * 10 + 320) / 10 : record.temp_C[i]!;
    lines.push([...writeTime(record.times_s[i]!, shape.writing, shape.zone), String(record.readCo2[i]), num(temp), num(record.rh_pct[i]!)].join(d));
  }
  return lines.join(shape.lineEnd ?? '\n') + (shape.lineEnd ?? '\n');
}
