/**
 * The survey file: a versioned JSON document holding one or more whole surveys.
 *
 *     { "format": "ventwalk-survey", "version": 1, "exportedAt": "…", "app": "0.1.0",
 *       "surveys": [ { "survey": {…}, "instruments": […], "areas": […], "rooms": […],
 *                      "series": […], "photos": […], "photosLeftOut": false } ] }
 *
 * `readSurveyFile` checks the text before anything is written: JSON, format name, version
 * (older versions are migrated; newer ones are refused), then every field and reference. It
 * returns the surveys or the problems (field path, value, rule), never a half-read file.
 */
import { z } from 'zod';
import { surveyDocumentSchema } from './survey-document.ts';
import { CURRENT_FORMAT_VERSION, MIGRATIONS, migrateFile, type Migration, type RawFile } from './migrations.ts';
import { validationProblems, type ValidationProblem } from './validation-problem.ts';
import { dateTime, text } from './field-rules.ts';
import { recordIds } from './survey-references.ts';

export const FORMAT_NAME = 'ventwalk-survey';

export const surveyFileSchema = z.strictObject({
  format: z.literal(FORMAT_NAME, { error: `Format must be "${FORMAT_NAME}"` }),
  version: z.literal(CURRENT_FORMAT_VERSION, { error: `Version must be ${CURRENT_FORMAT_VERSION}` }),
  exportedAt: dateTime,
  /** The Ventwalk version that wrote the file. */
  app: text('App version'),
  surveys: z.array(surveyDocumentSchema),
}).superRefine((file, ctx) => {
  // Records of different surveys share the device's stores, so ids must differ across the file.
  const owner = new Map<string, number>();
  file.surveys.forEach((doc, s) => {
    for (const [id, path] of recordIds(doc)) {
      const first = owner.get(id);
      if (first !== undefined && first !== s) {
        ctx.addIssue({ code: 'custom', path: ['surveys', s, ...path], input: id, message: `This id is also used by survey ${first + 1} in this file` });
      }
      owner.set(id, s);
    }
  });
});

export type SurveyFile = z.infer<typeof surveyFileSchema>;

export type ReadResult = { ok: true; file: SurveyFile; fromVersion: number } | { ok: false; problems: ValidationProblem[] };

const whole = (message: string, value?: unknown): ReadResult => ({
  ok: false,
  problems: [{ field: '', message, value }],
});

/** Parse the text of a survey file: JSON, then format and version, then migrations, then every rule. */
export function readSurveyFile(textOrValue: string | unknown, migrations: readonly Migration[] = MIGRATIONS): ReadResult {
  let value: unknown = textOrValue;
  if (typeof textOrValue === 'string') {
    try {
      value = JSON.parse(textOrValue);
    } catch (error) {
      const detail = error instanceof Error ? error.message : String(error);
      return whole(`This is not a complete JSON file (it may be cut short or not a Ventwalk file): ${detail}`);
    }
  }
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    return whole('This file does not hold a Ventwalk survey: it is not a JSON object');
  }
  const raw = value as RawFile;
  if (raw.format !== FORMAT_NAME) {
    return whole(`This is not a Ventwalk survey file: its format is ${JSON.stringify(raw.format) ?? 'missing'}, not "${FORMAT_NAME}"`, raw.format);
  }
  const version = raw.version;
  const current = migrations.length + 1;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return whole('The file’s version is missing or not a whole number', version);
  }
  if (version > current) {
    return whole(
      `This file was made by a newer Ventwalk (file version ${version}; this app reads up to ${current}). Update the app, then import it again.`,
      version,
    );
  }
  const migrated = migrateFile(raw, version, migrations);
  const schema = migrations === MIGRATIONS ? surveyFileSchema : surveyFileSchema.extend({ version: z.literal(current) });
  const parsed = schema.safeParse(migrated);
  if (!parsed.success) return { ok: false, problems: validationProblems(parsed.error, migrated) };
  return { ok: true, file: parsed.data as SurveyFile, fromVersion: version };
}

/** A file holding the given surveys, stamped with the format, version and time of export. */
export function makeSurveyFile(surveys: SurveyFile['surveys'], exportedAt: string, app: string): SurveyFile {
  return { format: FORMAT_NAME, version: CURRENT_FORMAT_VERSION, exportedAt, app, surveys };
}
