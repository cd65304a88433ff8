/**
 * One Lighthouse run (mobile preset: the default config's phone screen and simulated slow-4G and
 * 4× CPU throttling) of one address in Debian's Chromium, reduced to what the bench prints: the
 * performance, accessibility and best-practices scores (0–100), the main timings, the audits
 * that did not pass, and every request that left 127.0.0.1.
 *
 * Chromium runs headless with a profile directory the caller chooses (so a profile with the demo
 * surveys in IndexedDB can be audited). Lighthouse's own storage reset clears the service worker,
 * the Cache Storage and the HTTP cache before the load but not IndexedDB, so each run is a cold
 * network load of a surveyor's stored data. Every host name other than 127.0.0.1 is mapped to
 * nowhere: nothing can reach the internet during a run.
 */
import lighthouse from 'lighthouse';
import { launch } from 'chrome-launcher';
import { CHROMIUM_ARGS } from '../../support/browser.ts';

export const CATEGORIES = ['performance', 'accessibility', 'best-practices'] as const;
export type Category = (typeof CATEGORIES)[number];

export interface PageAudit {
  scores: Record<Category, number>;
  /** Milliseconds, except CLS (unitless). */
  metrics: { fcp_ms: number; lcp_ms: number; tbt_ms: number; si_ms: number; cls: number };
  /** Audits counted in the three categories whose score is below Lighthouse's pass mark (0.9). */
  failing: { id: string; title: string; category: Category; display: string; nodes: string[] }[];
  /** Audits of the three categories that could not run (no score; they do not count). */
  errored: { id: string; message: string }[];
  /** Requests to anywhere but 127.0.0.1 (there should be none). */
  offHost: string[];
  warnings: string[];
  /** Lighthouse's measure of the host's CPU speed during the run (higher is faster). */
  benchmarkIndex: number;
}

/** Lighthouse's pass mark for one audit (its report shows scores below it as not passed). */
const PASS = 0.9;

/** Headless Chromium for Lighthouse on the given profile directory; close() waits for it to exit. */
export async function openAuditBrowser(chromePath: string, userDataDir: string): Promise<{ port: number; close: () => Promise<void> }> {
  const chrome = await launch({
    chromePath,
    userDataDir,
    chromeFlags: ['--headless=new', ...CHROMIUM_ARGS, '--host-resolver-rules=MAP * ~NOTFOUND, EXCLUDE 127.0.0.1'],
    logLevel: 'error',
  });
  return {
    port: chrome.port,
    close: async () => {
      const exited = chrome.process.exitCode === null ? new Promise((resolve) => chrome.process.once('exit', resolve)) : undefined;
      chrome.kill();
      await exited;
    },
  };
}

/** One Lighthouse run of `url` in the browser listening on `port`. */
export async function auditPage(url: string, port: number): Promise<PageAudit> {
  const result = await lighthouse(url, {
    port,
    output: 'json',
    logLevel: 'error',
    onlyCategories: [...CATEGORIES],
    // Not in a category, but lists every request (to show that none left 127.0.0.1).
    onlyAudits: ['network-requests'],
  });
  if (!result) throw new Error(`Lighthouse returned nothing for ${url}`);
  const lhr = result.lhr;
  if (lhr.runtimeError) throw new Error(`Lighthouse: ${lhr.runtimeError.code} ${lhr.runtimeError.message}`);
  const numeric = (id: string) => lhr.audits[id]?.numericValue ?? Number.NaN;
  const failing: PageAudit['failing'] = [];
  const errored: PageAudit['errored'] = [];
  for (const category of CATEGORIES) {
    for (const ref of lhr.categories[category]?.auditRefs ?? []) {
      const audit = lhr.audits[ref.id];
      if (audit?.scoreDisplayMode === 'error' && !errored.some((e) => e.id === audit.id)) errored.push({ id: audit.id, message: audit.errorMessage ?? '' });
      if (!audit || audit.score === null || audit.score >= PASS) continue;
      if (failing.some((f) => f.id === audit.id)) continue;
      // The page elements an accessibility audit names (selector and markup), to find them quickly.
      const items = (audit.details as { items?: { node?: { selector?: string; snippet?: string } }[] } | undefined)?.items ?? [];
      const nodes = items.flatMap((i) => (i.node ? [`${i.node.selector ?? ''} ${i.node.snippet ?? ''}`.trim()] : [])).slice(0, 5);
      failing.push({ id: audit.id, title: audit.title, category, display: audit.displayValue ?? '', nodes });
    }
  }
  const requests = (lhr.audits['network-requests']?.details as { items?: { url?: string }[] } | undefined)?.items ?? [];
  return {
    scores: Object.fromEntries(CATEGORIES.map((c) => [c, Math.round((lhr.categories[c]?.score ?? 0) * 100)])) as Record<Category, number>,
    metrics: {
      fcp_ms: numeric('first-contentful-paint'),
      lcp_ms: numeric('largest-contentful-paint'),
      tbt_ms: numeric('total-blocking-time'),
      si_ms: numeric('speed-index'),
      cls: numeric('cumulative-layout-shift'),
    },
    failing,
    errored,
    offHost: requests.map((r) => r.url ?? '').filter((u) => !/^(https?:\/\/127\.0\.0\.1[:/]|data:|blob:)/.test(u)),
    warnings: lhr.runWarnings,
    benchmarkIndex: lhr.environment.benchmarkIndex,
  };
}
