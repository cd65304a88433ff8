/**
 * The survey list the start screen shows: summaries from storage, newest change first, narrowed
 * by a search over title and site. Deleting takes effect after a short undo window: the survey
 * leaves the list at once, and is removed from the device only if "undo" is not tapped in time
 * (if the app closes first, it is kept — nothing is lost by accident).
 */
import type { SurveySummary } from '../model/survey.ts';
import { listSurveys } from '../store/surveys.ts';
import { deleteSurvey } from '../store/delete-survey.ts';
import { connection } from './storage-connection.ts';

/** How long "undo" is offered after a delete, ms. */
export const UNDO_MS = 10_000;

class SurveyList {
  surveys = $state<SurveySummary[]>([]);
  loaded = $state(false);
  error = $state<string | null>(null);
  search = $state('');
  /** The survey deleted and still undoable. */
  deleting = $state<SurveySummary | null>(null);
  private timer: ReturnType<typeof setTimeout> | undefined;

  /** The surveys shown: not the one being deleted, matching the search (title or site). */
  get shown(): SurveySummary[] {
    const words = this.search.trim().toLowerCase();
    return this.surveys.filter(
      (s) => s.id !== this.deleting?.id && (!words || `${s.title} ${s.site}`.toLowerCase().includes(words)),
    );
  }

  async refresh(): Promise<void> {
    try {
      this.surveys = await listSurveys(connection);
      this.error = null;
    } catch (error) {
      this.error = error instanceof Error ? error.message : String(error);
    } finally {
      this.loaded = true;
    }
  }

  /** Delete a survey once the undo window has passed (a previous pending delete goes ahead now). */
  async remove(survey: SurveySummary): Promise<void> {
    await this.finishDelete();
    this.deleting = survey;
    this.timer = setTimeout(() => void this.finishDelete(), UNDO_MS);
  }

  undo(): void {
    clearTimeout(this.timer);
    this.deleting = null;
  }

  async finishDelete(): Promise<void> {
    clearTimeout(this.timer);
    const survey = this.deleting;
    if (!survey) return;
    try {
      await deleteSurvey(connection, survey.id);
      this.surveys = this.surveys.filter((s) => s.id !== survey.id);
    } catch (error) {
      this.error = `“${survey.title}” was not deleted: ${error instanceof Error ? error.message : String(error)}`;
    } finally {
      this.deleting = null;
    }
  }
}

export const surveyList = new SurveyList();
