/**
 * The state of a room's openings, fans and doors for a test or a scenario: which openings were
 * open (and how many of a record's identical units), which fans ran, whether doors were open.
 *
 * From a reading's recorded conditions (practice.md §1 item 12: a decay measures the state during
 * that test):
 * - openings recorded one by one (openOpeningIds) are taken as recorded;
 * - otherwise windows follow the summary ('all-open': every openable sash; 'some-open': one sash
 *   of the first openable window, assumed and flagged; shut or none: none), and background vents
 *   are as found;
 * - fans follow the summary ('on': every fan that works; a fan recorded dead or isolated never runs).
 *
 * "As found" for vents: open unless a defect records the vent shut or blocked, or it cannot be
 * used (blocked, seized). For fans with no reading: supply fans and terminals run (a mechanical
 * supply normally runs while the room is used); extract fans do not (usually switched, so not
 * counted: the conservative choice).
 *
 * Scenarios: closed (windows shut, vents and fans as found), vents open (every usable background
 * vent open), windows open (also every openable sash open to its recorded extent: purge).
 *
 * Example: stateFromConditions(room, { windows: 'all-closed', doors: 'open', fans: 'none', … })
 * → no windows open, doorsOpen true, vents as found.
 */
import type { DocumentRoom } from '../model/survey-document.ts';
import type { Opening } from '../model/opening.ts';
import type { Conditions } from '../model/reading.ts';
import type { RoomStateSummary } from './results.ts';

export interface RoomState {
  /** Opening record id → units open. */
  open: ReadonlyMap<string, number>;
  fansRunning: ReadonlySet<string>;
  doorsOpen: boolean;
  recordedOneByOne: boolean;
  assumptions: string[];
}

type Window = Extract<Opening, { type: 'window' }>;
type Vent = Extract<Opening, { type: 'vent' }>;
type Fan = Extract<Opening, { type: 'fan' }>;

/** A window whose sash can be opened at all (not fixed, blocked or seized). */
export function isOpenableWindow(o: Opening): o is Window {
  return o.type === 'window' && o.style !== 'fixed' && (o.operability === 'opens' || o.operability === 'restricted');
}

/** A vent that cannot pass air: blocked or seized as recorded, or a defect says blocked. */
export function isVentBlocked(room: DocumentRoom, vent: Vent): boolean {
  return (
    vent.operability === 'blocked' ||
    vent.operability === 'seized' ||
    room.defects.some((d) => d.kind === 'vent-blocked' && d.openingId === vent.id)
  );
}

/** A fan that cannot run: recorded dead, or its isolator is off. */
export function isFanDead(room: DocumentRoom, fan: Fan): boolean {
  return fan.isolator === 'off' || room.defects.some((d) => d.kind === 'fan-dead' && d.openingId === fan.id);
}

const backgroundVents = (room: DocumentRoom): Vent[] =>
  room.openings.filter((o): o is Vent => o.type === 'vent' && o.kind === 'background-vent' && !isVentBlocked(room, o));

const workingFans = (room: DocumentRoom): Fan[] => room.openings.filter((o): o is Fan => o.type === 'fan' && !isFanDead(room, o));

/** Background vents open as found: usable and not recorded shut. */
function ventsAsFound(room: DocumentRoom): [string, number][] {
  return backgroundVents(room)
    .filter((v) => !room.defects.some((d) => d.kind === 'vent-shut' && d.openingId === v.id))
    .map((v) => [v.id, v.count]);
}

/** The latest reading (by time, then id), if any. */
function latestReading(room: DocumentRoom) {
  return [...room.readings].sort((a, b) => (a.time === b.time ? (a.id < b.id ? -1 : 1) : Date.parse(a.time) - Date.parse(b.time))).at(-1);
}

/** Fans running as found: from the latest reading's record, else supply fans only. */
function fansAsFound(room: DocumentRoom): { running: string[]; assumption: string | null } {
  const latest = latestReading(room);
  if (latest) return { running: fansFrom(room, latest.conditions.fans), assumption: null };
  const running = workingFans(room)
    .filter((f) => f.direction === 'supply')
    .map((f) => f.id);
  return {
    running,
    assumption: workingFans(room).length > 0 ? 'fans not recorded with a reading: supply fans taken as running, extract fans as off' : null,
  };
}

function fansFrom(room: DocumentRoom, fans: Conditions['fans']): string[] {
  return fans === 'on' ? workingFans(room).map((f) => f.id) : [];
}

/**
 * The state recorded with a reading's conditions (see the file note).
 * Example: conditions with openOpeningIds [w1] → open = { w1: all its units }, recordedOneByOne.
 */
export function stateFromConditions(room: DocumentRoom, conditions: Conditions): RoomState {
  const assumptions: string[] = [];
  const open = new Map<string, number>();
  const byId = new Map(room.openings.map((o) => [o.id, o]));
  if (conditions.openOpeningIds) {
    for (const id of conditions.openOpeningIds) {
      const o = byId.get(id);
      if (o && o.type !== 'fan') open.set(id, o.count);
    }
  } else {
    const windows = room.openings.filter(isOpenableWindow);
    if (conditions.windows === 'all-open') {
      for (const w of windows) open.set(w.id, w.count);
    } else if (conditions.windows === 'some-open' && windows.length > 0) {
      open.set(windows[0]!.id, 1);
      assumptions.push('which windows were open was not recorded: one sash assumed open');
    }
    for (const [id, n] of ventsAsFound(room)) open.set(id, n);
    if (backgroundVents(room).length > 0) assumptions.push('background vents not recorded with the reading: taken as found');
  }
  return {
    open,
    fansRunning: new Set(fansFrom(room, conditions.fans)),
    doorsOpen: conditions.doors === 'open',
    recordedOneByOne: conditions.openOpeningIds !== undefined,
    assumptions,
  };
}

/** Windows shut, doors shut, vents and fans as found. */
export function closedState(room: DocumentRoom): RoomState {
  const fans = fansAsFound(room);
  return {
    open: new Map(ventsAsFound(room)),
    fansRunning: new Set(fans.running),
    doorsOpen: false,
    recordedOneByOne: false,
    assumptions: fans.assumption ? [fans.assumption] : [],
  };
}

/** As closed, with every usable background vent open. */
export function ventsOpenState(room: DocumentRoom): RoomState {
  const closed = closedState(room);
  const open = new Map(closed.open);
  for (const v of backgroundVents(room)) open.set(v.id, v.count);
  return { ...closed, open };
}

/** As vents open, with every openable sash open to its recorded extent (purge). */
export function windowsOpenState(room: DocumentRoom): RoomState {
  const vents = ventsOpenState(room);
  const open = new Map(vents.open);
  for (const w of room.openings.filter(isOpenableWindow)) open.set(w.id, w.count);
  return { ...vents, open };
}

/** The plain summary of a state, sorted by id. */
export function summariseState(state: RoomState): RoomStateSummary {
  return {
    open: [...state.open]
      .map(([openingId, units]) => ({ openingId, units }))
      .sort((a, b) => (a.openingId < b.openingId ? -1 : a.openingId > b.openingId ? 1 : 0)),
    fansRunning: [...state.fansRunning].sort(),
    doorsOpen: state.doorsOpen,
    recordedOneByOne: state.recordedOneByOne,
    assumptions: [...state.assumptions],
  };
}
