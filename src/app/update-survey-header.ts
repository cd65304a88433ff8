/**
 * Use case: change some fields of a survey's header. Several screens edit the header (details,
 * settings, start of visit); each sends only its own fields, applied to the header as last
 * known on this page, so none overwrites another's with a stale copy. The write starts at once
 * (no read first), so a save begun as the page is hidden still lands. Rooms and readings saved
 * meanwhile only move the header's last-change time (this save moves it later still) and, for an
 * issued revision, its revision number (moved on the same way here). Saves of one survey's header
 * run one after another (two forms on one screen saving at once would otherwise both start from
 * the same header, and the later write would drop the earlier one's fields).
 */
import type { Survey } from '../model/survey.ts';
import { editableRevision } from '../model/revision-lock.ts';
import { getSurvey, saveSurvey } from '../store/surveys.ts';
import { StorageError } from '../store/connection.ts';
import { connection } from './storage-connection.ts';

export type SurveyPatch = Partial<Omit<Survey, 'id' | 'createdAt' | 'updatedAt' | 'revision' | 'issued'>>;

const known = new Map<string, Survey>();
/** The last save of each survey's header, so the next starts from what it wrote. */
const inFlight = new Map<string, Promise<unknown>>();

/** The header as just read from storage (call when a screen opens a survey). */
export function knowHeader(survey: Survey): void {
  known.set(survey.id, structuredClone(survey));
}

export function updateSurveyHeader(surveyId: string, patch: SurveyPatch, now: Date = new Date()): Promise<Survey> {
  const save = () => writeHeader(surveyId, patch, now);
  const previous = inFlight.get(surveyId);
  const run = previous ? previous.then(save, save) : save();
  inFlight.set(surveyId, run);
  void run.finally(() => {
    if (inFlight.get(surveyId) === run) inFlight.delete(surveyId);
  }).catch(() => undefined);
  return run;
}

async function writeHeader(surveyId: string, patch: SurveyPatch, now: Date): Promise<Survey> {
  const base = known.get(surveyId) ?? (await getSurvey(connection, surveyId));
  if (!base) throw new StorageError('This survey is no longer on the device', 'failed');
  const changed = now.toISOString();
  const updatedAt = Date.parse(changed) > Date.parse(base.updatedAt) ? changed : base.updatedAt;
  const saved = await saveSurvey(connection, { ...editableRevision(base), ...patch, updatedAt });
  known.set(surveyId, saved);
  return saved;
}
