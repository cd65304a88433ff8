/**
 * Intervals on supply, air change rate, supply per person and steady CO2 from the uncertainty of
 * the meter (offset, gain, noise), the outdoor level, the volume, the occupant count and their
 * CO2 output, and the fit's own statistical error. Two ways, sharing one description of a draw:
 * - seeded Monte Carlo (JCGM 101:2008, "Propagation of distributions using a Monte Carlo
 *   method"): 2.5 and 97.5 percentiles of the draws;
 * - linearised propagation (JCGM 100:2008, GUM §5.1): central differences per input, combined
 *   on a log scale for the ratio-like figures, for methods whose refit is too slow to repeat
 *   1000 times.
 */
import { createSeededRandom } from './seeded-random.ts';
import { percentilesInPlace } from './order-statistics.ts';
import { studentTQuantile } from './student-t.ts';
import { NO_FIGURE, NO_FIGURES, type Figure, type SupplyFigures, type UncertaintyInputs } from './supply-estimate.ts';
import { PPM_PER_VOLUME_FRACTION } from './units.ts';

/** One set of "true" inputs. */
export interface TrueInputs {
  offset_ppm: number;
  gain: number;
  /** True outdoor level, ppm. */
  outdoor_ppm: number;
  /** Outdoor level in the room meter's reading scale, ppm (what the meter would read outdoors). */
  outdoorReading_ppm: number;
  volume_m3: number;
  count: number;
  perPerson_m3s: number;
  /** Standardised statistical error of the fit (a t or normal variate; 0 at the nominal). */
  stat: number;
  /** Noise on each reading the method uses individually, ppm (subtracted from the reading). */
  noise: number[];
}

/** A method's evaluation: the supply (m³/s) for one set of true inputs, or null if impossible. */
export type SupplyEvaluator = (inputs: TrueInputs) => number | null;

/** Options for the intervals. */
export interface PropagationOptions {
  /** Degrees of freedom of the fit's statistical error (Infinity: normal; 0: none). */
  statDof: number;
  /** Standard deviation of each individually used reading's noise, ppm. */
  noiseSd_ppm: readonly number[];
}

/** Standardised deviations of the inputs, in the order of DIMENSIONS. */
const DIMENSIONS = ['offset', 'gain', 'outdoor', 'volume', 'count', 'perPerson'] as const;

/**
 * Map standard deviates to true inputs, writing into `target` (reused across draws).
 * z: [offset, gain, outdoor, volume, count, perPerson].
 */
function fillTrueInputs(target: TrueInputs, u: UncertaintyInputs, z: ArrayLike<number>, stat: number, noise: number[]): TrueInputs {
  const offset = u.meter.offset_ppm + u.meter.offsetSd_ppm * z[0]!;
  const gain = u.meter.gain * (1 + u.meter.gainSd * z[1]!);
  const outdoorDrawn = u.outdoor.value_ppm + u.outdoor.sd_ppm * z[2]!;
  const same = u.outdoor.sameMeterAsRoom;
  const outdoor = same ? (outdoorDrawn - offset) / gain : outdoorDrawn;
  const occ = u.occupants;
  target.offset_ppm = offset;
  target.gain = gain;
  target.outdoor_ppm = outdoor;
  target.outdoorReading_ppm = same ? outdoorDrawn : outdoor * gain + offset;
  target.volume_m3 = u.volume_m3 + u.volumeSd_m3 * z[3]!;
  target.count = occ ? Math.max(0, occ.count + occ.countSd * z[4]!) : 0;
  target.perPerson_m3s = occ ? occ.perPerson_m3s * Math.max(0, 1 + occ.perPersonRelSd * z[5]!) : 0;
  target.stat = stat;
  target.noise = noise;
  return target;
}

function trueInputs(u: UncertaintyInputs, z: ArrayLike<number>, stat: number, noise: number[]): TrueInputs {
  const target: TrueInputs = {
    offset_ppm: 0,
    gain: 1,
    outdoor_ppm: 0,
    outdoorReading_ppm: 0,
    volume_m3: 0,
    count: 0,
    perPerson_m3s: 0,
    stat: 0,
    noise: [],
  };
  return fillTrueInputs(target, u, z, stat, noise);
}

