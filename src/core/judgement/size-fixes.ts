/**
 * Sizing a room's fixes: each option is applied to the room's engine input in its WINTER state
 * (windows shut; vents and fans as found), re-assessed over every weather case by the engine's
 * own prediction (predictRoomSupplyOverCases, no Monte Carlo), and kept only if the supply at the
 * UNFAVOURABLE end of its range in the WORST case reaches the target. A room with a measurement
 * is re-assessed as the scenarios are: measured supply plus the predicted change, end by end
 * (src/analysis/scenarios.ts), so a fix is never credited with more than the engine predicts it adds.
 *
 * Quantities are searched, not simulated: vent counts (up to what the wall takes, at most 8) and
 * fan and unit sizes by bisection over the stock sizes (the supply rises with the size: a tested
 * property), the largest size tried first; a candidate is predicted in the baseline's worst case
 * first and dropped at the first case that falls short; the largest occupancy by bisection. An option that cannot reach the target at its
 * largest size is NOT offered (physically trivial for the shortfall), and is listed with why; an
 * occupancy limit below half the room's stated use is no fix either (our own rule).
 * Options are ordered from least to most invasive. "Open the windows" is never a fix for winter:
 * freeing a stuck window is listed only as supporting work, for airing.
 */
import type { RoomAirflowInput } from '../airflow-inputs.ts';
import type { FlowRange } from '../flow-range.ts';
import { predictRoomSupply, predictRoomSupplyOverCases } from '../room-supply-prediction.ts';
import { litresPerSecond, roundToStep } from '../units.ts';
import type { WeatherCases } from '../weather-cases.ts';
import { addFan, addVents, EXTRACT_FAN_SIZES_M3S, maxAddedVents, openVents, repairFans, SUPPLY_UNIT_SIZES_M3S, type OutsideWall } from './fix-options.ts';
import { safetyGates, type FixKind, type GateFacts, type SafetyGate } from './safety-gates.ts';

/** Everything sizing needs. SI units. */
export interface FixSizingInput {
  cases: WeatherCases;
  /** The room in its winter state. */
  winter: RoomAirflowInput;
  /** When the room was measured: the state of the measurement and the measured supply. */
  anchor: { state: RoomAirflowInput; measured: FlowRange } | null;
  /** Supply needed at the unfavourable end, m³/s. */
  target_m3s: number;
  /** What sets the target, in words. */
  targetReason: string;
  /** Rooms where an extract fan is the usual item (kitchens, bathrooms, toilets, utility rooms). */
  extractRoom: boolean;
  shutVentIds: readonly string[];
  blockedVentIds: readonly string[];
  /** Dead extract fans and the measured flow to commission each at, m³/s. */
  deadExtractFans: readonly { id: string; flow_m3s: number }[];
  outsideWall: OutsideWall | null;
  /** Occupancy a room may be limited to (schools, workplaces); null in homes. */
  occupancy: { count: number; targetFor: (people: number) => number } | null;
  /** Windows found seized or blocked. */
  stuckWindows: number;
  gates: GateFacts;
}

/** A fix that meets its target. */
export interface FixOption {
  kind: FixKind;
  /** The item and quantity in a builder's words. */
  title: string;
  quantity: { value: number; unit: string };
  /** Supply after the fix at the unfavourable end of the worst weather case, m³/s. */
  supplyAfter_m3s: number;
  target_m3s: number;
  /** 1 least invasive … 6 most. */
  invasiveness: number;
  gates: SafetyGate[];
}

/** An option considered and not offered, with why. */
export interface FixNotOffered {
  kind: FixKind;
  why: string;
}

/** Work that helps but is not sized to a target (airing, make-up air). */
export interface SupportingWork {
  kind: FixKind;
  title: string;
  gates: SafetyGate[];
}

/** A room's sized fixes. */
export interface FixPlan {
  target_m3s: number;
  targetReason: string;
  /** Winter supply now at the unfavourable end of the worst case, m³/s. */
  current_m3s: number;
  /** Extra supply needed, m³/s (zero when none). */
  extraNeeded_m3s: number;
  options: FixOption[];
  notOffered: FixNotOffered[];
  supporting: SupportingWork[];
  caution: string;
}

const INVASIVENESS: Readonly<Record<FixKind, number>> = {
  'open-shut-vents': 1,
  'unblock-vents': 1,
  'repair-extract-fan': 2,
  'add-background-vents': 3,
  'add-extract-fan': 4,
  'add-supply-unit': 5,
  'limit-occupancy': 6,
  'undercut-door': 3,
  'free-window-for-airing': 2,
  'remove-restrictor': 2,
};

const CAUTION =
  'Fixes are sized for the worst weather case with windows shut, at the unfavourable end of each range; opening windows is for airing, not the winter fix. Screening estimates: a competent person designs and commissions the work, and local regulations apply.';

