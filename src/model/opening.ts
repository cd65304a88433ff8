/**
 * An opening of a room: a window, a vent rated by area, a fan or a door undercut. Sizes in m,
 * areas in m², flows in m³/s, angles in degrees, run-on in s. `count` identical openings share
 * one record. Whether a vent's label gives its free or its equivalent area is recorded, because
 * old trickle vents are often marked with free area, which overstates the equivalent area.
 */
import { z } from 'zod';
import {
  FAN_DIRECTIONS,
  OPERABILITY,
  VENT_KINDS,
  VENT_PURPOSES,
  WINDOW_HINGES,
  WINDOW_STYLES,
} from '../core/opening-kinds.ts';
import { MAX_NOTE_LENGTH, check, choice, facing, measure, recordId, text } from './field-rules.ts';

const common = {
  id: recordId,
  count: measure('Number of these openings', '', 1, 200, { integer: true }),
  facing: facing.optional(),
  condition: text('Condition', MAX_NOTE_LENGTH),
};

const operability = choice('Whether it opens', OPERABILITY);

export const windowSchema = z.strictObject({
  type: z.literal('window'),
  ...common,
  style: choice('Window style', WINDOW_STYLES),
  hinge: choice('Hinge', WINDOW_HINGES).optional(),
  sashWidth_m: measure('Sash width', 'm', 0.05, 10).optional(),
  sashHeight_m: measure('Sash height', 'm', 0.05, 10).optional(),
  sillHeight_m: measure('Sill height', 'm', 0, 50).optional(),
  headHeight_m: measure('Head height', 'm', 0, 50).optional(),
  /** How far a hinged sash opens, degrees. */
  openingAngle_deg: measure('Opening angle', '°', 0, 180).optional(),
  /** How far a sliding or sash window opens, m. */
  openingStroke_m: measure('Opening stroke', 'm', 0, 5).optional(),
  restrictor: check('Restrictor fitted'),
  operability,
});

export const ventSchema = z.strictObject({
  type: z.literal('vent'),
  ...common,
  kind: choice('Vent kind', VENT_KINDS),
  purpose: choice('Vent purpose', VENT_PURPOSES),
  /** The area printed on the vent or its data sheet, m². */
  labelArea_m2: measure('Vent area on the label', 'm²', 0, 1, { aboveMin: true }).optional(),
  labelAreaIs: choice('What the label area is', ['free', 'equivalent', 'unknown'] as const),
  operability,
});

export const fanSchema = z.strictObject({
  type: z.literal('fan'),
  ...common,
  direction: choice('Fan direction', FAN_DIRECTIONS),
  ratedFlow_m3s: measure('Rated fan flow', 'm³/s', 0, 5, { aboveMin: true }).optional(),
  measuredFlow_m3s: measure('Measured fan flow', 'm³/s', 0, 5).optional(),
  /** The instrument the flow was measured with. */
  measuredWith: recordId.optional(),
  runOn_s: measure('Run-on time', 's', 0, 7_200).optional(),
  humidistat: check('Humidistat fitted'),
  isolator: choice('Isolator', ['on', 'off', 'none', 'not-found'] as const),
  ducting: choice('Ducting', ['ducted', 'recirculating', 'through-wall'] as const),
});

export const undercutSchema = z.strictObject({
  type: z.literal('undercut'),
  ...common,
  gap_m: measure('Undercut gap', 'm', 0, 0.2),
  doorWidth_m: measure('Door width', 'm', 0.3, 5),
});

export const openingSchema = z.discriminatedUnion('type', [windowSchema, ventSchema, fanSchema, undercutSchema], {
  error: 'Opening type is not one of: window, vent, fan, undercut',
});

export type Opening = z.infer<typeof openingSchema>;
