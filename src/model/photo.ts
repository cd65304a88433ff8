/**
 * A photo's description: which room and defect it shows, its caption, when it was taken and its
 * size in pixels. On the device the JPEG bytes are stored beside it; in a survey file they are
 * carried as base64 text (or left out, when the backup was made without photos).
 */
import { z } from 'zod';
import { MAX_NOTE_LENGTH, dateTime, measure, recordId, text } from './field-rules.ts';

/** Largest photo accepted in a file, in bytes of JPEG (stored photos are about 200-500 kB). */
export const MAX_PHOTO_BYTES = 15_000_000;

export const photoSchema = z.strictObject({
  id: recordId,
  roomId: recordId.optional(),
  defectId: recordId.optional(),
  caption: text('Caption', MAX_NOTE_LENGTH),
  takenAt: dateTime,
  width_px: measure('Photo width', 'px', 1, 10_000, { integer: true }),
  height_px: measure('Photo height', 'px', 1, 10_000, { integer: true }),
});

export type Photo = z.infer<typeof photoSchema>;

/** A photo in a survey file: its description and its JPEG bytes as base64. */
export const filePhotoSchema = photoSchema.extend({
  jpegBase64: z
    .string({ error: 'Photo data must be text (base64)' })
    .max(Math.ceil(MAX_PHOTO_BYTES / 3) * 4, { error: 'Photo is larger than 15 MB' })
    .regex(/^[A-Za-z0-9+/]*={0,2}$/, { error: 'Photo data is not base64 text' }),
});

export type FilePhoto = z.infer<typeof filePhotoSchema>;
