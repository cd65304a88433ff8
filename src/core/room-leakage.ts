/**
 * A room's share of background leakage under a weather case, spread by exposed envelope area
 * (practice.md §1 item 9a): outside walls, roof and exposed floor of the room. An interior room
 * (no exposed envelope) gets none.
 *
 * - From a measured air permeability: central by the LBL model (it responds to the case's
 *   temperature difference and wind), with the room's leakage area from q50 × its exposed area;
 *   the range is ×/÷2 about it, widened to cover the divide-by-20 rule in SAP's form ×/÷2.
 * - From an effective leakage area of the dwelling: LBL on the room's share, ×/÷2.
 * - With no test: an assumed q50 (assumed-air-permeability.ts), then as measured, ×/÷3: the
 *   factor two of the model combined with a factor two on the default itself, in quadrature on a
 *   log scale (2^√2 ≈ 2.7, rounded up).
 * - A test that also measured leakage to neighbours (flats, terraces) overstates outdoor air: the
 *   low end is halved again and the surveyor is told.
 * LBL wind is taken as the case's 10 m wind; shelter enters through the LBL shelter class.
 */
import type { AirflowItem } from './airflow-item.ts';
import type { LeakageInput } from './airflow-inputs.ts';
import { airflowWarning, type AirflowWarning } from './airflow-warnings.ts';
import { assumedAirPermeability } from './assumed-air-permeability.ts';
import { coverValues, LEAKAGE_MODEL_FACTOR, NO_FLOW, rangeByFactor, type FlowRange } from './flow-range.ts';
import { leakageAreaFromAirPermeability, lblInfiltration } from './lbl-infiltration.ts';
import { leakageDivideBy20 } from './leakage-divide-by-20.ts';
import { roundToStep } from './units.ts';
import { temperatureDifference, type WeatherCase } from './weather-cases.ts';

/** Multiplicative uncertainty of leakage from an assumed default (see the file note). */
export const ASSUMED_LEAKAGE_FACTOR = 3;

/**
 * The room's leakage under a weather case, as an item (m³/s).
 * Source: LBL basic model (ASHRAE HoF infiltration chapter) and divide-by-20 in SAP's form.
 * Example: roomLeakage({ id: 'leak', source: { basis: 'measured-air-permeability', q50_m3hm2: 10 },
 *   roomExposedEnvelope_m2: 20, storeys: 2, shelterClass: 3, shelteredSides: 2 }, COLD_CALM).flow.central
 *   = 0.003236 m³/s (3.2 L/s).
 */
export function roomLeakage(leak: LeakageInput, weather: WeatherCase): AirflowItem {
  const base = { itemId: leak.id, mechanism: 'leakage' as const, countsAsOutdoorAir: true };
  if (!(leak.roomExposedEnvelope_m2 > 0)) {
    return {
      ...base,
      flow: NO_FLOW,
      method: 'interior room: no exposed envelope',
      warnings: [
        airflowWarning('leakage-interior-room', 'The room has no outside walls, roof or exposed floor, so no background leakage from outdoors is counted.'),
      ],
    };
  }
  const dT = temperatureDifference(weather);
  const u = weather.windAt10m_ms;
  const lbl = (area_m2: number) => lblInfiltration(area_m2, leak.storeys, leak.shelterClass, dT, u);
  const warnings: AirflowWarning[] = [];
  let flow: FlowRange;
  let method: string;
  const src = leak.source;
  if (src.basis === 'effective-leakage-area') {
    const share = src.dwellingEnvelope_m2 > 0 ? leak.roomExposedEnvelope_m2 / src.dwellingEnvelope_m2 : 0;
    flow = rangeByFactor(lbl(src.dwellingLeakageArea_m2 * Math.min(1, share)), LEAKAGE_MODEL_FACTOR);
    method = `LBL model on the room's share (${roundToStep(share * 100, 1)} %) of the dwelling's effective leakage area`;
  } else {
    const assumed = src.basis === 'assumed' ? assumedAirPermeability(src.assumed) : undefined;
    const q50 = assumed ? assumed.q50_m3hm2 : src.basis === 'measured-air-permeability' ? src.q50_m3hm2 : 0;
    const factor = assumed ? ASSUMED_LEAKAGE_FACTOR : LEAKAGE_MODEL_FACTOR;
    const central = lbl(leakageAreaFromAirPermeability(q50, leak.roomExposedEnvelope_m2));
    const byRule = leakageDivideBy20(q50, leak.roomExposedEnvelope_m2, leak.shelteredSides, u);
    flow = coverValues(rangeByFactor(central, factor), [byRule / factor, byRule * factor]);
    method = `LBL model from q50 ${roundToStep(q50, 0.1)} m³/(h·m²) over ${roundToStep(leak.roomExposedEnvelope_m2, 0.1)} m² exposed, range covering the divide-by-20 rule (SAP form)`;
    if (assumed) {
      method = `${method}; q50 ${assumed.method}`;
      warnings.push(
        airflowWarning(
          'leakage-assumed',
          `No pressure test: air leakage is assumed (${assumed.method}), so this part is shown with a range of ×/÷${ASSUMED_LEAKAGE_FACTOR}.`,
        ),
      );
    }
  }
  if (leak.includesLeakageToNeighbours) {
    flow = { ...flow, low: flow.low / 2 };
    warnings.push(
      airflowWarning(
        'leakage-includes-neighbours',
        'The pressure test also measured leakage to neighbouring homes, so part of this air is not outdoor air; the low end allows for that.',
      ),
    );
  }
  return { ...base, flow, method, warnings };
}
