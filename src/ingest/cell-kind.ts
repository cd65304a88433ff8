/**
 * What a cell of a logger file looks like before its column is known: empty, a number (point
 * or comma decimal), a date or time, or other text. Used to tell data rows from preamble,
 * header and units rows, and to choose the delimiter.
 *
 * Example: cellKind('27/10/2024 01:30') = 'date-time'; cellKind('21,5') = 'number';
 * cellKind('CO2 (ppm)') = 'text'; cellKind(' ') = 'empty'.
 */

export type CellKind = 'empty' | 'number' | 'date-time' | 'text';

const NUMBER = /^[-+]?(\d+([.,]\d+)?|\d{1,3}([.,]\d{3})+([.,]\d+)?)([eE][-+]?\d+)?$/;
const DATE_TIME = /^\d{1,4}[-/.]\d{1,2}[-/.]\d{1,4}([T ,]+\d{1,2}:\d{2}(:\d{2}([.,]\d+)?)?\s*([AaPp]\.?[Mm]\.?)?)?\s*(Z|[+-]\d{2}:?\d{2})?$|^\d{1,2}:\d{2}(:\d{2}([.,]\d+)?)?\s*([AaPp]\.?[Mm]\.?)?$/;

export function cellKind(text: string): CellKind {
  const s = text.trim();
  if (s === '') return 'empty';
  if (NUMBER.test(s)) return 'number';
  if (DATE_TIME.test(s)) return 'date-time';
  return 'text';
}
