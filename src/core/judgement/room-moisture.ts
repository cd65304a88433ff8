/**
 * Moisture and mould for one room, at both ends of its ranges (practice.md §1.3–1.5, §5):
 *
 * - Room humidity in the coldest month: the steady humidity-ratio balance with dry-air MASS flow
 *   (coldest-month-humidity.ts) at the room's supply and its mean daily moisture release.
 *   Favourable end: high supply, low release; unfavourable end: low supply, high release.
 * - Mould: the monthly-mean surface RH on the coldest exposed wall against 80 % (mould-risk.ts),
 *   with the wall's temperature factor from its recorded construction or a measured factor
 *   (never an assumed 0.75). Unfavourable end also takes the low factor. Both ends below 80 %:
 *   no risk predicted; both at or above: risk; otherwise uncertain.
 * - Glazing: condensation at 100 % surface RH on the glazing in the coldest month's mean state
 *   (condensation-risk.ts).
 * - OBSERVED MOULD ALWAYS WINS (observed-mould.ts): mould seen → 'mould-observed', whatever the
 *   prediction; condensation seen → 'observed' for glazing.
 * - The supply that would keep the unfavourable surface below 80 %: the vapour pressure the
 *   surface allows, p ≤ 0.8·p_ws(θ_si), as a humidity ratio W_max, then Q = G/(ρ_da·(W_max − W_out));
 *   none when W_max ≤ W_out (the surface is too cold for any ventilation to help).
 *
 * Units: m³, m³/s, kg/s, °C, %, Pa. Every figure here is PREDICTED for a typical coldest month;
 * a spot reading cannot establish mould risk.
 */
import { coldestMonthIndoorHumidity, UK_COLDEST_MONTH_SCREENING, type MonthlyOutdoorMean } from '../coldest-month-humidity.ts';
import { surfaceCondensation } from '../condensation-risk.ts';
import { diagnoseDamp, type DampDiagnosis, type DampEvidence } from '../damp-diagnosis.ts';
import { humidityRatioFromRelativeHumidity, humidityRatioFromVapourPressure } from '../humidity-ratio.ts';
import { dryAirPerCubicMetre } from '../moist-air-density.ts';
import type { MoistureWarning } from '../moisture-warnings.ts';
import { MOULD_SURFACE_RH_PCT, mouldRisk } from '../mould-risk.ts';
import { judgeMouldWithObservation } from '../observed-mould.ts';
import { saturationPressure } from '../saturation-pressure.ts';
import { surfaceTemperature, type TemperatureFactorEstimate } from '../surface-temperature-factor.ts';

/** A factor with its range (low is the colder surface). */
export type FactorRange = TemperatureFactorEstimate & { low: number; high: number };

/** Inputs for one room. */
export interface RoomMoistureInput {
  volume_m3: number;
  roomTemp_C: number;
  /** Outdoor-air supply, m³/s: favourable (high) and unfavourable (low) ends, central. */
  supply: { favourable: number; central: number; unfavourable: number };
  /** Mean moisture release over the day, kg/s. */
  source: { low: number; typical: number; high: number };
  /** The coldest month's mean outdoor state; the UK screening case when absent. */
  month?: MonthlyOutdoorMean;
  /** The coldest exposed wall's factor, or null when none is known (interior room, construction not recorded). */
  wall: FactorRange | null;
  /** The glazing's factor, or null when the room has no windows. */
  glazing: TemperatureFactorEstimate | null;
  observed: { mould: boolean; where?: string; condensation: boolean };
  /** Logged vapour-pressure excess and the evidence for a damp diagnosis, when there is a log. */
  diagnosis?: DampEvidence;
}

/** A figure at the favourable and unfavourable ends, central between; null where it has no value (no air: no steady state). */
export interface EndFigures {
  favourable: number | null;
  central: number | null;
  unfavourable: number | null;
}

export type RoomMouldVerdict = 'mould-observed' | 'risk' | 'uncertain' | 'no-risk-predicted' | 'not-established';
export type GlazingVerdict = 'observed' | 'condenses' | 'uncertain' | 'dry' | 'not-assessed';

