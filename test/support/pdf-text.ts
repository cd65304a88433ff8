/**
 * Read a PDF back in tests with pdfjs-dist's legacy build (the one that runs on Node 20): the
 * text of each page, with the pieces pdfjs splits a line into joined up again.
 */
import { fileURLToPath } from 'node:url';

const fonts = fileURLToPath(new URL('../../node_modules/pdfjs-dist/standard_fonts/', import.meta.url));

/** The text of every page, in page order. */
export async function pdfPages(bytes: Uint8Array): Promise<string[]> {
  const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const pdf = await pdfjs.getDocument({ data: bytes.slice(), standardFontDataUrl: fonts, verbosity: 0 }).promise;
  const pages: string[] = [];
  for (let i = 1; i <= pdf.numPages; i++) {
    const content = await (await pdf.getPage(i)).getTextContent();
    pages.push(content.items.map((item) => ('str' in item ? item.str + (item.hasEOL ? '\n' : '') : '')).join(''));
  }
  await pdf.destroy();
  return pages;
}
