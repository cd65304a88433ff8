/**
 * The instrument form's data: what the surveyor has typed for one instrument (new, or one being
 * changed), turned into the model's record and checked with its schema.
 *
 * Stated accuracy is ± (fixed part + % of reading), one per quantity the instrument measures, as
 * makers state it. The fixed part is typed in the unit the form shows (`ACCURACY_UNITS`: L/s for
 * airflow, stored in m³/s; the others as stored). A quantity with both parts empty has no stated
 * accuracy (the analysis then assumes one and says so). With only one part typed it is refused:
 * a maker's figure with no percentage part is typed as 0, so a forgotten part never narrows the
 * uncertainty the findings show. "Automatic baseline correction switched off" applies to CO₂
 * meters only and is dropped when the instrument does not measure CO₂. Changing an instrument
 * keeps its id, side-by-side checks and notes.
 *
 * Example: CO₂ typed as 50 and 3 → accuracy [{ quantity: 'co2', plusMinus: 50, percentOfReading: 3 }];
 * airflow typed as 2 L/s and 5 % → { quantity: 'airflow', plusMinus: 0.002, percentOfReading: 5 }.
 */
import { instrumentSchema, MEASURED_QUANTITIES, type Instrument, type MeasuredQuantity } from '../model/instrument.ts';
import type { CHECK_ANSWERS } from '../model/field-rules.ts';
import { validationProblems, type ValidationProblem } from '../model/validation-problem.ts';
import { QUANTITY_WORDS } from './quantity-words.ts';

/** The unit a stated accuracy's fixed part is typed and shown in, and how many make one stored (SI) unit. */
export const ACCURACY_UNITS: Readonly<Record<MeasuredQuantity, { unit: string; perStored: number }>> = {
  co2: { unit: 'ppm', perStored: 1 },
  temperature: { unit: '°C', perStored: 1 },
  'relative-humidity': { unit: '% RH', perStored: 1 },
  'surface-temperature': { unit: '°C', perStored: 1 },
  airflow: { unit: 'L/s', perStored: 1000 },
  'air-speed': { unit: 'm/s', perStored: 1 },
  pressure: { unit: 'Pa', perStored: 1 },
  'moisture-content': { unit: '% MC', perStored: 1 },
};

export interface AccuracyDraft {
  /** Fixed part in the unit of `ACCURACY_UNITS`, or undefined when empty. */
  fixed: number | undefined;
  /** Percent of reading, or undefined when empty. */
  percent: number | undefined;
}

export interface InstrumentDraft {
  model: string;
  serial: string;
  measures: MeasuredQuantity[];
  accuracy: Record<MeasuredQuantity, AccuracyDraft>;
  /** A calendar date (2025-09-02), or '' when not known. */
  calibratedOn: string;
  autoBaselineOff: (typeof CHECK_ANSWERS)[number];
}

export type InstrumentFromDraft = { ok: true; instrument: Instrument } | { ok: false; problems: ValidationProblem[] };

/** Field name of an accuracy part in the draft's problems ('accuracy.co2.fixed'). */
export const accuracyField = (quantity: MeasuredQuantity, part: 'fixed' | 'percent') => `accuracy.${quantity}.${part}`;

/** Up to 10 significant figures, so 0.002 m³/s shows as 2 L/s rather than 2.0000000000000004. */
const tidy = (value: number) => Number(value.toPrecision(10));

/** The form's starting values: an instrument's own, or a new CO₂, temperature and humidity meter. */
export function instrumentDraft(instrument?: Instrument): InstrumentDraft {
  const accuracy = Object.fromEntries(
    MEASURED_QUANTITIES.map((q) => {
      const stated = instrument?.accuracy.find((a) => a.quantity === q);
      return [q, { fixed: stated ? tidy(stated.plusMinus * ACCURACY_UNITS[q].perStored) : undefined, percent: stated?.percentOfReading }];
    }),
  ) as Record<MeasuredQuantity, AccuracyDraft>;
  return {
    model: instrument?.model ?? '',
    serial: instrument?.serial ?? '',
    measures: instrument ? [...instrument.measures] : ['co2', 'temperature', 'relative-humidity'],
    accuracy,
    calibratedOn: instrument?.calibratedOn ?? '',
    autoBaselineOff: instrument?.autoBaselineOff === undefined ? 'not-checked' : instrument.autoBaselineOff ? 'yes' : 'no',
  };
}

/**
 * The record for a draft, checked with the model's schema; `existing` is the instrument being
 * changed (its id, checks and notes are kept), or undefined for a new one (id from `newId`).
 */
export function instrumentFromDraft(draft: InstrumentDraft, existing: Instrument | undefined, newId: () => string): InstrumentFromDraft {
  const measures = MEASURED_QUANTITIES.filter((q) => draft.measures.includes(q));
  const problems: ValidationProblem[] = [];
  const accuracy: Instrument['accuracy'] = [];
  const stated: MeasuredQuantity[] = [];
  for (const q of measures) {
    const { fixed, percent } = draft.accuracy[q];
    if (fixed === undefined && percent === undefined) continue;
    if (fixed === undefined || percent === undefined) {
      const part = fixed === undefined ? 'fixed' : 'percent';
      const words = part === 'fixed' ? `the fixed part (${ACCURACY_UNITS[q].unit})` : 'the percent of reading';
      problems.push({ field: accuracyField(q, part), message: `${QUANTITY_WORDS[q]} accuracy: ${words} is empty — type 0 if the maker states none` });
      continue;
    }
    accuracy.push({ quantity: q, plusMinus: tidy(fixed / ACCURACY_UNITS[q].perStored), percentOfReading: percent });
    stated.push(q);
  }
  const measuresCo2 = measures.includes('co2');
  const instrument: Instrument = {
    id: existing?.id ?? newId(),
    model: draft.model,
    serial: draft.serial,
    measures,
    accuracy,
    ...(draft.calibratedOn ? { calibratedOn: draft.calibratedOn } : {}),
    ...(measuresCo2 && draft.autoBaselineOff !== 'not-checked' ? { autoBaselineOff: draft.autoBaselineOff === 'yes' } : {}),
    checks: existing?.checks ?? [],
    notes: existing?.notes ?? '',
  };
  const parsed = instrumentSchema.safeParse(instrument);
  if (!parsed.success) {
    for (const p of validationProblems(parsed.error, instrument)) {
      const m = /^accuracy\.(\d+)\.(plusMinus|percentOfReading)$/.exec(p.field);
      if (!m) problems.push(p);
      else {
        const q = stated[Number(m[1])]!;
        problems.push({ ...p, field: accuracyField(q, m[2] === 'plusMinus' ? 'fixed' : 'percent'), message: `${QUANTITY_WORDS[q]}: ${p.message}` });
      }
    }
  }
  if (problems.length > 0 || !parsed.success) return { ok: false, problems };
  return { ok: true, instrument: parsed.data };
}
