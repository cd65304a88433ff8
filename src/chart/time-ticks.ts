/**
 * Tick values for a time axis in seconds (seconds since midnight for a day profile, or since a
 * series' first day for logger files): steps of 1, 2, 5, 10, 15, 30 minutes or 1, 2, 3, 6, 12,
 * 24 hours, labelled "HH:MM" (with a day number past the first day).
 *
 * Example: timeTicks(8 * 3600, 16 * 3600, 6) gives steps of 2 h: 08:00, 10:00, 12:00, 14:00, 16:00.
 * Source: common practice (no published source) for clock-time axes.
 */
const STEPS_S = [60, 120, 300, 600, 900, 1800, 3600, 7200, 10800, 21600, 43200, 86400];

export interface TimeTick {
  t_s: number;
  label: string;
}

export function clockLabel(t_s: number): string {
  const day = Math.floor(t_s / 86400);
  const inDay = t_s - day * 86400;
  const h = Math.floor(inDay / 3600);
  const m = Math.floor((inDay - h * 3600) / 60);
  const hhmm = `${String(h).padStart(2, '0')}:${String(m).padStart(2, '0')}`;
  return day === 0 ? hhmm : `day ${day + 1} ${hhmm}`;
}

export function timeTicks(from_s: number, to_s: number, target = 6): TimeTick[] {
  if (!(to_s > from_s)) return [];
  const span = to_s - from_s;
  const step = STEPS_S.find((s) => span / s <= target) ?? Math.ceil(span / target / 86400) * 86400;
  const ticks: TimeTick[] = [];
  for (let t = Math.ceil(from_s / step) * step; t <= to_s; t += step) ticks.push({ t_s: t, label: clockLabel(t) });
  return ticks;
}
