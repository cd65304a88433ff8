/**
 * The findings of the open survey, kept current: every saved change asks for a new analysis,
 * which runs in the worker once changes pause (debounced), so typing never waits for it. Only
 * the latest request's results are kept. The result types are re-exported for the screens.
 */
import type { AnalysisResults } from '../analysis/results.ts';
import type { SurveyDocument } from '../model/survey-document.ts';
import { analyseInWorker } from './analysis-client.ts';

export type {
  AnalysisResults,
  AreaResults,
  Figure,
  MeasuredEstimate,
  Ranged,
  RoomResults,
  ScenarioResult,
  AnalysisWarning,
} from '../analysis/results.ts';

/** Quiet time after the last change before the analysis runs, ms. */
export const ANALYSIS_DELAY_MS = 500;

export class LiveAnalysis {
  results = $state.raw<AnalysisResults | null>(null);
  running = $state(false);
  error = $state<string | null>(null);
  private timer: ReturnType<typeof setTimeout> | undefined;
  private latest = 0;

  /** A new version of the document: analyse it once changes pause. */
  request(document: SurveyDocument, delayMs = ANALYSIS_DELAY_MS): void {
    const snapshot = $state.snapshot(document) as SurveyDocument;
    clearTimeout(this.timer);
    this.running = true;
    this.timer = setTimeout(() => void this.run(snapshot), delayMs);
  }

  clear(): void {
    clearTimeout(this.timer);
    this.latest += 1;
    this.results = null;
    this.running = false;
    this.error = null;
  }

  private async run(document: SurveyDocument): Promise<void> {
    const ticket = ++this.latest;
    try {
      const results = await analyseInWorker(document);
      if (ticket !== this.latest) return;
      this.results = results;
      this.error = null;
    } catch (error) {
      if (ticket !== this.latest) return;
      this.error = error instanceof Error ? error.message : String(error);
    } finally {
      if (ticket === this.latest) this.running = false;
    }
  }
}
