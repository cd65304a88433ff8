/**
 * A room's predicted outdoor-air supply: every opening, fan and the room's leakage under a
 * weather case, as a range with a breakdown per item; and the same over all screening cases,
 * naming the worst (lowest central supply).
 *
 * This is a screening prediction from simple models, not a measurement: each part carries its
 * model uncertainty (±50 % openings, ×/÷2 or more leakage), air from other rooms (undercuts,
 * grilles) and recirculation are never counted, and the parts combine by the one rule in
 * outdoor-air-combination.ts.
 */
import type { AirflowItem } from './airflow-item.ts';
import type { RoomAirflowInput } from './airflow-inputs.ts';
import { airflowWarning, type AirflowWarning } from './airflow-warnings.ts';
import { fanFlow } from './fan-flow.ts';
import { addRanges, type FlowRange } from './flow-range.ts';
import { COMBINATION_RULE, combineRanges } from './outdoor-air-combination.ts';
import { roomLeakage } from './room-leakage.ts';
import { roomNaturalVentilation, type VentilationMode } from './room-natural-ventilation.ts';
import { SCREENING_WEATHER_CASES, type WeatherCase, type WeatherCases } from './weather-cases.ts';

/** The prediction for one room under one weather case. Flows in m³/s. */
export interface RoomSupplyPrediction {
  roomId: string;
  weather: WeatherCase;
  /** Total outdoor-air supply. */
  outdoorAir: FlowRange;
  /** How the windows ventilate. */
  mode: VentilationMode;
  /** Every opening, fan and leakage entry, including those that add nothing, with why. */
  items: AirflowItem[];
  /** The combination rule used. */
  combination: string;
  /** Wind at the building, m/s; driving pressure across the envelope for vents, Pa. */
  windAtHeight_ms: number;
  envelopePressure_Pa: number;
  /** Room-level warnings (depth, cross path, weather case, no outdoor air). */
  warnings: AirflowWarning[];
}

/**
 * Predicted outdoor-air supply of a room under one weather case, m³/s, with its breakdown.
 * Source: the methods of each part (see their files); combination per outdoor-air-combination.ts.
 * Example: a bedroom with one 8000 mm² equivalent-area trickle vent open, all windows shut, no fan,
 *   no leakage entry, ceiling 2.4 m, COLD_CALM on a 6 m urban building → outdoorAir = { low: 0.00323, central: 0.00646, high: 0.00969 } m³/s (6.5 L/s at 1.05 Pa).
 */
export function predictRoomSupply(room: RoomAirflowInput, weather: WeatherCase): RoomSupplyPrediction {
  const natural = roomNaturalVentilation(room, weather);
  const items: AirflowItem[] = [
    ...natural.items,
    ...room.fans.map(fanFlow),
    ...(room.leakage ? [roomLeakage(room.leakage, weather)] : []),
  ];
  const outdoor = items.filter((i) => i.countsAsOutdoorAir);
  const sum = (keep: (i: AirflowItem) => boolean) => addRanges(outdoor.filter(keep).map((i) => i.flow));
  const supply = sum((i) => i.mechanism === 'mechanical-supply');
  const extract = sum((i) => i.mechanism === 'mechanical-extract');
  const naturalFlow = sum((i) => i.mechanism !== 'mechanical-supply' && i.mechanism !== 'mechanical-extract');
  const outdoorAir = combineRanges(supply, extract, naturalFlow);

  const warnings = [...natural.warnings];
  if (weather.assumed) {
    warnings.push(
      airflowWarning(
        'screening-weather-case',
        `Predicted for an assumed weather case (${weather.label}), not measured; real supply varies with the weather.`,
      ),
    );
  }
  if (!(outdoorAir.high > 0)) {
    warnings.push(
      airflowWarning('no-outdoor-air', 'Nothing recorded in this room brings in outdoor air in this case. Check it first.'),
    );
  }
  return {
    roomId: room.id,
    weather,
    outdoorAir,
    mode: natural.mode,
    items,
    combination: COMBINATION_RULE,
    windAtHeight_ms: natural.windAtHeight_ms,
    envelopePressure_Pa: natural.envelopePressure.total_Pa,
    warnings,
  };
}

/** A room's predictions over several weather cases and the worst of them. */
export interface RoomSupplyOverCases {
  roomId: string;
  predictions: RoomSupplyPrediction[];
  /** The case with the lowest central supply (ties: lowest low end, then first listed). */
  worst: RoomSupplyPrediction;
}

/**
 * Predicted supply of a room over weather cases (default: the three screening cases), naming the worst.
 * Source: practice.md §1 item 9c (report a range over stated weather cases).
 * Example: predictRoomSupplyOverCases(bedroom).worst.weather.id = 'mild-calm' for a room with only a trickle vent.
 */
export function predictRoomSupplyOverCases(
  room: RoomAirflowInput,
  cases: WeatherCases = SCREENING_WEATHER_CASES,
): RoomSupplyOverCases {
  const [first, ...rest] = cases;
  let worst = predictRoomSupply(room, first);
  const predictions = [worst];
  for (const weather of rest) {
    const p = predictRoomSupply(room, weather);
    predictions.push(p);
    const a = p.outdoorAir;
    const b = worst.outdoorAir;
    if (a.central < b.central || (a.central === b.central && a.low < b.low)) worst = p;
  }
  return { roomId: room.id, predictions, worst };
}
