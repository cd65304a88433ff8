/** What a benchmark receives. Chromium benchmarks also get a page of the built app. */
import type { Page } from 'playwright-core';

export interface BenchContext {
  /** Print one line of figures: `name: key=value key=value`. */
  report: (name: string, figures: Record<string, string | number>) => void;
  /** Only in chromium mode: a page with the built app loaded from 127.0.0.1. */
  page?: Page;
}
