/**
 * The outdoor CO2 level from an outdoor logger's readings over the time of the room measurements:
 * the median, so a passing vehicle, a flue plume or someone breathing near the logger (short
 * spikes, fewer than a quarter of the points) do not drag it, with the middle half of the
 * readings (lower to upper quartile) as its spread.
 *
 * Uncertainty (one standard deviation, ppm):
 * - the spread of the outdoor level during the measurements, from the interquartile range as a
 *   robust standard deviation, IQR / 1.349 (IQR of a normal distribution = 2·Φ⁻¹(0.75) σ =
 *   1.349 σ; standard statistics). It is NOT divided by √n: successive logger points are not
 *   independent, and a room measurement met the outdoor level of its own time, which moved about
 *   the median by about this much. At least the meter noise over √n (a logger that printed the
 *   same value throughout);
 * - on another meter than the room's readings, that meter's offset and gain uncertainty are added
 *   and the level is corrected onto true ppm (as for outdoor spot readings: outdoor-level.ts and
 *   practice.md §1 item 1); on the room's own meter they cancel and the level stays in its scale.
 * A median outside 390–500 ppm is queried (practice.md §2 item 5; common practice (no published
 * source)). Percentiles interpolate linearly (Hyndman & Fan 1996 definition 7; order-statistics.ts).
 *
 * Example: outdoorLoggerLevel([421, 424, 426, 427, 429, 431, 433, 436, 612], same meter, noise
 * 10 ppm) → 429 ppm (the 612 ppm spike left out by the median), quartiles 426 and 433 ppm,
 * sd 7/1.349 = 5.19 ppm.
 */
import { correctedLevel, type MeterErrorModel } from './meter-error.ts';
import { percentilesInPlace } from './order-statistics.ts';
import { outdoorLevel, type OutdoorLevel } from './outdoor-level.ts';
import { warn, type EngineWarning } from './warnings.ts';

/** Interquartile range of a normal distribution in standard deviations: 2·Φ⁻¹(0.75). */
export const NORMAL_IQR_PER_SD = 1.3489795003921634;

/** The outdoor level from a logger, with the figures behind it (ppm, in the level's own scale). */
export interface OutdoorLoggerLevel extends OutdoorLevel {
  /** Median of the logger's points. */
  median_ppm: number;
  /** Lower and upper quartiles: the middle half of the points. */
  lowerQuartile_ppm: number;
  upperQuartile_ppm: number;
  /** Robust spread of the points, IQR / 1.349. */
  spreadSd_ppm: number;
}

/**
 * Outdoor level from an outdoor logger's CO2 points (ppm, as the logger read them) over the
 * measurements' time (see the file note). No points: the default level with its warning.
 */
export function outdoorLoggerLevel(values_ppm: readonly number[], options: { sameMeterAsRoom: boolean; meter: MeterErrorModel }): OutdoorLoggerLevel {
  const n = values_ppm.length;
  if (n === 0) {
    const fallback = outdoorLevel([], options);
    return { ...fallback, median_ppm: fallback.value_ppm, lowerQuartile_ppm: fallback.value_ppm, upperQuartile_ppm: fallback.value_ppm, spreadSd_ppm: fallback.sd_ppm };
  }
  const { meter, sameMeterAsRoom } = options;
  // On another meter every point goes onto true ppm; the correction is monotone, so its median is the median corrected.
  const scale = (v: number) => (sameMeterAsRoom ? v : correctedLevel(v, meter));
  const [lower, median, upper] = percentilesInPlace(Float64Array.from(values_ppm), n, [0.25, 0.5, 0.75]).map(scale) as [number, number, number];
  const spread = (upper - lower) / NORMAL_IQR_PER_SD;
  const level = Math.max(spread, meter.noiseSd_ppm / Math.sqrt(n));
  const sd = sameMeterAsRoom ? level : Math.hypot(level, meter.offsetSd_ppm, meter.gainSd * median);
  const warnings: EngineWarning[] = [];
  if (median < 390 || median > 500) {
    warnings.push(
      warn(
        'outdoor-reading-unusual',
        `The outdoor logger's median is ${Math.round(median)} ppm, outside the usual 390–500 ppm. Check where it stood (away from people, flues, vents and traffic) and its clock and calibration.`,
      ),
    );
  }
  return {
    value_ppm: median,
    sd_ppm: sd,
    sameMeterAsRoom,
    readings: n,
    source: `median of ${n} point${n === 1 ? '' : 's'} (middle half ${Math.round(lower)}–${Math.round(upper)} ppm)${sameMeterAsRoom ? ' on the room meter' : ''}`,
    warnings,
    median_ppm: median,
    lowerQuartile_ppm: lower,
    upperQuartile_ppm: upper,
    spreadSd_ppm: spread,
  };
}
