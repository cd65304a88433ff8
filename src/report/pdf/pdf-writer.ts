/**
 * A flowing writer over one jspdf document: a cursor down the page, headings, wrapped
 * paragraphs and lists that break between lines, label-value blocks, and tables through
 * jspdf-autotable (called as a function) with the head repeated on every page and no row split
 * across pages. The running header and "page X of Y" are drawn in a final pass (`finish`), when
 * the page count is known.
 */
import type { jsPDF } from 'jspdf';
import { autoTable, type RowInput, type UserOptions } from 'jspdf-autotable';
import { pdfText } from './pdf-text.ts';
import { ACCENT, FILL_ALT, FILL_HEAD, INK, MUTED, PAGE, RULE, TYPE } from './pdf-style.ts';

type Rgb = readonly [number, number, number];

export class PdfWriter {
  readonly doc: jsPDF;
  y: number = PAGE.top;
  readonly left = PAGE.margin;
  readonly width = PAGE.width - 2 * PAGE.margin;
  readonly bottom = PAGE.height - PAGE.bottom;

  constructor(doc: jsPDF) {
    this.doc = doc;
    doc.setFont('helvetica', 'normal');
  }

  colour(rgb: Rgb, kind: 'text' | 'draw' | 'fill' = 'text'): void {
    if (kind === 'text') this.doc.setTextColor(rgb[0], rgb[1], rgb[2]);
    else if (kind === 'draw') this.doc.setDrawColor(rgb[0], rgb[1], rgb[2]);
    else this.doc.setFillColor(rgb[0], rgb[1], rgb[2]);
  }

  lineHeight(size: number): number {
    return size * TYPE.line;
  }

  newPage(): void {
    this.doc.addPage();
    this.y = PAGE.top;
  }

  /** Start a new page unless `space` points fit below the cursor. */
  ensure(space: number): void {
    if (this.y + space > this.bottom) this.newPage();
  }

  /** Lines of text wrapped to a width at a size. */
  wrap(text: string, size: number, width = this.width, style: 'normal' | 'bold' = 'normal'): string[] {
    this.doc.setFont('helvetica', style);
    this.doc.setFontSize(size);
    return this.doc.splitTextToSize(pdfText(text), width) as string[];
  }

  heading(text: string, level: 1 | 2 | 3 = 1): void {
    const size = level === 1 ? TYPE.heading : level === 2 ? TYPE.subheading : TYPE.body;
    this.ensure(this.lineHeight(size) * 3 + 8);
    if (level === 1 && this.y > PAGE.top) this.y += 8;
    this.y += level === 3 ? 4 : 6;
    this.doc.setFont('helvetica', 'bold');
    this.doc.setFontSize(size);
    this.colour(level === 3 ? INK : ACCENT);
    const lines = this.wrap(text, size, this.width, 'bold');
    for (const line of lines) {
      this.y += this.lineHeight(size);
      this.doc.text(line, this.left, this.y);
    }
    if (level === 1) {
      this.colour(ACCENT, 'draw');
      this.doc.setLineWidth(1.2);
      this.doc.line(this.left, this.y + 4, this.left + this.width, this.y + 4);
      this.y += 6;
    }
    this.y += 4;
    this.colour(INK);
    this.doc.setFont('helvetica', 'normal');
  }

  paragraph(text: string, options: { size?: number; bold?: boolean; colour?: Rgb; indent?: number; after?: number } = {}): void {
    const size = options.size ?? TYPE.body;
    const indent = options.indent ?? 0;
    const lines = this.wrap(text, size, this.width - indent, options.bold ? 'bold' : 'normal');
    this.colour(options.colour ?? INK);
    for (const line of lines) {
      this.ensure(this.lineHeight(size));
      this.y += this.lineHeight(size);
      this.doc.text(line, this.left + indent, this.y);
    }
    this.y += options.after ?? 4;
    this.colour(INK);
    this.doc.setFont('helvetica', 'normal');
  }

  /** A list with a marker before each item; items break between lines, never inside a short item. */
  list(items: readonly string[], options: { size?: number; marker?: string } = {}): void {
    const size = options.size ?? TYPE.body;
    for (const item of items) {
      const lines = this.wrap(item, size, this.width - 14);
      if (lines.length <= 4) this.ensure(lines.length * this.lineHeight(size));
      this.doc.setFont('helvetica', 'normal');
      this.doc.setFontSize(size);
      lines.forEach((line, i) => {
        this.ensure(this.lineHeight(size));
        this.y += this.lineHeight(size);
        if (i === 0) this.doc.text(options.marker ?? '•', this.left + 3, this.y);
        this.doc.text(line, this.left + 14, this.y);
      });
      this.y += 2;
    }
    this.y += 3;
  }

  /** Label-value pairs in two columns. */
  facts(rows: readonly (readonly [string, string])[], labelWidth = 130): void {
    for (const [label, value] of rows) {
      const lines = this.wrap(value, TYPE.body, this.width - labelWidth);
      this.ensure(lines.length * this.lineHeight(TYPE.body));
      this.doc.setFont('helvetica', 'bold');
      this.colour(MUTED);
      this.doc.text(pdfText(label), this.left, this.y + this.lineHeight(TYPE.body));
      this.doc.setFont('helvetica', 'normal');
      this.colour(INK);
      lines.forEach((line, i) => this.doc.text(line, this.left + labelWidth, this.y + (i + 1) * this.lineHeight(TYPE.body)));
      this.y += lines.length * this.lineHeight(TYPE.body) + 3;
    }
    this.y += 3;
  }

  /** A table: head on every page, rows kept whole, our palette; the cursor moves below it. */
  table(head: string[], body: readonly (readonly string[])[], options: Partial<UserOptions> = {}): void {
    if (body.length === 0) return;
    this.ensure(60);
    autoTable(this.doc, {
      head: [head.map(pdfText)],
      body: body.map((row) => row.map(pdfText)) as RowInput[],
      startY: this.y + 4,
      margin: { top: PAGE.top, bottom: PAGE.bottom, left: this.left, right: PAGE.margin },
      rowPageBreak: 'avoid',
      showHead: 'everyPage',
      theme: 'grid',
      styles: { font: 'helvetica', fontSize: TYPE.small, cellPadding: 3, textColor: [...INK], lineColor: [...RULE], lineWidth: 0.4, overflow: 'linebreak', valign: 'top' },
      headStyles: { font: 'helvetica', fontStyle: 'bold', fillColor: [...FILL_HEAD], textColor: [...INK] },
      alternateRowStyles: { fillColor: [...FILL_ALT] },
      ...options,
    });
    const last = (this.doc as unknown as { lastAutoTable?: { finalY: number } }).lastAutoTable;
    this.y = (last?.finalY ?? this.y) + 10;
  }

  /** The running header and footer on every page but the first: title, reference, page X of Y. */
  finish(header: string, footer: string): void {
    const pages = this.doc.getNumberOfPages();
    for (let i = 1; i <= pages; i++) {
      this.doc.setPage(i);
      this.doc.setFont('helvetica', 'normal');
      this.doc.setFontSize(TYPE.tiny);
      this.colour(MUTED);
      if (i > 1) {
        this.doc.text(pdfText(header), this.left, 36);
        this.colour(RULE, 'draw');
        this.doc.setLineWidth(0.5);
        this.doc.line(this.left, 41, this.left + this.width, 41);
      }
      this.doc.text(pdfText(footer), this.left, PAGE.height - 28);
      this.doc.text(`page ${i} of ${pages}`, this.left + this.width, PAGE.height - 28, { align: 'right' });
    }
    this.colour(INK);
  }
}
