/**
 * Capacity of a door undercut or transfer grille to pass air between rooms at a stated pressure
 * difference. This is air from other rooms, never outdoor air: it is shown so that a surveyor
 * can see whether an extract fan can draw its make-up air, and it is never added to a room's
 * outdoor supply (practice.md §2 item 9).
 *
 * An undercut is taken as a slot of free area width × gap with C_d 0.61 (a screening
 * approximation). ADF's 7600 mm² undercut is about 10 mm under a standard door (practice.md §2).
 */
import type { AirflowItem } from './airflow-item.ts';
import type { DoorUndercutInput, TransferGrilleInput } from './airflow-inputs.ts';
import { airflowWarning } from './airflow-warnings.ts';
import { describeOrifice, labelledVentFlow } from './background-vent-flow.ts';

/** Pressure difference at which transfer capacity is stated unless another is given, Pa (our choice). */
export const TRANSFER_REFERENCE_PRESSURE_PA = 1;

/**
 * Transfer capacity (m³/s) of an undercut or grille at Δp (Pa, default 1), shown but never outdoor air.
 * Source: orifice equation (BS 5925:1991 cl. 9 eq. (2)).
 * Example: transferFlow({ kind: 'door-undercut', id: 'd1', doorWidth_m: 0.76, gap_m: 0.01 }).flow.central
 *   = 0.61 · 0.0076 · sqrt(2/1.2) = 0.005985 m³/s (6.0 L/s at 1 Pa).
 */
export function transferFlow(
  opening: DoorUndercutInput | TransferGrilleInput,
  pressure_Pa = TRANSFER_REFERENCE_PRESSURE_PA,
): AirflowItem {
  const [area_m2, basis] =
    opening.kind === 'door-undercut'
      ? [Math.max(0, opening.doorWidth_m) * Math.max(0, opening.gap_m), 'equivalent' as const]
      : [opening.labelArea_m2, opening.areaBasis];
  const { flow, equivalentArea_m2, warnings } = labelledVentFlow(area_m2, basis, pressure_Pa);
  return {
    itemId: opening.id,
    mechanism: 'internal-transfer',
    flow,
    countsAsOutdoorAir: false,
    method: `transfer capacity by the orifice equation, ${describeOrifice(equivalentArea_m2, pressure_Pa)}`,
    warnings: [
      ...warnings,
      airflowWarning(
        'transfer-not-outdoor-air',
        'Air through a door gap or internal grille comes from other rooms. It is shown as capacity only and not counted as outdoor air.',
      ),
    ],
  };
}
