/**
 * A defect seen in a room: mould (where, how much in m², what pattern), condensation, a leak, a
 * dead fan, or a vent shut or blocked (naming the opening when it is on the survey).
 */
import { z } from 'zod';
import { MAX_NOTE_LENGTH, choice, measure, recordId, text } from './field-rules.ts';

export const DEFECT_KINDS = ['mould', 'condensation', 'leak', 'fan-dead', 'vent-shut', 'vent-blocked', 'other'] as const;

/** How mould is spread, which hints at its cause (cold bridge, air stagnation, leak). */
export const MOULD_PATTERNS = [
  'spots',
  'patches',
  'external-corners',
  'behind-furniture',
  'ceiling-edge',
  'around-window',
  'widespread',
] as const;

export const defectSchema = z.strictObject({
  id: recordId,
  kind: choice('Defect', DEFECT_KINDS),
  location: text('Where'),
  extent_m2: measure('Extent', 'm²', 0, 1_000).optional(),
  pattern: choice('Pattern', MOULD_PATTERNS).optional(),
  /** The fan or vent concerned. */
  openingId: recordId.optional(),
  notes: text('Defect notes', MAX_NOTE_LENGTH),
});

export type Defect = z.infer<typeof defectSchema>;
