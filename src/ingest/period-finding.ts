/**
 * The periods in a logged CO2 series worth fitting: occupied build-ups, near-steady occupied
 * plateaus and decays (after a lesson, at the end of the day, overnight), and the stretches to
 * leave out: gaps in the record, door-open spikes, combustion and the caller's own exclusions.
 *
 * Method (our own construction; thresholds are common practice (no published source)):
 * 1. Split the record at gaps (a step over 5 × the usual step and over 20 minutes).
 * 2. Smooth with a running median over about 15 minutes (rolling-median.ts); the noise is the
 *    robust spread (1.4826 × median absolute deviation) of the readings about it. Readings more
 *    than max(8 × noise, 100 ppm) off it for up to half the window are spikes (a door opened
 *    by the logger, someone breathing on it) and are excluded from fits.
 * 3. Walk the smoothed series for turning points: a fall counts once the level drops by
 *    max(8 × noise, 60 ppm, 30 % of its excess over the baseline), a rise once it climbs by
 *    max(8 × noise, 60 ppm). Plateau wobbles and brief dips stay inside the plateau, so no decay
 *    is found inside an occupied plateau.
 * 4. A decay starts where the level leaves the top (the last point within max(2 × noise, 3 % of
 *    the fall) of it, then placed on the readings by a two-line change point, corner-refinement.ts)
 *    and ends where it reaches within 5 % of the fall of the bottom, or where the
 *    next rise begins if it is cut short. A build-up starts where the level leaves the bottom
 *    and ends within 5 % of the rise of the top; the rest up to the next decay, when 30 minutes
 *    or longer, is a near-steady plateau.
 * 5. Combustion: a rise that starts outside the caller's occupied times, or climbs faster than
 *    the stated occupants could make it (volume and head count given), or, with neither, more than
 *    three times as steep as the file's other rises and over 30 ppm/min, is flagged (a heuristic:
 *    flames or a heater can also raise CO2 slowly).
 *
 * Times in s (epoch UTC), levels in ppm. The baseline is the caller's outdoor level or else the
 * 2nd percentile of the smoothed record.
 *
 * Example: a school day logged each minute (420 ppm overnight, pupils 09:00–12:00 and
 * 13:00–15:30) → build-ups from 09:00 and 13:00, plateaus to 12:00 and 15:30, decays from 12:00
 * (cut at 13:00) and from 15:30 (into the night).
 */
import { ingestWarning, type IngestWarning } from './ingest-warnings.ts';
import { refineCorner } from './corner-refinement.ts';
import { rollingMedian } from './rolling-median.ts';

export type PeriodKind = 'decay' | 'build-up' | 'steady' | 'excluded';
export type ExclusionReason = 'gap' | 'door-open' | 'caller';

/** A window of time, s (epoch UTC), with a reason where it is an exclusion. */
export interface TimeWindow {
  from_s: number;
  to_s: number;
  reason?: string;
}

/** People present over a window. */
export interface OccupiedWindow extends TimeWindow {
  count: number;
}

export interface PeriodFindingOptions {
  /** Outdoor level, ppm (the baseline excess is measured from). */
  outdoor_ppm?: number;
  /** Windows to leave out (a gas hob on, a heater, a known disturbance). */
  exclusions?: readonly TimeWindow[];
  /** When people were in the room, if known. */
  occupancy?: readonly OccupiedWindow[];
  /** Room volume, m³, and the most people the room held: for the combustion check. */
  volume_m3?: number;
  maxOccupants?: number;
}

export interface FoundPeriod {
  kind: PeriodKind;
  start_s: number;
  end_s: number;
  /** For 'excluded': why. */
  exclusion?: ExclusionReason;
  /** Index range in the series, inclusive. */
  first: number;
  last: number;
  /** How it was found, in words. */
  note: string;
  warnings: IngestWarning[];
}

export interface PeriodFinding {
  periods: FoundPeriod[];
  /** 1 where a reading may be used in a fit (finite, not a spike, not excluded). */
  usable: Uint8Array;
  /** The smoothed series, ppm. */
  smoothed: Float64Array;
  noise_ppm: number;
  baseline_ppm: number;
  /** Usual time between readings, s. */
  step_s: number;
}

