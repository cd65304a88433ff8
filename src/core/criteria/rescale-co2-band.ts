/**
 * CO2-above-outdoor bands rescaled for the people actually in the room. A band ΔC_limit defined
 * for an adult output G_ref corresponds to an outdoor-air supply of G_ref/ΔC_limit per person;
 * for a group whose output per person is G the same supply gives ΔC = ΔC_limit·G/G_ref
 * (steady-state mass balance, references.md §0; practice.md §1.7).
 *
 * Check (practice.md §1.7): pupils aged 6–11 breathe out about 0.0031 L/s of CO2 at 20 °C, so
 * EN 16798-1 category II (ΔC 800 ppm, 20 L/h per adult) means about 3.9 L/s per pupil, not 7.
 */
import { moistureWarning, type MoistureWarning } from '../moisture-warnings.ts';
import { PPM_PER_VOLUME_FRACTION } from '../units.ts';
import type { Criterion } from './criterion.ts';

/**
 * The band rescaled to a group's output: ΔC_limit·G/G_ref (ppm). Outputs in m³/s per person.
 * Example: rescaledCo2Excess(800, 5.556e-6, 3.1e-6) = 446.4 ppm.
 */
export function rescaledCo2Excess(limit_ppm: number, referenceOutput_m3s: number, groupOutput_m3s: number): number {
  return (limit_ppm * groupOutput_m3s) / referenceOutput_m3s;
}

/**
 * Outdoor air per person (m³/s) that holds the steady CO2 excess at excess_ppm for people each
 * giving out output_m3s: q = 1e6·G/ΔC. Example: flowPerPersonForCo2Excess(800, 3.1e-6) =
 * 3.875e-3 m³/s (3.9 L/s per person).
 */
export function flowPerPersonForCo2Excess(excess_ppm: number, output_m3s: number): number {
  return (PPM_PER_VOLUME_FRACTION * output_m3s) / excess_ppm;
}

/** A band made fit for a group: the rescaled criterion and the per-person supply it stands for. */
export interface RescaledCriterion {
  criterion: Criterion;
  /** Outdoor air per person the band stands for, m³/s (kept by the rescaling). */
  flowPerPerson_m3s: number | null;
  /** What the unscaled band would demand of this group, m³/s per person (the error rescaling avoids). */
  unscaledFlowPerPerson_m3s: number | null;
  method: string;
  warnings: MoistureWarning[];
}

/**
 * Rescale a CO2-above-outdoor criterion for a group's output per person (m³/s), keeping its
 * id and source and saying so in its note. Other criteria come back unchanged with a warning.
 * Example: EN 16798-1 category II (800 ppm, 20 L/h per adult) for pupils giving 3.1e-6 m³/s each
 * → limit 446.4 ppm; flowPerPerson_m3s 6.94e-3 (6.9 L/s, as for adults); unscaledFlowPerPerson_m3s
 * 3.875e-3 (800 ppm unchanged would accept 3.9 L/s per pupil).
 */
export function rescaleCriterionForOccupants(criterion: Criterion, groupOutput_m3s: number, groupLabel: string): RescaledCriterion {
  const method = 'ΔC_limit × G/G_ref: the same outdoor air per person as the band assumes';
  const reference = criterion.assumedCo2Output_m3s;
  if (criterion.metric !== 'co2-above-outdoor' || reference === undefined || criterion.limit === null) {
    return {
      criterion,
      flowPerPerson_m3s: null,
      unscaledFlowPerPerson_m3s: null,
      method,
      warnings: [moistureWarning('not-rescalable', `"${criterion.title}" is not a CO2 band with a stated output per person, so it cannot be rescaled.`)],
    };
  }
  const limit = rescaledCo2Excess(criterion.limit, reference, groupOutput_m3s);
  return {
    criterion: {
      ...criterion,
      limit,
      assumedCo2Output_m3s: groupOutput_m3s,
      note: `${criterion.note ? criterion.note + ' ' : ''}Rescaled for ${groupLabel}: ${Math.round(limit)} ppm instead of ${criterion.limit} ppm for adults.`,
    },
    flowPerPerson_m3s: flowPerPersonForCo2Excess(criterion.limit, reference),
    unscaledFlowPerPerson_m3s: flowPerPersonForCo2Excess(criterion.limit, groupOutput_m3s),
    method,
    warnings: [],
  };
}
