/**
 * A room's occupants as the engine wants them: the survey's occupant groups (count, age band of
 * the Persily & de Jonge table, sex, activity in met) become Engine I OccupantGroups, and their
 * CO2 output is worked out at the room's own temperature (Persily & de Jonge 2017 give it at
 * 0 °C; co2-generation.ts scales it).
 *
 * Three occupancies:
 * - present: the people recorded with a reading (its conditions);
 * - as found: for each group, the most recorded present at any reading of the visit; a group
 *   never recorded present (only empty-room readings, or none) counts in full (assumed);
 * - design: every group in full (the room's stated occupancy).
 *
 * Example: a classroom of 28 pupils 6–11 (mixed, 1.2 met) and a teacher 30–40 (female, 1.6 met)
 * at 20.4 °C → 29 people, output ≈ 1.0e-4 m³/s (0.10 L/s).
 */
import { occupantCo2Output, type AirState, type OccupantGroup } from '../core/co2-generation.ts';
import { STANDARD_PRESSURE_PA } from '../core/units.ts';
import type { DocumentRoom } from '../model/survey-document.ts';
import type { Conditions } from '../model/reading.ts';
import type { Basis, Figure, OccupancyFigures } from './results.ts';

/**
 * Relative standard uncertainty of the CO2 output per person: activity (met), body mass and the
 * table's own spread. Our screening value, common practice (no published source).
 */
export const OUTPUT_RELATIVE_SD = 0.15;

/** Room temperature assumed when no reading gives one, °C (the engine's screening indoor value). */
export const ASSUMED_ROOM_TEMP_C = 20;

/** Counts by group id. */
export type GroupCounts = ReadonlyMap<string, number>;

/** Occupancy figures with the engine groups behind them. */
export interface RoomOccupancy {
  figures: OccupancyFigures;
  groups: OccupantGroup[];
}

/**
 * The room's temperature, °C: the mean of its readings' temperatures, else assumed 20 °C.
 * Example: readings at 20.1 and 20.5 °C → { value: 20.3, basis: 'measured' }.
 */
export function roomTemperature(room: DocumentRoom): Figure {
  const temps = room.readings.flatMap((r) => (r.temp_C === undefined ? [] : [r.temp_C])).sort((a, b) => a - b);
  if (temps.length === 0) {
    return { value: ASSUMED_ROOM_TEMP_C, low: null, high: null, basis: 'assumed', method: 'no temperature read: 20 °C assumed' };
  }
  const mean = temps.reduce((a, b) => a + b, 0) / temps.length;
  return { value: mean, low: temps[0]!, high: temps[temps.length - 1]!, basis: 'measured', method: `mean of ${temps.length} readings` };
}

/** The air state for occupants' output at a room temperature (°C), standard pressure. */
export function roomAir(temp_C: number): AirState {
  return { temp_C, pressure_Pa: STANDARD_PRESSURE_PA };
}

/** People present by group in one reading's conditions. */
export function presentCounts(conditions: Conditions): GroupCounts {
  const counts = new Map<string, number>();
  for (const p of conditions.people) counts.set(p.groupId, (counts.get(p.groupId) ?? 0) + p.count);
  return counts;
}

/** Every group in full. */
export function designCounts(room: DocumentRoom): GroupCounts {
  return new Map(room.occupants.map((g) => [g.id, g.count]));
}

/** For each group, the most recorded present at any reading; a group never recorded counts in full. */
export function asFoundCounts(room: DocumentRoom): { counts: GroupCounts; assumed: boolean } {
  const most = new Map<string, number>();
  for (const reading of room.readings) {
    for (const [id, n] of presentCounts(reading.conditions)) if (n > 0) most.set(id, Math.max(most.get(id) ?? 0, n));
  }
  const assumed = room.occupants.some((g) => !most.has(g.id));
  return { counts: new Map(room.occupants.map((g) => [g.id, most.get(g.id) ?? g.count])), assumed };
}

/**
 * Engine groups and figures for given counts at an air state. Groups with nobody are left out.
 * Example: occupancyOf(room, designCounts(room), roomAir(20), 'assumed').figures.count = 29.
 */
export function occupancyOf(room: DocumentRoom, counts: GroupCounts, air: AirState, basis: Basis): RoomOccupancy {
  const present = room.occupants.filter((g) => (counts.get(g.id) ?? 0) > 0);
  const groups: OccupantGroup[] = present.map((g) => ({ count: counts.get(g.id)!, ageBand: g.ageBand, sex: g.sex, met: g.activity_met }));
  const output = occupantCo2Output(groups, air);
  return {
    groups,
    figures: {
      count: output.count,
      output_m3s: output.total_m3s,
      groups: present.map((g, i) => ({ groupId: g.id, label: g.label, count: groups[i]!.count, ageBand: g.ageBand, sex: g.sex, met: g.activity_met })),
      basis,
    },
  };
}