/** The room's moisture findings. */
export interface RoomMoisture {
  month: MonthlyOutdoorMean;
  /** Room RH in the coldest month, % (100 = saturated: water condenses on the coldest surfaces). */
  indoorRh_pct: EndFigures;
  /** Monthly-mean RH on the coldest wall, %; null ends where the wall is unknown or the room has no air. */
  wallSurfaceRh_pct: EndFigures;
  wallFactor: FactorRange | null;
  mould: { verdict: RoomMouldVerdict; reason: string; basis: 'observed' | 'predicted' };
  glazing: { verdict: GlazingVerdict; reason: string; surfaceRh_pct: number | null };
  /** Supply that would keep the wall below 80 % at the unfavourable end, m³/s; null when no supply can. */
  supplyForWall_m3s: number | null;
  diagnosis: DampDiagnosis | null;
  method: string;
  warnings: MoistureWarning[];
}

const METHOD =
  'coldest-month steady humidity-ratio balance (dry-air mass flow) at both ends of supply and moisture release; monthly-mean surface RH on the coldest wall against 80 % (ISO 13788 / BS 5250); glazing at 100 %';

const finite = (x: number): number | null => (Number.isFinite(x) ? x : null);
/** RH above 100 % means the air would condense: reported as 100 (saturated). */
const capped = (x: number | null): number | null => (x === null ? null : Math.min(100, x));

/** Steady room RH (%), or null with no supply. */
function roomRh(input: RoomMoistureInput, month: MonthlyOutdoorMean, supply: number, source: number) {
  const r = coldestMonthIndoorHumidity({ volume_m3: input.volume_m3, supply_m3s: supply, roomTemp_C: input.roomTemp_C, source_kgs: source, month });
  return { rh: finite(r.relativeHumidity_pct), warnings: r.warnings };
}

/**
 * Supply (m³/s) that holds a surface of factor f below 80 % RH at a moisture release G (kg/s); null when none can.
 * Example: 20 °C room, 4 °C / 87 % month, f 0.475, G 1.0e-4 kg/s → about 0.041 m³/s.
 */
export function supplyForSurfaceBelowMould(roomTemp_C: number, month: MonthlyOutdoorMean, factor: number, source_kgs: number): number | null {
  const surface = surfaceTemperature(factor, roomTemp_C, month.temp_C);
  const maxRatio = humidityRatioFromVapourPressure((MOULD_SURFACE_RH_PCT / 100) * saturationPressure(surface));
  const outdoorRatio = humidityRatioFromRelativeHumidity(month.temp_C, month.rh_pct);
  if (!(maxRatio > outdoorRatio)) return null;
  return source_kgs / (dryAirPerCubicMetre(roomTemp_C, outdoorRatio) * (maxRatio - outdoorRatio));
}

/**
 * Moisture and mould of a room (see the file note).
 * Example: a 30 m³ bedroom at 18 °C, supply 4.0–4.9 L/s, release 0.8–1.2 kg/day, solid brick
 * (f 0.425–0.575) in the UK screening month → wall surface RH above 80 % at both ends: 'risk';
 * with mould recorded → 'mould-observed'.
 */
