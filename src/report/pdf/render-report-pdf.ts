/**
 * The findings report as a PDF: lays out the report model (report-model.ts) with jspdf and
 * jspdf-autotable, drawn directly (never from HTML). The app loads this module with
 * `await import(...)` so jspdf stays out of the first download; the command line imports it.
 *
 * Deterministic: the creation date and the file id are set from `creationDate`, so the same
 * model and date give the same bytes. Between room sheets it reports progress, awaits `pause`
 * (the app yields to the page there) and stops with an AbortError when `signal` is aborted.
 *
 * Example: await renderReportPdf(model, { creationDate: new Date('2026-01-22T12:00:00Z') })
 * gives the bytes of an A4 PDF whose first page names the client and the site.
 */
import { jsPDF } from 'jspdf';
import type { ReportModel } from '../report-model.ts';
import { drawChart } from './pdf-chart.ts';
import { drawRoomSheet } from './pdf-room-sheet.ts';
import { ACCENT, MUTED, PAGE, TYPE } from './pdf-style.ts';
import { PdfWriter } from './pdf-writer.ts';

export interface PdfOptions {
  creationDate: Date;
  /** Called after each section: steps done and the total. */
  onProgress?: (done: number, total: number) => void;
  /** Awaited between room sheets, so a page can paint and take a tap. */
  pause?: () => Promise<void>;
  signal?: AbortSignal;
}

function fileId(model: ReportModel, date: Date): string {
  // A stable 32-hex-digit id from the reference, revision and date (FNV-1a, four lanes).
  const text = `${model.meta.reference}|${model.meta.revision}|${date.toISOString()}`;
  let out = '';
  for (let lane = 0; lane < 4; lane++) {
    let h = 0x811c9dc5 ^ lane;
    for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193) >>> 0;
    out += h.toString(16).padStart(8, '0');
  }
  return out.toUpperCase();
}

function front(w: PdfWriter, m: ReportModel): void {
  w.y = 90;
  w.paragraph('Ventilation findings report', { size: TYPE.title, bold: true, colour: ACCENT, after: 2 });
  w.paragraph(m.meta.title, { size: TYPE.subheading, after: 14 });
  w.facts([
    ['Client', m.front.client],
    ['Site', m.front.site],
    ['Building', m.front.buildingUse],
    ['Reference', m.meta.reference],
    ['Revision', `${m.meta.revision}, issued ${m.meta.issueDate}`],
    ['Visit', m.front.visits.join('; ') || 'not recorded'],
    ['Surveyor', m.front.surveyors.join('; ') || 'not recorded'],
  ]);
  w.heading('Purpose and scope', 2);
  w.facts([
    ['Purpose', m.front.purpose],
    ['Scope and access', m.front.scope],
    ['Rooms seen', m.front.roomsSeen.join('; ')],
    ['How', m.front.method],
  ]);
  w.heading('The day', 2);
  w.facts([
    ['Weather', m.front.weather.join(' ')],
    ['Outdoor CO2', m.front.outdoor.replace(/^Outdoor CO2 used: /, '')],
  ]);
  w.paragraph('People in each room when it was measured', { bold: true, after: 0 });
  w.list(m.front.occupancy, { size: TYPE.small });
  w.heading('Versions', 3);
  w.paragraph(m.meta.versions.map(([k, v]) => `${k} ${v}`).join(' · '), { size: TYPE.small, colour: MUTED });
}

