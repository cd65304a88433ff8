/**
 * The outdoor-air supply a room needs, from its criteria checks: for each numeric check on CO2
 * or on a rate, the supply at which it would be met with the occupants' output at its
 * UNFAVOURABLE end, then one figure for the room.
 *
 *     CO2 absolute limit L:     Q = N·G·k·1e6 / (L − C_out)      (steady state)
 *     CO2 above outdoor ΔL:     Q = N·G·k·1e6 / ΔL               (ΔL already rescaled for the occupants)
 *     per person q:             Q = N·q
 *     per person and area:      Q = N·q_p + A·q_B                (the check's limit is already this total)
 *
 * with N people each giving G (m³/s of CO2) and k ≥ 1 the factor that takes the output to its
 * unfavourable end. The steady level is the highest a room reaches at a constant supply, so a
 * supply that holds the steady level at the limit also holds any mean over the day below it:
 * conservative for means and 20-minute caps (mass balance, references.md §0).
 *
 * Which checks count: limits first (the room's own rules); benchmarks only when no limit gives
 * a figure. Within a group of alternatives (EN 16798-1 categories I–III, HSE's two levels) the
 * LEAST demanding row counts: the lowest level a row of that group accepts, not the best one.
 * Capacities ('when-running'), provisions and monthly means (moisture) do not set a supply.
 */
import type { CriterionCheck } from './judge-criterion.ts';
import { PPM_PER_VOLUME_FRACTION } from '../units.ts';

/** The room's people and outdoor level for the conversion. */
export interface RequiredSupplyContext {
  occupants: number;
  outputPerPerson_m3s: number;
  /** Multiplier taking output to its unfavourable end (e.g. 1.29). */
  outputFactor: number;
  outdoor_ppm: number;
}

/** The supply a room needs and the check that sets it. */
export interface RequiredSupply {
  supply_m3s: number;
  criterionId: string;
  role: CriterionCheck['role'];
  /** The check's title. */
  title: string;
  method: string;
}

const SETS_SUPPLY = new Set(['occupied-day-mean', 'occupied-period-mean', 'consistently', 'continuous', '20-consecutive-minutes', '8-hours', '24-hours']);

/** The supply one check needs, m³/s, or null when it sets none. */
export function supplyForCheck(check: CriterionCheck, ctx: RequiredSupplyContext): number | null {
  if (check.limit === null || !SETS_SUPPLY.has(check.period) || ctx.occupants <= 0) return null;
  const source = ctx.occupants * ctx.outputPerPerson_m3s * ctx.outputFactor * PPM_PER_VOLUME_FRACTION;
  switch (check.metric) {
    case 'co2-absolute':
      return check.limit > ctx.outdoor_ppm ? source / (check.limit - ctx.outdoor_ppm) : null;
    case 'co2-above-outdoor':
      return check.limit > 0 ? source / check.limit : null;
    case 'flow-per-person':
      return check.limit * ctx.occupants;
    case 'flow-per-person-and-area':
      return check.limit;
    default:
      return null;
  }
}

/**
 * The supply the room needs (see the file note), or null when no check sets one.
 * Example: an existing classroom of 29 with HSE 1500 ppm (limit) and the ACoP's 5 L/s per person
 * (limit), outdoor 430 ppm, 3.4e-6 m³/s each, k 1.29 → max(119, 145) L/s = 0.145 m³/s, set by
 * the ACoP row.
 */
export function requiredSupply(checks: readonly CriterionCheck[], ctx: RequiredSupplyContext): RequiredSupply | null {
  const pick = (role: CriterionCheck['role']): RequiredSupply | null => {
    const byGroup = new Map<string, RequiredSupply>();
    for (const check of checks) {
      if (check.role !== role) continue;
      const q = supplyForCheck(check, ctx);
      if (q === null || !Number.isFinite(q)) continue;
      const current = byGroup.get(check.group);
      if (!current || q < current.supply_m3s) {
        byGroup.set(check.group, { supply_m3s: q, criterionId: check.criterionId, role, title: check.title, method: 'steady-state supply at the unfavourable occupant output (least demanding row of each group)' });
      }
    }
    let best: RequiredSupply | null = null;
    for (const r of [...byGroup.values()].sort((a, b) => (a.criterionId < b.criterionId ? -1 : 1))) if (!best || r.supply_m3s > best.supply_m3s) best = r;
    return best;
  };
  return pick('limit') ?? pick('benchmark');
}