/** The nominal true inputs (every deviate zero). */
export function nominalInputs(u: UncertaintyInputs, noiseCount: number): TrueInputs {
  return trueInputs(u, [0, 0, 0, 0, 0, 0], 0, new Array<number>(noiseCount).fill(0));
}

/** A reading corrected for the meter's offset, gain and this reading's noise: the true level, ppm. */
export function trueLevel(inputs: TrueInputs, reading_ppm: number, noiseIndex = -1): number {
  const noise = noiseIndex >= 0 ? inputs.noise[noiseIndex]! : 0;
  return (reading_ppm - inputs.offset_ppm) / inputs.gain - noise;
}

/** [air change rate s⁻¹, per person m³/s, steady level ppm] for a supply under true inputs. */
function derived(inputs: TrueInputs, supply: number, withOccupants: boolean): [number, number, number] {
  const ach = supply / inputs.volume_m3;
  if (!withOccupants || !(inputs.count > 0)) return [ach, Number.NaN, Number.NaN];
  return [
    ach,
    supply / inputs.count,
    inputs.outdoor_ppm + (PPM_PER_VOLUME_FRACTION * inputs.count * inputs.perPerson_m3s) / supply,
  ];
}

function figure(value: number, low: number, high: number): Figure {
  return Number.isFinite(value) ? { value, low, high } : { value: null, low: null, high: null };
}

/** Result of a propagation: the figures and the share of draws that failed. */
export interface PropagatedFigures extends SupplyFigures {
  failedShare: number;
}

/**
 * Seeded Monte Carlo interval (JCGM 101). Draws all inputs, evaluates the supply, and reports the
 * nominal value with the 2.5–97.5 percentiles of each figure. Deterministic for a given seed.
 * Example: fitDecay on the references.md §7.3 noisy series with a perfect meter and an exact
 * outdoor level gives λ 0.8016 h⁻¹ with 95 % limits about ±0.016 h⁻¹ (the regression's own).
 */
export function monteCarloFigures(
  u: UncertaintyInputs,
  evaluate: SupplyEvaluator,
  options: PropagationOptions & { draws: number; seed: number },
): PropagatedFigures {
  const rng = createSeededRandom(options.seed);
  const withOcc = !!u.occupants && u.occupants.count > 0;
  const nominal = nominalInputs(u, options.noiseSd_ppm.length);
  const q0 = evaluate(nominal);
  const columns = [0, 1, 2, 3].map(() => new Float64Array(options.draws));
  const z = new Float64Array(DIMENSIONS.length);
  const occ = u.occupants;
  const sds = [u.meter.offsetSd_ppm, u.meter.gainSd, u.outdoor.sd_ppm, u.volumeSd_m3, occ?.countSd ?? 0, occ?.perPersonRelSd ?? 0];
  const varied = sds.flatMap((sd, k) => (sd > 0 ? [k] : []));
  const noise = new Array<number>(options.noiseSd_ppm.length).fill(0);
  const scratch = nominalInputs(u, options.noiseSd_ppm.length);
  let kept = 0;
  for (let d = 0; d < options.draws; d++) {
    for (const k of varied) z[k] = rng.normal();
    for (let k = 0; k < noise.length; k++) noise[k] = options.noiseSd_ppm[k]! * rng.normal();
    const stat = options.statDof === 0 ? 0 : Number.isFinite(options.statDof) ? rng.studentT(options.statDof) : rng.normal();
    const inputs = fillTrueInputs(scratch, u, z, stat, noise);
    const q = evaluate(inputs);
    if (q === null || !Number.isFinite(q)) continue;
    // The derived figures inline (no array per draw: this loop runs a million times per bench).
    columns[0]![kept] = q;
    columns[1]![kept] = q / inputs.volume_m3;
    if (withOcc) {
      // A draw with nobody in the room has no per-person figure: it ranks above every other draw
      // (and its steady level is the outdoor level).
      columns[2]![kept] = inputs.count > 0 ? q / inputs.count : Number.POSITIVE_INFINITY;
      columns[3]![kept] = inputs.outdoor_ppm + (PPM_PER_VOLUME_FRACTION * inputs.count * inputs.perPerson_m3s) / q;
    }
    kept++;
  }
  const failedShare = 1 - kept / options.draws;
  if (q0 === null || kept < 40) return { ...NO_FIGURES, failedShare };
  const [ach0, pp0, steady0] = derived(nominal, q0, withOcc);
  const range = (k: number): [number, number] => {
    const [low, high] = percentilesInPlace(columns[k]!, kept, [0.025, 0.975]);
    return [low!, high!];
  };
  return {
    supply_m3s: figure(q0, ...range(0)),
    airChangeRate_perSecond: figure(ach0, ...range(1)),
    supplyPerPerson_m3s: withOcc ? figure(pp0, ...range(2)) : NO_FIGURE,
    steadyLevel_ppm: withOcc ? figure(steady0, ...range(3)) : NO_FIGURE,
    failedShare,
  };
}

