/**
 * The retention period as screens see it: the months chosen, the surveys kept longer, and
 * deleting a survey's photos — shared by Settings (choose, delete) and the survey list (reminder).
 */
import { chooseRetentionMonths, deletePhotosOf, readRetentionMonths, retentionReminder } from './survey-retention.ts';
import type { PastRetention } from './retention-reminder.ts';
import { surveyList } from './survey-list.svelte.ts';

export type { PastRetention };

class Retention {
  /** undefined: no period chosen (no reminder). */
  months = $state<number | undefined>(undefined);
  known = $state(false);
  past = $state<PastRetention[]>([]);
  error = $state<string | null>(null);
  /** What was last done, in words (photos deleted). */
  done = $state<string | null>(null);

  async refresh(now: Date = new Date()): Promise<void> {
    try {
      const [months, past] = await Promise.all([readRetentionMonths(), retentionReminder(now)]);
      Object.assign(this, { months, past, known: true, error: null });
    } catch (error) {
      this.error = `Could not read the keeping period: ${error instanceof Error ? error.message : String(error)}`;
    }
  }

  async choose(months: number | undefined): Promise<void> {
    try {
      this.done = null;
      await chooseRetentionMonths(months);
      await this.refresh();
    } catch (error) {
      this.error = `Not saved: ${error instanceof Error ? error.message : String(error)}`;
    }
  }

  async deletePhotos(surveyId: string, title: string): Promise<void> {
    try {
      const n = await deletePhotosOf(surveyId);
      this.done = `Deleted ${n} ${n === 1 ? 'photo' : 'photos'} of “${title}”; its measurements are kept.`;
      await Promise.all([this.refresh(), surveyList.refresh()]);
    } catch (error) {
      this.error = `Photos not deleted: ${error instanceof Error ? error.message : String(error)}`;
    }
  }
}

export const retention = new Retention();