const ls = (q: number) => roundToStep(litresPerSecond(q), 0.5);

/**
 * The lowest supply over the weather cases at the unfavourable end (m³/s, see the file note),
 * and a quicker test of whether a candidate reaches a level: it predicts the baseline's worst
 * case first and stops at the first case that falls short.
 */
function assessor(input: FixSizingInput): { supplyOf: (candidate: RoomAirflowInput) => number; reaches: (candidate: RoomAirflowInput, level: number) => boolean } {
  const base = input.anchor ? predictRoomSupplyOverCases(input.anchor.state, input.cases).predictions.map((p) => p.outdoorAir) : null;
  const lowIn = (a: FlowRange, k: number): number => {
    if (!base || !input.anchor) return a.low;
    const b = base[k]!;
    return Math.max(0, input.anchor.measured.low + Math.min(a.low - b.low, a.central - b.central, a.high - b.high));
  };
  const lows = (candidate: RoomAirflowInput) => predictRoomSupplyOverCases(candidate, input.cases).predictions.map((p, k) => lowIn(p.outdoorAir, k));
  const winterLows = lows(input.winter);
  const order = winterLows.map((v, k) => [v, k] as const).sort((a, b) => a[0] - b[0] || a[1] - b[1]).map(([, k]) => k);
  return {
    supplyOf: (candidate) => Math.min(...lows(candidate)),
    reaches: (candidate, level) => order.every((k) => lowIn(predictRoomSupply(candidate, input.cases[k]!).outdoorAir, k) >= level),
  };
}

