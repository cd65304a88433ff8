/**
 * The analysis's method and scenario codes in a surveyor's words, for the findings screens.
 * Published methods keep their usual names.
 */
import type { MeasuredEstimate, ScenarioResult } from '../analysis/results.ts';

export const METHOD_WORDS: Record<MeasuredEstimate['method'], string> = {
  'decay-log-linear': 'decay test, log-linear fit (ASTM E741)',
  'decay-with-background': 'decay test, fitted with the level it tends to',
  'decay-two-point': 'decay test, two readings',
  'build-up-known-output': 'build-up, from the occupants’ CO₂ output',
  'build-up-rate-and-level': 'build-up, fitted rate and level',
  'build-up-two-point': 'build-up, two readings',
  'spot-reading': 'single reading, taken as steady state',
  'near-steady': 'readings near steady state',
};

export const SET_WORDS: Record<MeasuredEstimate['setKind'], string> = {
  decay: 'Decay test',
  'seeded-decay': 'Seeded decay',
  'build-up': 'Build-up',
  steady: 'Steady readings',
  spot: 'Spot reading',
};

export const KIND_WORDS: Record<MeasuredEstimate['kind'], string> = {
  estimate: 'estimate with its 95% interval',
  'upper-bound': 'an upper bound only',
  range: 'a range only',
  none: 'no estimate (see the notes)',
};

export const SCENARIO_WORDS: Record<ScenarioResult['id'], string> = {
  'as-found': 'As found',
  closed: 'Everything shut',
  'vents-open': 'Vents open, windows shut',
  'windows-open': 'Windows open',
  'design-occupancy': 'Full occupancy',
};
