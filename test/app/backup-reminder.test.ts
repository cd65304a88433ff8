import { describe, it, expect } from 'vitest';
import { backupReminder, daysSince } from '../../src/app/backup-reminder.ts';

const now = new Date('2026-01-14T10:00:00Z');

describe('backup reminder', () => {
  it('says nothing while there is nothing to lose', () => {
    expect(backupReminder(undefined, 0, now)).toBeUndefined();
  });

  it('asks for a first backup as soon as a survey exists', () => {
    expect(backupReminder(undefined, 1, now)).toMatch(/No backup made yet/);
  });

  it('reminds after 7 days (iOS clears a Safari tab’s data after 7 days without a visit: WebKit storage policy)', () => {
    expect(backupReminder('2026-01-08T10:00:01Z', 3, now)).toBeUndefined();
    expect(backupReminder('2026-01-07T10:00:00Z', 3, now)).toBe('Last backup 7 days ago: make one now.');
  });

  it('counts whole days', () => {
    expect(daysSince('2026-01-14T09:00:00Z', now)).toBe(0);
    expect(daysSince('2026-01-01T10:00:00Z', now)).toBe(13);
  });
});
