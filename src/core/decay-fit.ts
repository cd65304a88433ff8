/**
 * Air supply from a CO2 decay in an empty room (tracer-gas concentration decay, ASTM E741):
 * ln(C − C_out) = ln(C0 − C_out) − λ·t, fitted by least squares (λ = −slope, Q = λ·V).
 * When the decay spans two time constants or more, the level it tends to is also fitted
 * (C = B + A·e^(−λt)): rooms off corridors or beside occupied rooms decay towards the air that
 * arrives, not outdoor air (practice.md §1.2; single-zone premise of ASTM E741 and Sherman 1990,
 * Building and Environment 25:365). The interval is a seeded Monte Carlo over the meter's
 * offset, gain and noise, the outdoor level, the volume and the regression's own t-distributed
 * error, reusing the regression sums for each draw.
 */
import { EXPONENTIAL_APPROACH_MODEL, fitSeparableExponential } from './exponential-fit.ts';
import { logCurvature } from './log-curvature.ts';
import { correctedLevel } from './meter-error.ts';
import { fitStraightLine, slopeOnSameX } from './straight-line-fit.ts';
import { monteCarloFigures, nominalInputs, type SupplyEvaluator } from './supply-uncertainty.ts';
import { NO_FIGURES, toSupplyEstimate, type Reading, type SupplyEstimate, type UncertaintyInputs } from './supply-estimate.ts';
import { estimateDecayTwoPoint } from './decay-two-point.ts';
import { warn, type EngineWarning } from './warnings.ts';

/** Input of a decay fit. */
export interface DecayInput<C> {
  /** Readings of the room meter during the decay (room empty, no flames). */
  readings: readonly Reading[];
  uncertainty: UncertaintyInputs;
  /** The room state during this test (openings, doors, fans), passed through unchanged. */
  conditions: C;
  /** Monte Carlo seed. */
  seed: number;
  /** Monte Carlo draws (default 1000). */
  draws?: number;
}

/** Background this far above outdoor (ppm) is flagged (practice.md §1.2: ~75 ppm). */
export const BACKGROUND_FLAG_PPM = 75;

/**
 * Fit a decay. Two readings: the two-point form (estimateDecayTwoPoint). Fewer: no estimate.
 * Readings at or below outdoor are left out with a warning.
 * Example: 13 readings every 300 s of 420 + 1580·e^(−0.8 t/3600) with a small fixed noise,
 * outdoor 420 on the same meter, 50 m³ → λ ≈ 0.80 h⁻¹ (2.22e-4 s⁻¹), supply ≈ 11.1 L/s.
 */
