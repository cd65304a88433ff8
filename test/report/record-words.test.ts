/**
 * The room's records in the report's words (src/report/record-words.ts): no raw codes
 * ("not-checked", "not-found") reach the page, a door gap is given in millimetres as it is
 * measured, and a room without its own periods says which day the findings used.
 */
import { describe, it, expect } from 'vitest';
import { checkWords, openingWords, scheduleWords } from '../../src/report/record-words.ts';
import type { Opening } from '../../src/model/opening.ts';

describe('records in words', () => {
  it('gives a door undercut’s gap in millimetres and a fan’s isolator and ducting in words', () => {
    const undercut = { type: 'undercut', id: 'u', count: 1, gap_m: 0.008, doorWidth_m: 0.76, condition: '' } as unknown as Opening;
    expect(openingWords(undercut)).toBe('1 × door undercut: 8 mm gap under a 0.76 m door');
    const fan = { type: 'fan', id: 'f', count: 1, direction: 'extract', ducting: 'through-wall', isolator: 'not-found', measuredFlow_m3s: 0.0125, condition: '' } as unknown as Opening;
    expect(openingWords(fan)).toMatch(/^1 × extract fan \(through the wall\): rating not known, measured 12\.5 L\/s; isolator not found$/);
  });

  it('words a check answer and the day the findings used', () => {
    expect(checkWords('not-checked')).toBe('not checked');
    expect(checkWords('yes')).toBe('yes');
    expect(scheduleWords({ template: '', periods: [] }, 'the bedroom template (invented timetable)')).toBe('None recorded for the room: the findings use the bedroom template (invented timetable)');
    expect(scheduleWords({ template: '', periods: [] })).toBe('No schedule recorded');
  });
});
