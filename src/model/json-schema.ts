/**
 * The survey file's JSON Schema (draft 2020-12), generated from the zod schema so there is one
 * definition. The committed copy (schema/ventwalk-survey.schema.json) is checked against this
 * by a test and rewritten by `npm run schema`. Cross-record rules (unique ids, references) and
 * "at least one value" rules are not expressible in JSON Schema: the app checks them on import.
 */
import { z } from 'zod';
import { surveyFileSchema, FORMAT_NAME } from './survey-file.ts';
import { CURRENT_FORMAT_VERSION } from './migrations.ts';

export function surveyFileJsonSchema(): Record<string, unknown> {
  const generated = z.toJSONSchema(surveyFileSchema, { target: 'draft-2020-12', io: 'input', unrepresentable: 'throw', reused: 'ref' });
  return {
    ...generated,
    $id: `https://ventwalk.invalid/schema/${FORMAT_NAME}-${CURRENT_FORMAT_VERSION}.json`,
    title: `Ventwalk survey file, version ${CURRENT_FORMAT_VERSION}`,
    description:
      'One or more whole ventilation surveys. SI units throughout (m, m², m³/s, ppm, °C, %); times ISO 8601 with offset; logger times in ms since 1970-01-01 UTC. Unique ids and references between records are checked by the app, not by this schema.',
  };
}
