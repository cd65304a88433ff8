/**
 * An instrument used on the survey: what it is, what it measures, its stated accuracy, its
 * calibration, and the offsets found when it was checked side by side with the others.
 * Offsets and accuracies are in the SI unit of the quantity (ppm, °C, %, m³/s, Pa).
 */
import { z } from 'zod';
import { MAX_NOTE_LENGTH, calendarDate, choice, dateTime, measure, recordId, requiredText, text } from './field-rules.ts';

export const MEASURED_QUANTITIES = [
  'co2',
  'temperature',
  'relative-humidity',
  'surface-temperature',
  'airflow',
  'air-speed',
  'pressure',
  'moisture-content',
] as const;
export type MeasuredQuantity = (typeof MEASURED_QUANTITIES)[number];

const quantity = choice('Quantity', MEASURED_QUANTITIES);

/** Stated accuracy as ± (fixed part + percent of reading), as makers usually state it. */
export const statedAccuracySchema = z.strictObject({
  quantity,
  plusMinus: measure('Accuracy (fixed part)', '', 0, 10_000),
  percentOfReading: measure('Accuracy (percent of reading)', '%', 0, 100),
});

/** A side-by-side check: this instrument's reading minus the reference's, for one quantity. */
export const sideBySideCheckSchema = z.strictObject({
  time: dateTime,
  quantity,
  /** Another instrument on this survey, or absent when checked against outdoor air or a gas. */
  referenceInstrumentId: recordId.optional(),
  reference: text('What it was checked against'),
  offset: measure('Offset', '', -10_000, 10_000),
  duration_s: measure('Check duration', 's', 0, 86_400).optional(),
});

export const instrumentSchema = z.strictObject({
  id: recordId,
  model: requiredText('Instrument model'),
  serial: text('Serial number'),
  measures: z.array(quantity).min(1, { error: 'Say what the instrument measures' }),
  accuracy: z.array(statedAccuracySchema),
  calibratedOn: calendarDate.optional(),
  /** Automatic baseline correction switched off (it drifts low in rooms never aired to outdoor). */
  autoBaselineOff: z.boolean().optional(),
  checks: z.array(sideBySideCheckSchema),
  notes: text('Instrument notes', MAX_NOTE_LENGTH),
});

export type Instrument = z.infer<typeof instrumentSchema>;
