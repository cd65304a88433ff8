/**
 * Observed mould always wins over a prediction. A calculation can be wrong (a surface colder
 * than assumed, a leak, a wet week missed); mould seen on a surface is evidence. The report must
 * never show "no risk" beside a photo of mould (practice.md §3 and §5).
 */
import { moistureWarning, type MoistureWarning } from './moisture-warnings.ts';
import type { MouldRiskResult, MouldVerdict } from './mould-risk.ts';

/** What the surveyor saw on the surface. */
export interface MouldObservation {
  mouldSeen: boolean;
  /** Where, in the surveyor's words (optional). */
  where?: string;
}

/** The combined judgement: the verdict to report, why, and the prediction kept for reference. */
export interface MouldJudgement {
  verdict: MouldVerdict | 'mould-observed';
  reason: string;
  predicted: MouldRiskResult;
  warnings: MoistureWarning[];
}

/**
 * Combine a predicted mould risk with what was seen. Mould seen → 'mould-observed' whatever the
 * prediction says, with a warning when the prediction disagreed.
 * Example: a prediction of 'no-risk-predicted' with { mouldSeen: true, where: 'bedroom ceiling
 * corner' } → { verdict: 'mould-observed', reason: 'Mould was seen (bedroom ceiling corner); …' }.
 */
export function judgeMouldWithObservation(predicted: MouldRiskResult, observation: MouldObservation): MouldJudgement {
  if (!observation.mouldSeen) {
    return { verdict: predicted.verdict, reason: predicted.summary, predicted, warnings: [...predicted.warnings] };
  }
  const where = observation.where ? ` (${observation.where})` : '';
  const warnings = [...predicted.warnings];
  if (predicted.verdict !== 'risk') {
    warnings.push(
      moistureWarning(
        'observed-mould',
        'Mould was seen although the calculation did not predict it: check the surface factor, the moisture load and the months used, and look for a leak, penetrating or rising damp.',
      ),
    );
  }
  return {
    verdict: 'mould-observed',
    reason: `Mould was seen${where}; what is seen outweighs any calculated risk.`,
    predicted,
    warnings,
  };
}
