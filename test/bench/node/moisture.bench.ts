/**
 * Moisture speed: for each of 5000 invented rooms, the coldest-month humidity balance and the
 * mould check of its coldest surface (construction factor) and its glazing, repeated to get a
 * steady figure. Single-threaded: the checks are cheap next to the CO2 fits.
 */
import type { BenchContext } from '../bench-context.ts';
import { coldestMonthIndoorHumidity } from '../../../src/core/coldest-month-humidity.ts';
import { mouldRisk } from '../../../src/core/mould-risk.ts';
import { surfaceCondensation } from '../../../src/core/condensation-risk.ts';
import { CONSTRUCTIONS, constructionTemperatureFactor } from '../../../src/core/construction-temperature-factors.ts';
import { flowFromAirChanges } from '../../../src/core/units.ts';

interface InventedRoom {
  volume_m3: number;
  supply_m3s: number;
  roomTemp_C: number;
  source_kgs: number;
  wall: (typeof CONSTRUCTIONS)[number]['kind'];
}

/** Invented rooms spread over sizes, air change rates, temperatures, loads and walls (no randomness). */
function inventRooms(count: number): InventedRoom[] {
  const walls = CONSTRUCTIONS.filter((c) => c.element === 'opaque').map((c) => c.kind);
  return Array.from({ length: count }, (_, i) => {
    const volume = 20 + (i % 37) * 4;
    return {
      volume_m3: volume,
      supply_m3s: flowFromAirChanges(0.2 + (i % 11) * 0.15, volume),
      roomTemp_C: 15 + (i % 9),
      source_kgs: (4 + (i % 13)) / 86400,
      wall: walls[i % walls.length] ?? 'solid-brick',
    };
  });
}

function assess(rooms: readonly InventedRoom[]): number {
  let atRisk = 0;
  const glazing = constructionTemperatureFactor('double-glazing-early');
  for (const room of rooms) {
    const month = coldestMonthIndoorHumidity(room);
    const outside = month.month.temp_C;
    const wall = mouldRisk({ insideTemp_C: room.roomTemp_C, insideRh_pct: Math.min(100, month.relativeHumidity_pct), outsideTemp_C: outside, factor: constructionTemperatureFactor(room.wall), basis: 'monthly-mean' });
    const window = surfaceCondensation(room.roomTemp_C, Math.min(100, month.relativeHumidity_pct), outside, glazing);
    if (wall.verdict === 'risk' || window.condenses) atRisk++;
  }
  return atRisk;
}

export default async function moistureBench(ctx: BenchContext): Promise<void> {
  const rooms = inventRooms(5000);
  assess(rooms); // warm-up
  const repeats = 20;
  let atRisk = 0;
  const t0 = performance.now();
  for (let r = 0; r < repeats; r++) atRisk = assess(rooms);
  const ms = (performance.now() - t0) / repeats;
  ctx.report('moisture: coldest-month balance + wall mould + glazing condensation', {
    rooms: rooms.length,
    ms_per_5000: ms,
    rooms_per_s: (rooms.length / ms) * 1000,
    rooms_at_risk: atRisk,
  });
}