const MINUTE = 60;
/** Length of the smoothing window, s (common practice (no published source)). */
const SMOOTHING_S = 15 * MINUTE;
const MIN_PLATEAU_S = 30 * MINUTE;
/** A typical seated adult's CO2 output, m³/s: 0.0052 L/s (references.md §1.1, older ASHRAE method). */
const ADULT_OUTPUT_M3S = 5.2e-6;

function medianOf(values: Float64Array): number {
  if (values.length === 0) return NaN;
  const sorted = Float64Array.from(values).sort();
  return sorted[Math.floor(sorted.length / 2)]!;
}

function percentile(values: Float64Array, p: number): number {
  const finite = values.filter((v) => Number.isFinite(v)).sort();
  return finite.length ? finite[Math.min(finite.length - 1, Math.floor(p * finite.length))]! : NaN;
}

function overlaps(a0: number, a1: number, w: TimeWindow): boolean {
  return a0 < w.to_s && w.from_s < a1;
}

/** Find the periods of a CO2 series. */
export function findPeriods(times: Float64Array, co2: Float64Array, options: PeriodFindingOptions = {}): PeriodFinding {
  const n = times.length;
  const usable = new Uint8Array(n);
  let validCount = 0;
  const valid = new Uint32Array(n);
  for (let i = 0; i < n; i++) if (Number.isFinite(co2[i]!)) valid[validCount++] = i;
  const steps = new Float64Array(Math.max(0, validCount - 1));
  for (let k = 1; k < validCount; k++) steps[k - 1] = times[valid[k]!]! - times[valid[k - 1]!]!;
  const step = steps.length ? medianOf(steps) : MINUTE;
  const half = Math.max(2, Math.round(SMOOTHING_S / 2 / step));
  const gapLimit = Math.max(5 * step, 20 * MINUTE);
  const periods: FoundPeriod[] = [];

  // 1. Blocks between gaps (each a run of positions in `valid`).
  const blocks: Uint32Array[] = [];
  let blockStart = 0;
  for (let k = 1; k <= validCount; k++) {
    if (k < validCount && times[valid[k]!]! - times[valid[k - 1]!]! <= gapLimit) continue;
    blocks.push(valid.subarray(blockStart, k));
    if (k < validCount) {
      const a = valid[k - 1]!;
      const b = valid[k]!;
      periods.push(excluded('gap', a, b, times, `No readings for ${Math.round((times[b]! - times[a]!) / 60)} minutes.`));
    }
    blockStart = k;
  }

  // 2. Smoothing, noise and spikes.
  const smoothed = new Float64Array(n).fill(NaN);
  const residuals = new Float64Array(validCount);
  let r = 0;
  for (const block of blocks) {
    const levels = new Float64Array(block.length);
    for (let k = 0; k < block.length; k++) levels[k] = co2[block[k]!]!;
    const s = rollingMedian(levels, half);
    for (let k = 0; k < block.length; k++) {
      smoothed[block[k]!] = s[k]!;
      residuals[r++] = Math.abs(levels[k]! - s[k]!);
    }
  }
  const noise = Math.max(2, 1.4826 * medianOf(residuals));
  const spikeLimit = Math.max(8 * noise, 100);
  const off = (i: number) => Math.abs(co2[i]! - smoothed[i]!) > spikeLimit;
  for (const block of blocks) {
    let k = 0;
    while (k < block.length) {
      if (!off(block[k]!)) {
        usable[block[k]!] = 1;
        k++;
        continue;
      }
      let end = k;
      while (end + 1 < block.length && off(block[end + 1]!)) end++;
      if (end - k + 1 <= half) {
        let size = 0;
        for (let j = k; j <= end; j++) size = Math.max(size, Math.abs(co2[block[j]!]! - smoothed[block[j]!]!));
        const before = block[Math.max(0, k - 1)]!;
        const after = block[Math.min(block.length - 1, end + 1)]!;
        periods.push(excluded('door-open', before, after, times, `A brief excursion of ${Math.round(size)} ppm (a door or window opened by the logger, or someone close to it).`));
      } else {
        for (let j = k; j <= end; j++) usable[block[j]!] = 1;
      }
      k = end + 1;
    }
  }
  for (const w of options.exclusions ?? []) {
    const inside = Array.from(valid.subarray(0, validCount)).filter((i) => times[i]! >= w.from_s && times[i]! <= w.to_s);
    for (const i of inside) usable[i] = 0;
    periods.push({
      kind: 'excluded',
      exclusion: 'caller',
      start_s: w.from_s,
      end_s: w.to_s,
      first: inside[0] ?? -1,
      last: inside[inside.length - 1] ?? -1,
      note: w.reason ?? 'Left out by the surveyor.',
      warnings: [ingestWarning('excluded-by-caller', `Left out: ${w.reason ?? 'marked by the surveyor'}.`)],
    });
  }

  // 3–4. Turning points and periods, block by block.
  const baseline = options.outdoor_ppm ?? percentile(smoothed, 0.02);
  const delta = Math.max(8 * noise, 60);
  const found: FoundPeriod[] = [];
  // A corner near block position k, placed on the readings (a block position again).
  const corner = (k: number, block: Uint32Array) => {
    const lo = Math.max(0, k - 2 * half);
    const at = refineCorner(times, co2, usable, block[lo]!, block[Math.min(block.length - 1, k + 2 * half)]!, block[k]!);
    // Block positions rise with series indexes: search only the window.
    let i = lo;
    while (i < block.length && block[i]! < at) i++;
    return i;
  };
  for (const block of blocks) if (block.length >= 5) found.push(...blockPeriods(block, times, smoothed, noise, baseline, delta, (k) => corner(k, block)));

  // 5. Combustion and occupancy checks on rises.
  flagRises(found, times, smoothed, half, options);
  periods.push(...found);
  periods.sort((a, b) => a.start_s - b.start_s || a.end_s - b.end_s);
  return { periods, usable, smoothed, noise_ppm: noise, baseline_ppm: baseline, step_s: step };
}

