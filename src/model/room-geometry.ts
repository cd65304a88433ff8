/**
 * A room's size: length × width × height, floor area × height, or several such parts (an
 * L-shaped room, a bay, a raised ceiling over half the room). Metres and m². `roomVolume` and
 * `roomFloorArea` add up the parts.
 *
 * Example: roomVolume({ kind: 'box', length_m: 7.2, width_m: 7, height_m: 3 }) = 151.2 m³.
 */
import { z } from 'zod';
import { measure } from './field-rules.ts';

const height_m = measure('Room height', 'm', 1.5, 30);

export const boxPartSchema = z.strictObject({
  kind: z.literal('box'),
  length_m: measure('Room length', 'm', 0.3, 200),
  width_m: measure('Room width', 'm', 0.3, 200),
  height_m,
});

export const areaPartSchema = z.strictObject({
  kind: z.literal('area'),
  floorArea_m2: measure('Floor area', 'm²', 0.1, 10_000),
  height_m,
});

const part = z.discriminatedUnion('kind', [boxPartSchema, areaPartSchema], {
  error: 'Room size is not one of: box (length × width × height), area (floor area × height), parts',
});

export const partsSchema = z.strictObject({
  kind: z.literal('parts'),
  parts: z.array(part).min(1, { error: 'A room made of parts needs at least one part' }),
});

export const geometrySchema = z.discriminatedUnion('kind', [boxPartSchema, areaPartSchema, partsSchema], {
  error: 'Room size is not one of: box (length × width × height), area (floor area × height), parts',
});

export type Geometry = z.infer<typeof geometrySchema>;
type Part = z.infer<typeof part>;

function partsOf(geometry: Geometry): Part[] {
  return geometry.kind === 'parts' ? geometry.parts : [geometry];
}

function partArea(p: Part): number {
  return p.kind === 'box' ? p.length_m * p.width_m : p.floorArea_m2;
}

/** Floor area, m². Example: a 7.2 m × 7 m room → 50.4 m². */
export function roomFloorArea(geometry: Geometry): number {
  return partsOf(geometry).reduce((sum, p) => sum + partArea(p), 0);
}

/** Volume, m³. Example: a 7.2 m × 7 m × 3 m room → 151.2 m³. */
export function roomVolume(geometry: Geometry): number {
  return partsOf(geometry).reduce((sum, p) => sum + partArea(p) * p.height_m, 0);
}
