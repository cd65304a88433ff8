/**
 * Air through an air brick in an outside wall. Only an air brick that opens into the room and
 * is there to ventilate it counts as room supply. Air bricks that ventilate a sub-floor, or that
 * supply combustion air to an open-flued appliance, never count (practice.md §1 item 10; the
 * combustion-air ones must also never be closed). An air brick of unknown purpose is not counted
 * either, so that the prediction cannot reassure on a guess.
 */
import type { AirflowItem } from './airflow-item.ts';
import type { AirBrickInput } from './airflow-inputs.ts';
import { airflowWarning } from './airflow-warnings.ts';
import { describeOrifice, labelledVentFlow } from './background-vent-flow.ts';
import { NO_FLOW } from './flow-range.ts';

/**
 * Outdoor air into the room through an air brick at a stated pressure difference (Pa), as an item.
 * Source: orifice equation (BS 5925:1991 cl. 9 eq. (2)); counting rules common practice (no published source).
 * Example: airBrickFlow({ kind: 'air-brick', id: 'b1', labelArea_m2: 0.005, areaBasis: 'free',
 *   purpose: 'sub-floor', condition: 'clear', facing_deg: 0, centreHeight_m: -0.2 }, 1).flow.central = 0
 *   (with an explanatory note).
 */
export function airBrickFlow(brick: AirBrickInput, pressure_Pa: number): AirflowItem {
  const none = (method: string, warnings: AirflowItem['warnings']): AirflowItem => ({
    itemId: brick.id,
    mechanism: 'air-brick',
    flow: NO_FLOW,
    countsAsOutdoorAir: false,
    method,
    warnings,
  });
  switch (brick.purpose) {
    case 'sub-floor':
      return none('ventilates the space under the floor: not room supply', [
        airflowWarning(
          'air-brick-sub-floor',
          'This air brick ventilates the space under the floor, not the room, so it is not counted as room supply. Keep it clear: it protects the floor timbers.',
        ),
      ]);
    case 'combustion-air':
      return none('combustion air for an appliance: never counted as supply', [
        airflowWarning(
          'air-brick-combustion-air',
          'This vent supplies air to a fuel-burning appliance. It is not counted as ventilation, must never be closed or blocked, and any change needs a gas or solid-fuel engineer.',
        ),
      ]);
    case 'unknown':
      return none('purpose not recorded: not counted', [
        airflowWarning(
          'air-brick-purpose-unknown',
          'What this air brick serves was not recorded, so it is not counted as room supply. Check whether it serves the room, the sub-floor or an appliance.',
        ),
      ]);
    case 'room-supply':
      break;
  }
  if (brick.condition === 'blocked') {
    return {
      ...none('blocked: no flow', [airflowWarning('vent-blocked', 'The air brick is blocked and adds no air.')]),
      countsAsOutdoorAir: true,
    };
  }
  const { flow, equivalentArea_m2, warnings } = labelledVentFlow(brick.labelArea_m2, brick.areaBasis, pressure_Pa);
  return {
    itemId: brick.id,
    mechanism: 'air-brick',
    flow,
    countsAsOutdoorAir: true,
    method: `orifice equation (BS 5925), ${describeOrifice(equivalentArea_m2, pressure_Pa)}`,
    warnings,
  };
}
