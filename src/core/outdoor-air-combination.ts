/**
 * How a room's mechanical and natural outdoor-air flows combine. The one rule used by the room
 * prediction, kept here so it can be read, cited and changed in one place.
 *
 *     Q = Q_bal + sqrt(Q_unbal² + Q_nat²)
 *     Q_bal = min(S, E),  Q_unbal = |S − E|
 *
 * S = mechanical supply and E = mechanical extract serving the room, Q_nat = natural flow
 * (windows, vents, air bricks, leakage), all m³/s. Source: the superposition rule of the ASHRAE
 * Handbook of Fundamentals (ventilation and infiltration chapter), from memory: balanced
 * mechanical flow adds directly; unbalanced mechanical flow and natural flow combine in
 * quadrature, because an extract fan depressurises the room and takes part of its make-up air
 * through the same openings the natural flow uses. We apply it at room level.
 *
 * The rule never falls when any input rises, so it keeps low ≤ central ≤ high end by end.
 */
import type { FlowRange } from './flow-range.ts';

/** Name of the rule, for method strings and the report. */
export const COMBINATION_RULE =
  'Q = Q_bal + sqrt(Q_unbal² + Q_nat²) (ASHRAE Handbook of Fundamentals superposition, from memory)';

/**
 * Combined outdoor air, m³/s, from mechanical supply S, extract E and natural flow (m³/s).
 * Source: ASHRAE HoF superposition rule (from memory).
 * Example: combineFlows(0, 0.01, 0.01) = 0.01414 m³/s; combineFlows(0.02, 0.02, 0.01) = 0.03 m³/s.
 */
export function combineFlows(supply_m3s: number, extract_m3s: number, natural_m3s: number): number {
  const balanced = Math.min(supply_m3s, extract_m3s);
  const unbalanced = Math.abs(supply_m3s - extract_m3s);
  return balanced + Math.hypot(unbalanced, natural_m3s);
}

/**
 * The rule applied end by end to ranges (m³/s).
 * Source: ASHRAE HoF superposition rule (from memory).
 * Example: combineRanges({ low: 0, central: 0, high: 0 }, { low: 0.005, central: 0.01, high: 0.015 },
 *   { low: 0.005, central: 0.01, high: 0.02 }) = { low: 0.00707, central: 0.01414, high: 0.025 }.
 */
export function combineRanges(supply: FlowRange, extract: FlowRange, natural: FlowRange): FlowRange {
  return {
    low: combineFlows(supply.low, extract.low, natural.low),
    central: combineFlows(supply.central, extract.central, natural.central),
    high: combineFlows(supply.high, extract.high, natural.high),
  };
}
