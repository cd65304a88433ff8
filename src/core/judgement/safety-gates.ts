/**
 * Safety gates on fixes (practice.md §2 items 2 and 10, §5): each kind of fix is checked
 * against the room's facts before it is offered. A BLOCKING gate removes the option; the others
 * travel with it as conditions the work must meet. The gates defer to local regulations and to
 * competent people (gas and solid-fuel engineers, asbestos surveyors, fire-safety advisers).
 *
 * - More extract (a new fan, a repaired or stronger one) with an open-flued appliance in the
 *   home: only after a spillage test by a qualified engineer; with an open-flued SOLID-FUEL
 *   appliance: not offered at all (older ADF allowed no extract in such a room; from memory).
 * - Combustion-air vents are never adjustable: no fix opens, closes or counts them.
 * - Window restrictors are never removed above the ground floor (falls); unknown floor counts
 *   as above.
 * - Fire doors (flat entrance doors, doors on escape routes) are never undercut or wedged.
 * - New openings only through an OUTSIDE wall of the room: never through compartment walls or
 *   into escape routes (an extract fan in an inner room may be ducted out, fire-stopped where a
 *   duct crosses a compartment wall or floor).
 * - Drilling in a building from before 2000 (or of unknown age): an asbestos check first.
 * - More extract on a ground floor (or unknown floor): radon noted (extract can draw soil gas).
 */

/** The kinds of fix and supporting work the gates know. */
export type FixKind =
  | 'open-shut-vents'
  | 'unblock-vents'
  | 'repair-extract-fan'
  | 'add-background-vents'
  | 'add-extract-fan'
  | 'add-supply-unit'
  | 'limit-occupancy'
  | 'undercut-door'
  | 'free-window-for-airing'
  | 'remove-restrictor';

/** The facts the gates read. */
export interface GateFacts {
  /** An open-flued (or unknown-flue) appliance in the same home or room. */
  openFlued: boolean;
  /** An open-flued solid-fuel appliance in the same home or room. */
  openFluedSolidFuel: boolean;
  builtBefore2000: boolean | 'unknown';
  /** The room is on the ground floor (radon); 'unknown' counts as yes. */
  groundFloor: boolean | 'unknown';
  /** The room is above the ground floor (restrictors); 'unknown' counts as yes. */
  aboveGroundFloor: boolean | 'unknown';
  /** The room has an outside wall to put an opening through. */
  outsideWall: boolean;
  /** The room is a corridor, hall or stair (an escape route). */
  escapeRoute: boolean;
  /** The vents a fix would touch include a combustion-air vent. */
  touchesCombustionAir?: boolean;
}

export type GateCode =
  | 'spillage-test'
  | 'no-extract-with-solid-fuel'
  | 'combustion-air-never-adjusted'
  | 'keep-restrictors'
  | 'fire-door'
  | 'outside-wall-only'
  | 'escape-route'
  | 'asbestos-check'
  | 'radon';

/** One gate on a fix. */
export interface SafetyGate {
  code: GateCode;
  blocking: boolean;
  message: string;
}

const MORE_EXTRACT: ReadonlySet<FixKind> = new Set(['repair-extract-fan', 'add-extract-fan']);
const DRILLING: ReadonlySet<FixKind> = new Set(['add-background-vents', 'add-extract-fan', 'add-supply-unit']);
const TOUCHES_VENTS: ReadonlySet<FixKind> = new Set(['open-shut-vents', 'unblock-vents']);

/**
 * The gates on a kind of fix for a room.
 * Example: safetyGates('add-extract-fan', { openFlued: true, builtBefore2000: true, groundFloor: false, … })
 * → [spillage-test (not blocking), asbestos-check (not blocking)].
 */
export function safetyGates(kind: FixKind, facts: GateFacts): SafetyGate[] {
  const gates: SafetyGate[] = [];
  if (MORE_EXTRACT.has(kind) && facts.openFluedSolidFuel) {
    gates.push({ code: 'no-extract-with-solid-fuel', blocking: true, message: 'No extract fan where an open-flued solid-fuel appliance is present: it can pull fumes into the home. Ask a solid-fuel engineer.' });
  } else if (MORE_EXTRACT.has(kind) && facts.openFlued) {
    gates.push({ code: 'spillage-test', blocking: false, message: 'An open-flued appliance is in the home: only after a spillage test by a registered gas engineer with every extract fan running, and their written agreement.' });
  }
  if (TOUCHES_VENTS.has(kind) && facts.touchesCombustionAir) {
    gates.push({ code: 'combustion-air-never-adjusted', blocking: true, message: 'A combustion-air vent is never opened, closed or counted as room ventilation.' });
  }
  if ((kind === 'remove-restrictor' || kind === 'free-window-for-airing') && facts.aboveGroundFloor !== false) {
    gates.push({
      code: 'keep-restrictors',
      blocking: kind === 'remove-restrictor',
      message: 'Above the ground floor (or where the floor is not known) window restrictors stay fitted: a fall can kill.',
    });
  }
  if (kind === 'undercut-door') {
    gates.push({
      code: 'fire-door',
      blocking: facts.escapeRoute,
      message: 'Never undercut or wedge a fire door (a flat entrance door, a door onto an escape route); check the door is not one first.',
    });
  }
  if (DRILLING.has(kind)) {
    if (!facts.outsideWall && kind === 'add-extract-fan') {
      gates.push({ code: 'outside-wall-only', blocking: false, message: 'No outside wall is recorded: the fan must be ducted to outside without crossing a compartment wall or floor unless fire-stopped by a competent installer.' });
    } else if (!facts.outsideWall) {
      gates.push({ code: 'outside-wall-only', blocking: true, message: 'The room has no outside wall recorded: no new opening through a compartment wall or into an escape route.' });
    }
    if (facts.escapeRoute) gates.push({ code: 'escape-route', blocking: true, message: 'No new opening in an escape route without a fire-safety adviser.' });
    if (facts.builtBefore2000 !== false) {
      gates.push({ code: 'asbestos-check', blocking: false, message: 'The building is from before 2000 (or its age is not known): an asbestos check before drilling or cutting.' });
    }
  }
  if (MORE_EXTRACT.has(kind) && facts.groundFloor !== false) {
    gates.push({ code: 'radon', blocking: false, message: 'More extract on a ground floor can draw radon from the ground: check the radon map and test where the area is affected.' });
  }
  return gates;
}
