/**
 * The survey header: who, where, why and when, the building as a whole, the day's weather and
 * outdoor readings, the criteria chosen and the issued revisions. One definition (zod); the
 * TypeScript type is inferred from it. Stored values only, SI units (README "Survey file format").
 *
 * The rest of a survey (instruments, areas, rooms, readings, logger series, photos) lives in
 * its own records; survey-document.ts puts them together.
 */
import { z } from 'zod';
import { BUILDING_USE_IDS } from '../core/building-uses.ts';
import {
  MAX_NOTE_LENGTH,
  calendarDate,
  choice,
  co2Ppm,
  dateTime,
  facing,
  measure,
  outdoorTempC,
  recordId,
  relativeHumidity,
  requiredText,
  text,
} from './field-rules.ts';

export { MAX_NAME_LENGTH } from './field-rules.ts';

export const VENTILATION_TYPES = ['natural', 'mechanical', 'hybrid'] as const;
/** Whether the building (or the part surveyed) is new work, refurbished, or existing as found. */
export const BUILDING_STAGES = ['new', 'refurbished', 'existing'] as const;
/** Terrain around the site, as the wind formulas of BS 5925 group it. */
export const TERRAINS = ['open-country', 'country-with-windbreaks', 'urban', 'city-centre'] as const;
export const SHELTER = ['exposed', 'normal', 'sheltered'] as const;
export const WIND_STRENGTHS = ['calm', 'light', 'moderate', 'strong'] as const;
export const UNIT_SYSTEMS = ['si', 'imperial'] as const;

export const surveyorSchema = z.strictObject({
  name: requiredText('Surveyor name'),
  qualifications: text('Qualifications'),
});

/** One visit to site: when it started and, once known, when it ended. */
export const visitSchema = z.strictObject({
  start: dateTime,
  end: dateTime.optional(),
});

/** Measured air permeability of the envelope (a pressure test), m³/s of leakage per m² at 50 Pa. */
export const airPermeabilitySchema = z.strictObject({
  q50_m3sm2: measure('Air permeability', 'm³/s per m² at 50 Pa', 0, 0.03, { aboveMin: true }),
  testedOn: calendarDate.optional(),
  reference: text('Test reference'),
});

/** A threshold of the chosen criteria set replaced for this survey, with the reason. */
export const thresholdOverrideSchema = z.strictObject({
  thresholdId: requiredText('Threshold'),
  value: measure('Threshold value', '', 0, 1_000_000),
  reason: requiredText('Reason for the changed threshold', MAX_NOTE_LENGTH),
});

export const criteriaChoiceSchema = z.strictObject({
  setId: requiredText('Criteria set'),
  version: requiredText('Criteria set version'),
  overrides: z.array(thresholdOverrideSchema),
});

export const weatherSchema = z.strictObject({
  conditions: text('Weather', MAX_NOTE_LENGTH),
  outdoorTemp_C: outdoorTempC.optional(),
  outdoorRh_pct: relativeHumidity.optional(),
  wind: choice('Wind', WIND_STRENGTHS).optional(),
  windFrom: facing.optional(),
  rainInPreviousDays: z.boolean().optional(),
});

/** An outdoor reading, taken upwind at the start and end of the visit (or during it). */
export const outdoorReadingSchema = z
  .strictObject({
    id: recordId,
    time: dateTime,
    moment: choice('Outdoor reading moment', ['start', 'end', 'during'] as const),
    co2_ppm: co2Ppm.optional(),
    temp_C: outdoorTempC.optional(),
    rh_pct: relativeHumidity.optional(),
    instrumentId: recordId.optional(),
    location: text('Where the outdoor reading was taken'),
  })
  .refine((r) => r.co2_ppm !== undefined || r.temp_C !== undefined || r.rh_pct !== undefined, {
    error: 'An outdoor reading needs at least one value (CO₂, temperature or humidity)',
  });

/** A stated weather case the predictions are run for (cold and calm, cold and windy, …). */
export const designWeatherSchema = z.strictObject({
  id: recordId,
  name: requiredText('Weather case name'),
  outdoorTemp_C: outdoorTempC,
  windSpeed_ms: measure('Wind speed', 'm/s', 0, 40),
  windFrom: facing.optional(),
});

/** A revision of the findings that was issued; an issued revision is locked (revision-lock.ts). */
export const issuedRevisionSchema = z.strictObject({
  revision: measure('Revision', '', 1, 999, { integer: true }),
  issuedAt: dateTime,
  issuedBy: text('Issued by'),
  note: text('Revision note', MAX_NOTE_LENGTH),
});

export const surveySchema = z.strictObject({
  id: recordId,
  title: text('Survey title').min(1, { error: 'Survey title is empty: give the survey a name' }),
  site: text('Site'),
  client: text('Client'),
  surveyors: z.array(surveyorSchema),
  purpose: text('Purpose', MAX_NOTE_LENGTH),
  scope: text('Scope', MAX_NOTE_LENGTH),
  visits: z.array(visitSchema),
  buildingUse: choice('Building use', BUILDING_USE_IDS),
  ventilation: choice('Ventilation type', VENTILATION_TYPES).optional(),
  stage: choice('New, refurbished or existing', BUILDING_STAGES).optional(),
  construction: text('Construction', MAX_NOTE_LENGTH),
  builtYear: measure('Year built', '', 1000, 2200, { integer: true }).optional(),
  storeys: measure('Storeys', '', 1, 200, { integer: true }).optional(),
  terrain: choice('Terrain', TERRAINS).optional(),
  shelter: choice('Shelter', SHELTER).optional(),
  airPermeability: airPermeabilitySchema.optional(),
  criteria: criteriaChoiceSchema.optional(),
  units: choice('Units', UNIT_SYSTEMS),
  weather: weatherSchema,
  outdoorReadings: z.array(outdoorReadingSchema),
  designWeather: z.array(designWeatherSchema),
  notes: text('Notes', MAX_NOTE_LENGTH),
  /** The revision being worked on; it is locked once it appears in `issued`. */
  revision: measure('Revision', '', 1, 999, { integer: true }),
  issued: z.array(issuedRevisionSchema),
  createdAt: dateTime,
  updatedAt: dateTime,
  /**
   * The earlier survey of the same building this one started from (repeat-visit.ts), by id.
   * It may no longer be on the device: it is a link for comparison, not a reference checked on import.
   */
  previousSurveyId: recordId.optional(),
});

export type Survey = z.infer<typeof surveySchema>;

/** What the survey list shows: a summary, never the whole survey. */
export type SurveySummary = Pick<Survey, 'id' | 'title' | 'site' | 'buildingUse' | 'updatedAt'>;

/** The fields a person types when starting a survey. */
export const newSurveyInputSchema = surveySchema.pick({ title: true, site: true, buildingUse: true });
export type NewSurveyInput = z.infer<typeof newSurveyInputSchema>;

/** The essentials edited on the survey details screen. */
export const surveyEssentialsSchema = surveySchema.pick({
  title: true,
  site: true,
  client: true,
  buildingUse: true,
  ventilation: true,
  stage: true,
});
export type SurveyEssentials = z.infer<typeof surveyEssentialsSchema>;
