/**
 * Making the findings report on the device: load the survey, run the analysis, build the report
 * model, then draw the PDF with the lazily loaded renderer (jspdf comes down only now, from the
 * precache when offline), yielding to the page between room sheets so progress shows and Cancel
 * works. The PDF and the results CSV are then handed over from a second tap: shared through the
 * share sheet (called straight in the tap; a cancelled share is not an error), or downloaded where
 * the browser cannot share files — never downloaded in an installed iOS app, which has no downloads.
 * The analysis and report-model code is loaded with the renderer, at the first report, so the
 * survey screens start without it.
 */
import { loadSurvey } from '../store/load-survey.ts';
import { canShareFile, downloadFile, shareFile } from './deliver-file.ts';
import { deviceStatus } from './device-status.svelte.ts';
import { connection } from './storage-connection.ts';
import { sinceLastVisit } from './since-last-visit.ts';

export type ReportPhase = 'idle' | 'working' | 'ready' | 'cancelled' | 'failed';

/** Let the page paint and take taps (a macrotask, so a Cancel tap is handled in between). */
const yieldToPage = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

/** A local calendar date, ISO. */
function localDate(now: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

class ReportMaker {
  phase = $state<ReportPhase>('idle');
  /** What is being done, in words, and how far (0 to 1). */
  step = $state('');
  progress = $state(0);
  surveyId = $state<string | null>(null);
  pdf = $state<File | null>(null);
  csv = $state<File | null>(null);
  error = $state<string | null>(null);
  private controller: AbortController | null = null;
  private sharing = false;

  /** True when the PDF can go through the share sheet. */
  get shareable(): boolean {
    return this.pdf !== null && canShareFile(this.pdf);
  }

  /** Downloads trap the person in an installed iOS app: offer them everywhere else. */
  get downloadAllowed(): boolean {
    return !(deviceStatus.ios && deviceStatus.installed);
  }

  /** Build the report of one survey. */
  async create(surveyId: string, now = new Date()): Promise<void> {
    this.controller?.abort();
    const controller = new AbortController();
    this.controller = controller;
    Object.assign(this, { phase: 'working', surveyId, pdf: null, csv: null, error: null, progress: 0, step: 'Reading the survey' });
    try {
      const doc = await loadSurvey(connection, surveyId, { photos: true });
      if (!doc) throw new Error('This survey is no longer on the device.');
      this.step = 'Working out the figures';
      await yieldToPage();
      if (controller.signal.aborted) throw new DOMException('cancelled', 'AbortError');
      const [{ analyseSurvey }, { buildReport }, { roomResultsCsv }] = await Promise.all([
        import('../analysis/analyse-survey.ts'),
        import('../report/report-model.ts'),
        import('../report/report-csv.ts'),
      ]);
      if (controller.signal.aborted) throw new DOMException('cancelled', 'AbortError');
      const results = analyseSurvey(doc);
      // A repeat visit gains "Since the last visit" (when the earlier survey is still on the device).
      const since = doc.survey.previousSurveyId === undefined ? null : await sinceLastVisit(surveyId);
      if (controller.signal.aborted) throw new DOMException('cancelled', 'AbortError');
      const previousVisit = since?.status === 'compared' ? { previousVisit: since.comparison } : {};
      const model = buildReport(doc, results, { issueDate: localDate(now), appVersion: __APP_VERSION__, ...previousVisit });
      this.step = 'Drawing the report';
      const { renderReportPdf } = await import('../report/pdf/render-report-pdf.ts');
      const bytes = await renderReportPdf(model, {
        creationDate: now,
        signal: controller.signal,
        pause: yieldToPage,
        onProgress: (done, total) => {
          this.progress = done / total;
          this.step = `Drawing the report: ${Math.min(done, model.rooms.length)} of ${model.rooms.length} rooms`;
        },
      });
      if (this.controller !== controller) return;
      this.pdf = new File([bytes.buffer as ArrayBuffer], model.meta.fileName, { type: 'application/pdf' });
      this.csv = new File([roomResultsCsv(model, results)], model.meta.csvFileName, { type: 'text/csv' });
      this.phase = 'ready';
      this.progress = 1;
    } catch (error) {
      if (this.controller !== controller) return;
      if (error instanceof DOMException && error.name === 'AbortError') this.phase = 'cancelled';
      else {
        this.phase = 'failed';
        this.error = error instanceof Error ? error.message : String(error);
      }
    }
  }

  cancel(): void {
    this.controller?.abort();
  }

  /** Share a prepared file; call straight from the tap. Double taps are ignored until the sheet closes. */
  async share(file: File): Promise<void> {
    if (this.sharing) return;
    this.sharing = true;
    const reset = setTimeout(() => (this.sharing = false), 30_000);
    try {
      await shareFile(file);
    } catch (error) {
      this.error = `Could not share the file: ${error instanceof Error ? error.message : String(error)}.${this.downloadAllowed ? ' Try the download instead.' : ''}`;
    } finally {
      clearTimeout(reset);
      this.sharing = false;
    }
  }

  download(file: File): void {
    if (this.downloadAllowed) downloadFile(file);
  }
}

export const reportMaker = new ReportMaker();
