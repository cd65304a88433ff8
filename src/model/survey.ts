/**
 * The survey record: the one definition of a stored survey's header fields (zod), with its
 * TypeScript type inferred from it. Stored values only — typed text is parsed by the form
 * layer before it gets here, so this schema never turns "" into 0.
 *
 * Later issues extend the record (areas, rooms, readings, instruments); this is its first form.
 */
import { z } from 'zod';
import { BUILDING_USE_IDS } from '../core/building-uses.ts';

/** Longest title or site name accepted, in characters. */
export const MAX_NAME_LENGTH = 200;

const isoDateTime = z.iso.datetime({ offset: true, message: 'must be a date and time (ISO 8601)' });

export const surveySchema = z.object({
  id: z.uuid({ message: 'must be a survey id (UUID)' }),
  title: z
    .string()
    .trim()
    .min(1, { message: 'Survey title is empty: give the survey a name' })
    .max(MAX_NAME_LENGTH, { message: `Survey title is longer than ${MAX_NAME_LENGTH} characters` }),
  site: z
    .string()
    .trim()
    .max(MAX_NAME_LENGTH, { message: `Site is longer than ${MAX_NAME_LENGTH} characters` }),
  buildingUse: z.enum(BUILDING_USE_IDS, { message: 'Building use is not one of the listed uses' }),
  createdAt: isoDateTime,
  updatedAt: isoDateTime,
});

export type Survey = z.infer<typeof surveySchema>;

/** What the survey list shows: a summary, never the whole survey. */
export type SurveySummary = Pick<Survey, 'id' | 'title' | 'site' | 'buildingUse' | 'updatedAt'>;

/** The fields a person types when starting a survey. */
export const newSurveyInputSchema = surveySchema.pick({ title: true, site: true, buildingUse: true });
export type NewSurveyInput = z.infer<typeof newSurveyInputSchema>;
