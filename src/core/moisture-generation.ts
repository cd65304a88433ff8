/**
 * Water vapour given off by a person, by activity, for the later moisture balance. Each value
 * carries its source and its confidence, because the published figures disagree.
 */
import { fromGramsPerHour } from './units.ts';

/** Activity classes used by the moisture tables. */
export type MoistureActivity = 'asleep' | 'sedentary' | 'average' | 'strenuous';

/** A moisture output per person, kg/s, with a range and its source. */
export interface PersonMoistureOutput {
  activity: MoistureActivity;
  /** Typical value, kg/s. */
  typical_kgs: number;
  /** Low and high ends of the published range, kg/s. */
  low_kgs: number;
  high_kgs: number;
  /** Where the figures come from, with their confidence tag. */
  source: string;
}

const TABLE: Record<MoistureActivity, { low: number; typical: number; high: number; source: string }> = {
  asleep: {
    low: 30,
    typical: 40,
    high: 50,
    source:
      'BS 5250 (person asleep 40 g/h, from memory); UK public guidance of about half a pint per sleeping person overnight (≈35 g/h)',
  },
  sedentary: {
    low: 40,
    typical: 50,
    high: 60,
    source: 'IEA Annex 14 (1990) table of emission rates, sedentary person 40–60 g/h (secondary source)',
  },
  average: {
    low: 60,
    typical: 90,
    high: 120,
    source: 'IEA Annex 14 (1990) table of emission rates, average activity 60–120 g/h (secondary source)',
  },
  strenuous: {
    low: 120,
    typical: 160,
    high: 200,
    source: 'IEA Annex 14 (1990) table of emission rates, strenuous activity 120–200 g/h (secondary source)',
  },
};

/**
 * The moisture activity class for an activity level in met (Persily & de Jonge scale):
 * below 1.0 asleep, below 1.6 sedentary, below 3.0 average, otherwise strenuous.
 * The cut points are our own reading of the two tables (common practice (no published source)).
 * Example: moistureActivityForMet(1.2) = 'sedentary'.
 */
export function moistureActivityForMet(met: number): MoistureActivity {
  if (met < 1.0) return 'asleep';
  if (met < 1.6) return 'sedentary';
  if (met < 3.0) return 'average';
  return 'strenuous';
}

/**
 * Moisture output of one person (kg/s) for an activity class, with its range and source.
 * Example: personMoistureOutput('asleep').typical_kgs = 1.111e-5 kg/s (40 g/h).
 */
export function personMoistureOutput(activity: MoistureActivity): PersonMoistureOutput {
  const row = TABLE[activity];
  return {
    activity,
    typical_kgs: fromGramsPerHour(row.typical),
    low_kgs: fromGramsPerHour(row.low),
    high_kgs: fromGramsPerHour(row.high),
    source: row.source,
  };
}
