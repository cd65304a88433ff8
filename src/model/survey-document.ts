/**
 * A whole survey as one document: the header, instruments, areas, rooms with their readings,
 * logger series and photos. This is what a survey file carries (survey-file.ts wraps one or
 * more of them) and what the store assembles when a survey is loaded.
 *
 * Besides each record's own rules, the document checks that every reference points at a record
 * of the same survey and that no id is used twice (survey-references.ts).
 */
import { z } from 'zod';
import { surveySchema } from './survey.ts';
import { instrumentSchema } from './instrument.ts';
import { areaSchema } from './area.ts';
import { roomSchema } from './room.ts';
import { readingSchema } from './reading.ts';
import { loggerSeriesSchema } from './logger-series.ts';
import { filePhotoSchema } from './photo.ts';
import { checkReferences } from './survey-references.ts';

/** A room with its readings, as the document nests them. */
export const documentRoomSchema = roomSchema.extend({
  readings: z.array(readingSchema),
});

export const surveyDocumentSchema = z
  .strictObject({
    survey: surveySchema,
    instruments: z.array(instrumentSchema),
    areas: z.array(areaSchema),
    rooms: z.array(documentRoomSchema),
    series: z.array(loggerSeriesSchema),
    photos: z.array(filePhotoSchema),
    /** True when the backup was made without photos: the device keeps the photos it has. */
    photosLeftOut: z.boolean(),
  })
  .superRefine(checkReferences);

export type SurveyDocument = z.infer<typeof surveyDocumentSchema>;
export type DocumentRoom = z.infer<typeof documentRoomSchema>;
