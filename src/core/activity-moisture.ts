/**
 * Water vapour released by household activities, as a rate while the activity lasts (kg/s)
 * and as an amount per day (kg/day), each with its source and confidence. People are in
 * moisture-generation.ts (personMoistureOutput); this file covers everything else.
 *
 * The published figures disagree widely (a 2016 measurement study, Zemitis et al., Energy and
 * Buildings 127:884, found lower values than the handbooks), so every value carries a range.
 */
import { fromGramsPerHour, SECONDS_PER_HOUR } from './units.ts';

/** Activities that release moisture. */
export type MoistureActivityKind =
  | 'cooking'
  | 'cooking-gas'
  | 'bath'
  | 'shower'
  | 'laundry-drying-spun'
  | 'laundry-drying-dripping'
  | 'dishwashing'
  | 'clothes-washing'
  | 'pot-plants';

/** Moisture released by one activity. */
export interface ActivityMoistureOutput {
  kind: MoistureActivityKind;
  /** Rate while the activity lasts, kg/s: typical, low and high. */
  typical_kgs: number;
  low_kgs: number;
  high_kgs: number;
  /** Published daily amount, kg, where there is one (else undefined)… */
  dailyAmount_kg: number | undefined;
  /** …and what it is counted per: a household's day, a person's day, or one load of washing. */
  dailyAmountPer: 'household' | 'person' | 'load' | undefined;
  /** Where the figures come from, with their confidence tags. */
  source: string;
}

const ANNEX_14 =
  'IEA Annex 14 (1990) table of water-vapour emission rates, via a reproduced handbook table (secondary source)';

interface Row {
  low_gh: number;
  typical_gh: number;
  high_gh: number;
  daily?: { kg: number; per: 'household' | 'person' | 'load' };
  source: string;
}

const TABLE: Record<MoistureActivityKind, Row> = {
  cooking: {
    low_gh: 600,
    typical_gh: 1000,
    high_gh: 1500,
    daily: { kg: 2.0, per: 'household' },
    source: `${ANNEX_14}: cooking 600–1500 g/h; BS 5250 cooking by electricity 2 kg/day (from memory)`,
  },
  'cooking-gas': {
    low_gh: 600,
    typical_gh: 1000,
    high_gh: 1500,
    daily: { kg: 3.0, per: 'household' },
    source: `${ANNEX_14}: cooking 600–1500 g/h; BS 5250 cooking by gas 3 kg/day including the flame's water (from memory)`,
  },
  bath: {
    low_gh: 500,
    typical_gh: 700,
    high_gh: 900,
    daily: { kg: 0.2, per: 'person' },
    source: `${ANNEX_14}: bath about 700 g/h (range ours, ±200 g/h); BS 5250 bathing and washing 0.2 kg per person per day (from memory)`,
  },
  shower: {
    low_gh: 1500,
    typical_gh: 2500,
    high_gh: 3000,
    daily: { kg: 0.2, per: 'person' },
    source: `${ANNEX_14}: shower about 2500 g/h (range ours); BS 5250 bathing and washing 0.2 kg per person per day (from memory)`,
  },
  'laundry-drying-spun': {
    low_gh: 50,
    typical_gh: 125,
    high_gh: 200,
    daily: { kg: 1.5, per: 'person' },
    source: `${ANNEX_14}: 4.5 kg load spun 50–200 g/h; BS 5250 clothes drying 1.5 kg per person per day (from memory)`,
  },
  'laundry-drying-dripping': {
    low_gh: 100,
    typical_gh: 300,
    high_gh: 500,
    daily: { kg: 5.1, per: 'load' },
    source: `${ANNEX_14}: 4.5 kg load dripping 100–500 g/h; UK social-landlord advice: indoor clothes drying about 9 pints (5.1 kg) a load (confirmed)`,
  },
  dishwashing: {
    low_gh: 100,
    typical_gh: 200,
    high_gh: 300,
    daily: { kg: 0.4, per: 'household' },
    source: 'BS 5250 dishwashing 0.4 kg/day (from memory); hourly rate ours, for a 2 h daily total (common practice (no published source))',
  },
  'clothes-washing': {
    low_gh: 100,
    typical_gh: 250,
    high_gh: 400,
    daily: { kg: 0.5, per: 'household' },
    source: 'BS 5250 clothes washing 0.5 kg/day (from memory); hourly rate ours, for a 2 h daily total (common practice (no published source))',
  },
  'pot-plants': {
    low_gh: 7,
    typical_gh: 11,
    high_gh: 15,
    source: `${ANNEX_14}: potted plant 7–15 g/h each`,
  },
};

/** All activity kinds, in table order. */
export const MOISTURE_ACTIVITY_KINDS = Object.keys(TABLE) as MoistureActivityKind[];

/**
 * Moisture released by an activity: rate while it lasts (kg/s) and published daily amount (kg).
 * Example: activityMoistureOutput('shower').typical_kgs = 6.944e-4 kg/s (2500 g/h).
 */
export function activityMoistureOutput(kind: MoistureActivityKind): ActivityMoistureOutput {
  const row = TABLE[kind];
  return {
    kind,
    typical_kgs: fromGramsPerHour(row.typical_gh),
    low_kgs: fromGramsPerHour(row.low_gh),
    high_kgs: fromGramsPerHour(row.high_gh),
    dailyAmount_kg: row.daily?.kg,
    dailyAmountPer: row.daily?.per,
    source: row.source,
  };
}

/** One entry of a day's moisture: a rate (kg/s) for a duration (s). */
export interface MoistureEvent {
  rate_kgs: number;
  duration_s: number;
}

/**
 * Total moisture (kg) of a list of events, and their mean rate (kg/s) over a period (s, default
 * one day). Example: a 10 min shower (6.944e-4 kg/s) and two people asleep 8 h (2 × 1.111e-5
 * kg/s) → 1.056 kg, mean 1.222e-5 kg/s over 24 h.
 */
export function moistureOverPeriod(
  events: readonly MoistureEvent[],
  period_s = 24 * SECONDS_PER_HOUR,
): { total_kg: number; meanRate_kgs: number } {
  const total = events.reduce((sum, e) => sum + e.rate_kgs * e.duration_s, 0);
  return { total_kg: total, meanRate_kgs: period_s > 0 ? total / period_s : 0 };
}
