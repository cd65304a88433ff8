/**
 * One room in one state as the airflow engine's RoomAirflowInput: its openings and fans
 * (opening-inputs.ts), the terminals of its dwelling's own system that serve it, its share of
 * background leakage, the site, and a cross path through the area's other rooms (cross-path.ts).
 *
 * - Exposed envelope: each exposed wall's length × the ceiling height; a wall without a length
 *   counts √(floor area) (assumed, flagged). Roof and exposed floor are not recorded. No exposed
 *   wall: an interior room, no leakage from outdoors.
 * - Depth from the openings: floor area ÷ the longest exposed wall (for the depth limits).
 * - A flat's measured air permeability includes leakage to neighbours (the engine halves the low end).
 * - Dwelling-system terminals serving the room: continuous extract → whole-dwelling extract,
 *   heat recovery → balanced, positive input → supply, intermittent extract → the room's own;
 *   measured flows; running unless the system is recorded not running. Terminals measured at
 *   boost are left out (a boost flow is not the continuous one), with a caution.
 *
 * Example: Classroom B1 (7.2 × 7 × 2.9 m, one 7.2 m SW wall) → exposed envelope 20.88 m², depth 7 m.
 */
import type { FanInput, FanSystem, RoomAirflowInput } from '../core/airflow-inputs.ts';
import type { Area } from '../model/area.ts';
import { roomFloorArea } from '../model/room-geometry.ts';
import type { Geometry } from '../model/room-geometry.ts';
import type { DocumentRoom, SurveyDocument } from '../model/survey-document.ts';
import { analysisWarning, type AnalysisWarning } from './analysis-warnings.ts';
import { crossPathInput } from './cross-path.ts';
import { openingInputs } from './opening-inputs.ts';
import type { RoomState } from './room-state.ts';
import type { SiteInputs } from './site-inputs.ts';

/** What every state of a room shares. */
export interface RoomAirflowContext {
  room: DocumentRoom;
  ceilingHeight_m: number;
  /** Areas from the room's own up to the top. */
  areaChain: readonly Area[];
  /** Other rooms of the same area, sorted by id. */
  areaMates: readonly DocumentRoom[];
  site: SiteInputs;
  ceilingOf: (r: DocumentRoom) => number;
}

/** Floor-to-ceiling height: the tallest part, m. Example: a 7.2 × 7 × 2.9 m box → 2.9. */
export function ceilingHeight(geometry: Geometry): number {
  return geometry.kind === 'parts' ? Math.max(...geometry.parts.map((p) => p.height_m)) : geometry.height_m;
}

/** The room's area and those it sits in, innermost first (a cycle stops the walk). */
function areaChain(areaId: string | undefined, areas: readonly Area[]): Area[] {
  const chain: Area[] = [];
  let id = areaId;
  while (id !== undefined && !chain.some((a) => a.id === id)) {
    const area = areas.find((a) => a.id === id);
    if (!area) break;
    chain.push(area);
    id = area.parentId;
  }
  return chain;
}

/** What every state of a room in a survey shares (area mates sorted by id). */
export function roomAirflowContext(room: DocumentRoom, doc: SurveyDocument, site: SiteInputs): RoomAirflowContext {
  return {
    room,
    ceilingHeight_m: ceilingHeight(room.geometry),
    areaChain: areaChain(room.areaId, doc.areas),
    areaMates: room.areaId === undefined ? [] : doc.rooms.filter((r) => r.areaId === room.areaId && r.id !== room.id).sort((a, b) => (a.id < b.id ? -1 : 1)),
    site,
    ceilingOf: (r) => ceilingHeight(r.geometry),
  };
}