function summary(w: PdfWriter, m: ReportModel): void {
  w.newPage();
  w.heading('Summary');
  w.paragraph(m.summary.basis);
  w.heading('Safety items (apart from improvements)', 2);
  if (m.summary.safety.length) w.list(m.summary.safety.map((s) => `${s.place}: ${s.text}`));
  else w.paragraph('None recorded.');
  w.heading(m.summary.judgementAvailable ? 'Worst rooms' : 'Rooms with the least outdoor air per person', 2);
  w.table(
    ['#', 'Room', 'Priority', 'Figure'],
    m.summary.worst.map((r) => [String(r.rank), r.place, r.priorityText, r.value]),
    { columnStyles: { 0: { cellWidth: 20 } } },
  );
  w.heading('What to do', 2);
  if (m.summary.actions.length) {
    w.table(
      ['When', 'Action'],
      m.summary.actions.map((a) => [a.urgency === 'not-judged' ? 'not judged' : a.urgency === 'immediate' ? 'Immediately' : a.urgency === 'weeks' ? 'Within weeks' : a.urgency === 'planned' ? 'Planned work' : '—', a.text]),
      { columnStyles: { 0: { cellWidth: 70 } } },
    );
  } else w.paragraph('No action listed.');
  w.table(['Count', 'Rooms'], m.summary.counts.map((c) => [c.label, String(c.count)]), { tableWidth: 260 });
  w.paragraph(m.summary.screening, { size: TYPE.small, colour: MUTED });
}

function sinceLastVisit(w: PdfWriter, m: ReportModel): void {
  const s = m.sinceLastVisit;
  if (!s) return;
  w.newPage();
  w.heading('Since the last visit');
  w.paragraph(s.basis);
  w.paragraph(s.rule, { size: TYPE.small, colour: MUTED });
  w.table(
    ['Room', 'Supply then → now', 'Steady CO2 then → now', 'Mould risk', 'Priority', 'Fixes recommended last time', 'Overall'],
    s.rooms.map((r) => [r.room, r.supply, r.steadyCo2, r.mouldRisk, r.priority, r.fixes.join('; '), r.overall]),
    { styles: { fontSize: TYPE.tiny, cellPadding: 2.5 }, columnStyles: { 0: { cellWidth: 70 } } },
  );
  if (s.notRevisited.length) {
    w.paragraph('Rooms of the last visit not seen this time', { bold: true, after: 0 });
    w.list(s.notRevisited, { size: TYPE.small });
  }
  w.table(['Overall', 'Rooms'], s.counts.map(([label, n]) => [label, String(n)]), { tableWidth: 260 });
}

function ranked(w: PdfWriter, m: ReportModel): void {
  w.newPage();
  w.heading('Rooms to fix, in order');
  w.paragraph(m.ranked.basis, { size: TYPE.small });
  w.table(
    ['#', 'Area / room (client no.)', 'Use', 'Priority', 'Criterion and status', 'This room', 'Limit', 'Fix'],
    m.ranked.rows.map((r) => [String(r.rank), r.place, r.use, r.priorityText, r.criterion, r.value, r.limit, r.fix]),
    { styles: { fontSize: TYPE.tiny, cellPadding: 2.5 }, columnStyles: { 0: { cellWidth: 18 }, 1: { cellWidth: 80 } } },
  );
}

function dwellings(w: PdfWriter, m: ReportModel): void {
  for (const d of m.dwellings) {
    w.newPage();
    w.heading(`Dwelling: ${d.title}`);
    w.facts(d.facts);
    w.facts(d.figures.map((f) => [f.label, f.text] as const), 160);
    w.paragraph('Rooms', { bold: true, after: 0 });
    w.list(d.rooms, { size: TYPE.small });
    w.paragraph('Findings', { bold: true, after: 0 });
    w.list(d.findings);
    if (d.cautions.length) {
      w.paragraph('Cautions on these figures', { bold: true, after: 0, size: TYPE.small });
      w.list(d.cautions, { size: TYPE.small });
    }
  }
}

function tables(w: PdfWriter, m: ReportModel): void {
  w.newPage();
  w.heading('Instruments');
  if (m.instruments.length) {
    w.table(['Instrument', 'Serial', 'Measures', 'Stated accuracy', 'Calibrated', 'Field checks'], m.instruments);
  } else w.paragraph('No instruments recorded.');
  w.heading('Methods');
  w.table(['Method', 'Follows', 'Used for'], m.methods, { columnStyles: { 0: { cellWidth: 120 }, 2: { cellWidth: 110 } } });
  w.heading('Criteria');
  w.paragraph(m.criteria.note, { size: TYPE.small });
  w.table(['Criterion', 'Source', 'Status', 'Averaging period', 'Checked against the document', 'Room uses'], m.criteria.rows, { styles: { fontSize: TYPE.tiny, cellPadding: 2.5 } });
}

