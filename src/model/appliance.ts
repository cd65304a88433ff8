/**
 * A combustion appliance in a room, with the checks that matter for safety: flue type,
 * combustion-air vent present and clear, CO alarm present and tested, gas safety record seen.
 */
import { z } from 'zod';
import { MAX_NOTE_LENGTH, check, choice, recordId, text } from './field-rules.ts';

export const APPLIANCE_KINDS = [
  'gas-boiler',
  'gas-water-heater',
  'gas-fire',
  'gas-cooker',
  'oil-boiler',
  'solid-fuel-stove',
  'open-fire',
  'unflued-heater',
  'other',
] as const;

export const FLUE_TYPES = ['room-sealed', 'open-flued', 'flueless', 'not-known'] as const;

export const applianceSchema = z.strictObject({
  id: recordId,
  kind: choice('Appliance', APPLIANCE_KINDS),
  flue: choice('Flue type', FLUE_TYPES),
  combustionAirVentPresent: check('Combustion-air vent present'),
  combustionAirVentClear: check('Combustion-air vent clear'),
  coAlarmPresent: check('CO alarm present'),
  coAlarmTested: check('CO alarm tested'),
  gasSafetyRecordSeen: choice('Gas safety record seen', ['yes', 'no', 'not-checked', 'not-applicable'] as const),
  notes: text('Appliance notes', MAX_NOTE_LENGTH),
});

export type Appliance = z.infer<typeof applianceSchema>;
