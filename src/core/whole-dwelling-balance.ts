/**
 * Supply-equals-extract check of a dwelling's mechanical ventilation (practice.md §2 item 9: with
 * MEV, PIV or MVHR the dwelling is the unit). Air is conserved: what a balanced system supplies
 * and extracts should agree; what an extract-only or supply-only system moves must be made up
 * through background vents and leakage.
 *
 * Tolerance: supply and extract of a balanced system within 10 % of the larger (our screening
 * tolerance; common practice (no published source)).
 */
import type { FanInput } from './airflow-inputs.ts';
import { airflowWarning, type AirflowWarning } from './airflow-warnings.ts';
import { fanFlowRange } from './fan-flow.ts';
import { addRanges, type FlowRange } from './flow-range.ts';
import { litresPerSecond, roundToStep } from './units.ts';

/** Largest accepted mismatch of a balanced system, as a fraction of the larger flow. */
export const BALANCE_TOLERANCE = 0.1;

/** Result of the dwelling balance check. Flows in m³/s. */
export interface DwellingBalance {
  /** Total supply of running whole-dwelling terminals. */
  supply: FlowRange;
  /** Total extract of running whole-dwelling terminals. */
  extract: FlowRange;
  /** |supply − extract| / max(supply, extract), central values; 0 when nothing runs. */
  mismatch: number;
  /** Air that must come in (positive) or leave (negative) through vents and leakage, central, m³/s. */
  madeUpThroughEnvelope_m3s: number;
  warnings: AirflowWarning[];
}

/**
 * Totals of all running whole-dwelling terminals (m³/s) and the supply = extract check.
 * Source: conservation of air mass (dwelling as one zone); tolerance is our own.
 * Example: dwellingBalance([mvhr supply 0.030 measured, mvhr extract 0.036 measured]).mismatch = 0.1667,
 *   with a 'dwelling-supply-extract-unbalanced' warning.
 */
export function dwellingBalance(fans: readonly FanInput[]): DwellingBalance {
  const terminals = fans.filter((f) => f.system !== 'local' && f.running && f.role !== 'recirculating');
  const sum = (role: 'supply' | 'extract') =>
    addRanges(terminals.filter((f) => f.role === role).map((f) => fanFlowRange(f).flow));
  const supply = sum('supply');
  const extract = sum('extract');
  const larger = Math.max(supply.central, extract.central);
  const mismatch = larger > 0 ? Math.abs(supply.central - extract.central) / larger : 0;
  const warnings: AirflowWarning[] = [];
  const balanced = terminals.some((f) => f.system === 'whole-dwelling-balanced');
  if (balanced && mismatch > BALANCE_TOLERANCE) {
    warnings.push(
      airflowWarning(
        'dwelling-supply-extract-unbalanced',
        `The balanced system supplies ${roundToStep(litresPerSecond(supply.central), 0.5)} L/s and extracts ${roundToStep(litresPerSecond(extract.central), 0.5)} L/s: more than ${BALANCE_TOLERANCE * 100} % apart. Check the commissioning, filters and terminal settings.`,
      ),
    );
  }
  return { supply, extract, mismatch, madeUpThroughEnvelope_m3s: extract.central - supply.central, warnings };
}
