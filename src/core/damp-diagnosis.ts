/**
 * Which of three causes the moisture evidence points to, so a damp room is not put down to
 * ventilation by default (practice.md §2.3 and §5):
 *
 * - "too wet": the vapour-pressure excess is above the ISO 13788 class expected for the use,
 *   while the outdoor-air supply meets its benchmark: more moisture is released than a room of
 *   this kind normally has to lose (look for drying washing, unvented appliances, leaks).
 * - "too little air": the excess is above the expected class and the supply is below its
 *   benchmark.
 * - "too cold": the excess is within the expected class, yet the surface is cold — its
 *   temperature factor is below the factor the surface needs (IP 1/06 design minimum or the
 *   mould check's f_Rsi,min, whichever the caller gives), or the mould check predicts a surface
 *   RH of 80 % or more. A cold surface with a high excess is reported as well, beside the
 *   moisture cause.
 *
 * The rule, plainly: compare the excess with the class limit at the mean outdoor temperature;
 * if it is above, the supply decides between "too wet" and "too little air" (unknown supply:
 * both are kept open); separately, a surface factor below the needed factor means "too cold".
 * When none applies and there is damp, look for liquid water (leaks, penetrating or rising damp).
 * The messages describe the building and its use, never the occupants' way of life.
 */
import { humidityClassLimit, type HumidityClass } from './humidity-classes.ts';
import { moistureWarning, type MoistureWarning } from './moisture-warnings.ts';
import { litresPerSecond } from './units.ts';

/** The causes the diagnosis can name. */
export type DampCause = 'too-wet' | 'too-little-air' | 'too-wet-or-too-little-air' | 'too-cold' | 'no-moisture-cause-found';

/** Evidence for the diagnosis; every part may be missing, and the result says what that leaves open. */
export interface DampEvidence {
  /** Mean daily vapour-pressure excess (Pa) and the mean outdoor temperature (°C) of those days. */
  excess?: { meanExcess_Pa: number; meanOutsideTemp_C: number };
  /** ISO 13788 class expected for the room's use. */
  expectedClass: HumidityClass;
  /** The surface's temperature factor and the factor it needs. */
  surface?: { factor: number; neededFactor: number };
  /** Outdoor-air supply, m³/s, and the benchmark for the room, m³/s, with the benchmark's name. */
  supply?: { measured_m3s: number; benchmark_m3s: number; benchmarkLabel: string };
}

/** One cause with its reason. */
export interface DampFinding {
  cause: DampCause;
  reason: string;
}

/** The diagnosis: causes with reasons, the rule applied and warnings. */
export interface DampDiagnosis {
  findings: DampFinding[];
  rule: string;
  warnings: MoistureWarning[];
}

const RULE =
  'excess above the ISO 13788 class for the use → too wet (supply meets its benchmark) or too little air (supply below it); surface factor below the factor needed → too cold';

/**
 * Diagnose the moisture cause of damp in a room from its evidence.
 * Example: excess 900 Pa at 5 °C outdoor mean, class 3 (limit 607.5 Pa), supply 4 L/s against a
 * 8 L/s benchmark, surface factor 0.62 against 0.75 → findings 'too-little-air' and 'too-cold'.
 */
export function diagnoseDamp(evidence: DampEvidence): DampDiagnosis {
  const findings: DampFinding[] = [];
  const warnings: MoistureWarning[] = [];
  const { excess, supply, surface } = evidence;
  let excessHigh: boolean | undefined;
  if (excess) {
    const limit = humidityClassLimit(evidence.expectedClass, excess.meanOutsideTemp_C);
    excessHigh = excess.meanExcess_Pa > limit;
    const excessText = `vapour-pressure excess ${Math.round(excess.meanExcess_Pa)} Pa against ${Math.round(limit)} Pa for class ${evidence.expectedClass}`;
    if (excessHigh) {
      if (!supply) {
        findings.push({ cause: 'too-wet-or-too-little-air', reason: `The ${excessText}; without a measured supply the two cannot be told apart.` });
        warnings.push(moistureWarning('supply-unknown', 'No measured outdoor-air supply: measure it to tell "too wet" from "too little air".'));
      } else if (supply.measured_m3s < supply.benchmark_m3s) {
        findings.push({
          cause: 'too-little-air',
          reason: `The ${excessText}, and the supply of ${litresPerSecond(supply.measured_m3s).toFixed(1)} L/s is below the ${supply.benchmarkLabel} of ${litresPerSecond(supply.benchmark_m3s).toFixed(1)} L/s.`,
        });
      } else {
        findings.push({
          cause: 'too-wet',
          reason: `The ${excessText}, although the supply meets the ${supply.benchmarkLabel}: more moisture is released than this kind of room normally has to lose (look for indoor drying, unvented appliances or leaks).`,
        });
      }
    }
  }
  if (surface) {
    if (surface.factor < surface.neededFactor) {
      findings.push({
        cause: 'too-cold',
        reason: `The surface temperature factor ${surface.factor.toFixed(2)} is below the ${surface.neededFactor.toFixed(2)} it needs: the surface is too cold${excessHigh === false ? ' although the moisture level is normal for the use' : ''}.`,
      });
    }
  } else {
    warnings.push(moistureWarning('surface-unknown', 'No surface factor: a cold surface cannot be confirmed or ruled out.'));
  }
  if (findings.length === 0) {
    findings.push({
      cause: 'no-moisture-cause-found',
      reason: excess
        ? 'The moisture level is within the class for the use and the surface is not colder than it needs to be: if there is damp, look for liquid water (leaks, penetrating or rising damp).'
        : 'Without logged humidity inside and outside no moisture cause can be named.',
    });
  }
  return { findings, rule: RULE, warnings };
}
