/**
 * Local wall-clock time in an IANA time zone (Europe/London) turned into UTC, and back, with
 * Intl.DateTimeFormat (in every browser and in Node; no time-zone data of our own). A local
 * time can occur twice (clocks go back: the hour after 01:00 in Europe/London on the last
 * Sunday of October) or never (clocks go forward: 01:00–02:00 on the last Sunday of March);
 * both are reported. A repeated time is placed after the previous reading when that is
 * possible, so a logger that writes 01:59 then 01:00 again moves on in time; a skipped time
 * is read with the offset in force before the change.
 *
 * Offsets are cached per hour (of UTC, and of local time for the conversion), so 100,000
 * readings cost a few hundred Intl calls.
 *
 * Example: zoneClock('Europe/London')!.toUtc(Date.UTC(2024, 9, 27, 1, 30) / 1000, -Infinity)
 * = { utc_s: 1729989000 (00:30Z, the first 01:30), kind: 'repeated' }.
 */

export type LocalTimeKind = 'ok' | 'repeated' | 'skipped';

export interface ZoneClock {
  zone: string;
  /** Offset of local time from UTC at a UTC instant, s (east positive). */
  offsetAt(utc_s: number): number;
  /**
   * UTC of a local wall-clock time written as seconds since 1970-01-01 local. For a repeated
   * time the earliest instant after `previous_s` is taken (the later one if none is).
   */
  toUtc(local_s: number, previous_s: number): { utc_s: number; kind: LocalTimeKind };
}

/** The zone's clock, or null when the name is not a time zone this platform knows. */
export function zoneClock(zone: string): ZoneClock | null {
  let format: Intl.DateTimeFormat;
  try {
    format = new Intl.DateTimeFormat('en-US', {
      timeZone: zone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
      second: 'numeric',
      era: 'short',
    });
  } catch {
    return null;
  }
  const exact = (utc_s: number): number => {
    const whole = Math.floor(utc_s);
    const parts: Record<string, string> = {};
    for (const p of format.formatToParts(whole * 1000)) parts[p.type] = p.value;
    const year = parts.era === 'BC' || parts.era === 'B' ? 1 - Number(parts.year) : Number(parts.year);
    const local = Date.UTC(year, Number(parts.month) - 1, Number(parts.day), Number(parts.hour), Number(parts.minute), Number(parts.second)) / 1000;
    return local - whole;
  };
  const cache = new Map<number, number>();
  const offsetAt = (utc_s: number): number => {
    const hour = Math.floor(utc_s / 3600);
    let cached = cache.get(hour);
    if (cached === undefined) {
      const start = exact(hour * 3600);
      // An offset change inside this hour (a half-hour zone): NaN marks "ask each time".
      cached = exact(hour * 3600 + 3599) === start ? start : NaN;
      cache.set(hour, cached);
    }
    return Number.isNaN(cached) ? exact(utc_s) : cached;
  };
  const resolve = (local_s: number, previous_s: number): { utc_s: number; kind: LocalTimeKind } => {
    // The offsets in force a day either side cover any one change (zones change at most twice a year).
    const before = offsetAt(local_s - 86400);
    const after = offsetAt(local_s + 86400);
    if (before === after) {
      const utc = local_s - before;
      if (offsetAt(utc) === before) return { utc_s: utc, kind: 'ok' };
    }
    const candidates = [local_s - before, local_s - after].filter((u, i) => offsetAt(u) === (i === 0 ? before : after));
    if (candidates.length === 0) return { utc_s: local_s - before, kind: 'skipped' };
    if (candidates.length === 1 || candidates[0] === candidates[1]) return { utc_s: candidates[0]!, kind: 'ok' };
    const [early, late] = candidates[0]! < candidates[1]! ? [candidates[0]!, candidates[1]!] : [candidates[1]!, candidates[0]!];
    return { utc_s: early > previous_s ? early : late, kind: 'repeated' };
  };
  // Local hours wholly on one offset: NaN marks an hour that holds a change.
  const localHours = new Map<number, number>();
  let lastHour = NaN;
  let lastOffset = NaN;
  const toUtc = (local_s: number, previous_s: number): { utc_s: number; kind: LocalTimeKind } => {
    const hour = Math.floor(local_s / 3600);
    let offset = hour === lastHour ? lastOffset : localHours.get(hour);
    if (offset === undefined) {
      const a = resolve(hour * 3600, -Infinity);
      const b = resolve(hour * 3600 + 3599, -Infinity);
      offset = a.kind === 'ok' && b.kind === 'ok' && hour * 3600 - a.utc_s === hour * 3600 + 3599 - b.utc_s ? hour * 3600 - a.utc_s : NaN;
      localHours.set(hour, offset);
    }
    lastHour = hour;
    lastOffset = offset;
    return Number.isNaN(offset) ? resolve(local_s, previous_s) : { utc_s: local_s - offset, kind: 'ok' };
  };
  return { zone: format.resolvedOptions().timeZone, offsetAt, toUtc };
}
