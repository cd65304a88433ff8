/**
 * Ranking rooms for a report: SAFETY first (rooms with safety items, most items first), then
 * PRIORITY level, then SEVERITY, then room id, so the order is total and never depends on the
 * order rooms were entered.
 *
 * Severity (our own, documented): the air shortfall at the unfavourable end of the worst weather
 * case, in L/s, times the people who use the room (at least one, so an empty room with a shortfall
 * still counts): "L/s·person short". A room with mould seen adds 1 per 0.1 m² of mould, so two
 * rooms equally short are told apart by what was seen.
 */
import { PRIORITY_LEVELS, type PriorityLevel } from './priority.ts';
import { litresPerSecond } from '../units.ts';

/** One room's ranking facts. */
export interface RankFacts {
  id: string;
  safetyItems: number;
  level: PriorityLevel;
  severity: number;
}

/**
 * The severity measure of the file note: shortfall (m³/s) in L/s × max(1, people) + 10 per m² of mould seen.
 * Example: severityOf(0.09, 29, 0) = 2610.
 */
export function severityOf(shortfall_m3s: number, people: number, mouldArea_m2: number): number {
  return Math.max(0, litresPerSecond(shortfall_m3s)) * Math.max(1, people) + 10 * Math.max(0, mouldArea_m2);
}

const ORDER = new Map(PRIORITY_LEVELS.map((l, i) => [l.level, i]));

/**
 * Total order of two rooms (negative: a first).
 * Example: a room with a safety item sorts before any room without one.
 */
export function compareRooms(a: RankFacts, b: RankFacts): number {
  return (
    (b.safetyItems > 0 ? 1 : 0) - (a.safetyItems > 0 ? 1 : 0) ||
    b.safetyItems - a.safetyItems ||
    ORDER.get(a.level)! - ORDER.get(b.level)! ||
    b.severity - a.severity ||
    (a.id < b.id ? -1 : a.id > b.id ? 1 : 0)
  );
}

/**
 * Rooms in rank order, numbered from 1.
 * Example: rankRooms([{ id: 'b', …, level: 'no-action-found' }, { id: 'a', …, level: 'act-now' }]) → a rank 1, b rank 2.
 */
export function rankRooms<T extends RankFacts>(rooms: readonly T[]): (T & { rank: number })[] {
  return [...rooms].sort(compareRooms).map((r, i) => ({ ...r, rank: i + 1 }));
}
