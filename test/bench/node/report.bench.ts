/**
 * The findings report of a 200-room survey: the demo surveys' rooms copied with fresh ids
 * (withFreshIds) into one survey. analyseSurvey is timed on its own (at 50 Monte Carlo draws, to
 * keep the bench short; the report does not depend on the draws' number) and left out of the PDF
 * figures. Reported: report model time, PDF time and size (targets under 10 s and 5 MB without
 * photos), pages and time per page, and the share of the PDF time spent inside jspdf and
 * jspdf-autotable, from a CPU profile (self time by script).
 */
import { Session } from 'node:inspector/promises';
import type { BenchContext } from '../bench-context.ts';
import { analyseSurvey } from '../../../src/analysis/analyse-survey.ts';
import { withFreshIds } from '../../../src/model/fresh-ids.ts';
import { surveyDocumentSchema, type SurveyDocument } from '../../../src/model/survey-document.ts';
import { renderReportPdf } from '../../../src/report/pdf/render-report-pdf.ts';
import { buildReport } from '../../../src/report/report-model.ts';
import { demoFile } from '../../support/fixtures.ts';

const ROOMS = 200;
const DRAWS = 50;

function bigSurvey(): SurveyDocument {
  const demos = demoFile().surveys.map((s) => surveyDocumentSchema.parse(s));
  let n = 0;
  const newId = () => `00000000-0000-4000-8000-${(++n).toString(16).padStart(12, '0')}`;
  const copies: SurveyDocument[] = [];
  for (let rooms = 0; rooms < ROOMS; ) {
    for (const demo of demos) {
      const copy = withFreshIds(demo, newId);
      copies.push(copy);
      rooms += copy.rooms.length;
    }
  }
  const rooms = copies.flatMap((c) => c.rooms).slice(0, ROOMS);
  const kept = new Set(rooms.map((r) => r.id));
  const first = copies[0]!;
  return surveyDocumentSchema.parse({
    ...first,
    instruments: copies.flatMap((c) => c.instruments),
    areas: copies.flatMap((c) => c.areas),
    rooms,
    series: copies.flatMap((c) => c.series).filter((s) => !s.roomId || kept.has(s.roomId)),
    photos: [],
  });
}

interface ProfileNode {
  id: number;
  callFrame: { url: string };
}

/** Share of sampled time whose top frame is in each group of scripts. */
function selfShares(profile: { nodes: ProfileNode[]; samples?: number[] }): { jspdf: number; autotable: number } {
  const url = new Map(profile.nodes.map((n) => [n.id, n.callFrame.url]));
  let jspdf = 0;
  let autotable = 0;
  const samples = profile.samples ?? [];
  for (const id of samples) {
    const u = url.get(id) ?? '';
    if (u.includes('/node_modules/jspdf-autotable/')) autotable++;
    else if (u.includes('/node_modules/jspdf/')) jspdf++;
  }
  return { jspdf: jspdf / Math.max(1, samples.length), autotable: autotable / Math.max(1, samples.length) };
}

export default async function reportBench(ctx: BenchContext): Promise<void> {
  const doc = bigSurvey();
  let start = performance.now();
  const results = analyseSurvey(doc, { draws: DRAWS });
  ctx.report(`analyseSurvey (${ROOMS} rooms, ${DRAWS} draws; not in the PDF figures)`, { rooms: doc.rooms.length, total_s: (performance.now() - start) / 1000 });

  const options = { issueDate: '2026-01-22', appVersion: 'bench' };
  const created = new Date('2026-01-22T12:00:00Z');
  await renderReportPdf(buildReport(doc, results, options), { creationDate: created }); // warm-up

  start = performance.now();
  const model = buildReport(doc, results, options);
  const modelSeconds = (performance.now() - start) / 1000;
  start = performance.now();
  const bytes = await renderReportPdf(model, { creationDate: created });
  const pdfSeconds = (performance.now() - start) / 1000;
  const pages = Buffer.from(bytes).toString('latin1').match(/\/Type \/Page\b(?!s)/g)?.length ?? 0;
  ctx.report(`report of ${ROOMS} rooms, no photos`, {
    model_s: modelSeconds,
    pdf_s: pdfSeconds,
    target_s: 10,
    size_MB: bytes.length / 1e6,
    target_MB: 5,
    pages,
    ms_per_page: (pdfSeconds * 1000) / pages,
  });

  const session = new Session();
  session.connect();
  await session.post('Profiler.enable');
  await session.post('Profiler.setSamplingInterval', { interval: 200 });
  await session.post('Profiler.start');
  await renderReportPdf(model, { creationDate: created });
  const { profile } = await session.post('Profiler.stop');
  session.disconnect();
  const shares = selfShares(profile as unknown as { nodes: ProfileNode[]; samples?: number[] });
  ctx.report('share of PDF time (CPU profile, self time)', {
    jspdf_pct: 100 * shares.jspdf,
    autotable_pct: 100 * shares.autotable,
    ours_and_runtime_pct: 100 * (1 - shares.jspdf - shares.autotable),
  });
}
