/**
 * Flow through a background ventilator (trickle vent) at a stated pressure difference, by the
 * orifice equation with its equivalent area (BS 5925:1991 cl. 9 eq. (2); equivalent area as
 * defined in ADF / BS EN 13141-1). A label giving free area is converted with a stated factor
 * and flagged. The range carries the ±50 % of opening formulas (practice.md §1 item 9c).
 */
import type { AirflowItem } from './airflow-item.ts';
import type { AreaBasis } from './equivalent-area.ts';
import type { BackgroundVentInput } from './airflow-inputs.ts';
import { airflowWarning, type AirflowWarning } from './airflow-warnings.ts';
import { equivalentAreaFromLabel } from './equivalent-area.ts';
import { NO_FLOW, OPENING_MODEL_UNCERTAINTY, type FlowRange } from './flow-range.ts';
import { orificeFlow } from './orifice-flow.ts';
import { roundToStep, squareMillimetres } from './units.ts';

/**
 * Orifice flow range (m³/s) of a vent from its labelled area (m²) and label basis at Δp (Pa):
 * low = low equivalent area, −50 %; high = high equivalent area, +50 %.
 * Source: orifice equation (BS 5925:1991 cl. 9 eq. (2)); equivalent area (ADF, BS EN 13141-1).
 * Example: labelledVentFlow(0.008, 'equivalent', 1).flow = { low: 0.00315, central: 0.00630, high: 0.00945 }.
 */
export function labelledVentFlow(
  labelArea_m2: number,
  basis: AreaBasis,
  pressure_Pa: number,
): { flow: FlowRange; equivalentArea_m2: number; warnings: AirflowWarning[] } {
  const { area, warnings } = equivalentAreaFromLabel(labelArea_m2, basis);
  const flow = {
    low: orificeFlow(area.low, pressure_Pa) * (1 - OPENING_MODEL_UNCERTAINTY),
    central: orificeFlow(area.central, pressure_Pa),
    high: orificeFlow(area.high, pressure_Pa) * (1 + OPENING_MODEL_UNCERTAINTY),
  };
  return { flow, equivalentArea_m2: area.central, warnings };
}

/**
 * Words for a method string: equivalent area (m², shown in mm² to 100) and pressure (Pa, to 0.01).
 * Source: none (display wording).
 * Example: describeOrifice(0.004, 1) = '4000 mm² equivalent area at 1 Pa'.
 */
export function describeOrifice(equivalentArea_m2: number, pressure_Pa: number): string {
  return `${roundToStep(squareMillimetres(equivalentArea_m2), 100)} mm² equivalent area at ${roundToStep(pressure_Pa, 0.01)} Pa`;
}

/**
 * Outdoor air through a background vent at a stated pressure difference (Pa), as an item.
 * A closed or blocked vent passes nothing and says so.
 * Source: orifice equation (BS 5925:1991 cl. 9 eq. (2)).
 * Example: backgroundVentFlow({ kind: 'background-vent', id: 'v1', labelArea_m2: 0.008,
 *   areaBasis: 'equivalent', condition: 'open', facing_deg: 180, centreHeight_m: 2.1 }, 1).flow.central = 0.00630 m³/s.
 */
export function backgroundVentFlow(vent: BackgroundVentInput, pressure_Pa: number): AirflowItem {
  const base = { itemId: vent.id, mechanism: 'background-vent' as const, countsAsOutdoorAir: true };
  if (vent.condition !== 'open') {
    const warning =
      vent.condition === 'closed'
        ? airflowWarning('vent-closed', 'The vent was closed, so it adds no air in this prediction.')
        : airflowWarning('vent-blocked', 'The vent is blocked (painted over, filled or obstructed) and adds no air.');
    return { ...base, flow: NO_FLOW, method: 'closed or blocked: no flow', warnings: [warning] };
  }
  const { flow, equivalentArea_m2, warnings } = labelledVentFlow(vent.labelArea_m2, vent.areaBasis, pressure_Pa);
  return {
    ...base,
    flow,
    method: `orifice equation (BS 5925), ${describeOrifice(equivalentArea_m2, pressure_Pa)}`,
    warnings,
  };
}
