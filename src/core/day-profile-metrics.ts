/**
 * Figures of a day profile that criteria are written in: mean over the occupied period, peak,
 * time above a level, the longest continuous run above it, and the highest mean over a rolling
 * window (for example 20 consecutive minutes). Means, peaks and threshold times are exact
 * (each piece is monotone, so crossings come from timeToReach and integrals are closed-form);
 * the rolling-window maximum is found by a scan and a golden-section refinement of exact window
 * means.
 */
import { levelAfter, timeToReach } from './balance.ts';
import { levelIntegralTo, type DayProfile } from './day-profile.ts';
import { minimizeByGoldenSection } from './golden-section.ts';
import { warn, type EngineWarning } from './warnings.ts';

/** Which part of the day the figures describe. */
export type MetricPeriod = 'occupied' | 'whole';

/** Options. */
export interface ProfileMetricsOptions {
  /** Level for time-above figures, ppm. */
  threshold_ppm: number;
  /** Rolling window, s (default 1200 s = 20 minutes). */
  window_s?: number;
  /** 'occupied' (default): only times when someone is present; 'whole': the entire profile. */
  period?: MetricPeriod;
}

/** The figures. Levels in ppm, durations in s, times in s from midnight. null where undefined. */
export interface ProfileMetrics {
  period: MetricPeriod;
  /** Total duration of the period, s. */
  duration_s: number;
  mean_ppm: number | null;
  peak_ppm: number | null;
  peakTime_s: number | null;
  timeAbove_s: number;
  longestRunAbove_s: number;
  /** Highest mean over any window of window_s lying wholly in one continuous stretch of the period. */
  highestRollingMean_ppm: number | null;
  highestRollingMeanStart_s: number | null;
  window_s: number;
  threshold_ppm: number;
  warnings: EngineWarning[];
}

/** Merge adjacent pieces into continuous spans of the chosen period: [start, end] pairs. */
function spansOf(profile: DayProfile, period: MetricPeriod): [number, number][] {
  const spans: [number, number][] = [];
  for (const piece of profile.pieces) {
    if (period === 'occupied' && !(piece.occupants > 0)) continue;
    const last = spans[spans.length - 1];
    if (last && last[1] === piece.start_s) last[1] = piece.end_s;
    else spans.push([piece.start_s, piece.end_s]);
  }
  return spans;
}

/** Highest window mean in [a, b] for a window of w (b − a ≥ w): scan then golden refinement. */
function highestWindowMean(profile: DayProfile, a: number, b: number, w: number): [number, number] {
  const mean = (s: number): number => (levelIntegralTo(profile, s + w) - levelIntegralTo(profile, s)) / w;
  const last = b - w;
  const step = Math.min(60, w / 10);
  const count = Math.max(1, Math.ceil((last - a) / step));
  let bestS = a;
  let best = mean(a);
  for (let k = 1; k <= count; k++) {
    const s = Math.min(a + k * step, last);
    const m = mean(s);
    if (m > best) {
      best = m;
      bestS = s;
    }
  }
  const refined = minimizeByGoldenSection((s) => -mean(s), Math.max(a, bestS - step), Math.min(last, bestS + step), 1e-3);
  const refinedMean = mean(refined);
  return refinedMean > best ? [refinedMean, refined] : [best, bestS];
}

/**
 * Compute the figures of a profile.
 * Example: a profile that is one 3600 s piece rising from 450 towards 1316 ppm (the §7.2
 * classroom at 100 L/s), period 'whole', threshold 1000 ppm, 20-minute window → mean 985.9, peak 1235.9 at the
 * end, 2076 s above 1000 ppm in one run, highest 20-minute mean 1193.8 ppm over the last 20 minutes.
 */
export function profileMetrics(profile: DayProfile, options: ProfileMetricsOptions): ProfileMetrics {
  const period = options.period ?? 'occupied';
  const window_s = options.window_s ?? 1200;
  const threshold = options.threshold_ppm;
  const warnings: EngineWarning[] = [];
  const spans = spansOf(profile, period);
  let duration = 0;
  let integral = 0;
  let peak: number | null = null;
  let peakTime: number | null = null;
  let timeAbove = 0;
  let longest = 0;
  let rolling: number | null = null;
  let rollingStart: number | null = null;

  for (const [a, b] of spans) {
    duration += b - a;
    integral += levelIntegralTo(profile, b) - levelIntegralTo(profile, a);
    let run = 0;
    for (const piece of profile.pieces) {
      if (piece.end_s <= a || piece.start_s >= b) continue;
      const from = Math.max(a, piece.start_s);
      const to = Math.min(b, piece.end_s);
      const c0 = levelAfter(piece.conditions, piece.startLevel_ppm, from - piece.start_s);
      const c1 = levelAfter(piece.conditions, piece.startLevel_ppm, to - piece.start_s);
      for (const [level, time] of [
        [c0, from],
        [c1, to],
      ] as const) {
        if (peak === null || level > peak) {
          peak = level;
          peakTime = time;
        }
      }
      // Each piece is monotone: the part above the threshold is at its start or at its end.
      const crossing = Math.min(to - from, timeToReach(piece.conditions, c0, threshold));
      let aboveAtStart = 0;
      let aboveAtEnd = 0;
      if (c0 > threshold) aboveAtStart = crossing;
      else if (c1 > threshold) aboveAtEnd = to - from - crossing;
      if (aboveAtStart > 0) {
        run += aboveAtStart;
        longest = Math.max(longest, run);
        if (aboveAtStart < to - from) run = 0;
      } else {
        run = 0;
      }
      if (aboveAtEnd > 0) {
        run = aboveAtEnd;
        longest = Math.max(longest, run);
      }
      timeAbove += aboveAtStart + aboveAtEnd;
    }
    if (b - a >= window_s) {
      const [m, s] = highestWindowMean(profile, a, b, window_s);
      if (rolling === null || m > rolling) {
        rolling = m;
        rollingStart = s;
      }
    }
  }
  if (spans.length === 0) {
    warnings.push(warn('no-occupied-period', 'Nobody is present at any time in this schedule, so there are no occupied-period figures.'));
  } else if (rolling === null) {
    warnings.push(
      warn(
        'window-longer-than-period',
        `No continuous stretch of the period lasts ${window_s / 60} minutes, so there is no rolling-window figure.`,
      ),
    );
  }
  return {
    period,
    duration_s: duration,
    mean_ppm: duration > 0 ? integral / duration : null,
    peak_ppm: peak,
    peakTime_s: peakTime,
    timeAbove_s: timeAbove,
    longestRunAbove_s: longest,
    highestRollingMean_ppm: rolling,
    highestRollingMeanStart_s: rollingStart,
    window_s,
    threshold_ppm: threshold,
    warnings,
  };
}
