/**
 * How a CO2 meter's readings err: reading = gain × true level + offset + noise. Offset and gain
 * are fixed for a meter over a survey (systematic), noise differs reading to reading. A stated
 * accuracy of ±(a ppm + b % of reading) is mostly offset and gain, not random scatter
 * (practice.md §1.1: common practice (no published source) for NDIR meters).
 */
import { fitStraightLine } from './straight-line-fit.ts';

/** A meter's error model. ppm and fractions. */
export interface MeterErrorModel {
  /** Best estimate of the offset (subtracted from readings), ppm. */
  offset_ppm: number;
  /** Standard uncertainty of the offset, ppm. */
  offsetSd_ppm: number;
  /** Best estimate of the gain (readings are divided by it), dimensionless. */
  gain: number;
  /** Standard uncertainty of the gain, as a fraction (0.015 = 1.5 %). */
  gainSd: number;
  /** Reading-to-reading noise, ppm (one standard deviation). */
  noiseSd_ppm: number;
  /** Where the figures came from. */
  source: string;
}

/** Noise assumed when the maker states none, ppm (practice.md §1.1: ±10 ppm; common practice (no published source)). */
export const DEFAULT_NOISE_PPM = 10;

/**
 * Error model from a maker's stated accuracy ±(ppm + percent of reading), read as 95 % bounds:
 * offset sd = ppm/2, gain sd = percent/200, no correction applied.
 * Example: meterErrorFromStatedAccuracy(50, 3) → offsetSd 25 ppm, gainSd 0.015, noise 10 ppm.
 */
export function meterErrorFromStatedAccuracy(ppm: number, percentOfReading: number, noiseSd_ppm = DEFAULT_NOISE_PPM): MeterErrorModel {
  return {
    offset_ppm: 0,
    offsetSd_ppm: ppm / 2,
    gain: 1,
    gainSd: percentOfReading / 200,
    noiseSd_ppm,
    source: `stated accuracy ±(${ppm} ppm + ${percentOfReading} % of reading), taken as 95 % bounds`,
  };
}

/** One pair of a side-by-side check: the reference meter's and this meter's reading, ppm. */
export interface SideBySidePair {
  reference_ppm: number;
  meter_ppm: number;
}

/**
 * Error model from a side-by-side check against a reference meter whose own error is
 * referenceSd_ppm (one sd). Fits meter = gain·reference + offset by least squares when the
 * check spans at least 300 ppm; otherwise (the usual co-location at room level) estimates the
 * offset only and keeps the stated gain uncertainty `fallback.gainSd`. Noise: residual sd.
 * Example: pairs at (420, 452) (800, 843) (1200, 1235) with reference sd 10 → offset 33.7 ppm,
 * gain 1.0036.
 */
export function meterErrorFromSideBySide(
  pairs: readonly SideBySidePair[],
  referenceSd_ppm: number,
  fallback: MeterErrorModel,
): MeterErrorModel {
  const ref = pairs.map((p) => p.reference_ppm);
  const met = pairs.map((p) => p.meter_ppm);
  const n = pairs.length;
  if (n === 0) return fallback;
  const span = Math.max(...ref) - Math.min(...ref);
  if (n >= 3 && span >= 300) {
    const fit = fitStraightLine(ref, met);
    const residual = Number.isFinite(fit.residualSd) ? fit.residualSd : fallback.noiseSd_ppm;
    // Offset uncertainty at the middle of the check, plus the reference meter's own error.
    return {
      offset_ppm: fit.intercept,
      offsetSd_ppm: Math.hypot(fit.interceptSe, referenceSd_ppm),
      gain: fit.slope,
      gainSd: Math.hypot(fit.slopeSe, referenceSd_ppm / Math.max(...ref)),
      noiseSd_ppm: residual,
      source: `side-by-side check, ${n} pairs over ${Math.round(span)} ppm`,
    };
  }
  const diffs = met.map((m, i) => m - ref[i]!);
  const mean = diffs.reduce((a, b) => a + b, 0) / n;
  const sd = n > 1 ? Math.sqrt(diffs.reduce((a, d) => a + (d - mean) ** 2, 0) / (n - 1)) : fallback.noiseSd_ppm;
  return {
    offset_ppm: mean,
    offsetSd_ppm: Math.hypot(sd / Math.sqrt(n), referenceSd_ppm),
    gain: fallback.gain,
    gainSd: fallback.gainSd,
    noiseSd_ppm: sd,
    source: `side-by-side check, ${n} pairs at one level (offset only; gain from ${fallback.source})`,
  };
}

/**
 * True level from a reading: (reading − offset)/gain, ppm.
 * Example: correctedLevel(1050, { offset_ppm: 40, gain: 1.05, … }) = 961.9 ppm.
 */
export function correctedLevel(reading_ppm: number, meter: Pick<MeterErrorModel, 'offset_ppm' | 'gain'>): number {
  return (reading_ppm - meter.offset_ppm) / meter.gain;
}
