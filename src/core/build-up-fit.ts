/**
 * Air supply from the CO2 build-up in an occupied room (references.md §2.3; Batterman 2017,
 * IJERPH 14(2):145). Two fits of the exact solution C(t) = C_ss + (C0 − C_ss)·e^(−λt):
 * - known output: C_ss = C_out + 1e6·N·G/(λV) is tied to λ, so λ is found by a bracketed
 *   one-parameter search (C0 enters linearly);
 * - rate and steady level: λ and C_ss fitted freely, which needs no assumed output and so checks
 *   it: the implied output per person is λ·V·(C_ss − C_out)/(1e6·N).
 * Intervals are linearised (GUM §5.1) over the meter's offset and gain, the outdoor level, the
 * volume, the occupant count and output, and the fit's own t-distributed error.
 */
import { EXPONENTIAL_APPROACH_MODEL, fitSeparableExponential, type SeparableExponentialModel } from './exponential-fit.ts';
import { linearisedFigures, nominalInputs, trueLevel, type TrueInputs } from './supply-uncertainty.ts';
import { NO_FIGURES, toSupplyEstimate, type Reading, type SupplyEstimate, type SupplyMethod, type UncertaintyInputs } from './supply-estimate.ts';
import { PPM_PER_VOLUME_FRACTION } from './units.ts';
import { warn, type EngineWarning } from './warnings.ts';

/** Input of a build-up fit: readings from when constant occupancy began. */
export interface BuildUpInput<C> {
  readings: readonly Reading[];
  /** Must include occupants (count and output per person). */
  uncertainty: UncertaintyInputs;
  conditions: C;
}

/** tφ(λt) and its derivative in λ: t²φ'(λt), with φ(x) = (1 − e^(−x))/x. */
function risePart(rate: number, t: number): [number, number] {
  const x = rate * t;
  if (x < 1e-4) return [t * (1 - x / 2 + (x * x) / 6), t * t * (-0.5 + x / 3)];
  const e = Math.exp(-x);
  return [(t * (1 - e)) / x, (t * t * (e * (1 + x) - 1)) / (x * x)];
}

/** C(t) = C_out + s·tφ(λt) + (C0 − C_out)·e^(−λt); the one linear coefficient is C0 − C_out. */
function knownOutputModel(outdoor: number, sourceRate: number): SeparableExponentialModel {
  return {
    basisCount: 1,
    fixed: (rate, t) => {
      const [v, dv] = risePart(rate, t);
      return [outdoor + sourceRate * v, sourceRate * dv];
    },
    basis: (_j, rate, t) => {
      const e = Math.exp(-rate * t);
      return [e, -t * e];
    },
  };
}

function prepared(readings: readonly Reading[]): { t: number[]; raw: number[]; span: number; step: number } {
  const sorted = [...readings].sort((a, b) => a.time_s - b.time_s);
  const t0 = sorted[0]?.time_s ?? 0;
  const t = sorted.map((r) => r.time_s - t0);
  const span = t[t.length - 1] ?? 0;
  let step = span;
  for (let i = 1; i < t.length; i++) step = Math.min(step, t[i]! - t[i - 1]!);
  return { t, raw: sorted.map((r) => r.level_ppm), span, step: step > 0 ? step : span };
}

function result<C>(
  method: SupplyMethod,
  input: BuildUpInput<C>,
  figures: ReturnType<typeof linearisedFigures> | null,
  warnings: EngineWarning[],
  details: Record<string, number | null>,
): SupplyEstimate<C> {
  return toSupplyEstimate(figures ?? { ...NO_FIGURES, failedShare: 1 }, {
    method,
    conditions: input.conditions,
    warnings,
    uncertainty: input.uncertainty,
    interval: { kind: 'linearised' },
    details,
  });
}

function commonWarnings(u: UncertaintyInputs, n: number, minimum: number): EngineWarning[] {
  const warnings = [...u.outdoor.warnings];
  if (n < minimum) warnings.push(warn('too-few-readings', `A build-up fit needs at least ${minimum} readings; log every 2–5 minutes.`));
  return warnings;
}

/**
 * Build-up fit with known occupant output (one-parameter search on λ).
 * Example: the §7.2 classroom (151.2 m³, N·G = 0.0896 L/s, outdoor 420) read every 5 min for an
 * hour from 450 ppm at 100 L/s, noise-free → supply 0.1 m³/s (100 L/s).
 */
