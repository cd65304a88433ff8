/**
 * Whether a fix recommended last visit was done, read from what the surveyor recorded in the
 * room then and now. Openings get new ids on each visit, so the check counts what the fix
 * changes rather than following one vent or fan:
 *
 *   open-shut-vents         vents recorded shut (defects "vent shut")                fewer now
 *   unblock-vents           room vents blocked or seized, or defects "vent blocked"   fewer now
 *   repair-extract-fan      dead fans (defects "fan dead")                           none now, and an extract fan present
 *   add-background-vents    background vents for the room (by count)                 more now
 *   add-extract-fan         extract fans                                             more now
 *   add-supply-unit         supply fans                                              more now
 *   limit-occupancy         people in the occupant groups                            fewer now
 *   undercut-door           door undercuts                                           more now
 *   free-window-for-airing  windows seized or blocked                                fewer now
 *   remove-restrictor       windows with a restrictor                                fewer now
 *
 * "done": the count moved all the way (none left, or more than before); "partly-done": it moved
 * but some remain; "not-done": no change; "cannot-tell": a fix kind this table does not know.
 * Combustion-air vents never count as room vents.
 *
 * Example: a bedroom with one "vent shut" defect last time and none now → open-shut-vents "done".
 */
import type { DocumentRoom } from '../model/survey-document.ts';
import type { Opening } from '../model/opening.ts';

export type FollowUpStatus = 'done' | 'partly-done' | 'not-done' | 'cannot-tell';

export interface FixFollowUp {
  kind: string;
  title: string;
  status: FollowUpStatus;
  /** What was counted, then and now, in words. */
  evidence: string;
}

type Counter = (room: DocumentRoom) => number;

const units = (room: DocumentRoom, keep: (o: Opening) => boolean) => room.openings.filter(keep).reduce((n, o) => n + o.count, 0);
const defects = (room: DocumentRoom, kind: string) => room.defects.filter((d) => d.kind === kind).length;
const roomVent = (o: Opening) => o.type === 'vent' && o.purpose !== 'combustion-air';
const fan = (direction: 'extract' | 'supply') => (o: Opening) => o.type === 'fan' && o.direction === direction;

/** For each fix kind: what it changes, the way that counts as done, and its words. */
const RULES: Readonly<Record<string, { count: Counter; goal: 'fewer' | 'more'; what: string }>> = {
  'open-shut-vents': { count: (r) => defects(r, 'vent-shut'), goal: 'fewer', what: 'vents recorded shut' },
  'unblock-vents': {
    count: (r) => units(r, (o) => roomVent(o) && (o.type === 'vent' && (o.operability === 'blocked' || o.operability === 'seized'))) + defects(r, 'vent-blocked'),
    goal: 'fewer',
    what: 'vents blocked',
  },
  'repair-extract-fan': { count: (r) => defects(r, 'fan-dead') + (units(r, fan('extract')) === 0 ? 1 : 0), goal: 'fewer', what: 'dead or missing extract fans' },
  'add-background-vents': { count: (r) => units(r, (o) => roomVent(o) && o.type === 'vent' && o.kind === 'background-vent'), goal: 'more', what: 'background vents' },
  'add-extract-fan': { count: (r) => units(r, fan('extract')), goal: 'more', what: 'extract fans' },
  'add-supply-unit': { count: (r) => units(r, fan('supply')), goal: 'more', what: 'supply fans' },
  'limit-occupancy': { count: (r) => r.occupants.reduce((n, g) => n + g.count, 0), goal: 'fewer', what: 'people' },
  'undercut-door': { count: (r) => units(r, (o) => o.type === 'undercut'), goal: 'more', what: 'door undercuts' },
  'free-window-for-airing': {
    count: (r) => units(r, (o) => o.type === 'window' && (o.operability === 'seized' || o.operability === 'blocked')),
    goal: 'fewer',
    what: 'windows that do not open',
  },
  'remove-restrictor': { count: (r) => units(r, (o) => o.type === 'window' && o.restrictor === 'yes'), goal: 'fewer', what: 'windows with restrictors' },
};

export function fixFollowUp(fix: { kind: string; title: string }, before: DocumentRoom, after: DocumentRoom): FixFollowUp {
  const rule = RULES[fix.kind];
  if (!rule) return { ...fix, status: 'cannot-tell', evidence: 'Ventwalk cannot tell from the records whether this was done: check on site.' };
  const then = rule.count(before);
  const now = rule.count(after);
  const evidence = `${rule.what}: ${then} last visit, ${now} now`;
  const status: FollowUpStatus =
    rule.goal === 'more'
      ? now > then ? 'done' : 'not-done'
      : now < then ? (now === 0 || fix.kind === 'limit-occupancy' ? 'done' : 'partly-done') : 'not-done';
  return { ...fix, status, evidence };
}
