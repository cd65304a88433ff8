/**
 * The supply methods by their published names, with the method or standard each follows, for
 * the measurement rows and the methods table.
 *
 * Example: METHOD_WORDS['decay-log-linear'].name = 'Decay test, log-linear regression'.
 */
import type { SupplyMethod } from '../core/supply-estimate.ts';

export const METHOD_WORDS: Record<SupplyMethod, { name: string; source: string }> = {
  'decay-log-linear': { name: 'Decay test, log-linear regression', source: 'Tracer-gas decay, ASTM E741, with CO2 as the tracer' },
  'decay-with-background': { name: 'Decay test with a fitted background level', source: 'Tracer-gas decay (ASTM E741) with the level it falls towards fitted as a third parameter' },
  'decay-two-point': { name: 'Decay test from two readings', source: 'Tracer-gas decay, ASTM E741 (two-point form)' },
  'build-up-known-output': { name: 'Build-up with the occupants’ known CO2 output', source: 'Single-zone mass balance; CO2 output by Persily & de Jonge' },
  'build-up-rate-and-level': { name: 'Build-up fitted for rate and level', source: 'Single-zone mass balance, transient fit' },
  'build-up-two-point': { name: 'Build-up from two readings', source: 'Single-zone mass balance, two-point form; CO2 output by Persily & de Jonge' },
  'spot-reading': { name: 'Single reading after a known occupied time', source: 'Single-zone mass balance; CO2 output by Persily & de Jonge' },
  'near-steady': { name: 'Near-steady occupied level', source: 'Single-zone mass balance at steady state; CO2 output by Persily & de Jonge' },
};