function excluded(reason: 'gap' | 'door-open', first: number, last: number, times: Float64Array, note: string): FoundPeriod {
  return { kind: 'excluded', exclusion: reason, start_s: times[first]!, end_s: times[last]!, first, last, note, warnings: [ingestWarning(reason, note)] };
}

interface Turn {
  at: number; // position in block
  kind: 'peak' | 'trough';
}

function turningPoints(s: (k: number) => number, length: number, baseline: number, delta: number): Turn[] {
  const fall = (top: number) => Math.max(delta, 0.3 * (top - baseline));
  const turns: Turn[] = [];
  let dir = 0;
  let hi = 0;
  let lo = 0;
  for (let k = 1; k < length; k++) {
    const v = s(k);
    if (dir >= 0 && v > s(hi)) hi = k;
    if (dir <= 0 && v < s(lo)) lo = k;
    if (dir >= 0 && v <= s(hi) - fall(s(hi))) {
      turns.push({ at: hi, kind: 'peak' });
      dir = -1;
      lo = k;
    } else if (dir <= 0 && v >= s(lo) + delta) {
      turns.push({ at: lo, kind: 'trough' });
      dir = 1;
      hi = k;
    }
  }
  // The ends of the block close the first and last segments.
  const first: Turn = { at: 0, kind: turns[0]?.kind === 'peak' ? 'trough' : 'peak' };
  const lastKind = turns.length === 0 ? 'peak' : turns[turns.length - 1]!.kind === 'peak' ? 'trough' : 'peak';
  const last: Turn = { at: dir > 0 ? hi : dir < 0 ? lo : length - 1, kind: lastKind };
  const all = [first, ...turns];
  if (last.at > all[all.length - 1]!.at) all.push(last);
  return all;
}

