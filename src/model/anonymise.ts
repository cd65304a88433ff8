/**
 * A copy of a survey fit to share with a third party (a consultant, a researcher, a manufacturer):
 * every measurement, size, opening, time and reading kept, and nothing that names or describes
 * people or places in the surveyor's own words.
 *
 * - Replaced by generic labels: the survey's title ("Survey 1"), surveyors ("Surveyor 1", no
 *   qualifications), areas ("Flat 1", "Floor 2" by their kind), rooms ("Room 3"), occupant
 *   groups ("Group 1") and logger file names ("logger-1.csv").
 * - Emptied: site (the address), client, area and room numbers, purpose, scope, construction,
 *   weather description, where outdoor readings were taken, test references, who issued each
 *   revision, and every free-text note (survey, revision, instrument, area, system, room,
 *   opening condition, appliance, defect, test, reading, logger period). The reason given for a
 *   changed threshold is replaced by a fixed sentence.
 * - Left out: interview answers (with their topics) and every photo (`photosLeftOut` is then true), so
 *   no picture and no picture metadata leaves the device this way.
 * - Kept because they are the trade's labels, not prose about people: weather case names,
 *   schedule templates and period labels, instrument model and serial, criteria ids, where on a
 *   wall or in a room a defect, terminal or surface reading is, logger column names, time zone.
 *
 * Record ids are kept (random UUIDs, naming nobody). The result is a valid survey document.
 *
 * Example: anonymiseSurvey(flat3Survey, 1).survey.site = '' and .rooms[0].name = 'Room 1'.
 */
import type { SurveyDocument } from './survey-document.ts';

/** Area kinds as a label starts: "Flat 2", "Floor 1". */
const AREA_LABELS: Readonly<Record<string, string>> = {
  block: 'Block',
  floor: 'Floor',
  flat: 'Flat',
  house: 'House',
  wing: 'Wing',
  other: 'Area',
};

/** The sentence that stands in for a threshold override's reason. */
export const WITHHELD_REASON = 'Reason left out of this shared copy';

/** `number` names the survey in the shared file ("Survey 1", "Survey 2", …). */
export function anonymiseSurvey(doc: SurveyDocument, number: number): SurveyDocument {
  const { survey } = doc;
  const counters = new Map<string, number>();
  const nextOf = (kind: string) => {
    const n = (counters.get(kind) ?? 0) + 1;
    counters.set(kind, n);
    return n;
  };
  return {
    survey: {
      ...survey,
      title: `Survey ${number}`,
      site: '',
      client: '',
      surveyors: survey.surveyors.map((_, i) => ({ name: `Surveyor ${i + 1}`, qualifications: '' })),
      purpose: '',
      scope: '',
      construction: '',
      ...(survey.airPermeability ? { airPermeability: { ...survey.airPermeability, reference: '' } } : {}),
      ...(survey.criteria
        ? { criteria: { ...survey.criteria, overrides: survey.criteria.overrides.map((o) => ({ ...o, reason: WITHHELD_REASON })) } }
        : {}),
      weather: { ...survey.weather, conditions: '' },
      outdoorReadings: survey.outdoorReadings.map((r) => ({ ...r, location: '' })),
      notes: '',
      issued: survey.issued.map((r) => ({ ...r, issuedBy: '', note: '' })),
    },
    instruments: doc.instruments.map((x) => ({ ...x, notes: '' })),
    areas: doc.areas.map((area) => {
      const label = AREA_LABELS[area.kind] ?? 'Area';
      const system = area.dwelling?.system;
      return {
        ...area,
        name: `${label} ${nextOf(label)}`,
        clientRef: '',
        notes: '',
        ...(area.dwelling ? { dwelling: { ...area.dwelling, ...(system ? { system: { ...system, notes: '' } } : {}) } } : {}),
      };
    }),
    rooms: doc.rooms.map((room, r) => ({
      ...room,
      name: `Room ${r + 1}`,
      clientRef: '',
      occupants: room.occupants.map((g, i) => ({ ...g, label: `Group ${i + 1}` })),
      openings: room.openings.map((o) => ({ ...o, condition: '' })),
      appliances: room.appliances.map((a) => ({ ...a, notes: '' })),
      defects: room.defects.map((d) => ({ ...d, notes: '' })),
      interview: [],
      tests: room.tests.map((t) => ({ ...t, note: '' })),
      notes: '',
      readings: room.readings.map((reading) => ({ ...reading, note: '' })),
    })),
    series: doc.series.map((s, i) => ({
      ...s,
      sourceFile: `logger-${i + 1}.csv`,
      periods: s.periods.map((p) => ({ ...p, note: '' })),
    })),
    photos: [],
    photosLeftOut: doc.photosLeftOut || doc.photos.length > 0,
  };
}
