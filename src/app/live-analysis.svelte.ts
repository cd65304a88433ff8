/**
 * The findings of the open survey, kept current: every saved change asks for a new analysis,
 * which runs in the worker on the survey as stored once saves pause (debounced), so typing never
 * waits for it and the page copies nothing. Each room's results are kept on their own as they
 * arrive (in batches), so a long survey's screen updates a few rooms at a time; only the latest
 * request counts. The result types are re-exported for the screens.
 */
import { SvelteMap } from 'svelte/reactivity';
import type { AnalysisResults, RoomResults } from '../analysis/results.ts';
import { analyseInWorker } from './analysis-client.ts';

export type {
  AnalysisResults,
  AreaResults,
  Figure,
  MeasuredEstimate,
  Ranged,
  ProfileCurve,
  RoomResults,
  ScenarioResult,
  AnalysisWarning,
  RoomJudgement,
  AreaJudgement,
} from '../analysis/results.ts';

/** Quiet time after the last save before the analysis runs, ms. */
export const ANALYSIS_DELAY_MS = 300;

export class LiveAnalysis {
  /** The latest whole results (survey-level figures: weather cases, outdoor level, areas). */
  results = $state.raw<AnalysisResults | null>(null);
  /** Each room's latest results, by room id. */
  readonly rooms = new SvelteMap<string, RoomResults>();
  running = $state(false);
  error = $state<string | null>(null);
  private timer: ReturnType<typeof setTimeout> | undefined;
  private latest = 0;

  /** The stored survey changed: analyse it once saves pause. */
  request(surveyId: string, delayMs = ANALYSIS_DELAY_MS): void {
    clearTimeout(this.timer);
    this.running = true;
    this.timer = setTimeout(() => void this.run(surveyId), delayMs);
  }

  clear(): void {
    clearTimeout(this.timer);
    this.latest += 1;
    this.results = null;
    this.rooms.clear();
    this.running = false;
    this.error = null;
  }

  private async run(surveyId: string): Promise<void> {
    const ticket = ++this.latest;
    const current = () => ticket === this.latest;
    try {
      const results = await analyseInWorker({ surveyId }, (rooms) => {
        if (current()) for (const room of rooms) this.rooms.set(room.roomId, room);
      });
      if (!current()) return;
      this.results = results;
      this.error = null;
    } catch (error) {
      if (current()) this.error = error instanceof Error ? error.message : String(error);
    } finally {
      if (current()) this.running = false;
    }
  }
}