/** Exposed envelope (m²) and whether a wall length was assumed. */
export function exposedEnvelope(room: DocumentRoom, ceilingHeight_m: number): { area_m2: number; assumed: boolean } {
  const side = Math.sqrt(roomFloorArea(room.geometry));
  let assumed = false;
  const area = room.exposedWalls.reduce((sum, w) => {
    if (w.length_m === undefined) assumed = true;
    return sum + (w.length_m ?? side) * ceilingHeight_m;
  }, 0);
  return { area_m2: area, assumed };
}

type Terminal = NonNullable<NonNullable<Area['dwelling']>['system']>['terminals'][number];

const SYSTEMS: Readonly<Record<string, FanSystem>> = {
  'continuous-extract': 'whole-dwelling-extract',
  'heat-recovery': 'whole-dwelling-balanced',
  'positive-input': 'whole-dwelling-supply',
  'intermittent-extract': 'local',
};

/**
 * The dwelling system's terminals kept by `keep` (e.g. those serving one room), as fans.
 * Example: a continuous-extract system with a 0.008 m³/s bathroom terminal → one FanInput, system 'whole-dwelling-extract'.
 */
export function terminalFans(area: Area, keep: (t: Terminal) => boolean, warnings: AnalysisWarning[]): FanInput[] {
  const system = area.dwelling?.system;
  if (!system || system.kind === 'none') return [];
  if (system.running === 'not-checked') {
    warnings.push(analysisWarning('system-state-unknown', 'caution', `Whether the ${area.name} system was running was not checked; it is counted as running.`));
  }
  return system.terminals
    .filter(keep)
    .flatMap((t, i): FanInput[] => {
      if (t.setting === 'boost') {
        warnings.push(analysisWarning('terminal-at-boost', 'caution', `A terminal (${t.location || 'no location'}) was measured at boost, which is not its continuous flow: not counted. Measure it at its normal setting.`));
        return [];
      }
      return [
        {
          kind: 'fan',
          id: `${area.id}#terminal-${i + 1}`,
          role: t.direction,
          system: SYSTEMS[system.kind] ?? (t.direction === 'extract' ? 'whole-dwelling-extract' : 'whole-dwelling-supply'),
          running: system.running !== 'no',
          measuredFlow_m3s: t.flow_m3s,
        },
      ];
    });
}

/**
 * The room's airflow input in a state at a time (ms since 1970, for the cross path; null for a scenario).
 */
export function roomAirflowInput(ctx: RoomAirflowContext, state: RoomState, time_ms: number | null): { input: RoomAirflowInput; warnings: AnalysisWarning[] } {
  const { room, ceilingHeight_m, site } = ctx;
  const mapped = openingInputs(room, state, ceilingHeight_m);
  const warnings = [...mapped.warnings];
  const envelope = exposedEnvelope(room, ceilingHeight_m);
  if (envelope.assumed) {
    warnings.push(analysisWarning('wall-length-assumed', 'info', 'An exposed wall’s length is not recorded: √(floor area) is taken for its leakage share.'));
  }
  const longest = Math.max(0, ...room.exposedWalls.map((w) => w.length_m ?? 0));
  const isFlat = ctx.areaChain.some((a) => a.kind === 'flat');
  const terminals = ctx.areaChain.flatMap((a) => terminalFans(a, (t) => t.roomId === room.id, warnings));
  const input: RoomAirflowInput = {
    id: room.id,
    ceilingHeight_m,
    depth_m: longest > 0 ? roomFloorArea(room.geometry) / longest : undefined,
    openings: mapped.openings,
    fans: [...mapped.fans, ...terminals],
    leakage: {
      id: `${room.id}#leakage`,
      source: site.leakage,
      roomExposedEnvelope_m2: envelope.area_m2,
      storeys: site.storeys,
      shelterClass: site.shelterClass,
      shelteredSides: site.shelteredSides,
      includesLeakageToNeighbours: isFlat && site.leakage.basis === 'measured-air-permeability',
    },
    crossPath: crossPathInput(room, state, time_ms, ctx.areaMates, ctx.ceilingOf),
    site: site.site,
  };
  return { input, warnings };
}
