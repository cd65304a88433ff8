/**
 * The kinds of opening a room can have, in the trade's words, grouped by how air goes through
 * them: windows (by how the sash moves), vents rated by area, fans, and door undercuts. One list
 * for the whole app; the airflow formulas choose their method from these groups.
 *
 * Source: common practice (no published source) for the grouping; the terms are the trade's
 * (background ventilator / trickle vent, air brick, extract fan, undercut).
 *
 * Example: WINDOW_STYLES includes 'sash'; VENT_KINDS = ['background-vent', 'air-brick', 'grille'].
 */

/** How a window's sash moves. */
export const WINDOW_STYLES = ['hinged', 'sash', 'sliding', 'louvre', 'fixed'] as const;
export type WindowStyle = (typeof WINDOW_STYLES)[number];

/** Where a hinged sash is hinged (tilt-and-turn counts as side-hung when turned, bottom-hung when tilted). */
export const WINDOW_HINGES = ['side', 'top', 'bottom', 'centre-pivot', 'tilt-and-turn'] as const;
export type WindowHinge = (typeof WINDOW_HINGES)[number];

/** Vents rated by an area (free or equivalent). */
export const VENT_KINDS = ['background-vent', 'air-brick', 'grille'] as const;
export type VentKind = (typeof VENT_KINDS)[number];

/** What an air brick or grille is there for: air for the room, the sub-floor, or a combustion appliance. */
export const VENT_PURPOSES = ['room', 'sub-floor', 'combustion-air'] as const;
export type VentPurpose = (typeof VENT_PURPOSES)[number];

/** Which way a fan moves air. */
export const FAN_DIRECTIONS = ['extract', 'supply'] as const;
export type FanDirection = (typeof FAN_DIRECTIONS)[number];

/** Whether an opening can be used as found. */
export const OPERABILITY = ['opens', 'restricted', 'blocked', 'seized'] as const;
export type Operability = (typeof OPERABILITY)[number];
