/**
 * The app's copy of the demo file (static/demo-survey.json, served and precached with the app)
 * is the committed demo fixture, byte for byte: `cp test/fixtures/demo-survey.json static/`
 * after `npm run demo`.
 */
import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';

describe('demo survey served by the app', () => {
  it('is identical to test/fixtures/demo-survey.json', () => {
    const app = readFileSync(new URL('../../static/demo-survey.json', import.meta.url), 'utf8');
    const fixture = readFileSync(new URL('../fixtures/demo-survey.json', import.meta.url), 'utf8');
    expect(app === fixture, 'static/demo-survey.json differs from the fixture: copy it again').toBe(true);
  });
});
