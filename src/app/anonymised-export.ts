/**
 * Use case: a survey file to share with a third party — no names, addresses, free-text notes,
 * interview answers or photos (model/anonymise.ts), every measurement kept. Built from the
 * stored surveys without their photos; the screen then shares or downloads the File from a tap
 * (deliver-file.ts), like a backup. It is not a backup: restoring it gives back generic labels.
 *
 * Example: await anonymisedFile(surveyId) → File "ventwalk-shared-2026-02-01-1200.json".
 */
import { anonymiseSurvey } from '../model/anonymise.ts';
import { makeSurveyFile } from '../model/survey-file.ts';
import { exportSurveys } from '../store/backup.ts';
import { connection } from './storage-connection.ts';
import { backupFileName } from './backup-export.svelte.ts';

/** The anonymised file of one survey (by id) or of every survey on the device. */
export async function anonymisedFile(scope: 'all' | string, now: Date = new Date()): Promise<File> {
  const exportedAt = now.toISOString();
  const stamp = { exportedAt, app: __APP_VERSION__ };
  const file = await exportSurveys(connection, scope === 'all' ? 'all' : [scope], { photos: false }, stamp);
  const shared = makeSurveyFile(
    file.surveys.map((doc, i) => anonymiseSurvey(doc, i + 1)),
    exportedAt,
    stamp.app,
  );
  return new File([JSON.stringify(shared)], backupFileName(now, 'shared'), { type: 'application/json' });
}
