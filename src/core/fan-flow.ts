/**
 * Air moved by a fan or a mechanical-system terminal, only while it runs.
 *
 * - A measured flow (powered hood or vane anemometer and cone) is used when present, ±15 %
 *   (common practice (no published source): hood and anemometer readings in the field).
 * - Otherwise the maker's rated flow, derated: installed fans rarely reach their rating once
 *   ducts, grilles and back-draught shutters are added. We count 60 % of rated flow, range
 *   30–100 % (our own stated assumption; common practice (no published source)), and flag it.
 * - A recirculating hood moves no outdoor air. A fan with neither figure counts as nothing.
 */
import type { AirflowItem } from './airflow-item.ts';
import type { FanInput } from './airflow-inputs.ts';
import { airflowWarning, type AirflowWarning } from './airflow-warnings.ts';
import { NO_FLOW, rangeAboutCentral, type FlowRange } from './flow-range.ts';
import { litresPerSecond, roundToStep } from './units.ts';

/** Relative uncertainty of a field-measured fan flow (±15 %, common practice). */
export const MEASURED_FAN_FLOW_UNCERTAINTY = 0.15;
/** Fraction of rated flow counted for an unmeasured fan (assumed). */
export const RATED_FLOW_DERATING = Object.freeze({ low: 0.3, central: 0.6, high: 1.0 });

/**
 * The flow range a fan delivers while running, m³/s, and the warnings about where it came from.
 * Source: common practice (no published source); derating is our stated assumption.
 * Example: fanFlowRange({ kind: 'fan', id: 'f', role: 'extract', system: 'local', running: true,
 *   ratedFlow_m3s: 0.015 }).flow = { low: 0.0045, central: 0.009, high: 0.015 }.
 */
export function fanFlowRange(fan: FanInput): { flow: FlowRange; method: string; warnings: AirflowWarning[] } {
  if (fan.measuredFlow_m3s !== undefined && fan.measuredFlow_m3s >= 0) {
    return {
      flow: rangeAboutCentral(fan.measuredFlow_m3s, MEASURED_FAN_FLOW_UNCERTAINTY),
      method: `measured flow ${roundToStep(litresPerSecond(fan.measuredFlow_m3s), 0.5)} L/s, ±${MEASURED_FAN_FLOW_UNCERTAINTY * 100} %`,
      warnings: [],
    };
  }
  if (fan.ratedFlow_m3s !== undefined && fan.ratedFlow_m3s >= 0) {
    const d = RATED_FLOW_DERATING;
    const rated = fan.ratedFlow_m3s;
    return {
      flow: { low: rated * d.low, central: rated * d.central, high: rated * d.high },
      method: `rated flow ${roundToStep(litresPerSecond(rated), 0.5)} L/s counted at ${d.central * 100} % (${d.low * 100}–${d.high * 100} %)`,
      warnings: [
        airflowWarning(
          'fan-rated-flow-derated',
          `No measured flow: the maker's rating is counted at ${d.central * 100} % (${d.low * 100}–${d.high * 100} %), since installed fans rarely reach it. Measure it to narrow the range.`,
        ),
      ],
    };
  }
  return {
    flow: NO_FLOW,
    method: 'no measured or rated flow: not counted',
    warnings: [airflowWarning('fan-flow-unknown', 'Neither a measured nor a rated flow is recorded, so this fan is not counted.')],
  };
}

/**
 * A fan's contribution to the room as an item (m³/s), counted only while it runs.
 * Source: see the file note.
 * Example: fanFlow({ kind: 'fan', id: 'f', role: 'extract', system: 'local', running: true,
 *   measuredFlow_m3s: 0.012 }).flow.central = 0.012 m³/s.
 */
export function fanFlow(fan: FanInput): AirflowItem {
  if (fan.role === 'recirculating') {
    return {
      itemId: fan.id,
      mechanism: 'recirculating',
      flow: NO_FLOW,
      countsAsOutdoorAir: false,
      method: 'recirculates room air: no outdoor air',
      warnings: [
        airflowWarning('recirculating-no-outdoor-air', 'A recirculating unit filters room air and returns it; it adds no outdoor air.'),
      ],
    };
  }
  const mechanism = fan.role === 'extract' ? 'mechanical-extract' : 'mechanical-supply';
  if (!fan.running) {
    return {
      itemId: fan.id,
      mechanism,
      flow: NO_FLOW,
      countsAsOutdoorAir: true,
      method: 'not running: no flow',
      warnings: [airflowWarning('fan-not-running', 'The fan is not running in this case, so it adds no air.')],
    };
  }
  const { flow, method, warnings } = fanFlowRange(fan);
  const extractNote =
    fan.role === 'extract' && flow.central > 0
      ? [
          airflowWarning(
            'extract-draws-indoor-air',
            'Air drawn out by extract is replaced partly through the room’s own openings and leakage and partly from other rooms, so not all of it is outdoor air.',
          ),
        ]
      : [];
  return { itemId: fan.id, mechanism, flow, countsAsOutdoorAir: true, method, warnings: [...warnings, ...extractNote] };
}
