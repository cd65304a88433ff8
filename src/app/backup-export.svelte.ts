/**
 * Making a backup: the survey file of all surveys (or of one), with or without photos, prepared
 * first and then shared or downloaded from a tap. A file above `LARGE_BACKUP_BYTES` gets a
 * warning (mail and messaging apps often refuse such files) and the offer of one without photos.
 * Once a file of all surveys is handed over, the time is remembered as the last backup.
 */
import { exportSurveys } from '../store/backup.ts';
import { readMeta, writeMeta } from '../store/meta.ts';
import { connection } from './storage-connection.ts';
import { canShareFile, downloadFile, shareFile } from './deliver-file.ts';

/** Above this a backup is called large: 25 MB (common mail attachment limits are 20-25 MB). */
export const LARGE_BACKUP_BYTES = 25_000_000;

export interface PreparedBackup {
  /** What it holds: every survey, or one survey's id. */
  scope: 'all' | string;
  file: File;
  surveyCount: number;
  withPhotos: boolean;
  large: boolean;
  shareable: boolean;
}

/** File name for a backup: ventwalk-backup-2026-01-14-1730.json (local time). */
export function backupFileName(now: Date, label = 'backup'): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  const stamp = `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}-${pad(now.getHours())}${pad(now.getMinutes())}`;
  return `ventwalk-${label}-${stamp}.json`;
}

class BackupExport {
  prepared = $state<PreparedBackup | null>(null);
  busy = $state(false);
  error = $state<string | null>(null);
  /** ISO time of the last backup handed over; undefined when none yet. */
  lastBackupAt = $state<string | undefined>(undefined);
  lastBackupKnown = $state(false);

  async refreshLastBackup(): Promise<void> {
    try {
      this.lastBackupAt = await readMeta(connection, 'lastBackupAt');
    } finally {
      this.lastBackupKnown = true;
    }
  }

  /** Build the backup file of every survey, or of one survey (by id). */
  async prepare(withPhotos: boolean, scope: 'all' | string = 'all', now = new Date()): Promise<void> {
    this.busy = true;
    this.error = null;
    this.prepared = null;
    try {
      const ids = scope === 'all' ? 'all' : [scope];
      const file = await exportSurveys(connection, ids, { photos: withPhotos }, { exportedAt: now.toISOString(), app: __APP_VERSION__ });
      const name = backupFileName(now, scope === 'all' ? 'backup' : 'survey');
      const blob = new File([JSON.stringify(file)], name, { type: 'application/json' });
      this.prepared = {
        scope,
        file: blob,
        surveyCount: file.surveys.length,
        withPhotos,
        large: blob.size > LARGE_BACKUP_BYTES,
        shareable: canShareFile(blob),
      };
    } catch (error) {
      this.error = error instanceof Error ? error.message : String(error);
    } finally {
      this.busy = false;
    }
  }

  /** Share the prepared file (call straight from the tap). */
  async share(): Promise<void> {
    const prepared = this.prepared;
    if (!prepared) return;
    try {
      if (await shareFile(prepared.file)) await this.handedOver(prepared);
    } catch (error) {
      this.error = `Could not share the backup: ${error instanceof Error ? error.message : String(error)}. Try the download instead.`;
    }
  }

  async download(): Promise<void> {
    const prepared = this.prepared;
    if (!prepared) return;
    downloadFile(prepared.file);
    await this.handedOver(prepared);
  }

  /** A file of every survey handed over counts as the last backup (a one-survey file does not). */
  private async handedOver(prepared: PreparedBackup, now = new Date()): Promise<void> {
    if (prepared.scope !== 'all') return;
    const stamp = now.toISOString();
    this.lastBackupAt = stamp;
    await writeMeta(connection, 'lastBackupAt', stamp).catch((error: unknown) => {
      this.error = `The backup was made, but its date could not be remembered: ${error instanceof Error ? error.message : String(error)}`;
    });
  }
}

export const backupExport = new BackupExport();