function limitations(w: PdfWriter, m: ReportModel): void {
  w.heading('Limitations');
  w.list(m.limitations);
  w.heading('Cautions');
  w.list(m.cautions);
}

function signOff(w: PdfWriter, m: ReportModel): void {
  w.heading('Sign-off');
  w.ensure(200);
  w.paragraph(m.signOff.factsAndOpinions, { size: TYPE.small });
  w.paragraph(m.signOff.independence);
  const line = (label: string, name: string) => {
    w.facts([[label, name || ' ']]);
    w.doc.setDrawColor(...MUTED);
    w.doc.line(w.left + 130, w.y + 12, w.left + 360, w.y + 12);
    w.doc.setFontSize(TYPE.tiny);
    w.doc.text('signature and date', w.left + 130, w.y + 20);
    w.y += 30;
  };
  line('Prepared by', `${m.signOff.preparedBy} (${m.signOff.qualifications})`);
  line('Checked by', m.signOff.checkedBy);
}

function appendix(w: PdfWriter, m: ReportModel): void {
  w.newPage();
  w.heading('Appendix: every reading');
  w.paragraph('Times as recorded. Conditions are those recorded with each reading.', { size: TYPE.small });
  if (m.appendix.outdoor.length) {
    w.heading('Outdoor', 2);
    w.table(['Time', 'When', 'CO2', 'Temp.', 'RH', 'Where', 'Instrument'], m.appendix.outdoor);
  }
  for (const r of m.appendix.readings) {
    w.heading(r.room, 2);
    w.table(['Time', 'CO2', 'Temp.', 'RH', 'Surface', 'Conditions', 'Instrument; note'], r.rows, {
      styles: { fontSize: TYPE.tiny, cellPadding: 2 },
      columnStyles: { 0: { cellWidth: 70 }, 5: { cellWidth: 140 } },
    });
  }
  if (m.appendix.loggers.length) {
    w.heading('Appendix: logger records');
    for (const chart of m.appendix.loggers) drawChart(w, chart);
  }
}

/** Render the report model to PDF bytes (see the file note). */
export async function renderReportPdf(model: ReportModel, options: PdfOptions): Promise<Uint8Array> {
  const doc = new jsPDF({ unit: 'pt', format: [PAGE.width, PAGE.height], compress: true, putOnlyUsedFonts: true });
  doc.setCreationDate(options.creationDate);
  doc.setFileId(fileId(model, options.creationDate));
  doc.setDocumentProperties({ title: model.meta.title, subject: `Ventilation findings, ${model.front.site}`, creator: 'Ventwalk', keywords: model.meta.reference });
  const w = new PdfWriter(doc);
  const total = model.rooms.length + 3;
  let done = 0;
  const step = async () => {
    done += 1;
    options.onProgress?.(done, total);
    if (options.signal?.aborted) throw new DOMException('The report was cancelled', 'AbortError');
    await options.pause?.();
    if (options.signal?.aborted) throw new DOMException('The report was cancelled', 'AbortError');
  };
  front(w, model);
  summary(w, model);
  sinceLastVisit(w, model);
  ranked(w, model);
  await step();
  for (const sheet of model.rooms) {
    drawRoomSheet(w, sheet);
    await step();
  }
  dwellings(w, model);
  tables(w, model);
  limitations(w, model);
  signOff(w, model);
  appendix(w, model);
  w.finish(`${model.meta.title} · ${model.meta.reference} rev ${model.meta.revision}`, `Ventwalk screening report · issued ${model.meta.issueDate} · screening estimates: read with the limitations and cautions`);
  await step();
  return new Uint8Array(doc.output('arraybuffer'));
}
