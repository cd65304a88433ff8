import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import Ajv2020 from 'ajv/dist/2020.js';
import { jsonSchemaText, JSON_SCHEMA_PATH } from '../support/write-json-schema.ts';
import { demoFile } from '../support/fixtures.ts';

describe('survey file JSON Schema', () => {
  it('is committed and current (run `npm run schema` after changing the model)', () => {
    expect(readFileSync(JSON_SCHEMA_PATH, 'utf8')).toBe(jsonSchemaText());
  });

  it('accepts the demo file and refuses an out-of-range reading (checked by ajv, an independent validator)', () => {
    const ajv = new Ajv2020({ strict: false, validateFormats: false });
    const validate = ajv.compile(JSON.parse(readFileSync(JSON_SCHEMA_PATH, 'utf8')));
    const file = demoFile();
    expect(validate(file), JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
    file.surveys[0]!.rooms[0]!.readings[0]!.co2_ppm = 20_000;
    expect(validate(file)).toBe(false);
  });
});
