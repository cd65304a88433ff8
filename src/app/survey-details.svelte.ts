/**
 * The survey details screen's state: one survey's essentials (title, site, client, building
 * use, ventilation type, new / refurbished / existing) loaded from storage, edited in place and
 * autosaved. An edit that breaks a rule (an empty title) is kept on screen and in memory with
 * the reason, and is not saved until it is put right. An edit to an issued revision is saved as
 * the next revision.
 */
import type { Survey, SurveyEssentials } from '../model/survey.ts';
import { surveyEssentialsSchema } from '../model/survey.ts';
import { validationProblems, type ValidationProblem } from '../model/validation-problem.ts';
import { editableRevision } from '../model/revision-lock.ts';
import { getSurvey } from '../store/surveys.ts';
import { knowHeader, updateSurveyHeader } from './update-survey-header.ts';
import { connection } from './storage-connection.ts';
import { Autosave } from './autosave.svelte.ts';
import { surveyWalk } from './survey-walk.svelte.ts';

class SurveyDetails {
  /** The survey as last loaded or saved. */
  survey = $state<Survey | null>(null);
  /** The essentials being edited. */
  form = $state<SurveyEssentials | null>(null);
  problems = $state<ValidationProblem[]>([]);
  loadError = $state<string | null>(null);
  readonly autosave = new Autosave<Survey>({
    form: 'survey details',
    save: async (survey) => {
      const { title, site, client, buildingUse, ventilation, stage } = survey;
      this.survey = await updateSurveyHeader(survey.id, { title, site, client, buildingUse, ventilation, stage }, new Date(survey.updatedAt));
      // The walk's copy of the header and its findings follow (building use and ventilation feed the analysis).
      await surveyWalk.headerSavedElsewhere(survey.id);
    },
  });

  /** Load a survey for editing (saving anything pending for the previous one first). */
  async open(surveyId: string): Promise<void> {
    await this.autosave.flush();
    if (this.survey?.id === surveyId && this.form) return;
    this.loadError = null;
    this.survey = null;
    this.form = null;
    try {
      const survey = await getSurvey(connection, surveyId);
      if (!survey) {
        this.loadError = 'This survey is not on this device (it may have been deleted).';
        return;
      }
      this.survey = survey;
      knowHeader(survey);
      const { title, site, client, buildingUse, ventilation, stage } = survey;
      this.form = { title, site, client, buildingUse, ventilation, stage };
    } catch (error) {
      this.loadError = error instanceof Error ? error.message : String(error);
    }
  }

  /** One field changed (typing): keep it and queue the save. */
  update<K extends keyof SurveyEssentials>(field: K, value: SurveyEssentials[K]): void {
    if (!this.form) return;
    this.form[field] = value;
    this.edited();
  }

  /** A field was committed (change event, a choice tapped): save at once. */
  commit(): Promise<void> {
    return this.autosave.flush();
  }

  /** The form changed: check it and queue the save (or hold it with the reason). */
  edited(now = new Date()): void {
    if (!this.form || !this.survey) return;
    const parsed = surveyEssentialsSchema.safeParse($state.snapshot(this.form));
    if (!parsed.success) {
      this.problems = validationProblems(parsed.error);
      this.autosave.refuse(this.problems.map((p) => p.message).join('; '));
      return;
    }
    this.problems = [];
    this.autosave.edit({ ...editableRevision($state.snapshot(this.survey)), ...parsed.data, updatedAt: now.toISOString() });
  }

  /** Leaving the screen: save what is pending and forget the survey as "open". */
  async close(): Promise<void> {
    await this.autosave.flush();
    this.autosave.closeForm();
    // Other screens edit the same header (visit, settings): read it afresh next time.
    if (this.autosave.state === 'saved') this.form = null;
  }

  problemFor(field: keyof SurveyEssentials): string | undefined {
    return this.problems.find((p) => p.field === field)?.message;
  }
}

export const surveyDetails = new SurveyDetails();
