/**
 * No pupil or tenant names anywhere in the survey file: the only text fields that may hold a
 * person's name are the surveyor's own name and who issued a revision. Occupant groups carry a
 * count and a group label ("Year 5 class", "adults"), never names. The test walks the file's
 * JSON Schema and fails on any other text field whose name sounds like it holds a person.
 */
import { describe, it, expect } from 'vitest';
import { schemaFields } from '../support/schema-text-fields.ts';

/** Words in a field name that suggest a person's name or contact details. */
const PERSON_LIKE = /name|person|people|pupil|student|child|tenant|resident|occupant|teacher|owner|contact|phone|email|surname|forename|birth|signature|issuedby/i;

/** Text fields allowed to match: people who made the survey, and names of places and things. */
const ALLOWED = new Set([
  'surveys[].survey.surveyors[].name', // the surveyor, who signs the report
  'surveys[].survey.issued[].issuedBy', // the surveyor who issued a revision
  'surveys[].survey.designWeather[].name', // a weather case ("Cold and calm")
  'surveys[].areas[].name', // a block, floor or flat
  'surveys[].rooms[].name', // a room
  'surveys[].rooms[].occupants[].label', // a group's label ("Year 5 class"), never a list of names
]);

describe('no names of occupants in the model', () => {
  it('holds person-like text only in the surveyor fields and the names of places and things', () => {
    const offending = schemaFields()
      .filter((f) => f.freeText && PERSON_LIKE.test(f.path.split('.').slice(-2).join('.')) && !ALLOWED.has(f.path))
      .map((f) => f.path);
    expect(offending).toEqual([]);
  });

  it('describes occupant groups by count, age band, sex, activity and a label only', () => {
    const group = schemaFields()
      .filter((f) => f.path.startsWith('surveys[].rooms[].occupants[].'))
      .map((f) => f.key)
      .sort();
    expect(group).toEqual(['activity_met', 'ageBand', 'count', 'id', 'label', 'sex']);
  });

  it('would catch a field named for a pupil', () => {
    const schema = { type: 'object', properties: { rooms: { type: 'array', items: { type: 'object', properties: { pupilName: { type: 'string' } } } } } };
    const found = schemaFields(schema).filter((f) => f.freeText && PERSON_LIKE.test(f.path));
    expect(found.map((f) => f.path)).toEqual(['rooms[].pupilName']);
  });
});
