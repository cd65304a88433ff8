/**
 * The figures of a room's results offered to the criteria judge (core judge-criterion.ts), each
 * with the metric and averaging period it can stand for:
 *
 * - the as-found day profile's mean over the occupied hours ('occupied-day-mean' in schools and
 *   workplaces, 'occupied-period-mean' in homes) and its highest 20-minute rolling mean
 *   ('20-consecutive-minutes', only when the window is 20 minutes), at the two ends of the range;
 * - the highest single CO2 reading ('instant'): offered so the judge can say why it was NOT used
 *   against a mean or a cap;
 * - the as-found supply in the worst weather case ('continuous') and the windows-open supply
 *   ('when-running', purge);
 * - extract fans' flow when running, background ventilators' equivalent area, door undercut area
 *   and openable window area per floor area ('design-provision');
 * - the predicted monthly-mean surface RH on the coldest wall ('monthly-mean').
 *
 * Favourable end = low CO2 / high flow; unfavourable end = high CO2 / low flow.
 * Example: Classroom B1 → co2-absolute occupied-day-mean 1220–2180 ppm (measured supply), a spot
 * reading of 1320 ppm (instant), supply 48–60 L/s (continuous).
 */
import { equivalentAreaFromLabel } from '../core/equivalent-area.ts';
import { fanFlowRange } from '../core/fan-flow.ts';
import type { MetricEvidence } from '../core/judgement/judge-criterion.ts';
import type { RoomMoisture } from '../core/judgement/room-moisture.ts';
import type { DocumentRoom } from '../model/survey-document.ts';
import { isFanDead, isVentBlocked } from './room-state.ts';
import type { Figure, RoomResults } from './results.ts';

const HOME_USES = new Set(['bedroom', 'living-room']);
/** Hinged sashes open less than this count for nothing in the purge rule, more than the upper count in full (ADF purge rule, from memory). */
const PURGE_ANGLES_DEG = { none: 15, full: 30 } as const;

const flowEvidence = (f: Figure, period: MetricEvidence['period'], describe: string): MetricEvidence => ({
  metric: 'outdoor-air-flow',
  period,
  favourable: f.high ?? f.value,
  central: f.value,
  unfavourable: f.low ?? f.value,
  basis: f.basis,
  describe,
});

/**
 * The evidence list of one room (see the file note).
 */
