/**
 * One room's sheet in the PDF, on a new page and in four steps: observation → measurement →
 * interpretation → recommendation, with moisture and mould findings, the chart of the day and
 * captioned photos. Values carry their basis in words; nothing here computes a number.
 */
import type { ReportFigure } from '../report-figure.ts';
import type { RoomSheet } from '../report-model.ts';
import { drawChart } from './pdf-chart.ts';
import { pdfText } from './pdf-text.ts';
import { MUTED, TYPE } from './pdf-style.ts';
import type { PdfWriter } from './pdf-writer.ts';

/** Widest and tallest a photo is drawn, points. */
const PHOTO_BOX = { width: 235, height: 170 };

const cell = (f: ReportFigure | null) => (f ? f.text.replace(/, (measured|predicted|assumed|estimated from measurements)$/, '') : '—');

function photos(w: PdfWriter, sheet: RoomSheet): void {
  if (sheet.photos.length === 0) return;
  w.heading('Photos', 3);
  let column = 0;
  let rowTop = w.y;
  for (const p of sheet.photos) {
    const scale = Math.min(PHOTO_BOX.width / p.width_px, PHOTO_BOX.height / p.height_px);
    const width = p.width_px * scale;
    const height = p.height_px * scale;
    if (column === 0) {
      w.ensure(PHOTO_BOX.height + 30);
      rowTop = w.y;
    }
    const x = w.left + column * (PHOTO_BOX.width + 30);
    w.doc.addImage(p.jpegBase64, 'JPEG', x, rowTop + 4, width, height);
    w.doc.setFontSize(TYPE.small);
    w.colour(MUTED);
    w.doc.text(w.wrap(p.caption, TYPE.small, PHOTO_BOX.width).slice(0, 2), x, rowTop + height + 14);
    column = (column + 1) % 2;
    w.y = column === 0 ? rowTop + PHOTO_BOX.height + 34 : rowTop;
  }
  if (column === 1) w.y = rowTop + PHOTO_BOX.height + 34;
}

export function drawRoomSheet(w: PdfWriter, sheet: RoomSheet): void {
  w.newPage();
  w.heading(`Room: ${sheet.place}`, 1);
  w.paragraph(`${sheet.use} · priority: ${sheet.priorityText}`, { colour: MUTED });

  w.heading('1  Observation (as found)', 2);
  w.facts(sheet.observation.facts);
  if (sheet.observation.openings.length) {
    w.paragraph('Openings, vents and fans', { bold: true, after: 0 });
    w.list(sheet.observation.openings, { size: TYPE.small });
  }
  if (sheet.observation.defects.length) {
    w.paragraph('Defects seen', { bold: true, after: 0 });
    w.list(sheet.observation.defects, { size: TYPE.small });
  }
  if (sheet.observation.appliances.length) {
    w.paragraph('Combustion appliances', { bold: true, after: 0 });
    w.list(sheet.observation.appliances, { size: TYPE.small });
  }
  if (sheet.observation.interview.length) {
    w.paragraph('What the occupants or staff said', { bold: true, after: 0 });
    w.list(sheet.observation.interview, { size: TYPE.small });
  }
  if (sheet.observation.notes) w.paragraph(`Notes: ${sheet.observation.notes}`, { size: TYPE.small });
  photos(w, sheet);

  w.heading('2  Measurement', 2);
  if (sheet.measurement.none) w.paragraph(sheet.measurement.none);
  w.table(
    ['Reading set', 'Times', 'Method', 'Outdoor air', 'Air changes', 'Per person', 'CO2 settles at'],
    sheet.measurement.rows.map((r) => [r.label, r.time, `${r.method}; ${r.basis}`, cell(r.supply), cell(r.airChanges), cell(r.perPerson), cell(r.steady)]),
    { columnStyles: { 0: { cellWidth: 62 }, 1: { cellWidth: 58 }, 2: { cellWidth: 90 } } },
  );
  w.paragraph(sheet.measurement.outdoor, { size: TYPE.small, colour: MUTED });
  if (sheet.chart) drawChart(w, sheet.chart);

  w.heading('3  Interpretation', 2);
  w.facts(sheet.interpretation.headline.map((f) => [f.label, f.text] as const), 150);
  w.paragraph(sheet.interpretation.headlineSource, { size: TYPE.small, colour: MUTED });
  w.table(
    ['Scenario', 'Weather case (least air)', 'Outdoor air', 'Per person', 'CO2 settles at'],
    sheet.interpretation.scenarios.map((s) => [s.label, s.weather, s.supply.text, cell(s.perPerson), cell(s.steady)]),
  );
  w.list(sheet.interpretation.profile, { size: TYPE.small });
  if (sheet.interpretation.reconciliation.length) w.list(sheet.interpretation.reconciliation, { size: TYPE.small });
  if (sheet.interpretation.checks.length) {
    w.table(
      ['Criterion', 'Status', 'Averaging', 'This room', 'Limit', 'Finding'],
      sheet.interpretation.checks.map((c) => [c.criterion, c.status, c.period, c.value, c.limit, c.finding]),
    );
    if (sheet.interpretation.checks.some((c) => c.criterion.endsWith(' *'))) {
      w.paragraph('* Not yet confirmed against its source document: see the criteria table for the source.', { size: TYPE.small, colour: MUTED });
    }
  }
  if (sheet.interpretation.settleBy.length) {
    w.paragraph(`To settle the open checks: ${sheet.interpretation.settleBy.join(' ')}`, { size: TYPE.small });
  }
  if (sheet.interpretation.duties.length) {
    w.paragraph(`Duties that also apply, which readings cannot test: ${sheet.interpretation.duties.join('; ')}.`, { size: TYPE.small });
  }
  if (sheet.interpretation.cautions.length) {
    w.paragraph('Cautions on these figures', { bold: true, after: 0, size: TYPE.small });
    w.list(sheet.interpretation.cautions, { size: TYPE.small });
  }

  w.heading('Moisture and mould', 3);
  w.list(sheet.moisture, { size: TYPE.small });

  w.heading('4  Recommendation', 2);
  w.list(sheet.recommendation.lines);
  if (sheet.recommendation.safety.length) {
    w.paragraph('Safety', { bold: true, after: 0 });
    w.list(sheet.recommendation.safety.map(pdfText));
  }
}
