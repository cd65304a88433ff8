/**
 * What the engine needs to predict a room's air supply: its openings, fans and leakage, and the
 * site. The model layer maps a validated survey onto these shapes; values here are already SI
 * (m, m², m³/s, degrees) and valid.
 *
 * Directions are compass bearings in degrees clockwise from north, of the way the opening faces
 * (a window in a south wall faces 180). Heights are above the room's floor unless stated.
 */
import type { AssumedLeakageBasis } from './assumed-air-permeability.ts';
import type { AreaBasis } from './equivalent-area.ts';
import type { LblShelterClass, LblStoreys } from './lbl-infiltration.ts';
import type { TerrainKind } from './reference-wind-speed.ts';

/** How a window opens. Sliding sashes open by a stroke; hinged sashes by an angle or a stroke. */
export type WindowType = 'side-hung' | 'top-hung' | 'bottom-hung' | 'vertical-sliding' | 'horizontal-sliding';

/** The state of a sash as found. A restricted sash opens only to its restrictor's stroke. */
export type SashCondition = 'works' | 'restricted' | 'blocked' | 'seized';

/** How far a window is open in the case predicted. */
export type OpeningExtent =
  | { by: 'closed' }
  | { by: 'angle'; angle_deg: number }
  /** Opening width at the free edge (hinged) or the gap (sliding), m. */
  | { by: 'stroke'; stroke_m: number };

/** An openable window (one sash). */
export interface WindowInput {
  kind: 'window';
  id: string;
  windowType: WindowType;
  /** Clear width of the sash opening, m. */
  sashWidth_m: number;
  /** Clear height of the sash opening, m. */
  sashHeight_m: number;
  opening: OpeningExtent;
  condition: SashCondition;
  /** For a restricted sash: the restrictor's stroke at the free edge (or the sliding gap), m. */
  restrictorStroke_m?: number;
  facing_deg: number;
  /** Height of the centre of the open part above the floor, m. */
  centreHeight_m: number;
}

/** A background ventilator (trickle vent, through-wall vent). */
export interface BackgroundVentInput {
  kind: 'background-vent';
  id: string;
  /** The area on its label (or measured), m². */
  labelArea_m2: number;
  areaBasis: AreaBasis;
  condition: 'open' | 'closed' | 'blocked';
  facing_deg: number;
  centreHeight_m: number;
}

/** What an air brick is for (practice.md §1 item 10). */
export type AirBrickPurpose = 'room-supply' | 'sub-floor' | 'combustion-air' | 'unknown';

/** An air brick or fixed grille in an outside wall. */
export interface AirBrickInput {
  kind: 'air-brick';
  id: string;
  labelArea_m2: number;
  areaBasis: AreaBasis;
  purpose: AirBrickPurpose;
  condition: 'clear' | 'blocked';
  facing_deg: number;
  centreHeight_m: number;
}

/** The gap under an internal door: air from other rooms, never outdoor air. */
export interface DoorUndercutInput {
  kind: 'door-undercut';
  id: string;
  doorWidth_m: number;
  /** Gap between the bottom of the door and the floor finish, m. */
  gap_m: number;
}

/** A grille through an internal wall or door: air from other rooms, never outdoor air. */
export interface TransferGrilleInput {
  kind: 'transfer-grille';
  id: string;
  labelArea_m2: number;
  areaBasis: AreaBasis;
}

/** Any opening of a room. */
export type OpeningInput =
  | WindowInput
  | BackgroundVentInput
  | AirBrickInput
  | DoorUndercutInput
  | TransferGrilleInput;

/**
 * Which system a fan belongs to: a room's own fan, or a terminal of a whole-dwelling system
 * (extract-only MEV, supply-only PIV, or balanced supply and extract such as MVHR).
 */
export type FanSystem = 'local' | 'whole-dwelling-extract' | 'whole-dwelling-supply' | 'whole-dwelling-balanced';

/** A fan or a terminal of a mechanical system serving the room. */
export interface FanInput {
  kind: 'fan';
  id: string;
  /** Extract moves room air out; supply brings outdoor air in; recirculating moves none. */
  role: 'extract' | 'supply' | 'recirculating';
  system: FanSystem;
  /** Running during the case predicted (switched on, not isolated, not on a timer that has ended). */
  running: boolean;
  /** Measured flow, m³/s (hood or vane anemometer). Preferred when present. */
  measuredFlow_m3s?: number;
  /** Maker's rated flow, m³/s. Used, derated, only when no measurement exists. */
  ratedFlow_m3s?: number;
}

/** Where the leakage figure comes from. */
export type LeakageSource =
  /** Air permeability from a pressure test, m³/(h·m²) of envelope at 50 Pa. */
  | { basis: 'measured-air-permeability'; q50_m3hm2: number }
  /** The dwelling's effective leakage area at 4 Pa (C_D = 1 convention), m², and its envelope area, m². */
  | { basis: 'effective-leakage-area'; dwellingLeakageArea_m2: number; dwellingEnvelope_m2: number }
  /** No test: a default from construction or age, clearly assumed. */
  | { basis: 'assumed'; assumed: AssumedLeakageBasis };

/** Background leakage of the room's share of the envelope. */
export interface LeakageInput {
  id: string;
  source: LeakageSource;
  /** Outside walls, roof and exposed floor of this room, m². Zero for an interior room. */
  roomExposedEnvelope_m2: number;
  /** Storeys of the dwelling or building (LBL coefficients). */
  storeys: LblStoreys;
  /** LBL shelter class 1 (no obstructions) to 5 (buildings immediately adjacent). */
  shelterClass: LblShelterClass;
  /** Sides of the dwelling sheltered by neighbours or obstructions, 0–4 (SAP shelter factor). */
  shelteredSides: number;
  /** A flat or terraced house whose test also measured leakage to neighbours. */
  includesLeakageToNeighbours?: boolean;
}

/**
 * A path for cross ventilation through other rooms: openings on another facade reached through
 * internal doors. Used only when every door on the path was recorded open.
 */
export interface CrossPathInput {
  internalPathOpen: boolean;
  /** Open area of the far openings, m² (free area, as for windows). */
  farOpenArea_m2: number;
  farFacing_deg: number;
  /** Smallest open internal doorway on the path, m² (in series with the openings). */
  internalOpeningArea_m2: number;
}

/** The site, for the wind at the building. */
export interface SiteInput {
  terrain: TerrainKind;
  /** Height of the building (or of the room's openings above ground), m. */
  buildingHeight_m: number;
}

/** Everything needed to predict one room's air supply under a weather case. */
export interface RoomAirflowInput {
  id: string;
  /** Floor-to-ceiling height, m (depth limits, stack height of envelope vents). */
  ceilingHeight_m: number;
  /** Depth of the room away from its openings, m; omitted if not recorded. */
  depth_m?: number;
  openings: OpeningInput[];
  fans: FanInput[];
  /** Omitted when the room's leakage is not to be counted (e.g. entered separately). */
  leakage?: LeakageInput;
  crossPath?: CrossPathInput;
  site: SiteInput;
}
