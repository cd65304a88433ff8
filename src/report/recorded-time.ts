/**
 * Times as the surveyor recorded them. A survey's times are ISO 8601 with an offset
 * ("2026-01-14T07:45:00Z"); the report prints the clock time written in the record and names
 * its offset, so a report made anywhere shows the same times (no device time zone involved).
 *
 * Example: recordedDateTime('2026-01-14T07:45:00Z') = '14 January 2026, 07:45 UTC'.
 */
const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

interface Parts {
  year: number;
  month: number;
  day: number;
  hh: string;
  mm: string;
  zone: string;
}

function parts(iso: string): Parts | null {
  const m = /^(\d{4})-(\d{2})-(\d{2})(?:T(\d{2}):(\d{2})(?::\d{2}(?:\.\d+)?)?(Z|[+-]\d{2}:\d{2})?)?/.exec(iso);
  if (!m) return null;
  const zone = m[6] === undefined ? '' : m[6] === 'Z' ? 'UTC' : `UTC${m[6]}`;
  return { year: Number(m[1]), month: Number(m[2]), day: Number(m[3]), hh: m[4] ?? '00', mm: m[5] ?? '00', zone };
}

/** '14 January 2026' from an ISO date or date-time. */
export function recordedDate(iso: string): string {
  const p = parts(iso);
  return p ? `${p.day} ${MONTHS[p.month - 1]} ${p.year}` : iso;
}

/** '07:45' from an ISO date-time, as written in it. */
export function recordedClock(iso: string): string {
  const p = parts(iso);
  return p ? `${p.hh}:${p.mm}` : iso;
}

/** 'UTC' or 'UTC+01:00': the offset the record was written in ('' for a plain date). */
export function recordedZone(iso: string): string {
  return parts(iso)?.zone ?? '';
}

/** '14 January 2026, 07:45 UTC'. */
export function recordedDateTime(iso: string): string {
  const zone = recordedZone(iso);
  return `${recordedDate(iso)}, ${recordedClock(iso)}${zone ? ` ${zone}` : ''}`;
}

/**
 * Seconds since the record's own midnight, counting whole days from `dayOf` (an ISO date), for
 * chart axes. Example: clockSeconds('2026-01-14T07:45:00Z', '2026-01-14') = 27900.
 */
export function clockSeconds(iso: string, dayOf: string): number {
  const p = parts(iso);
  const d = parts(dayOf);
  if (!p || !d) return Number.NaN;
  const days = (Date.UTC(p.year, p.month - 1, p.day) - Date.UTC(d.year, d.month - 1, d.day)) / 86_400_000;
  const seconds = /T\d{2}:\d{2}:(\d{2})/.exec(iso)?.[1] ?? '0';
  return days * 86_400 + Number(p.hh) * 3600 + Number(p.mm) * 60 + Number(seconds);
}