/** Smallest index of sizes whose supply meets the target, by bisection (supply rises with size); -1 when none. */
function smallestSize(sizes: readonly number[], meets: (size: number) => boolean): number {
  let lo = 0;
  let hi = sizes.length - 1;
  if (hi < 0 || !meets(sizes[hi]!)) return -1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (meets(sizes[mid]!)) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

/**
 * Size the fixes of a room (see the file note).
 * Example: a classroom measured at 48–60 L/s needing 145 L/s, one 7.2 m outside wall → vents not
 * offered (8 vents add about 25 L/s at the low end), a supply unit of 100 L/s offered, "at most 9
 * people" offered.
 */
export function sizeFixes(input: FixSizingInput): FixPlan {
  const { supplyOf, reaches } = assessor(input);
  const current = supplyOf(input.winter);
  const target = input.target_m3s;
  const options: FixOption[] = [];
  const notOffered: FixNotOffered[] = [];
  const supporting: SupportingWork[] = [];
  const gatesOf = (kind: FixKind) => safetyGates(kind, input.gates);
  const consider = (kind: FixKind, size: () => { title: string; quantity: { value: number; unit: string }; after: number } | string) => {
    const gates = gatesOf(kind);
    const blocking = gates.filter((g) => g.blocking);
    if (blocking.length > 0) {
      notOffered.push({ kind, why: blocking.map((g) => g.message).join(' ') });
      return;
    }
    const sized = size();
    if (typeof sized === 'string') {
      notOffered.push({ kind, why: sized });
      return;
    }
    options.push({ kind, title: sized.title, quantity: sized.quantity, supplyAfter_m3s: sized.after, target_m3s: target, invasiveness: INVASIVENESS[kind], gates });
  };
  const short = (what: string, after: number) =>
    `${what} would give ${ls(after)} L/s at the unfavourable end, short of the ${ls(target)} L/s needed: not offered as the fix.`;

  if (current < target) {
    if (input.shutVentIds.length > 0) {
      consider('open-shut-vents', () => {
        const after = supplyOf(openVents(input.winter, input.shutVentIds));
        const n = input.shutVentIds.length;
        return after >= target ? { title: `Open the ${n} background vent${n > 1 ? 's' : ''} found shut and leave ${n > 1 ? 'them' : 'it'} open`, quantity: { value: n, unit: 'vents' }, after } : short(`Opening the ${n} shut vent(s)`, after);
      });
    }
    if (input.blockedVentIds.length > 0) {
      consider('unblock-vents', () => {
        const after = supplyOf(openVents(input.winter, input.blockedVentIds));
        const n = input.blockedVentIds.length;
        return after >= target ? { title: `Unblock ${n} background vent${n > 1 ? 's' : ''} and leave ${n > 1 ? 'them' : 'it'} open`, quantity: { value: n, unit: 'vents' }, after } : short(`Unblocking the ${n} vent(s)`, after);
      });
    }
    if (input.deadExtractFans.length > 0) {
      consider('repair-extract-fan', () => {
        // At least its rating; a stock size up when the rating falls short at the unfavourable end (measured ±15 %).
        const rated = input.deadExtractFans.reduce((s, f) => s + f.flow_m3s, 0);
        const sizes = [rated, ...EXTRACT_FAN_SIZES_M3S.filter((q) => q > rated)];
        const repaired = (q: number) => repairFans(input.winter, input.deadExtractFans.map((f) => ({ id: f.id, flow_m3s: (f.flow_m3s / rated) * q })));
        const afterFor = (q: number) => supplyOf(repaired(q));
        const k = smallestSize(sizes, (q) => reaches(repaired(q), target));
        if (k < 0) return short('Replacing the extract fan with the largest stock size', afterFor(sizes[sizes.length - 1]!));
        const q = sizes[k]!;
        return { title: `${k === 0 ? 'Repair or replace' : 'Replace'} the extract fan and commission it at ${ls(q)} L/s, measured`, quantity: { value: ls(q), unit: 'L/s measured' }, after: afterFor(q) };
      });
    }
    const wall = input.outsideWall;
    if (wall) {
      consider('add-background-vents', () => {
        const most = maxAddedVents(wall.length_m);
        if (most < 1) return 'The outside wall is too short for another vent.';
        const counts = Array.from({ length: most }, (_, k) => k + 1);
        const k = smallestSize(counts, (n) => reaches(addVents(input.winter, n, wall), target));
        if (k < 0) return short(`${most} added 5,000 mm² vents (the most the wall takes)`, supplyOf(addVents(input.winter, most, wall)));
        const n = counts[k]!;
        return { title: `Add ${n} background vent${n > 1 ? 's' : ''} of 5,000 mm² equivalent area each in the outside wall`, quantity: { value: n, unit: '× 5,000 mm²' }, after: supplyOf(addVents(input.winter, n, wall)) };
      });
    } else {
      notOffered.push({ kind: 'add-background-vents', why: 'No outside wall is recorded: no new opening through a compartment wall or into an escape route.' });
    }
    const fanKind: FixKind = input.extractRoom ? 'add-extract-fan' : 'add-supply-unit';
    const sizes = input.extractRoom ? EXTRACT_FAN_SIZES_M3S : SUPPLY_UNIT_SIZES_M3S;
    const role = input.extractRoom ? 'extract' : 'supply';
    consider(fanKind, () => {
      const afterFor = (q: number) => supplyOf(addFan(input.winter, role, q));
      const k = smallestSize(sizes, (q) => reaches(addFan(input.winter, role, q), target));
      if (k < 0) return short(`The largest ${role === 'extract' ? 'extract fan' : 'supply unit'} considered`, afterFor(sizes[sizes.length - 1]!));
      const q = sizes[k]!;
      const what = role === 'extract' ? 'an extract fan' : 'a mechanical supply unit (single-room heat recovery, or ducted supply designed by a ventilation engineer)';
      return { title: `Add ${what} of ${ls(q)} L/s, commissioned and measured`, quantity: { value: ls(q), unit: 'L/s measured' }, after: afterFor(q) };
    });
    const occ = input.occupancy;
    if (occ && occ.count > 1) {
      consider('limit-occupancy', () => {
        const fits = (n: number) => occ.targetFor(n) <= current;
        // Largest n in [1, count − 1] that fits, by bisection (the need rises with n).
        let lo = 0;
        let hi = occ.count - 1;
        while (lo < hi) {
          const mid = (lo + hi + 1) >> 1;
          if (fits(mid)) lo = mid;
          else hi = mid - 1;
        }
        if (lo * 2 < occ.count) return `The room would fit only ${lo} of its ${occ.count} people with the air it gets now: below half its use, that is no fix.`;
        return { title: `Use the room for at most ${lo} people until the ventilation is improved`, quantity: { value: lo, unit: 'people' }, after: current };
      });
    }
  }
  if (options.some((o) => o.kind === 'repair-extract-fan' || o.kind === 'add-extract-fan')) {
    supporting.push({ kind: 'undercut-door', title: 'Make sure air can reach the fan: a gap of about 10 mm under the door (7,600 mm²)', gates: gatesOf('undercut-door') });
  }
  if (input.stuckWindows > 0) {
    supporting.push({ kind: 'free-window-for-airing', title: `Free the ${input.stuckWindows} stuck window${input.stuckWindows > 1 ? 's' : ''} so the room can be aired between uses (airing only, not the winter fix)`, gates: gatesOf('free-window-for-airing') });
  }
  options.sort((a, b) => a.invasiveness - b.invasiveness || a.quantity.value - b.quantity.value || (a.kind < b.kind ? -1 : 1));
  return { target_m3s: target, targetReason: input.targetReason, current_m3s: current, extraNeeded_m3s: Math.max(0, target - current), options, notOffered, supporting, caution: CAUTION };
}
