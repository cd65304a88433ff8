/**
 * A room's moisture inputs from the survey (core room-moisture.ts and room-moisture-release.ts):
 *
 * - supply: the CLOSED scenario (windows shut; vents and fans as found) in its worst weather
 *   case: the winter state, never a mild day with windows open;
 * - release: the design occupants for the hours the room's day plan has them (full = all, half =
 *   half; no plan: 8 h in bedrooms, 6 h in living rooms and classrooms, 8 h in offices, 2 h
 *   elsewhere, common practice (no published source)), plus activities: cooking (by gas when a gas
 *   cooker is recorded) and dishwashing in kitchens, a shower per person a day in bathrooms
 *   (people: the dwelling's usual occupants, else two), and laundry drying where the interview or
 *   the notes say it happens in that room (an answer naming another room's use puts it there);
 * - walls: the coldest exposed wall — a measured factor when recorded (indicative, ±0.05), else
 *   the recorded construction's factor range; a construction without a table row (timber frame,
 *   curtain wall, other) gives no factor: never an assumed 0.75;
 * - glazing: single glazing when the survey's construction says so (and never mentions double), else early double glazing
 *   (assumed, flagged);
 * - observed: mould and condensation defects;
 * - log: a logger series in the room with temperature and RH, paired with an outdoor logger, or
 *   with the mean of the visit's outdoor readings (flagged).
 *
 * Example: Bedroom 1 of the demo flats → measured f 0.47 (0.42–0.52), two sleepers for 8.5 h, no
 * activities (the laundry is dried in the living room), mould observed.
 */
import { constructionTemperatureFactor, type ConstructionKind } from '../core/construction-temperature-factors.ts';
import { criticalFactorUseFor, criticalTemperatureFactor } from '../core/critical-temperature-factor.ts';
import type { HumidityClass } from '../core/humidity-classes.ts';
import type { FactorRange, RoomMoistureInput } from '../core/judgement/room-moisture.ts';
import type { MoistureActivity, MoisturePeople } from '../core/judgement/room-moisture-release.ts';
import { vapourPressureExcess, type VapourPressureExcessResult } from '../core/vapour-pressure-excess.ts';
import type { Area } from '../model/area.ts';
import type { DocumentRoom, SurveyDocument } from '../model/survey-document.ts';
import { analysisWarning, type AnalysisWarning } from './analysis-warnings.ts';
import { dayPlan } from './day-schedule.ts';
import type { RoomResults } from './results.ts';

const WALLS: Readonly<Partial<Record<string, ConstructionKind>>> = {
  'solid-masonry': 'solid-brick',
  'cavity-unfilled': 'unfilled-cavity',
  'cavity-filled': 'filled-cavity',
  'insulated-solid': 'insulated-modern-wall',
};
/** Spread given to a measured factor, ± (our own: one IR spot reading; common practice (no published source)). */
const MEASURED_FACTOR_SPREAD = 0.05;
const DEFAULT_HOURS: Readonly<Record<string, number>> = { bedroom: 8, 'living-room': 6, classroom: 6, office: 8, 'meeting-room': 3, hall: 4 };
const USE_WORDS: Readonly<Record<string, RegExp>> = {
  bedroom: /bedroom/i,
  'living-room': /living room|lounge|sitting room/i,
  kitchen: /kitchen/i,
  'wet-room': /bathroom|shower room/i,
  utility: /utility/i,
};
const LAUNDRY_TOPIC = /laundry|drying|washing/i;
const NEGATIVE = /^\s*(no|never|none|not)\b|tumble|outside|outdoors/i;

/** Expected ISO 13788 class by use (ISO 13788 Annex A from memory; schools taken as class 3, our choice). */
export function expectedHumidityClass(buildingUse: string, roomUse: string): HumidityClass {
  if (roomUse === 'kitchen' || roomUse === 'wet-room' || roomUse === 'utility' || roomUse === 'hall') return 4;
  if (buildingUse === 'office') return 2;
  return 3;
}

