/**
 * A room as stored: its name and the client's room number, use, size, exposed walls, who uses it
 * and when, its openings, appliances, defects, interview answers and notes, and the tests that
 * group its readings. The readings themselves are stored one record each (a reading saved on
 * site rewrites one small record); the survey document nests them under their room.
 */
import { z } from 'zod';
import { ROOM_USE_IDS } from '../core/room-uses.ts';
import { MAX_NOTE_LENGTH, choice, dateTime, recordId, requiredText, text } from './field-rules.ts';
import { geometrySchema } from './room-geometry.ts';
import { exposedWallSchema } from './exposed-wall.ts';
import { occupantGroupSchema, scheduleSchema } from './occupancy.ts';
import { openingSchema } from './opening.ts';
import { applianceSchema } from './appliance.ts';
import { defectSchema } from './defect.ts';
import { roomTestSchema } from './reading.ts';

/** One answer of the structured interview (heating habits, why vents are shut, class sizes…). */
export const interviewAnswerSchema = z.strictObject({
  topic: requiredText('Interview topic'),
  answer: text('Interview answer', MAX_NOTE_LENGTH),
});

export const roomSchema = z.strictObject({
  id: recordId,
  /** The area (flat, floor, block) it is in, or absent when the survey has no areas. */
  areaId: recordId.optional(),
  name: requiredText('Room name'),
  clientRef: text('Client’s room number'),
  use: choice('Room use', ROOM_USE_IDS),
  geometry: geometrySchema,
  exposedWalls: z.array(exposedWallSchema),
  occupants: z.array(occupantGroupSchema),
  schedule: scheduleSchema,
  openings: z.array(openingSchema),
  appliances: z.array(applianceSchema),
  defects: z.array(defectSchema),
  interview: z.array(interviewAnswerSchema),
  tests: z.array(roomTestSchema),
  notes: text('Room notes', MAX_NOTE_LENGTH),
  updatedAt: dateTime,
  /** The same room in the survey this one started from (`survey.previousSurveyId`), by id. */
  previousRoomId: recordId.optional(),
});

export type Room = z.infer<typeof roomSchema>;