/**
 * Linearised interval (GUM §5.1): the figures at ±1 standard deviation of each input in turn
 * (central differences), combined in quadrature on a log scale for supply, air change rate and
 * per-person supply and on a linear scale for the steady level; 1.96 for the inputs and the
 * Student t multiplier for the fit's own error. Example: as monteCarloFigures, without draws.
 */
export function linearisedFigures(u: UncertaintyInputs, evaluate: SupplyEvaluator, options: PropagationOptions): PropagatedFigures {
  const withOcc = !!u.occupants && u.occupants.count > 0;
  const nNoise = options.noiseSd_ppm.length;
  const nominal = nominalInputs(u, nNoise);
  const q0 = evaluate(nominal);
  if (q0 === null || !(q0 > 0)) return { ...NO_FIGURES, failedShare: 1 };
  const centre = [q0, ...derived(nominal, q0, withOcc)];
  const logScale = [true, true, true, false];
  const variance = [0, 0, 0, 0];
  const z95 = 1.959963984540054;
  let failed = 0;
  let tried = 0;
  const addDeviation = (make: (sign: number) => TrueInputs, multiplier: number): void => {
    const sides = [1, -1].map((sign) => {
      const inputs = make(sign);
      const q = evaluate(inputs);
      tried++;
      if (q === null || !(q > 0)) {
        failed++;
        return null;
      }
      return [q, ...derived(inputs, q, withOcc)];
    });
    const [plus, minus] = sides;
    for (let k = 0; k < 4; k++) {
      const f = (v: number): number => (logScale[k] ? Math.log(v) : v);
      const hi = plus ? f(plus[k]!) : null;
      const lo = minus ? f(minus[k]!) : null;
      const mid = f(centre[k]!);
      // One-sided difference when one side cannot be evaluated.
      const half = hi !== null && lo !== null ? (hi - lo) / 2 : hi !== null ? hi - mid : lo !== null ? mid - lo : 0;
      if (Number.isFinite(half)) variance[k]! += (half * multiplier) ** 2;
    }
  };
  for (let d = 0; d < DIMENSIONS.length; d++) {
    addDeviation((sign) => {
      const z = [0, 0, 0, 0, 0, 0];
      z[d] = sign;
      return trueInputs(u, z, 0, new Array<number>(nNoise).fill(0));
    }, z95);
  }
  for (let k = 0; k < nNoise; k++) {
    addDeviation((sign) => {
      const noise = new Array<number>(nNoise).fill(0);
      noise[k] = sign * options.noiseSd_ppm[k]!;
      return { ...nominal, noise };
    }, z95);
  }
  if (options.statDof !== 0) {
    const tMult = Number.isFinite(options.statDof) ? studentTQuantile(0.975, options.statDof) : z95;
    addDeviation((sign) => ({ ...nominal, stat: sign }), tMult);
  }
  const interval = (k: number): Figure => {
    const half = Math.sqrt(variance[k]!);
    const c = centre[k]!;
    if (logScale[k]) return figure(c, c * Math.exp(-half), c * Math.exp(half));
    return figure(c, c - half, c + half);
  };
  return {
    supply_m3s: interval(0),
    airChangeRate_perSecond: interval(1),
    supplyPerPerson_m3s: withOcc ? interval(2) : NO_FIGURE,
    steadyLevel_ppm: withOcc ? interval(3) : NO_FIGURE,
    failedShare: failed / Math.max(1, tried),
  };
}