export function roomMoisture(input: RoomMoistureInput): RoomMoisture {
  const month = input.month ?? UK_COLDEST_MONTH_SCREENING;
  const warnings: MoistureWarning[] = [];
  const fav = roomRh(input, month, input.supply.favourable, input.source.low);
  const mid = roomRh(input, month, input.supply.central, input.source.typical);
  const unf = roomRh(input, month, input.supply.unfavourable, input.source.high);
  warnings.push(...mid.warnings);
  const indoorRh = { favourable: fav.rh, central: mid.rh, unfavourable: unf.rh };

  const surfaceRh = (rh: number | null, factor: number | undefined): number | null => {
    if (rh === null || factor === undefined) return null;
    return mouldRisk({ insideTemp_C: input.roomTemp_C, insideRh_pct: rh, outsideTemp_C: month.temp_C, factor: { ...input.wall!, value: factor }, basis: 'monthly-mean' }).surfaceRh_pct;
  };
  const wall = input.wall;
  const wallRh: EndFigures = {
    favourable: surfaceRh(indoorRh.favourable, wall?.high),
    central: surfaceRh(indoorRh.central, wall?.value),
    unfavourable: surfaceRh(indoorRh.unfavourable, wall?.low),
  };
  // The central prediction, for its warnings and the observed-mould rule.
  const central = wall && indoorRh.central !== null
    ? mouldRisk({ insideTemp_C: input.roomTemp_C, insideRh_pct: indoorRh.central, outsideTemp_C: month.temp_C, factor: wall, basis: 'monthly-mean' })
    : null;
  if (central) warnings.push(...central.warnings);

  let mould: RoomMoisture['mould'];
  if (input.observed.mould) {
    const where = input.observed.where ? ` (${input.observed.where})` : '';
    mould = { verdict: 'mould-observed', reason: `Mould was seen${where}; what is seen outweighs any calculated risk.`, basis: 'observed' };
    if (central) warnings.push(...judgeMouldWithObservation(central, { mouldSeen: true, ...(input.observed.where ? { where: input.observed.where } : {}) }).warnings.filter((w) => w.code === 'observed-mould'));
  } else if (!wall) {
    mould = { verdict: 'not-established', reason: 'No exposed wall with a recorded construction or a measured surface factor: mould risk cannot be predicted. Record the wall or measure its surface temperature.', basis: 'predicted' };
  } else {
    const u = wallRh.unfavourable;
    const f = wallRh.favourable;
    // Whole percent, except that a value just under the limit never prints as the limit itself
    // (79.6 % is "79.6 %", not "80 %", beside "below 80 %").
    const words = (x: number | null) => {
      if (x === null) return 'saturated (no steady state)';
      const whole = Math.round(Math.min(x, 100));
      return x < MOULD_SURFACE_RH_PCT && whole >= MOULD_SURFACE_RH_PCT ? `${Math.floor(x * 10) / 10} %` : `${whole} %`;
    };
    if (u !== null && u < MOULD_SURFACE_RH_PCT) {
      mould = { verdict: 'no-risk-predicted', reason: `Predicted monthly-mean RH on the coldest wall ${words(f)}–${words(u)}, below 80 % even at the unfavourable end, for a typical coldest month.`, basis: 'predicted' };
    } else if (f === null || f >= MOULD_SURFACE_RH_PCT) {
      mould = { verdict: 'risk', reason: `Predicted monthly-mean RH on the coldest wall ${words(f)}–${words(u)}: at or above 80 %, where mould can grow, even at the favourable end.`, basis: 'predicted' };
    } else {
      mould = { verdict: 'uncertain', reason: `Predicted monthly-mean RH on the coldest wall ${words(f)}–${words(u)}: the range spans 80 %. Logging temperature and humidity for one to two weeks and measuring the wall's surface factor would decide this.`, basis: 'predicted' };
    }
  }

  let glazing: RoomMoisture['glazing'];
  if (input.observed.condensation) glazing = { verdict: 'observed', reason: 'Condensation was seen or reported.', surfaceRh_pct: null };
  else if (!input.glazing || indoorRh.central === null) glazing = { verdict: 'not-assessed', reason: input.glazing ? 'No steady room humidity (no outdoor air).' : 'No windows recorded.', surfaceRh_pct: null };
  else {
    const at = (rh: number | null) => (rh === null ? null : surfaceCondensation(input.roomTemp_C, rh, month.temp_C, input.glazing!));
    const lo = at(indoorRh.favourable);
    const hi = at(indoorRh.unfavourable);
    const c = at(indoorRh.central)!;
    const verdict: GlazingVerdict = lo?.condenses ? 'condenses' : hi && !hi.condenses ? 'dry' : 'uncertain';
    glazing = { verdict, reason: `${input.glazing.label}: predicted surface RH about ${Math.round(Math.min(c.surfaceRh_pct, 999))} % in a typical coldest month (100 % condenses).`, surfaceRh_pct: finite(c.surfaceRh_pct) };
  }

  const diagnosis = input.diagnosis ? diagnoseDamp(input.diagnosis) : null;
  if (diagnosis) warnings.push(...diagnosis.warnings);
  const cap = (e: EndFigures): EndFigures => ({ favourable: capped(e.favourable), central: capped(e.central), unfavourable: capped(e.unfavourable) });
  return {
    month,
    indoorRh_pct: cap(indoorRh),
    wallSurfaceRh_pct: cap(wallRh),
    wallFactor: wall,
    mould,
    glazing,
    supplyForWall_m3s: wall ? supplyForSurfaceBelowMould(input.roomTemp_C, month, wall.low, input.source.high) : null,
    diagnosis,
    method: METHOD,
    warnings,
  };
}
