/**
 * A room's openings in a given state (room-state.ts) as the airflow engine's inputs: windows,
 * background vents, air bricks and grilles, door undercuts, and fans. `count` identical units
 * of a window become that many sashes (the BS 5925 forms are not linear in area); vents and fans
 * scale by count (orifice flow and fan flow are).
 *
 * Mappings (our own, stated):
 * - window style and hinge → window type: side → side-hung; top → top-hung; bottom → bottom-hung;
 *   centre-pivot → top-hung and tilt-and-turn → bottom-hung (both by the CEN/TR 16798-8
 *   coefficient, the nearest published form); louvre → top-hung; sash → vertical sliding;
 *   sliding → horizontal sliding; fixed glazing never opens and is not mapped;
 * - operability → sash condition: opens → works, restricted → restricted (the recorded stroke as
 *   the restrictor's), blocked and seized as recorded;
 * - open extent: the recorded angle or stroke; none recorded: 30° hinged or half the sash
 *   sliding, assumed and flagged;
 * - vents: a background vent closes; air bricks and grilles are fixed. Purpose: room → room
 *   supply; sub-floor and combustion-air are never counted (a background vent marked as
 *   combustion air is mapped as a combustion-air vent, so it never counts: practice.md §1.10);
 * - fans: recirculating ducting → recirculating (no outdoor air); running only when the state says so;
 * - facing: the opening's, else the room's first exposed wall's, else north (flagged);
 * - centre heights: between sill and head, else sill + half the sash, else half the ceiling
 *   height for windows and 90 % of it for vents (frame-head trickle vents), flagged.
 *
 * Example: a top-hung 0.9 × 0.6 m sash open 25° facing SW, restricted, count 3, all open →
 * three WindowInputs 'id#1'…'id#3', windowType 'top-hung', facing_deg 225, condition 'restricted'.
 */
import type { FanInput, OpeningExtent, OpeningInput, WindowInput, WindowType } from '../core/airflow-inputs.ts';
import type { Opening } from '../model/opening.ts';
import type { DocumentRoom } from '../model/survey-document.ts';
import { FACINGS } from '../model/field-rules.ts';
import { analysisWarning, type AnalysisWarning } from './analysis-warnings.ts';
import { isFanDead, isVentBlocked, type RoomState } from './room-state.ts';

/** Hinged opening angle assumed when none is recorded, degrees (common practice (no published source)). */
export const ASSUMED_HINGED_ANGLE_DEG = 30;

type Window = Extract<Opening, { type: 'window' }>;

/**
 * Compass point → bearing in degrees clockwise from north. Example: bearingOf('SW') = 225.
 */
export function bearingOf(facing: (typeof FACINGS)[number]): number {
  return FACINGS.indexOf(facing) * 45;
}

function windowType(w: Window): WindowType | null {
  switch (w.style) {
    case 'fixed':
      return null;
    case 'sash':
      return 'vertical-sliding';
    case 'sliding':
      return 'horizontal-sliding';
    case 'louvre':
      return 'top-hung';
    case 'hinged':
      switch (w.hinge) {
        case 'top':
        case 'centre-pivot':
          return 'top-hung';
        case 'bottom':
        case 'tilt-and-turn':
          return 'bottom-hung';
        default:
          return 'side-hung';
      }
  }
}

/** Window opening extent when open: as recorded, else the assumed default. */
function extentOf(w: Window, type: WindowType, warnings: AnalysisWarning[]): OpeningExtent {
  const sliding = type === 'vertical-sliding' || type === 'horizontal-sliding';
  if (!sliding && w.openingAngle_deg !== undefined && w.openingAngle_deg > 0) return { by: 'angle', angle_deg: w.openingAngle_deg };
  if (w.openingStroke_m !== undefined && w.openingStroke_m > 0) return { by: 'stroke', stroke_m: w.openingStroke_m };
  const half = ((type === 'vertical-sliding' ? w.sashHeight_m : w.sashWidth_m) ?? 0) / 2;
  warnings.push(
    analysisWarning(
      'window-extent-assumed',
      'caution',
      sliding
        ? 'How far the sliding sash opens is not recorded: half its travel is assumed. Record the gap.'
        : `How far the sash opens is not recorded: ${ASSUMED_HINGED_ANGLE_DEG}° is assumed. Record the angle or the gap.`,
    ),
  );
  return sliding ? { by: 'stroke', stroke_m: half } : { by: 'angle', angle_deg: ASSUMED_HINGED_ANGLE_DEG };
}

