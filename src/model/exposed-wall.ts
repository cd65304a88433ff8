/**
 * An exposed wall of a room: which way it faces, what it is built of, and, when measured, its
 * surface temperature factor f = (θ_surface − θ_out) / (θ_in − θ_out) with the three
 * temperatures it came from (°C). A wall needs its construction or a measurement, because a
 * default factor for new junctions is wrong for old fabric.
 */
import { z } from 'zod';
import { choice, dateTime, facing, indoorTempC, measure, outdoorTempC, recordId, surfaceTempC, text } from './field-rules.ts';

export const WALL_CONSTRUCTIONS = [
  'solid-masonry',
  'cavity-unfilled',
  'cavity-filled',
  'timber-frame',
  'insulated-solid',
  'curtain-wall',
  'other',
] as const;

export const measuredFactorSchema = z.strictObject({
  time: dateTime,
  insideAir_C: indoorTempC,
  outsideAir_C: outdoorTempC,
  surface_C: surfaceTempC,
  /** The factor worked out from the three temperatures, 0-1. */
  factor: measure('Surface temperature factor', '', 0, 1),
  location: text('Where on the wall'),
});

export const exposedWallSchema = z
  .strictObject({
    id: recordId,
    facing: facing.optional(),
    construction: choice('Wall construction', WALL_CONSTRUCTIONS).optional(),
    length_m: measure('Wall length', 'm', 0.1, 200).optional(),
    measured: measuredFactorSchema.optional(),
  })
  .refine((w) => w.construction !== undefined || w.measured !== undefined, {
    error: 'An exposed wall needs its construction or a measured surface temperature factor',
  });

export type ExposedWall = z.infer<typeof exposedWallSchema>;
