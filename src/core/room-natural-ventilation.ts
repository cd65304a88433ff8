/**
 * Natural air supply through one room's openings under a weather case: windows by the BS 5925
 * forms, background vents and air bricks by the orifice equation at the envelope's driving
 * pressure, and internal transfer shown as capacity only.
 *
 * Which window form applies (practice.md §1 item 9b; references.md §3.2):
 * - cross ventilation when the room's own open windows face different ways (at least 90° apart:
 *   the room itself is the path), or when a recorded cross path through other rooms has every
 *   door on it open; the internal doorway then acts in series. A path with a door shut never
 *   uses the cross forms;
 * - otherwise single-sided.
 * A cross-ventilated room never gets less than its own openings would give single-sided (our
 * screening rule: each opening still exchanges air on its own). Where several cross cases exist
 * (windows on three facades, or own windows and a path) the largest counts, end by end. Far
 * openings reached through other rooms have no recorded height: wind only across that path.
 *
 * Ranges: ±50 % on the opening formulas (practice.md §1 item 9c), widened to cover de Gids &
 * Phaff in the same conditions (single-sided) and ΔC_p from 0.1 to 0.9 (cross). Through other
 * rooms, the room may be downwind and receive their air, so the low end is the single-sided one.
 * The window group's flow is shared among its windows by open area for the breakdown.
 */
import type { AirflowItem } from './airflow-item.ts';
import type { OpeningInput, RoomAirflowInput, WindowInput } from './airflow-inputs.ts';
import { airflowWarning, type AirflowWarning } from './airflow-warnings.ts';
import { airBrickFlow } from './air-brick-flow.ts';
import { backgroundVentFlow } from './background-vent-flow.ts';
import { CROSS_PRESSURE_COEFFICIENT, crossFlow, type CrossFlow } from './cross-ventilation.ts';
import { deGidsPhaffFlow } from './de-gids-phaff-ventilation.ts';
import { envelopeDrivingPressure, type EnvelopePressure } from './envelope-driving-pressure.ts';
import { NO_FLOW, OPENING_MODEL_UNCERTAINTY, scaleRange, type FlowRange } from './flow-range.ts';
import type { LevelledArea } from './opening-height-splits.ts';
import { referenceWindSpeed } from './reference-wind-speed.ts';
import { singleSidedFlow } from './single-sided-ventilation.ts';
import { transferFlow } from './transfer-flow.ts';
import { depthLimitWarnings } from './ventilation-depth-limit.ts';
import { meanTemperature, temperatureDifference, type WeatherCase } from './weather-cases.ts';
import { windowOpenArea, type WindowOpenArea } from './window-open-area.ts';
import { roundToStep } from './units.ts';

/** Openings at least this far apart in bearing face different ways, degrees (our rule). */
export const DIFFERENT_FACING_DEG = 90;

/** How the room's windows ventilate in this case. */
export type VentilationMode = 'single-sided' | 'cross' | 'none';

/** The room's natural supply under one weather case. */
export interface NaturalVentilation {
  mode: VentilationMode;
  /** One item per opening (windows, vents, air bricks, undercuts, grilles). */
  items: AirflowItem[];
  /** Wind at the building, m/s. */
  windAtHeight_ms: number;
  /** Pressure used for vents and air bricks, Pa. */
  envelopePressure: EnvelopePressure;
  warnings: AirflowWarning[];
}

/**
 * Smallest angle between two compass bearings, degrees (0–180).
 * Source: plane geometry.
 * Example: bearingDifference(350, 20) = 30.
 */
export function bearingDifference(a_deg: number, b_deg: number): number {
  const d = (((a_deg - b_deg) % 360) + 360) % 360;
  return Math.min(d, 360 - d);
}

interface OpenWindow {
  input: WindowInput;
  open: WindowOpenArea;
}

/** End-by-end maximum of two ranges. */
const maxOfRanges = (a: FlowRange, b: FlowRange): FlowRange => ({
  low: Math.max(a.low, b.low),
  central: Math.max(a.central, b.central),
  high: Math.max(a.high, b.high),
});

const levelled = (w: OpenWindow): LevelledArea => ({ area_m2: w.open.area_m2, centreHeight_m: w.input.centreHeight_m });

/**
 * Natural supply of a room's openings under a weather case (flows in m³/s).
 * Source: BS 5925:1991 forms (references.md §3.2), de Gids & Phaff (§3.3), orifice equation (§3.1).
 * Example: one 0.6 × 1.0 m side-hung sash open 30° facing south, centre 1.5 m, urban 6 m building,
 *   COLD_CALM → mode 'single-sided', window flow { low: 0.0302, central: 0.0718, high: 0.1077 } m³/s (stack governs).
 */
