/** `npm run schema`: rewrite schema/ventwalk-survey.schema.json from the zod schema. */
import { mkdirSync, writeFileSync } from 'node:fs';
import { surveyFileJsonSchema } from '../../src/model/json-schema.ts';

export const JSON_SCHEMA_PATH = new URL('../../schema/ventwalk-survey.schema.json', import.meta.url);

/** The committed text of the schema: two-space JSON with a final newline. */
export function jsonSchemaText(): string {
  return `${JSON.stringify(surveyFileJsonSchema(), null, 2)}\n`;
}

if (process.argv[1] && import.meta.url.endsWith(process.argv[1].split('/').pop()!)) {
  mkdirSync(new URL('.', JSON_SCHEMA_PATH), { recursive: true });
  writeFileSync(JSON_SCHEMA_PATH, jsonSchemaText());
  console.log(`wrote ${JSON_SCHEMA_PATH.pathname}`);
}
