/**
 * A moment as ISO 8601 text in the device's local time with its offset, as readings are stored:
 * the clock time the surveyor saw stays in the text (the analysis reads schedules by it).
 *
 * Example: 09:05 on 14 January 2026 in London → '2026-01-14T09:05:00+00:00'.
 */
export function localIso(date: Date): string {
  const pad = (n: number) => String(Math.floor(Math.abs(n))).padStart(2, '0');
  const offset = -date.getTimezoneOffset();
  const sign = offset >= 0 ? '+' : '-';
  return (
    `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}` +
    `T${pad(date.getHours())}:${pad(date.getMinutes())}:${pad(date.getSeconds())}` +
    `${sign}${pad(offset / 60)}:${pad(offset % 60)}`
  );
}

/** The clock time of a stored moment, as recorded ("09:05"). */
export function clockOf(iso: string): string {
  return /T(\d{2}:\d{2})/.exec(iso)?.[1] ?? iso;
}

/**
 * Seconds from midnight on the clock a moment was recorded in (its own hours and minutes,
 * whatever its offset), as charts and schedules use them.
 * Example: clockSeconds('2026-01-14T09:05:00+01:00') = 32 700.
 */
export function clockSeconds(iso: string): number {
  const m = /T(\d{2}):(\d{2})(?::(\d{2}(?:\.\d+)?))?/.exec(iso);
  return m ? Number(m[1]) * 3600 + Number(m[2]) * 60 + Number(m[3] ?? 0) : 0;
}

/**
 * A stored moment with its clock time corrected to "hh:mm", keeping its date and offset (the
 * seconds too when the minute is unchanged); undefined when the time is not "hh:mm".
 * Example: withClockTime('2026-01-14T09:05:30+00:00', '09:15') = '2026-01-14T09:15:00+00:00'.
 */
export function withClockTime(iso: string, hhmm: string): string | undefined {
  if (!/^(?:[01]\d|2[0-3]):[0-5]\d$/.test(hhmm)) return undefined;
  if (clockOf(iso) === hhmm) return iso;
  return iso.replace(/T\d{2}:\d{2}(?::\d{2}(?:\.\d+)?)?/, `T${hhmm}:00`);
}
