/**
 * An area's (a flat's, a floor's, a block's) figures from its rooms: the whole-dwelling outdoor
 * air, per m² of floor and per usual occupant, and the dwelling system's supply-extract balance
 * (core whole-dwelling-balance.ts; practice.md §2 item 9: with a whole-dwelling system the
 * dwelling is the unit). Numbers only: judging them against criteria is Engine III's.
 *
 * - Rooms: those of the area and of every area inside it.
 * - Supply: the rooms' headline as-found supplies added end by end (sorted by room id, so the
 *   sum never depends on order), combined with the dwelling system's terminals that serve no
 *   surveyed room by the engine's one combination rule (outdoor-air-combination.ts). Terminals
 *   that serve a surveyed room are already in that room's figure.
 * - Floor area: the dwelling's recorded area, else the surveyed rooms' floor areas added.
 *
 * Judging the figures is judge-area.ts's.
 *
 * Example: a flat of two surveyed rooms at 10 and 6 L/s, 58 m² recorded, 3 usual occupants →
 * 16 L/s, 0.28 L/s per m², 5.3 L/s per occupant.
 */
import { dwellingBalance } from '../core/whole-dwelling-balance.ts';
import { combineRanges } from '../core/outdoor-air-combination.ts';
import type { Area } from '../model/area.ts';
import { analysisWarning, fromEngineWarning, type AnalysisWarning } from './analysis-warnings.ts';
import type { AreaResults, Basis, Figure, Ranged, RoomResults } from './results.ts';
import { terminalFans } from './room-airflow-input.ts';

/** Ids of an area and every area inside it. */
function subtree(area: Area, areas: readonly Area[]): Set<string> {
  const ids = new Set([area.id]);
  let grew = true;
  while (grew) {
    grew = false;
    for (const a of areas) {
      if (a.parentId && ids.has(a.parentId) && !ids.has(a.id)) {
        ids.add(a.id);
        grew = true;
      }
    }
  }
  return ids;
}

function combinedBasis(bases: readonly Basis[]): Basis {
  if (bases.length === 0) return 'assumed';
  if (bases.every((b) => b === 'measured')) return 'measured';
  if (bases.some((b) => b === 'measured' || b === 'estimated-from-measurements')) return 'estimated-from-measurements';
  return bases.includes('predicted') ? 'predicted' : 'assumed';
}

const per = (r: Ranged, d: number): Ranged => ({
  value: r.value === null ? null : r.value / d,
  low: r.low === null ? null : r.low / d,
  high: r.high === null ? null : r.high / d,
});

/**
 * The figures of one area from its rooms' results.
 * Example: assessArea(flat3, areas, rooms).roomIds = the ids of Bedroom 1 and Living room, sorted.
 */
export function assessArea(area: Area, areas: readonly Area[], rooms: readonly RoomResults[]): Omit<AreaResults, 'judgement'> {
  const ids = subtree(area, areas);
  const own = rooms.filter((r) => r.areaId !== null && ids.has(r.areaId)).sort((a, b) => (a.roomId < b.roomId ? -1 : 1));
  const warnings: AnalysisWarning[] = [];
  const add = (key: 'value' | 'low' | 'high'): number | null =>
    own.reduce<number | null>((s, r) => (s === null || r.headline.supply_m3s[key] === null ? null : s + r.headline.supply_m3s[key]!), 0);
  const roomsSum = { value: add('value'), low: add('low'), high: add('high') };
  const surveyed = new Set(own.map((r) => r.roomId));
  const unlinked = (t: { roomId?: string | undefined }) => !(t.roomId && surveyed.has(t.roomId));
  const fans = terminalFans(area, () => true, warnings);
  const balance = fans.length > 0 ? dwellingBalance(fans) : null;
  warnings.push(...(balance?.warnings ?? []).map(fromEngineWarning));
  const others = terminalFans(area, unlinked, []);
  let supply: Ranged = roomsSum;
  if (others.length > 0 && roomsSum.value !== null && roomsSum.low !== null && roomsSum.high !== null) {
    const b = dwellingBalance(others);
    const c = combineRanges(b.supply, b.extract, { low: roomsSum.low, central: roomsSum.value, high: roomsSum.high });
    supply = { value: c.central, low: c.low, high: c.high };
  }
  const basis = combinedBasis(own.map((r) => r.headline.supply_m3s.basis));
  const supplyFigure: Figure = {
    ...supply,
    basis,
    method: `${own.length} surveyed room(s) added${others.length > 0 ? ', with the dwelling system’s other terminals by the combination rule' : ''}`,
  };
  const recorded = area.dwelling?.floorArea_m2;
  const roomsArea = own.reduce((s, r) => s + r.floorArea_m2, 0);
  const floorArea: Figure = recorded
    ? { value: recorded, low: null, high: null, basis: 'measured', method: 'recorded for the dwelling' }
    : { value: roomsArea, low: null, high: null, basis: 'measured', method: 'surveyed rooms’ floor areas added' };
  if (area.dwelling && own.length > 0) {
    warnings.push(analysisWarning('area-rooms-partial', 'info', `Whole-dwelling figures cover the ${own.length} room(s) surveyed; rooms not surveyed add air not counted here.`));
  }
  const occupants = area.dwelling?.usualOccupants ?? null;
  return {
    areaId: area.id,
    name: area.name,
    kind: area.kind,
    parentId: area.parentId ?? null,
    roomIds: own.map((r) => r.roomId),
    floorArea_m2: floorArea,
    bedrooms: area.dwelling?.bedrooms ?? null,
    usualOccupants: occupants,
    supply_m3s: supplyFigure,
    supplyPerFloorArea_m3sm2: floorArea.value ? per(supply, floorArea.value) : { value: null, low: null, high: null },
    supplyPerOccupant_m3s: occupants ? per(supply, occupants) : null,
    balance: balance
      ? {
          supply_m3s: { value: balance.supply.central, low: balance.supply.low, high: balance.supply.high },
          extract_m3s: { value: balance.extract.central, low: balance.extract.low, high: balance.extract.high },
          mismatch: balance.mismatch,
          madeUpThroughEnvelope_m3s: balance.madeUpThroughEnvelope_m3s,
        }
      : null,
    warnings,
  };
}