/** The coldest exposed wall's factor range, or null. */
export function wallFactor(room: DocumentRoom): FactorRange | null {
  let best: FactorRange | null = null;
  for (const w of room.exposedWalls) {
    let f: FactorRange | null = null;
    if (w.measured) {
      const v = w.measured.factor;
      f = { value: v, low: Math.max(0, v - MEASURED_FACTOR_SPREAD), high: Math.min(1, v + MEASURED_FACTOR_SPREAD), basis: 'measured', label: `measured on site (${w.measured.location || 'wall'}), indicative` };
    } else if (w.construction && WALLS[w.construction]) {
      f = constructionTemperatureFactor(WALLS[w.construction]!);
    }
    if (f && (!best || f.low < best.low)) best = f;
  }
  return best;
}

/** Hours a day the room's people are in it. */
function occupiedHours(room: DocumentRoom): number {
  const plan = dayPlan(room);
  if (!plan) return DEFAULT_HOURS[room.use] ?? 2;
  return plan.slots.reduce((s, slot) => s + (slot.presence === 'full' ? 1 : slot.presence === 'half' ? 0.5 : 0) * (slot.end_s - slot.start_s), 0) / 3600;
}

/** Whether the interview or notes of the room's area put laundry drying in this room. */
function laundryHere(room: DocumentRoom, mates: readonly DocumentRoom[]): string | null {
  const own = room.interview.find((a) => LAUNDRY_TOPIC.test(a.topic) && !NEGATIVE.test(a.answer) && !Object.values(USE_WORDS).some((re) => re.test(a.answer)));
  if (own) return `the interview here: “${own.answer}”`;
  for (const r of [room, ...mates]) {
    const named = r.interview.find((a) => LAUNDRY_TOPIC.test(a.topic) && !NEGATIVE.test(a.answer) && USE_WORDS[room.use]?.test(a.answer));
    if (named) return `the interview${r.id === room.id ? '' : ` in ${r.name}`}: “${named.answer}”`;
  }
  const note = [room.notes, ...room.readings.map((x) => x.note)].find((n) => /laundry|washing (is )?drying|drying (washing|laundry|clothes)/i.test(n));
  return note ? `the notes: “${note}”` : null;
}

/** The log's vapour-pressure excess, when the room has a T/RH logger series. */
function loggedExcess(room: DocumentRoom, doc: SurveyDocument, expectedClass: HumidityClass, warnings: AnalysisWarning[]): VapourPressureExcessResult | null {
  const series = doc.series.find((s) => s.roomId === room.id && s.temp_C && s.rh_pct);
  if (!series) return null;
  const outdoorSeries = doc.series.find((s) => s.roomId === undefined && s.temp_C && s.rh_pct);
  let outT: number[];
  let outRh: number[];
  if (outdoorSeries) {
    // Nearest outdoor point in time for each indoor point.
    let j = 0;
    outT = [];
    outRh = [];
    for (const t of series.times_ms) {
      while (j + 1 < outdoorSeries.times_ms.length && Math.abs(outdoorSeries.times_ms[j + 1]! - t) <= Math.abs(outdoorSeries.times_ms[j]! - t)) j++;
      outT.push(outdoorSeries.temp_C![j]!);
      outRh.push(outdoorSeries.rh_pct![j]!);
    }
  } else {
    const readings = doc.survey.outdoorReadings.filter((r) => r.temp_C !== undefined && r.rh_pct !== undefined);
    if (readings.length === 0) return null;
    const t = readings.reduce((s, r) => s + r.temp_C!, 0) / readings.length;
    const rh = readings.reduce((s, r) => s + r.rh_pct!, 0) / readings.length;
    outT = series.times_ms.map(() => t);
    outRh = series.times_ms.map(() => rh);
    warnings.push(analysisWarning('outdoor-humidity-from-visit', 'caution', 'No outdoor logger: the outdoor humidity for the vapour-pressure excess is the mean of the visit’s outdoor readings, held constant.'));
  }
  return vapourPressureExcess({
    insideTemp_C: series.temp_C!,
    insideRh_pct: series.rh_pct!,
    outsideTemp_C: outT,
    outsideRh_pct: outRh,
    day: { kind: 'time', times_s: series.times_ms.map((t) => t / 1000) },
    expectedClass,
  });
}

/**
 * The moisture inputs of a room (see the file note).
 */
