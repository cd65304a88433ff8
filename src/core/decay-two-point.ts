/**
 * Two-point decay: λ = ln[(C1 − C_out)/(C2 − C_out)] / (t2 − t1) (ASTM E741 two-point form,
 * from memory; references.md §2.4). The interval is a seeded Monte Carlo over the noise of both
 * readings, the meter's offset and gain, the outdoor level and the volume.
 */
import { monteCarloFigures, nominalInputs, trueLevel } from './supply-uncertainty.ts';
import { NO_FIGURES, toSupplyEstimate, type Reading, type SupplyEstimate, type UncertaintyInputs } from './supply-estimate.ts';
import { warn, type EngineWarning } from './warnings.ts';

/** Input of a two-point decay. */
export interface DecayTwoPointInput<C> {
  first: Reading;
  second: Reading;
  uncertainty: UncertaintyInputs;
  conditions: C;
  seed: number;
  draws?: number;
}

/**
 * Supply from two readings of a decay.
 * Example: 1500 ppm then 900 ppm an hour later, outdoor 420 → λ = ln(1080/480) = 0.8109 h⁻¹
 * (references.md §7.3); in 50 m³ that is 11.26 L/s.
 */
export function estimateDecayTwoPoint<C>(input: DecayTwoPointInput<C>): SupplyEstimate<C> {
  const u = input.uncertainty;
  const draws = input.draws ?? 1000;
  const [a, b] = input.first.time_s <= input.second.time_s ? [input.first, input.second] : [input.second, input.first];
  const dt = b.time_s - a.time_s;
  const warnings: EngineWarning[] = [
    ...u.outdoor.warnings,
    warn('too-few-readings', 'Only two readings: the result rests on them alone. Log every 2–5 minutes if you can.'),
  ];
  const figures = monteCarloFigures(
    u,
    (x) => {
      const e1 = trueLevel(x, a.level_ppm, 0) - x.outdoor_ppm;
      const e2 = trueLevel(x, b.level_ppm, 1) - x.outdoor_ppm;
      if (!(e1 > 0 && e2 > 0 && dt > 0)) return null;
      return (Math.log(e1 / e2) / dt) * x.volume_m3;
    },
    { draws, seed: input.seed, statDof: 0, noiseSd_ppm: [u.meter.noiseSd_ppm, u.meter.noiseSd_ppm] },
  );
  const nominal = nominalInputs(u, 2);
  const e1 = trueLevel(nominal, a.level_ppm) - nominal.outdoor_ppm;
  const e2 = trueLevel(nominal, b.level_ppm) - nominal.outdoor_ppm;
  if (!(e1 > e2 && e2 > 0)) {
    warnings.push(warn('rate-not-determined', 'The second reading is not lower than the first, or not above outdoor: no decay rate.'));
  } else if (e2 / e1 > 0.8) {
    warnings.push(warn('short-decay', 'The level fell by less than a fifth of its excess: wait longer before the second reading.'));
  }
  const ok = e1 > e2 && e2 > 0;
  return toSupplyEstimate(ok ? figures : { ...NO_FIGURES, failedShare: figures.failedShare }, {
    method: 'decay-two-point',
    conditions: input.conditions,
    warnings,
    uncertainty: u,
    interval: { kind: 'monte-carlo', draws, seed: input.seed },
    details: { excessRatio: e2 > 0 ? e2 / e1 : null },
  });
}
