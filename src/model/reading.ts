/**
 * A reading taken in a room, with the conditions at that moment (who was in, windows, doors,
 * fans, heating, combustion), and the tests (decay, build-up, seeded decay) that group readings.
 * CO₂ in ppm, temperatures in °C, relative humidity in %.
 */
import { z } from 'zod';
import {
  MAX_NOTE_LENGTH,
  choice,
  co2Ppm,
  dateTime,
  indoorTempC,
  measure,
  recordId,
  relativeHumidity,
  surfaceTempC,
  text,
} from './field-rules.ts';

/** People of one occupant group present at the time. */
export const peoplePresentSchema = z.strictObject({
  groupId: recordId,
  count: measure('People present', '', 0, 10_000, { integer: true }),
});

export const conditionsSchema = z.strictObject({
  people: z.array(peoplePresentSchema),
  windows: choice('Windows', ['all-closed', 'some-open', 'all-open', 'none'] as const),
  doors: choice('Doors', ['closed', 'open'] as const),
  fans: choice('Fans', ['off', 'on', 'none'] as const),
  heating: choice('Heating', ['off', 'on'] as const),
  /** A flame burning in the room (gas hob, unflued heater, candles): its CO₂ is not from people. */
  combustion: z.boolean({ error: 'Say whether anything was burning' }),
  /** The openings that were open, when recorded one by one. */
  openOpeningIds: z.array(recordId).optional(),
});

export const readingSchema = z
  .strictObject({
    id: recordId,
    time: dateTime,
    co2_ppm: co2Ppm.optional(),
    temp_C: indoorTempC.optional(),
    rh_pct: relativeHumidity.optional(),
    surfaceTemp_C: surfaceTempC.optional(),
    instrumentId: recordId.optional(),
    conditions: conditionsSchema,
    note: text('Reading note', MAX_NOTE_LENGTH),
  })
  .refine((r) => [r.co2_ppm, r.temp_C, r.rh_pct, r.surfaceTemp_C].some((v) => v !== undefined), {
    error: 'A reading needs at least one value (CO₂, temperature, humidity or surface temperature)',
  });

export type Reading = z.infer<typeof readingSchema>;
export type Conditions = z.infer<typeof conditionsSchema>;

export const TEST_KINDS = ['decay', 'build-up', 'seeded-decay'] as const;

/** A test: readings of one room taken as one decay or build-up. */
export const roomTestSchema = z.strictObject({
  id: recordId,
  kind: choice('Test kind', TEST_KINDS),
  readingIds: z.array(recordId).min(2, { error: 'A test needs at least two readings' }),
  note: text('Test note', MAX_NOTE_LENGTH),
});

export type RoomTest = z.infer<typeof roomTestSchema>;
