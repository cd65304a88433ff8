/**
 * The open area of one window as found: its type, size, how far it is open and its condition.
 * Restricted sashes count only their restrictor's stroke; blocked and seized sashes count
 * nothing (practice.md §1 item 9; §2 item 10: restrictors stay).
 *
 * - side-hung: geometric method (hinged-window-area.ts), hinge side = sash height;
 * - top- and bottom-hung: CEN/TR 16798-8 coefficient (hung-window-area.ts); a stroke is turned
 *   into an angle by the same hinge geometry, hinge side = sash width;
 * - vertical sliding: gap × width, the gap is the opening's height;
 * - horizontal sliding: gap × height.
 */
import type { WindowInput } from './airflow-inputs.ts';
import { airflowWarning, type AirflowWarning } from './airflow-warnings.ts';
import { hingedAngleFromStroke, hingedWindowArea } from './hinged-window-area.ts';
import { hungWindowArea } from './hung-window-area.ts';

/** Restrictor stroke assumed when a sash is recorded as restricted without one, m (common practice (no published source)). */
export const ASSUMED_RESTRICTOR_STROKE_M = 0.1;

/** The open area of a window and the height of its opening (for the stack forms). */
export interface WindowOpenArea {
  /** Open (free) area to use in the BS 5925 forms, m². */
  area_m2: number;
  /** Vertical extent of the opening, m. */
  openingHeight_m: number;
  method: string;
  warnings: AirflowWarning[];
}

const NONE = (method: string, warning: AirflowWarning): WindowOpenArea => ({
  area_m2: 0,
  openingHeight_m: 0,
  method,
  warnings: [warning],
});

/**
 * Open area (m²) and opening height (m) of one window as found.
 * Source: references.md §3.4 (geometric method for hinged sashes; CEN/TR 16798-8 for top- and bottom-hung).
 * Example: windowOpenArea({ kind: 'window', id: 'w', windowType: 'side-hung', sashWidth_m: 0.6,
 *   sashHeight_m: 1.0, opening: { by: 'angle', angle_deg: 30 }, condition: 'works', facing_deg: 180,
 *   centreHeight_m: 1.5 }).area_m2 = 0.4240 m².
 */
export function windowOpenArea(w: WindowInput): WindowOpenArea {
  if (w.condition === 'blocked') {
    return NONE('blocked: no open area', airflowWarning('sash-blocked', 'The sash cannot be opened (blocked), so it adds no air.'));
  }
  if (w.condition === 'seized') {
    return NONE('seized: no open area', airflowWarning('sash-seized', 'The sash is seized shut, so it adds no air.'));
  }
  if (w.opening.by === 'closed') {
    return NONE('closed', airflowWarning('window-closed', 'The window is closed in this case, so it adds no air.'));
  }
  const warnings: AirflowWarning[] = [];
  let limitStroke = Number.POSITIVE_INFINITY;
  if (w.condition === 'restricted') {
    limitStroke = w.restrictorStroke_m ?? ASSUMED_RESTRICTOR_STROKE_M;
    warnings.push(
      airflowWarning(
        'sash-restricted',
        w.restrictorStroke_m === undefined
          ? `The sash is restricted; its stroke was not recorded, so ${ASSUMED_RESTRICTOR_STROKE_M * 1000} mm is assumed. Never remove restrictors on upper floors.`
          : 'The sash is restricted, so it counts only as far as the restrictor lets it open. Never remove restrictors on upper floors.',
      ),
    );
  }
  const width = Math.max(0, w.sashWidth_m);
  const height = Math.max(0, w.sashHeight_m);

  if (w.windowType === 'vertical-sliding' || w.windowType === 'horizontal-sliding') {
    if (w.opening.by !== 'stroke') {
      return NONE(
        'sliding sash given an angle',
        airflowWarning('opening-measure-not-applicable', 'A sliding sash opens by a gap, not an angle; record the gap to count it.'),
      );
    }
    const along = w.windowType === 'vertical-sliding' ? height : width;
    const gap = Math.min(Math.max(0, w.opening.stroke_m), limitStroke, along);
    const vertical = w.windowType === 'vertical-sliding';
    return {
      area_m2: gap * (vertical ? width : height),
      openingHeight_m: vertical ? gap : height,
      method: `sliding sash: ${vertical ? 'gap × width' : 'gap × height'}`,
      warnings,
    };
  }

  // Hinged: across = dimension from hinge to free edge.
  const sideHung = w.windowType === 'side-hung';
  const hingeSide = sideHung ? height : width;
  const across = sideHung ? width : height;
  let angle = w.opening.by === 'angle' ? Math.max(0, w.opening.angle_deg) : hingedAngleFromStroke(across, w.opening.stroke_m);
  if (angle > 90) {
    angle = 90;
    warnings.push(
      airflowWarning('opening-angle-limited', 'Opening angles above 90° are counted as 90°, the limit of the published methods.'),
    );
  }
  if (Number.isFinite(limitStroke)) angle = Math.min(angle, hingedAngleFromStroke(across, limitStroke));
  const area = sideHung ? hingedWindowArea(hingeSide, across, angle) : hungWindowArea(width * height, angle);
  return {
    area_m2: area,
    openingHeight_m: height,
    method: sideHung
      ? `side-hung, geometric method at ${Math.round(angle)}°`
      : `${w.windowType}, CEN/TR 16798-8 coefficient at ${Math.round(angle)}°`,
    warnings,
  };
}
