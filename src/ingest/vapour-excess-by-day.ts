/**
 * The vapour-pressure excess (inside − outside, Pa) by local day from a logged temperature and
 * humidity series, for the damp diagnosis: the engine's vapourPressureExcess (daily means of
 * Hyland–Wexler vapour pressures, ISO 13788 Annex A classes) fed with days counted in the
 * survey's time zone. Outdoor comes from a second logged series (each inside reading paired
 * with the outdoor value interpolated at its time, when an outdoor reading lies within an hour
 * either side) or from a constant.
 *
 * Example: two local days of 20 °C / 60 % inside against a constant 5 °C / 85 % outside →
 * each day's excess 661.6 Pa (as the engine's own example), days labelled '2024-01-08',
 * '2024-01-09'.
 */
import { vapourPressureExcess, type VapourPressureExcessResult } from '../core/vapour-pressure-excess.ts';
import type { HumidityClass } from '../core/humidity-classes.ts';
import { ingestWarning, type IngestWarning } from './ingest-warnings.ts';
import { zoneClock } from './zone-clock.ts';

export interface HumiditySeries {
  times_s: Float64Array;
  temp_C: Float64Array;
  rh_pct: Float64Array;
}

export type OutdoorHumidity = ({ kind: 'series' } & HumiditySeries) | { kind: 'constant'; temp_C: number; rh_pct: number };

export interface VapourExcessByDay {
  result: VapourPressureExcessResult;
  /** The local date of each entry of result.days, YYYY-MM-DD. */
  dayLabels: string[];
  /** Inside readings with no outdoor reading near enough to pair. */
  unpaired: number;
  warnings: IngestWarning[];
}

/** Outdoor readings further than this from an inside reading are not paired with it, s (our own choice). */
const PAIRING_LIMIT_S = 3600;

/**
 * The outdoor value at t: linear between the readings either side; the nearest reading at the
 * ends or across a long gap, when within the pairing limit; NaN otherwise. `from` is where the
 * search starts (inside times rise, so the search only moves on).
 */
function interpolate(times: Float64Array, values: Float64Array, t: number, from: number): { value: number; at: number } {
  let k = from;
  while (k + 1 < times.length && times[k + 1]! <= t) k++;
  const before = times[k]! <= t ? k : -1;
  const after = before < 0 ? k : k + 1 < times.length ? k + 1 : -1;
  if (before >= 0 && after >= 0) {
    const [t0, t1] = [times[before]!, times[after]!];
    if (t - t0 <= PAIRING_LIMIT_S || t1 - t <= PAIRING_LIMIT_S) {
      const w = (t - t0) / (t1 - t0);
      return { value: values[before]! * (1 - w) + values[after]! * w, at: k };
    }
    return { value: NaN, at: k };
  }
  const near = before >= 0 ? before : after;
  return { value: near >= 0 && Math.abs(times[near]! - t) <= PAIRING_LIMIT_S ? values[near]! : NaN, at: k };
}

export function vapourExcessByDay(inside: HumiditySeries, outdoor: OutdoorHumidity, timeZone: string, expectedClass?: HumidityClass): VapourExcessByDay | { error: IngestWarning } {
  const zone = zoneClock(timeZone);
  if (!zone) return { error: ingestWarning('unknown-time-zone', `"${timeZone}" is not a time zone name this device knows.`) };
  const insideTemp: number[] = [];
  const insideRh: number[] = [];
  const outsideTemp: number[] = [];
  const outsideRh: number[] = [];
  const days: number[] = [];
  let unpaired = 0;
  let at = 0;
  for (let i = 0; i < inside.times_s.length; i++) {
    const t = inside.times_s[i]!;
    let te: number;
    let re: number;
    if (outdoor.kind === 'constant') [te, re] = [outdoor.temp_C, outdoor.rh_pct];
    else {
      const a = interpolate(outdoor.times_s, outdoor.temp_C, t, at);
      te = a.value;
      re = interpolate(outdoor.times_s, outdoor.rh_pct, t, a.at).value;
      at = a.at;
    }
    if (!Number.isFinite(te) || !Number.isFinite(re)) {
      unpaired++;
      continue;
    }
    insideTemp.push(inside.temp_C[i]!);
    insideRh.push(inside.rh_pct[i]!);
    outsideTemp.push(te);
    outsideRh.push(re);
    days.push(Math.floor((t + zone.offsetAt(t)) / 86400));
  }
  const result = vapourPressureExcess({ insideTemp_C: insideTemp, insideRh_pct: insideRh, outsideTemp_C: outsideTemp, outsideRh_pct: outsideRh, day: { kind: 'index', days }, expectedClass });
  const warnings: IngestWarning[] = [];
  if (unpaired > 0) {
    warnings.push(ingestWarning('outdoor-series-short', `${unpaired} inside reading(s) had no outdoor reading within an hour and were left out.`));
  }
  return { result, dayLabels: result.days.map((d) => new Date(d.day * 86400_000).toISOString().slice(0, 10)), unpaired, warnings };
}