function blockPeriods(
  block: Uint32Array,
  times: Float64Array,
  smoothed: Float64Array,
  noise: number,
  baseline: number,
  delta: number,
  corner: (position: number) => number,
): FoundPeriod[] {
  // A sharp corner placed on the readings, kept inside [lo, hi] (block positions).
  const sharpen = (k: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, corner(k)));
  const s = (k: number) => smoothed[block[k]!]!;
  const t = (k: number) => times[block[k]!]!;
  const turns = turningPoints(s, block.length, baseline, delta);
  const out: FoundPeriod[] = [];
  const make = (kind: PeriodKind, a: number, b: number, note: string): FoundPeriod => ({
    kind,
    start_s: t(a),
    end_s: t(b),
    first: block[a]!,
    last: block[b]!,
    note,
    warnings: [],
  });
  let plateauFrom: number | null = null;
  for (let j = 0; j + 1 < turns.length; j++) {
    const a = turns[j]!;
    const b = turns[j + 1]!;
    const size = Math.abs(s(b.at) - s(a.at));
    if (size < delta) continue;
    const edge = Math.max(2 * noise, 0.03 * size);
    const near = Math.max(2 * noise, 0.05 * size);
    if (a.kind === 'peak') {
      // Fall: decay.
      let start = a.at;
      for (let k = a.at; k <= b.at; k++) if (s(k) >= s(a.at) - edge) start = k;
      start = sharpen(start, a.at, b.at);
      const cutShort = s(b.at) - baseline > 0.2 * (s(a.at) - baseline) && b.at < block.length - 1;
      let end = b.at;
      if (cutShort) end = sharpen(b.at, start, block.length - 1);
      else for (let k = start; k <= b.at; k++) if (s(k) <= s(b.at) + near) { end = k; break; }
      if (plateauFrom !== null && t(start) - t(plateauFrom) >= MIN_PLATEAU_S) {
        out.push(make('steady', plateauFrom, start, `Level held near ${Math.round(s(start))} ppm.`));
      }
      plateauFrom = null;
      if (end > start) out.push(make('decay', start, end, `Fell from ${Math.round(s(start))} to ${Math.round(s(end))} ppm.`));
    } else {
      // Rise: build-up, then perhaps a plateau.
      let start = a.at;
      for (let k = a.at; k <= b.at; k++) if (s(k) <= s(a.at) + edge) start = k;
      start = sharpen(start, Math.max(0, a.at - 1), b.at);
      let end = b.at;
      for (let k = start; k <= b.at; k++) if (s(k) >= s(b.at) - near) { end = k; break; }
      if (end > start) out.push(make('build-up', start, end, `Rose from ${Math.round(s(start))} to ${Math.round(s(end))} ppm.`));
      plateauFrom = end;
    }
  }
  if (plateauFrom !== null && t(block.length - 1) - t(plateauFrom) >= MIN_PLATEAU_S) {
    out.push(make('steady', plateauFrom, block.length - 1, `Level held near ${Math.round(s(block.length - 1))} ppm to the end of the record.`));
  }
  return out;
}

/** Steepest smoothed climb over a build-up, ppm/s, measured over the smoothing window. */
function steepestRise(p: FoundPeriod, times: Float64Array, smoothed: Float64Array, half: number): number {
  let best = 0;
  for (let i = p.first; i + half <= p.last; i++) {
    const dt = times[i + half]! - times[i]!;
    if (dt > 0) best = Math.max(best, (smoothed[i + half]! - smoothed[i]!) / dt);
  }
  return best;
}

function flagRises(found: FoundPeriod[], times: Float64Array, smoothed: Float64Array, half: number, options: PeriodFindingOptions): void {
  const rises = found.filter((p) => p.kind === 'build-up');
  const slopes = rises.map((p) => steepestRise(p, times, smoothed, half));
  const typical = slopes.length >= 3 ? [...slopes].sort((a, b) => a - b)[Math.floor(slopes.length / 2)]! : NaN;
  for (const [k, p] of rises.entries()) {
    const slope = slopes[k]!;
    const occupancy = options.occupancy;
    if (occupancy && occupancy.length && !occupancy.some((w) => overlaps(p.start_s - 10 * MINUTE, p.start_s + 10 * MINUTE, w) && w.count > 0)) {
      p.warnings.push(
        ingestWarning('unoccupied-rise', 'CO2 rose while nobody was recorded in the room: a flame, a heater or unrecorded people. Left out of the fits unless you accept it.'),
      );
      continue;
    }
    if (options.volume_m3 && options.maxOccupants) {
      const people = (options.volume_m3 * slope * 1e-6) / ADULT_OUTPUT_M3S;
      if (people > 1.5 * options.maxOccupants) {
        p.warnings.push(
          ingestWarning(
            'combustion-suspected',
            `CO2 climbed at ${Math.round(slope * 60)} ppm/min, as fast as about ${Math.round(people)} seated adults with no air supply would make it, more than the ${options.maxOccupants} people the room held: a flame or heater is likely (a heuristic check).`,
          ),
        );
      }
    } else if (Number.isFinite(typical) && slope > 3 * typical && slope * 60 > 30) {
      p.warnings.push(
        ingestWarning(
          'combustion-suspected',
          `CO2 climbed at ${Math.round(slope * 60)} ppm/min, over three times as steeply as the other rises in this file: check for a flame, a heater or a crowd (a heuristic check).`,
        ),
      );
    }
  }
}