export function roomMoistureInputs(
  room: DocumentRoom,
  r: Omit<RoomResults, 'judgement'>,
  doc: SurveyDocument,
  area: Area | undefined,
  mates: readonly DocumentRoom[],
): { input: RoomMoistureInput; people: MoisturePeople[]; activities: MoistureActivity[]; logged: VapourPressureExcessResult | null; warnings: AnalysisWarning[] } {
  const warnings: AnalysisWarning[] = [];
  const closed = r.scenarios.find((s) => s.id === 'closed')!;
  const winter = closed.cases.find((c) => c.weatherId === closed.worstWeatherId)!.supply_m3s;
  const hours = occupiedHours(room);
  const people: MoisturePeople[] = room.occupants.map((g) => ({ count: g.count, met: g.activity_met, hoursPerDay: hours }));
  const household = area?.dwelling?.usualOccupants ?? 2;
  const activities: MoistureActivity[] = [];
  if (room.use === 'kitchen') {
    const gas = room.appliances.some((a) => a.kind === 'gas-cooker');
    activities.push({ kind: gas ? 'cooking-gas' : 'cooking', multiplier: 1, basis: 'assumed', why: `cooking in a kitchen${gas ? ' with a gas cooker' : ''}` });
    activities.push({ kind: 'dishwashing', multiplier: 1, basis: 'assumed', why: 'washing up in a kitchen' });
  }
  if (room.use === 'wet-room' && doc.survey.buildingUse === 'dwelling') {
    activities.push({ kind: 'shower', multiplier: household, basis: 'assumed', why: `a shower a day for each of ${household} people` });
  }
  const laundry = doc.survey.buildingUse === 'dwelling' ? laundryHere(room, mates) : null;
  if (laundry) activities.push({ kind: 'laundry-drying-spun', multiplier: household, basis: 'recorded', why: `laundry dried in this room, from ${laundry}` });
  if (activities.some((a) => a.basis === 'assumed')) {
    warnings.push(analysisWarning('moisture-activity-assumed', 'info', `Moisture from ${activities.filter((a) => a.basis === 'assumed').map((a) => a.why).join(' and ')} is assumed from published daily amounts.`));
  }
  const single = /single[- ]glaz/i.test(doc.survey.construction) && !/double[- ]glaz/i.test(doc.survey.construction);
  const hasWindows = room.openings.some((o) => o.type === 'window');
  const glazing = hasWindows ? constructionTemperatureFactor(single ? 'single-glazing' : 'double-glazing-early') : null;
  if (glazing && !single) warnings.push(analysisWarning('glazing-assumed', 'info', 'The glazing is not recorded per window: early double glazing is assumed for the condensation check; single glazing would be much colder.'));
  const mould = room.defects.filter((d) => d.kind === 'mould');
  const expected = expectedHumidityClass(doc.survey.buildingUse, room.use);
  const logged = loggedExcess(room, doc, expected, warnings);
  const wall = wallFactor(room);
  const criticalUse = criticalFactorUseFor(doc.survey.buildingUse);
  const input: RoomMoistureInput = {
    volume_m3: r.volume_m3,
    roomTemp_C: r.roomTemp_C.value ?? 20,
    supply: { favourable: winter.high ?? winter.value ?? 0, central: winter.value ?? 0, unfavourable: winter.low ?? winter.value ?? 0 },
    source: { low: 0, typical: 0, high: 0 },
    wall,
    glazing,
    observed: { mould: mould.length > 0, ...(mould.length > 0 ? { where: mould.map((d) => d.location).filter(Boolean).join('; ') } : {}), condensation: room.defects.some((d) => d.kind === 'condensation') },
    ...(logged && logged.days.length > 0
      ? {
          diagnosis: {
            excess: { meanExcess_Pa: logged.meanExcess_Pa, meanOutsideTemp_C: logged.meanOutsideTemp_C },
            expectedClass: expected,
            ...(wall && criticalUse ? { surface: { factor: wall.value, neededFactor: criticalTemperatureFactor(criticalUse).factor } } : {}),
          },
        }
      : {}),
  };
  return { input, people, activities, logged, warnings };
}
