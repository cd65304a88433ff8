/**
 * Whether to remind the surveyor to make a backup: never backed up while surveys are stored, or
 * the last backup is older than a week (a phone must not hold the only copy for long: browsers
 * may clear a site's data, and iOS clears a Safari tab's data after 7 days without a visit).
 *
 * Example: backupReminder('2026-01-01T10:00:00Z', 3, new Date('2026-01-14T10:00:00Z'))
 * → 'Last backup 13 days ago: make one now.'
 */
export const REMIND_AFTER_DAYS = 7;
const DAY_MS = 86_400_000;

/** Whole days between a backup and now (0 on the same day). */
export function daysSince(iso: string, now: Date): number {
  return Math.max(0, Math.floor((now.getTime() - Date.parse(iso)) / DAY_MS));
}

/** The reminder to show, or undefined when none is due. */
export function backupReminder(lastBackupAt: string | undefined, surveyCount: number, now: Date): string | undefined {
  if (surveyCount === 0) return undefined;
  if (lastBackupAt === undefined) return 'No backup made yet: the surveys on this phone exist nowhere else. Make one now.';
  const days = daysSince(lastBackupAt, now);
  return days >= REMIND_AFTER_DAYS ? `Last backup ${days} days ago: make one now.` : undefined;
}
