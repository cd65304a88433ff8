/**
 * Draw a report chart as vectors: the shared geometry of src/chart/time-chart.ts (the same the
 * screens draw as SVG) turned into jspdf lines, text and rectangles. Limits are dashed and
 * labelled in words, scheduled periods shaded light grey and named, readings drawn as a line or
 * as small squares, a second line (the other end of a predicted range) dotted so it is not taken
 * for a limit; the axes carry their units. Readable in black and white.
 */
import { timeChart } from '../../chart/time-chart.ts';
import type { ReportChart } from '../report-model.ts';
import { pdfText } from './pdf-text.ts';
import { FILL_PERIOD, INK, MUTED, RULE, TYPE } from './pdf-style.ts';
import type { PdfWriter } from './pdf-writer.ts';

/** Height of a chart on the page, points. */
export const CHART_HEIGHT = 130;

export function drawChart(w: PdfWriter, chart: ReportChart, height = CHART_HEIGHT): void {
  const caption = w.wrap(chart.caption, TYPE.small);
  w.ensure(height + 24 + caption.length * w.lineHeight(TYPE.small));
  w.paragraph(chart.title, { bold: true, size: TYPE.body, after: 2 });
  const g = timeChart({
    width: w.width,
    height,
    series: chart.series,
    limits: chart.limits,
    periods: chart.periods,
    yLabel: chart.yLabel,
    yInclude: chart.yInclude,
    ...(chart.timeRange_s ? { timeRange_s: chart.timeRange_s } : {}),
    margin: { top: 10, right: 10, bottom: 26, left: 52 },
  });
  const doc = w.doc;
  const ox = w.left;
  const oy = w.y;
  const { plot } = g;
  doc.setFontSize(TYPE.tiny);
  for (const p of g.periods) {
    w.colour(FILL_PERIOD, 'fill');
    doc.rect(ox + p.x0, oy + plot.y, p.x1 - p.x0, plot.height, 'F');
    w.colour(MUTED);
    doc.text(pdfText(p.label), ox + p.x0 + 2, oy + plot.y + 8, { maxWidth: Math.max(20, p.x1 - p.x0 - 4) });
  }
  w.colour(RULE, 'draw');
  doc.setLineWidth(0.3);
  for (const t of g.yTicks) {
    doc.line(ox + plot.x, oy + t.y, ox + plot.x + plot.width, oy + t.y);
    w.colour(MUTED);
    doc.text(t.label, ox + plot.x - 4, oy + t.y + 2.5, { align: 'right' });
  }
  for (const t of g.xTicks) {
    doc.line(ox + t.x, oy + plot.y + plot.height, ox + t.x, oy + plot.y + plot.height + 3);
    doc.text(t.label, ox + t.x, oy + plot.y + plot.height + 11, { align: 'center' });
  }
  w.colour(INK, 'draw');
  doc.setLineWidth(0.6);
  doc.rect(ox + plot.x, oy + plot.y, plot.width, plot.height, 'S');
  doc.text(pdfText(g.yLabel), ox + 10, oy + plot.y + plot.height / 2, { angle: 90, align: 'center' });
  doc.text('time (as recorded)', ox + plot.x + plot.width / 2, oy + plot.y + plot.height + 21, { align: 'center' });
  doc.setLineWidth(0.7);
  doc.setLineDashPattern([4, 2], 0);
  for (const l of g.limits) {
    doc.line(ox + plot.x, oy + l.y, ox + plot.x + plot.width, oy + l.y);
    w.colour(INK);
    doc.text(pdfText(l.label), ox + plot.x + plot.width - 3, oy + l.y - 2.5, { align: 'right' });
  }
  doc.setLineDashPattern([], 0);
  doc.setLineWidth(1.1);
  w.colour(INK, 'fill');
  let lines = 0;
  for (const s of g.series) {
    const dotted = s.style !== 'points' && lines++ > 0;
    doc.setLineDashPattern(dotted ? [1, 1.8] : [], 0);
    for (const seg of s.segments) {
      if (s.style === 'points' || seg.length === 1) {
        for (const p of seg) doc.rect(ox + p.x - 1.6, oy + p.y - 1.6, 3.2, 3.2, 'F');
      } else {
        doc.lines(
          seg.slice(1).map((p, i) => [p.x - seg[i]!.x, p.y - seg[i]!.y]),
          ox + seg[0]!.x,
          oy + seg[0]!.y,
          [1, 1],
          'S',
          false,
        );
      }
    }
  }
  doc.setLineDashPattern([], 0);
  doc.setLineWidth(0.4);
  w.y = oy + height + 2;
  w.paragraph(chart.caption, { size: TYPE.small, colour: MUTED });
}
