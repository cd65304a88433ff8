/**
 * Measured against predicted: each measurement is compared with the prediction for the state
 * recorded during that test (practice.md §1 item 12), under the day's weather when it was
 * recorded, else over every weather case. A measurement is never averaged with a prediction: a
 * decay is ±5–10 %, a prediction ±50 % or a factor of two (practice.md §1 item 9c). They are
 * said to disagree only when the measured interval and the predicted range do not overlap.
 *
 * When they disagree, one reason is chosen from what was recorded (our own screening rules):
 * measured above the prediction —
 * - doors were recorded open: air from a corridor or the next room reaches the room
 *   ('door-open-to-corridor'; a decay then tends to that air, not outdoor air);
 * - else, when nothing was open and leakage is an assumed default: the fabric leaks more than
 *   assumed ('leakier-fabric-than-assumed');
 * - else an opening or path not on the record ('unrecorded-opening');
 * measured below the prediction —
 * - a running fan is counted in the prediction: it was off, weaker than rated or short of make-up
 *   air ('fan-off-or-weak');
 * - else the openings pass less than the formulas say ('openings-pass-less-than-predicted').
 * A logger period has no recorded state: 'not-compared' ('state-not-recorded').
 *
 * Example: a decay at 14 (12–16) L/s with doors shut and nothing open, against an assumed-leakage
 * prediction of 3 (1–7) L/s → 'measured-above', 'leakier-fabric-than-assumed'.
 */
import type { FlowRange } from '../core/flow-range.ts';
import type { MeasuredEstimate, Ranged, Reconciliation, ReconciliationReason } from './results.ts';
import type { RoomState } from './room-state.ts';

/** What was recorded and predicted for the test. */
export interface ReconcileInputs {
  measured: MeasuredEstimate;
  /** The state recorded during the test; null when not recorded. */
  state: RoomState | null;
  predicted: FlowRange | null;
  predictedUnder: string;
  /** The prediction counts flow from a running fan or terminal. */
  fanCounted: boolean;
  /** Any window or vent counted open in the prediction. */
  anythingOpen: boolean;
  leakageAssumed: boolean;
}

const EXPLANATIONS: Readonly<Record<ReconciliationReason, string>> = {
  'door-open-to-corridor':
    'The doors were open during the test: air from the corridor or the next room reached the room, which the prediction for this room alone does not count. Repeat with the doors shut to measure the room itself.',
  'unrecorded-opening':
    'More air arrived than the recorded openings and leakage can give: an opening, a gap or a path that is not on the record was probably open. Check trickle vents, extract grilles, gaps around pipes and doors.',
  'leakier-fabric-than-assumed':
    'With everything recorded shut, more air arrived than the assumed leakage gives: the fabric is leakier than assumed. A pressure test would settle it.',
  'fan-off-or-weak':
    'Less air arrived than the prediction counts from a running fan: the fan was off, is weaker than its rating, or cannot draw make-up air. Measure the fan’s flow.',
  'openings-pass-less-than-predicted':
    'Less air arrived than the openings are predicted to give: the weather was calmer than the case, or the openings pass less than the formulas say (partly blocked, screened, sheltered).',
  'state-not-recorded': 'The state of the openings during this period was not recorded, so it cannot be compared with a prediction.',
};

const endsOf = (r: Ranged): { low: number | null; high: number | null } => ({ low: r.low ?? r.value, high: r.high ?? r.value });

/**
 * Compare one measurement with its prediction (see the file note).
 * Example: reconcile({ measured: decayAt14, state: shutState, predicted: { low: 0.001, central: 0.003, high: 0.007 }, … }).reason
 *   = 'leakier-fabric-than-assumed'.
 */
export function reconcile(x: ReconcileInputs): Reconciliation {
  const m = x.measured;
  const base = { setId: m.setId, method: m.method, measured_m3s: m.supply_m3s, predictedUnder: x.predictedUnder };
  const predicted: Ranged = x.predicted ? { value: x.predicted.central, low: x.predicted.low, high: x.predicted.high } : { value: null, low: null, high: null };
  if (!x.state || !x.predicted) {
    return { ...base, predicted_m3s: predicted, outcome: 'not-compared', ratio: null, reason: 'state-not-recorded', explanation: EXPLANATIONS['state-not-recorded'] };
  }
  const { low, high } = endsOf(m.supply_m3s);
  const p = x.predicted;
  const ratio = m.supply_m3s.value !== null && p.central > 0 ? m.supply_m3s.value / p.central : null;
  let outcome: Reconciliation['outcome'] = 'agree';
  if (low !== null && low > p.high) outcome = 'measured-above';
  else if (high !== null && high < p.low) outcome = 'measured-below';
  let reason: ReconciliationReason | null = null;
  if (outcome === 'measured-above') {
    reason = x.state.doorsOpen ? 'door-open-to-corridor' : !x.anythingOpen && x.leakageAssumed ? 'leakier-fabric-than-assumed' : 'unrecorded-opening';
  } else if (outcome === 'measured-below') {
    reason = x.fanCounted ? 'fan-off-or-weak' : 'openings-pass-less-than-predicted';
  }
  return {
    ...base,
    predicted_m3s: predicted,
    outcome,
    ratio,
    reason,
    explanation: reason ? EXPLANATIONS[reason] : 'The measurement lies within the predicted range for the state recorded during the test.',
  };
}