export function roomNaturalVentilation(room: RoomAirflowInput, weather: WeatherCase): NaturalVentilation {
  const windAtHeight = referenceWindSpeed(weather.windAt10m_ms, room.site.terrain, room.site.buildingHeight_m);
  const dT = temperatureDifference(weather);
  const mean = meanTemperature(weather);
  const pressure = envelopeDrivingPressure(weather, windAtHeight, room.ceilingHeight_m);
  const u = OPENING_MODEL_UNCERTAINTY;
  const warnings: AirflowWarning[] = [];

  const windows: OpenWindow[] = room.openings
    .filter((o): o is WindowInput => o.kind === 'window')
    .map((input) => ({ input, open: windowOpenArea(input) }));
  const open = windows.filter((w) => w.open.area_m2 > 0);
  const openArea = open.reduce((s, w) => s + w.open.area_m2, 0);

  // Single-sided, with de Gids & Phaff as a second published estimate.
  const sides = open.map((w) => ({ ...levelled(w), openingHeight_m: w.open.openingHeight_m }));
  const single = singleSidedFlow(sides, windAtHeight, dT, mean);
  const gidsPhaff = open.reduce(
    (s, w) => s + deGidsPhaffFlow(w.open.area_m2, weather.windAt10m_ms, w.open.openingHeight_m, dT),
    0,
  );
  const singleRange: FlowRange = {
    low: Math.min(single.flow, gidsPhaff) * (1 - u),
    central: single.flow,
    high: Math.max(single.flow, gidsPhaff) * (1 + u),
  };
  let mode: VentilationMode = open.length > 0 ? 'single-sided' : 'none';
  let range = singleRange;
  let how =
    `BS 5925 single-sided (${single.governing} governs${single.governing === 'stack' ? `, ${single.stackForm} form` : ''}), ` +
    `U_r ${roundToStep(windAtHeight, 0.1)} m/s; range covers de Gids & Phaff`;

  // Cross ventilation: the room's own windows facing different ways, or an open path to far openings.
  const crossCases: { flow: (deltaCp: number) => CrossFlow; throughRooms: boolean }[] = [];
  for (const facing of new Set(open.map((w) => w.input.facing_deg))) {
    const facing1 = open.filter((w) => bearingDifference(w.input.facing_deg, facing) < DIFFERENT_FACING_DEG);
    const facing2 = open.filter((w) => !facing1.includes(w));
    if (facing2.length === 0) continue;
    crossCases.push({
      flow: (deltaCp) => crossFlow(facing1.map(levelled), facing2.map(levelled), [], windAtHeight, dT, mean, deltaCp),
      throughRooms: false,
    });
  }
  const path = room.crossPath;
  if (path && !path.internalPathOpen) {
    warnings.push(
      airflowWarning('cross-path-closed', 'A door on the cross-ventilation path was shut, so it is not counted.'),
    );
  }
  if (
    path?.internalPathOpen &&
    path.farOpenArea_m2 > 0 &&
    path.internalOpeningArea_m2 > 0 &&
    open.some((w) => bearingDifference(w.input.facing_deg, path.farFacing_deg) >= DIFFERENT_FACING_DEG)
  ) {
    // Heights of the far openings are not recorded: wind only across the path (all at one level).
    const near = [{ area_m2: openArea, centreHeight_m: 0 }];
    const far = [{ area_m2: path.farOpenArea_m2, centreHeight_m: 0 }];
    crossCases.push({
      flow: (deltaCp) => crossFlow(near, far, [path.internalOpeningArea_m2], windAtHeight, dT, mean, deltaCp),
      throughRooms: true,
    });
  }
  const cp = CROSS_PRESSURE_COEFFICIENT;
  for (const c of crossCases) {
    const central = c.flow(cp.central);
    const candidate: FlowRange = {
      low: c.throughRooms ? singleRange.low : Math.max(c.flow(cp.low).flow, single.flow) * (1 - u),
      central: Math.max(central.flow, single.flow),
      high: Math.max(c.flow(cp.high).flow, single.flow, gidsPhaff) * (1 + u),
    };
    if (mode !== 'cross' || candidate.central > range.central) {
      how =
        `BS 5925 cross ventilation${c.throughRooms ? ' through an open internal path' : ''} (${central.governing} governs; ` +
        `printed rule: ${central.printedRule}), U_r ${roundToStep(windAtHeight, 0.1)} m/s, ΔC_p ${cp.low}–${cp.high} assumed`;
    }
    range = maxOfRanges(range, candidate);
    mode = 'cross';
  }
  if (mode === 'cross') {
    warnings.push(
      airflowWarning(
        'cross-pressure-assumed',
        `Wind direction is unknown, so the pressure difference between the facades is taken as ${cp.low}–${cp.high} of the wind's dynamic pressure (assumed).`,
      ),
    );
  }
  if (crossCases.some((c) => c.throughRooms)) {
    warnings.push(
      airflowWarning(
        'cross-through-other-rooms',
        'The cross path runs through other rooms: with the wind from the far side this room receives their air, so the low end counts only its own openings single-sided.',
      ),
    );
  }
  if (mode !== 'none') warnings.push(...depthLimitWarnings(room.depth_m, room.ceilingHeight_m, mode));

  const windowItem = (w: OpenWindow): AirflowItem => ({
    itemId: w.input.id,
    mechanism: w.open.area_m2 > 0 ? mode : 'none',
    flow: w.open.area_m2 > 0 ? scaleRange(range, w.open.area_m2 / openArea) : NO_FLOW,
    countsAsOutdoorAir: true,
    method: w.open.area_m2 > 0 ? `${w.open.method}; ${how}` : w.open.method,
    warnings: w.open.warnings,
  });
  const itemFor = (o: OpeningInput): AirflowItem => {
    switch (o.kind) {
      case 'window':
        return windowItem(windows.find((w) => w.input === o)!);
      case 'background-vent':
        return backgroundVentFlow(o, pressure.total_Pa);
      case 'air-brick':
        return airBrickFlow(o, pressure.total_Pa);
      case 'door-undercut':
      case 'transfer-grille':
        return transferFlow(o);
    }
  };
  return {
    mode,
    items: room.openings.map(itemFor),
    windAtHeight_ms: windAtHeight,
    envelopePressure: pressure,
    warnings,
  };
}