export interface OpeningInputs {
  openings: OpeningInput[];
  fans: FanInput[];
  warnings: AnalysisWarning[];
}

/**
 * The engine inputs of a room's openings in a state (see the file note).
 * Example: openingInputs(room, closedState(room), 2.9).openings has every window 'closed'.
 */
export function openingInputs(room: DocumentRoom, state: RoomState, ceilingHeight_m: number): OpeningInputs {
  const warnings: AnalysisWarning[] = [];
  const wall = room.exposedWalls.find((w) => w.facing !== undefined)?.facing;
  const openings: OpeningInput[] = [];
  const fans: FanInput[] = [];
  const facingOf = (o: Opening): number => {
    const f = o.facing ?? wall;
    if (f === undefined) {
      warnings.push(analysisWarning('facing-assumed', 'info', 'An opening’s facing is not recorded: taken as north. Record it to judge cross ventilation.'));
      return 0;
    }
    return bearingOf(f);
  };
  for (const o of room.openings) {
    const unitsOpen = state.open.get(o.id) ?? 0;
    switch (o.type) {
      case 'window': {
        const type = windowType(o);
        if (type === null) break;
        if (o.sashWidth_m === undefined || o.sashHeight_m === undefined) {
          warnings.push(
            analysisWarning('opening-not-counted', 'caution', 'A window’s sash size is not recorded, so it is not counted. Measure the sash.'),
          );
          break;
        }
        const condition = o.operability === 'opens' ? 'works' : o.operability;
        const extent = unitsOpen > 0 && condition !== 'blocked' && condition !== 'seized' ? extentOf(o, type, warnings) : null;
        let centre: number;
        if (o.sillHeight_m !== undefined && o.headHeight_m !== undefined) centre = (o.sillHeight_m + o.headHeight_m) / 2;
        else if (o.sillHeight_m !== undefined) centre = o.sillHeight_m + o.sashHeight_m / 2;
        else {
          centre = ceilingHeight_m / 2;
          warnings.push(analysisWarning('height-assumed', 'info', 'A window’s sill height is not recorded: its centre is taken at half the room height.'));
        }
        const base: Omit<WindowInput, 'id' | 'opening'> = {
          kind: 'window',
          windowType: type,
          sashWidth_m: o.sashWidth_m,
          sashHeight_m: o.sashHeight_m,
          condition,
          restrictorStroke_m: condition === 'restricted' ? o.openingStroke_m : undefined,
          facing_deg: facingOf(o),
          centreHeight_m: centre,
        };
        for (let k = 1; k <= o.count; k++) {
          const opening: OpeningExtent = extent && k <= unitsOpen ? extent : { by: 'closed' };
          openings.push({ ...base, id: o.count === 1 ? o.id : `${o.id}#${k}`, opening });
        }
        break;
      }
      case 'vent': {
        if (o.labelArea_m2 === undefined) {
          warnings.push(analysisWarning('opening-not-counted', 'caution', 'A vent’s area is not recorded, so it is not counted. Read its label.'));
          break;
        }
        const area = o.labelArea_m2 * o.count;
        const blocked = isVentBlocked(room, o);
        const common = { id: o.id, labelArea_m2: area, areaBasis: o.labelAreaIs, facing_deg: facingOf(o), centreHeight_m: 0.9 * ceilingHeight_m };
        if (o.kind === 'background-vent' && o.purpose === 'room') {
          openings.push({ ...common, kind: 'background-vent', condition: blocked ? 'blocked' : unitsOpen > 0 ? 'open' : 'closed' });
        } else {
          const purpose = o.purpose === 'room' ? 'room-supply' : o.purpose;
          openings.push({ ...common, kind: 'air-brick', purpose, condition: blocked ? 'blocked' : 'clear' });
        }
        break;
      }
      case 'undercut':
        openings.push({ kind: 'door-undercut', id: o.id, doorWidth_m: o.doorWidth_m * o.count, gap_m: o.gap_m });
        break;
      case 'fan': {
        const scale = (v: number | undefined) => (v === undefined ? undefined : v * o.count);
        fans.push({
          kind: 'fan',
          id: o.id,
          role: o.ducting === 'recirculating' ? 'recirculating' : o.direction,
          system: 'local',
          running: state.fansRunning.has(o.id) && !isFanDead(room, o),
          measuredFlow_m3s: scale(o.measuredFlow_m3s),
          ratedFlow_m3s: scale(o.ratedFlow_m3s),
        });
        break;
      }
    }
  }
  return { openings, fans, warnings };
}
