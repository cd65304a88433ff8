/**
 * Restoring from a backup: read the chosen file, check all of it (format, version, every field
 * and reference) before anything is written, ask what to do about surveys already on the device
 * (keep both, or replace), then import in one all-or-nothing transaction and say what happened.
 * A refused file leaves stored data exactly as it was, and the report names each problem's
 * field, value and rule.
 */
import { readSurveyFile, type SurveyFile } from '../model/survey-file.ts';
import type { ValidationProblem } from '../model/validation-problem.ts';
import { importSurveys, planImport, type ClashChoice, type ImportedSurvey, type ImportPlanItem } from '../store/backup.ts';
import { connection } from './storage-connection.ts';
import { surveyList } from './survey-list.svelte.ts';
import { formatBytes } from './format-bytes.ts';
import { deviceStatus } from './device-status.svelte.ts';

/** Largest file read at all: 300 MB (a backup with many photos; larger ones are not ours). */
export const MAX_IMPORT_BYTES = 300_000_000;
/** Problems listed in full; the rest are counted. */
export const PROBLEMS_SHOWN = 50;

export type ImportStage =
  | { kind: 'idle' }
  | { kind: 'checking'; name: string }
  | { kind: 'refused'; name: string; problems: ValidationProblem[]; total: number }
  | { kind: 'choose'; name: string; file: SurveyFile; plan: ImportPlanItem[]; choices: Record<string, ClashChoice> }
  | { kind: 'importing'; name: string }
  | { kind: 'done'; name: string; imported: ImportedSurvey[] }
  | { kind: 'failed'; name: string; message: string };

class BackupImport {
  stage = $state<ImportStage>({ kind: 'idle' });

  /** Check a chosen file; import at once when nothing clashes, otherwise ask. */
  async choose(file: File): Promise<void> {
    const name = file.name;
    if (file.size > MAX_IMPORT_BYTES) {
      this.refuse(name, [{ field: '', message: `The file is ${formatBytes(file.size)}; a Ventwalk backup is never that large. Choose another file.` }]);
      return;
    }
    this.stage = { kind: 'checking', name };
    let text: string;
    try {
      text = await file.text();
    } catch (error) {
      this.refuse(name, [{ field: '', message: `The file could not be read: ${error instanceof Error ? error.message : String(error)}` }]);
      return;
    }
    const result = readSurveyFile(text);
    if (!result.ok) {
      this.refuse(name, result.problems);
      return;
    }
    try {
      const plan = await planImport(connection, result.file);
      if (plan.some((p) => p.onDevice !== undefined)) {
        this.stage = { kind: 'choose', name, file: result.file, plan, choices: {} };
      } else {
        await this.write(name, result.file, {});
      }
    } catch (error) {
      this.stage = { kind: 'failed', name, message: error instanceof Error ? error.message : String(error) };
    }
  }

  /** Record the person's choice for one clashing survey. */
  decide(surveyId: string, choice: ClashChoice): void {
    if (this.stage.kind === 'choose') this.stage.choices[surveyId] = choice;
  }

  /** True when every clashing survey has a choice. */
  get ready(): boolean {
    const stage = this.stage;
    return stage.kind === 'choose' && stage.plan.every((p) => p.onDevice === undefined || stage.choices[p.surveyId] !== undefined);
  }

  async confirm(): Promise<void> {
    const stage = this.stage;
    if (stage.kind !== 'choose' || !this.ready) return;
    await this.write(stage.name, stage.file, $state.snapshot(stage.choices));
  }

  reset(): void {
    this.stage = { kind: 'idle' };
  }

  private refuse(name: string, problems: ValidationProblem[]): void {
    this.stage = { kind: 'refused', name, problems: problems.slice(0, PROBLEMS_SHOWN), total: problems.length };
  }

  private async write(name: string, file: SurveyFile, choices: Record<string, ClashChoice>): Promise<void> {
    this.stage = { kind: 'importing', name };
    try {
      const imported = await importSurveys(connection, file, choices, () => crypto.randomUUID());
      this.stage = { kind: 'done', name, imported };
      // Restored surveys are real data: ask for protected storage (a refusal is a normal answer).
      void deviceStatus.requestProtection().catch(() => undefined);
      await surveyList.refresh();
    } catch (error) {
      this.stage = { kind: 'failed', name, message: error instanceof Error ? error.message : String(error) };
    }
  }
}

export const backupImport = new BackupImport();

/** A value found in a file, short enough to show: strings quoted, long ones cut. */
export function describeValue(value: unknown): string {
  if (value === undefined) return '(missing)';
  const text = typeof value === 'string' ? JSON.stringify(value) : JSON.stringify(value) ?? String(value);
  return text.length > 60 ? `${text.slice(0, 57)}…` : text;
}