export function fitBuildUpKnownOutput<C>(input: BuildUpInput<C>): SupplyEstimate<C> {
  const u = input.uncertainty;
  const { t, raw, span, step } = prepared(input.readings);
  const warnings = commonWarnings(u, t.length, 4);
  if (!u.occupants || !(u.occupants.count > 0) || t.length < 4 || !(span > 0)) {
    return result('build-up-known-output', input, null, warnings, {});
  }
  const fitFor = (x: TrueInputs, startRate?: number) => {
    const s = (PPM_PER_VOLUME_FRACTION * x.count * x.perPerson_m3s) / x.volume_m3;
    const levels = raw.map((r) => trueLevel(x, r));
    return fitSeparableExponential(knownOutputModel(x.outdoor_ppm, s), t, levels, 1e-3 / span, 5 / step, startRate);
  };
  const nominal = fitFor(nominalInputs(u, 0));
  if (!nominal) return result('build-up-known-output', input, null, warnings, {});
  if (nominal.atSearchLimit) {
    warnings.push(
      warn('rate-not-determined', 'The readings do not pin down the supply (the rise is too short, or the level is flat).'),
    );
  }
  // A draw that moves only the fit's own error needs no refit: reuse the nominal fit then.
  const nominalX = nominalInputs(u, 0);
  const sameFit = (x: TrueInputs) =>
    x.offset_ppm === nominalX.offset_ppm && x.gain === nominalX.gain && x.outdoor_ppm === nominalX.outdoor_ppm &&
    x.volume_m3 === nominalX.volume_m3 && x.count === nominalX.count && x.perPerson_m3s === nominalX.perPerson_m3s;
  const figures = linearisedFigures(
    u,
    (x) => {
      const fit = sameFit(x) ? nominal : fitFor(x, nominal.rate);
      return fit ? (fit.rate + nominal.rateSe * x.stat) * x.volume_m3 : null;
    },
    { statDof: nominal.dof, noiseSd_ppm: [] },
  );
  return result('build-up-known-output', input, figures, warnings, {
    rate_perSecond: nominal.rate,
    startLevel_ppm: nominal.coefficients[0]! + nominalInputs(u, 0).outdoor_ppm,
  });
}

/**
 * Build-up fit of rate and steady level together (needs no assumed output). Details give the
 * implied output per person, m³/s, to compare with the assumed one.
 * Example: the same noise-free classroom build-up over two hours → supply 100 L/s, steady level
 * 1316 ppm, implied output 0.0896/31 L/s per person if 31 people were stated.
 */
export function fitBuildUpRateAndLevel<C>(input: BuildUpInput<C>): SupplyEstimate<C> {
  const u = input.uncertainty;
  const { t, raw, span, step } = prepared(input.readings);
  const warnings = commonWarnings(u, t.length, 5);
  if (t.length < 5 || !(span > 0)) return result('build-up-rate-and-level', input, null, warnings, {});
  const fitFor = (x: TrueInputs, startRate?: number) =>
    fitSeparableExponential(EXPONENTIAL_APPROACH_MODEL, t, raw.map((r) => trueLevel(x, r)), 1e-3 / span, 5 / step, startRate);
  const nominalInputsValue = nominalInputs(u, 0);
  const nominal = fitFor(nominalInputsValue);
  if (!nominal) return result('build-up-rate-and-level', input, null, warnings, {});
  if (nominal.atSearchLimit || nominal.rate * span < 1) {
    warnings.push(
      warn(
        'short-decay',
        'The rise covers less than one time constant, so the steady level and the supply are poorly fixed; log for longer.',
      ),
    );
  }
  // The fitted rate does not move with the meter's offset or gain (an affine change of every level
  // only rescales the level terms of C = B + A·e^(−λt)), and neither outdoor level nor occupants
  // enter this model: every draw shares the nominal rate, and only volume and the fit's own error vary.
  const figures = linearisedFigures(u, (x) => (nominal.rate + nominal.rateSe * x.stat) * x.volume_m3, {
    statDof: nominal.dof,
    noiseSd_ppm: [],
  });
  const steady = nominal.coefficients[0]!;
  const occ = u.occupants;
  const implied =
    occ && occ.count > 0
      ? (nominal.rate * u.volume_m3 * (steady - nominalInputsValue.outdoor_ppm)) / (PPM_PER_VOLUME_FRACTION * occ.count)
      : null;
  if (implied !== null && occ) {
    const ratio = implied / occ.perPerson_m3s;
    const relSe = Math.hypot(nominal.rateSe / nominal.rate, nominal.coefficientSe[0]! / Math.max(1, steady - nominalInputsValue.outdoor_ppm));
    if (Math.abs(Math.log(ratio)) > 1.96 * Math.hypot(relSe, occ.perPersonRelSd) + 0.1) {
      warnings.push(
        warn(
          'output-disagrees',
          `The rise implies ${Math.round(ratio * 100)} % of the assumed CO2 output per person. Check the head count, activity and ages, and any flames or other sources.`,
        ),
      );
    }
  }
  return result('build-up-rate-and-level', input, figures, warnings, {
    rate_perSecond: nominal.rate,
    fittedSteadyLevel_ppm: steady,
    impliedPerPerson_m3s: implied,
  });
}
