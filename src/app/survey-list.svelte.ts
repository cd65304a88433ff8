/**
 * The survey list the start screen shows: summaries from storage, newest change first.
 */
import type { SurveySummary } from '../model/survey.ts';
import { listSurveys } from '../store/surveys.ts';
import { connection } from './storage-connection.ts';

class SurveyList {
  surveys = $state<SurveySummary[]>([]);
  loaded = $state(false);
  error = $state<string | null>(null);

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
}

export const surveyList = new SurveyList();