export function fitDecay<C>(input: DecayInput<C>): SupplyEstimate<C> {
  const { uncertainty: u, conditions } = input;
  const draws = input.draws ?? 1000;
  const readings = [...input.readings].sort((a, b) => a.time_s - b.time_s);
  const warnings: EngineWarning[] = [...u.outdoor.warnings];
  const assumed = { ...u, confidence: 0.95 as const, interval: { kind: 'monte-carlo' as const, draws, seed: input.seed } };
  const none = (extra: EngineWarning[]): SupplyEstimate<C> => ({
    ...NO_FIGURES,
    method: 'decay-log-linear',
    kind: 'none',
    conditions,
    warnings: [...warnings, ...extra],
    assumed,
    details: {},
  });
  if (readings.length === 2) {
    return estimateDecayTwoPoint({ first: readings[0]!, second: readings[1]!, uncertainty: u, conditions, seed: input.seed, draws });
  }
  const nominal = nominalInputs(u, 0);
  const usable = readings.filter((r) => correctedLevel(r.level_ppm, nominal) - nominal.outdoor_ppm > 0);
  if (usable.length < readings.length) {
    warnings.push(
      warn(
        'reading-at-or-below-outdoor',
        `${readings.length - usable.length} reading(s) at or below the outdoor level were left out of the decay.`,
      ),
    );
  }
  if (usable.length < 3) {
    return none([warn('too-few-readings', 'A decay needs at least three readings above outdoor; take one every 2–5 minutes.')]);
  }
  if (usable.length < 5) {
    warnings.push(warn('too-few-readings', `Only ${usable.length} readings: the interval is wide. Take a reading every 2–5 minutes.`));
  }
  const t0 = usable[0]!.time_s;
  const t = usable.map((r) => r.time_s - t0);
  const span = t[t.length - 1]!;
  const trueLevels = usable.map((r) => correctedLevel(r.level_ppm, nominal));
  const fit = fitStraightLine(t, trueLevels.map((c) => Math.log(c - nominal.outdoor_ppm)));
  const rate = -fit.slope;
  if (!(rate > 0)) {
    return none([warn('rate-not-determined', 'The readings do not fall: this is not a decay (people or a flame in the room?).')]);
  }
  const details: Record<string, number | null> = { logLinearRate_perSecond: rate, background_ppm: null, backgroundRate_perSecond: null };
  const firstExcess = trueLevels[0]! - nominal.outdoor_ppm;
  if (firstExcess < 300) {
    warnings.push(
      warn(
        'small-excess',
        `The decay started only ${Math.round(firstExcess)} ppm above outdoor. Start at 500 ppm or more above outdoor for a reliable result.`,
      ),
    );
  }
  if (rate * span < 0.3) {
    warnings.push(
      warn(
        'short-decay',
        `The decay lasted ${Math.round(span / 60)} minutes, under a third of the room's time constant. Let it run longer.`,
      ),
    );
  }

  // Background as a third parameter when the decay spans two time constants or more.
  let method: 'decay-log-linear' | 'decay-with-background' = 'decay-log-linear';
  let asymptote = nominal.outdoor_ppm;
  let evaluate: SupplyEvaluator;
  let statDof = fit.dof;
  if (rate * span >= 2 && usable.length >= 6) {
    const bg = fitSeparableExponential(EXPONENTIAL_APPROACH_MODEL, t, trueLevels, 0.2 / span, 50 / span);
    if (bg && !bg.atSearchLimit && Number.isFinite(bg.rateSe)) {
      const background = bg.coefficients[0]!;
      details.background_ppm = background;
      details.backgroundRate_perSecond = bg.rate;
      if (background - nominal.outdoor_ppm > BACKGROUND_FLAG_PPM) {
        method = 'decay-with-background';
        asymptote = background;
        statDof = bg.dof;
        warnings.push(
          warn(
            'background-above-outdoor',
            `The room decays towards about ${Math.round(background)} ppm, ${Math.round(background - nominal.outdoor_ppm)} ppm above outdoor: air is arriving from occupied space (corridor, next room or recirculation). The supply shown is the rate of air arriving; record door states and the corridor CO2.`,
          ),
        );
        evaluate = (x) => (bg.rate + bg.rateSe * x.stat) * x.volume_m3;
      }
    }
  }
  evaluate ??= decayEvaluator(usable, t, fit.xMean, fit.sxx, fit.slopeSe);

  const curvature = logCurvature(t, trueLevels.map((c) => Math.log(Math.max(c - asymptote, 1e-9))));
  details.rateAtStart_perSecond = curvature.rateAtStart;
  details.rateAtEnd_perSecond = curvature.rateAtEnd;
  if (curvature.curved) {
    warnings.push(
      warn(
        'curvature',
        'The decay rate changes part-way through (someone came back, a window or door was opened or closed, or a fan switched). Use only the steady part of the decay.',
      ),
    );
  }
  const figures = monteCarloFigures(u, evaluate, { draws, seed: input.seed, statDof, noiseSd_ppm: [] });
  return toSupplyEstimate(figures, { method, conditions, warnings, uncertainty: u, interval: assumed.interval, details });
}

/**
 * Supply for one draw of the true inputs: re-correct the readings, take the log excess over the
 * drawn outdoor level and reuse x̄ and Sxx of the nominal fit for the slope; add the fit's own
 * error as SE × a t variate. Points at or below the drawn outdoor level make the draw fail.
 */
function decayEvaluator(readings: readonly Reading[], t: readonly number[], xMean: number, sxx: number, slopeSe: number): SupplyEvaluator {
  const levels = Float64Array.from(readings, (r) => r.level_ppm);
  const y = new Float64Array(readings.length);
  return (x) => {
    // (reading − offset)/gain − outdoor = (reading − offset − gain·outdoor)/gain: the gain only
    // shifts every log by the same amount, so the slope needs just the reading-scale background.
    const background = x.offset_ppm + x.gain * x.outdoor_ppm;
    for (let i = 0; i < levels.length; i++) {
      const excess = levels[i]! - background;
      if (!(excess > 0)) return null;
      y[i] = Math.log(excess);
    }
    const rate = -slopeOnSameX(t, y, xMean, sxx) + slopeSe * x.stat;
    return rate * x.volume_m3;
  };
}
