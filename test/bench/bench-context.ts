/** What a benchmark receives. Browser benchmarks also get the built app's address (and a page). */
import type { Page } from 'playwright-core';

export interface BenchContext {
  /** Print one line of figures: `name: key=value key=value`. */
  report: (name: string, figures: Record<string, string | number>) => void;
  /** Only in chromium mode: a page with the built app loaded from 127.0.0.1. */
  page?: Page;
  /** In chromium and lighthouse modes: the built app's address on 127.0.0.1. */
  baseURL?: string;
}
