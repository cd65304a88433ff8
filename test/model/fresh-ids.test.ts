import { describe, it, expect } from 'vitest';
import { withFreshIds } from '../../src/model/fresh-ids.ts';
import { surveyDocumentSchema } from '../../src/model/survey-document.ts';
import { recordIds } from '../../src/model/survey-references.ts';
import { demoFile } from '../support/fixtures.ts';

describe('fresh ids for keeping both copies', () => {
  it('shares no id with the original and keeps every reference whole', () => {
    const original = demoFile().surveys[0]!;
    let n = 0;
    const copy = withFreshIds(original, () => `0c0c0000-0000-4000-8000-${(++n).toString(16).padStart(12, '0')}`);
    const before = new Set(recordIds(original).map(([id]) => id));
    expect(recordIds(copy).filter(([id]) => before.has(id))).toEqual([]);
    expect(surveyDocumentSchema.safeParse(copy).success).toBe(true);
    const room = copy.rooms[0]!;
    expect(room.tests[0]!.readingIds.every((id) => room.readings.some((r) => r.id === id))).toBe(true);
    expect(copy.rooms[0]!.name).toBe(original.rooms[0]!.name);
  });
});