export function roomEvidence(room: DocumentRoom, r: Omit<RoomResults, 'judgement'>, moisture: RoomMoisture): MetricEvidence[] {
  const out: MetricEvidence[] = [];
  const asFound = r.scenarios.find((s) => s.id === 'as-found')!;
  const worst = asFound.cases.find((c) => c.weatherId === asFound.worstWeatherId)!;
  const profile = asFound.profile;
  if (profile) {
    const period = HOME_USES.has(r.use) ? 'occupied-period-mean' : 'occupied-day-mean';
    out.push({
      metric: 'co2-absolute',
      period,
      favourable: profile.occupiedMean_ppm.low,
      central: null,
      unfavourable: profile.occupiedMean_ppm.high,
      basis: worst.supply_m3s.basis === 'measured' ? 'estimated-from-measurements' : worst.supply_m3s.basis,
      describe: `the day profile’s mean CO2 over the occupied hours (${profile.schedule}; as found, worst weather case)`,
    });
    if (profile.window_s === 1200) {
      out.push({
        metric: 'co2-absolute',
        period: '20-consecutive-minutes',
        favourable: profile.highestRollingMean_ppm.low,
        central: null,
        unfavourable: profile.highestRollingMean_ppm.high,
        basis: worst.supply_m3s.basis === 'measured' ? 'estimated-from-measurements' : worst.supply_m3s.basis,
        describe: 'the day profile’s highest 20-minute rolling mean CO2 (as found, worst weather case)',
      });
    }
  }
  const spot = room.readings.filter((x) => x.co2_ppm !== undefined).sort((a, b) => b.co2_ppm! - a.co2_ppm! || (a.id < b.id ? -1 : 1))[0];
  if (spot) {
    out.push({ metric: 'co2-absolute', period: 'instant', favourable: spot.co2_ppm!, central: spot.co2_ppm!, unfavourable: spot.co2_ppm!, basis: 'measured', describe: `the highest single reading (${spot.co2_ppm} ppm at ${spot.time})` });
  }
  out.push(flowEvidence(r.headline.supply_m3s, 'continuous', `the as-found outdoor-air supply (${r.headline.supply_m3s.method})`));
  const purge = r.scenarios.find((s) => s.id === 'windows-open')!;
  const purgeCase = purge.cases.find((c) => c.weatherId === purge.worstWeatherId)!;
  out.push(flowEvidence(purgeCase.supply_m3s, 'when-running', 'the supply with every openable window and vent open (airing), worst weather case'));

  // Provisions and capacities from the records.
  const fans = room.openings.filter((o) => o.type === 'fan' && o.direction === 'extract' && o.ducting !== 'recirculating');
  if (fans.length > 0) {
    let low = 0;
    let central = 0;
    let high = 0;
    let measured = true;
    for (const f of fans) {
      if (f.type !== 'fan' || isFanDead(room, f)) continue;
      const range = fanFlowRange({ kind: 'fan', id: f.id, role: 'extract', system: 'local', running: true, measuredFlow_m3s: f.measuredFlow_m3s === undefined ? undefined : f.measuredFlow_m3s * f.count, ratedFlow_m3s: f.ratedFlow_m3s === undefined ? undefined : f.ratedFlow_m3s * f.count }).flow;
      low += range.low;
      central += range.central;
      high += range.high;
      measured &&= f.measuredFlow_m3s !== undefined;
    }
    out.push({ metric: 'extract-flow', period: 'when-running', favourable: high, central, unfavourable: low, basis: measured ? 'measured' : 'predicted', describe: 'the extract fans’ flow when running (a dead fan counts nothing)' });
  }
  const vents = room.openings.filter((o) => o.type === 'vent' && o.kind === 'background-vent' && o.purpose === 'room' && o.labelArea_m2 !== undefined);
  if (vents.length > 0) {
    const sum = { low: 0, central: 0, high: 0 };
    for (const v of vents) {
      if (v.type !== 'vent' || isVentBlocked(room, v)) continue;
      const a = equivalentAreaFromLabel(v.labelArea_m2! * v.count, v.labelAreaIs).area;
      sum.low += a.low;
      sum.central += a.central;
      sum.high += a.high;
    }
    out.push({ metric: 'ventilator-equivalent-area', period: 'design-provision', favourable: sum.high, central: sum.central, unfavourable: sum.low, basis: 'measured', describe: 'the background vents’ equivalent area (blocked vents count nothing; free-area labels converted)' });
  }
  const undercuts = room.openings.filter((o) => o.type === 'undercut');
  if (undercuts.length > 0) {
    const area = undercuts.reduce((s, o) => (o.type === 'undercut' ? s + o.gap_m * o.doorWidth_m * o.count : s), 0);
    out.push({ metric: 'door-undercut-area', period: 'design-provision', favourable: area, central: area, unfavourable: area, basis: 'measured', describe: 'the door undercut area as measured' });
  }
  const windows = room.openings.filter((o) => o.type === 'window' && o.style !== 'fixed' && o.sashWidth_m !== undefined && o.sashHeight_m !== undefined);
  if (windows.length > 0 && r.floorArea_m2 > 0) {
    let area = 0;
    for (const w of windows) {
      if (w.type !== 'window' || w.operability !== 'opens') continue;
      const hinged = w.style === 'hinged' || w.style === 'louvre';
      const angle = w.openingAngle_deg ?? PURGE_ANGLES_DEG.full;
      const share = !hinged || angle >= PURGE_ANGLES_DEG.full ? 1 : angle >= PURGE_ANGLES_DEG.none ? 0.5 : 0;
      area += share * w.sashWidth_m! * w.sashHeight_m! * w.count;
    }
    const fraction = area / r.floorArea_m2;
    out.push({ metric: 'opening-area-fraction', period: 'design-provision', favourable: fraction, central: fraction, unfavourable: fraction, basis: 'measured', describe: 'openable window area over floor area (sashes that open freely; hinged 15–30° count half)' });
  }
  const s = moisture.wallSurfaceRh_pct;
  if (moisture.wallFactor && s.central !== null) {
    // No steady state (no outdoor air) means a saturated surface: 100 %.
    out.push({ metric: 'surface-rh', period: 'monthly-mean', favourable: s.favourable ?? 100, central: s.central, unfavourable: s.unfavourable ?? 100, basis: 'predicted', describe: 'the predicted monthly-mean RH on the coldest wall in a typical coldest month' });
  }
  return out;
}
