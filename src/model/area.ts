/**
 * An area of the building: a block, a floor or a flat, nested by parent (a flat on a floor of a
 * block). A flat (or house) carries the dwelling's facts and its whole-dwelling ventilation
 * system, with the system's mode and each terminal's measured flow (m³/s).
 */
import { z } from 'zod';
import { MAX_NOTE_LENGTH, check, choice, measure, recordId, requiredText, text } from './field-rules.ts';

export const AREA_KINDS = ['block', 'floor', 'flat', 'house', 'wing', 'other'] as const;

/** Whole-dwelling systems, in the trade's words. */
export const DWELLING_SYSTEMS = [
  'none',
  'intermittent-extract',
  'continuous-extract',
  'heat-recovery',
  'positive-input',
  'other',
] as const;

export const terminalSchema = z.strictObject({
  /** The room it serves, when that room is on the survey. */
  roomId: recordId.optional(),
  location: text('Terminal location'),
  direction: choice('Terminal direction', ['extract', 'supply'] as const),
  /** What the system was set to when measured. */
  setting: choice('Setting when measured', ['normal', 'boost', 'other'] as const),
  flow_m3s: measure('Terminal flow', 'm³/s', 0, 2),
  instrumentId: recordId.optional(),
});

export const dwellingSystemSchema = z.strictObject({
  kind: choice('Whole-dwelling system', DWELLING_SYSTEMS),
  /** Mode as found (normal, boost, off, summer bypass…), in the surveyor's words. */
  mode: text('System mode'),
  running: check('System running'),
  terminals: z.array(terminalSchema),
  notes: text('System notes', MAX_NOTE_LENGTH),
});

export const dwellingSchema = z.strictObject({
  bedrooms: measure('Bedrooms', '', 0, 50, { integer: true }).optional(),
  floorArea_m2: measure('Dwelling floor area', 'm²', 5, 5_000).optional(),
  usualOccupants: measure('Usual occupants', '', 0, 100, { integer: true }).optional(),
  system: dwellingSystemSchema.optional(),
});

export const areaSchema = z.strictObject({
  id: recordId,
  /** The area this one sits in, or absent at the top. */
  parentId: recordId.optional(),
  kind: choice('Area kind', AREA_KINDS),
  name: requiredText('Area name'),
  clientRef: text('Client’s reference'),
  dwelling: dwellingSchema.optional(),
  notes: text('Area notes', MAX_NOTE_LENGTH),
});

export type Area = z.infer<typeof areaSchema>;
export type Dwelling = z.infer<typeof dwellingSchema>;
export type DwellingSystem = z.infer<typeof dwellingSystemSchema>;
export type Terminal = z.infer<typeof terminalSchema>;
