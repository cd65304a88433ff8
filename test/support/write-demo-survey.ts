/** `npm run demo`: rewrite test/fixtures/demo-survey.json from the demo builder. */
import { writeFileSync } from 'node:fs';
import { buildDemoSurveyFile } from './demo-survey-builder.ts';
import { readSurveyFile } from '../../src/model/survey-file.ts';

const file = buildDemoSurveyFile();
const check = readSurveyFile(file);
if (!check.ok) {
  console.error(check.problems.slice(0, 20));
  process.exit(1);
}
const target = new URL('../fixtures/demo-survey.json', import.meta.url);
writeFileSync(target, `${JSON.stringify(file, null, 1)}\n`);
console.log(`wrote ${target.pathname}`);
