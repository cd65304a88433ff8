/**
 * Where a logger file's table starts: the preamble lines before it (device notes, a title), the
 * header line of column names, an optional units line under it, and the first data line. A data
 * line has at least two numbers or times and few words; the header is the wordy line just
 * before the data (or before a units line); everything above is preamble. Without a wordy line
 * the columns are named "Column 1", "Column 2", ….
 *
 * Rows are the file's lines split by the delimiter, index = line − 1.
 *
 * Example: rows [['Room 4 logger'], ['Time', 'CO2', 'Temp'], ['', 'ppm', '°C'],
 * ['27/10/2024 00:00', '812', '19.5'], …] → preamble 1, header row 1, units row 2, data from row 3,
 * names ['Time', 'CO2', 'Temp'], units ['', 'ppm', '°C'].
 */
import { cellKind } from './cell-kind.ts';

export interface TableLayout {
  /** Lines before the header (or before the data when there is no header). */
  preambleLines: number;
  /** Row index of the header, or null when the file has none. */
  headerRow: number | null;
  /** Row index of a units line under the header, or null. */
  unitsRow: number | null;
  /** Row index of the first data line. */
  dataStart: number;
  /** A name for every column (the header's, or "Column n"). */
  names: string[];
  /** The unit written for every column (in a units line or in brackets in the name), '' when none. */
  units: string[];
}

const UNIT_CELL = /^[[(]?\s*(ppm|°\s*[CF]|º\s*[CF]|deg\s*[CF]|[CF]|%|%\s*rh|rh\s*%|s|ms|days?|hh:mm(:ss)?|dd[./-]mm[./-]yy(yy)?|mm[./-]dd[./-]yy(yy)?|yyyy-mm-dd)\s*[\])]?$/i;
const UNIT_IN_NAME = /[[(]\s*([^\])]+?)\s*[\])]\s*$/;

function kinds(row: readonly string[]) {
  let typed = 0;
  let text = 0;
  for (const cell of row) {
    const k = cellKind(cell);
    if (k === 'number' || k === 'date-time') typed++;
    else if (k === 'text') text++;
  }
  return { typed, text };
}

function isDataLike(row: readonly string[]): boolean {
  const { typed, text } = kinds(row);
  return typed >= 2 && text <= typed / 2;
}

function isUnitsLike(row: readonly string[]): boolean {
  const filled = row.map((c) => c.trim()).filter((c) => c !== '');
  return filled.length > 0 && filled.every((c) => UNIT_CELL.test(c));
}

function isHeaderLike(row: readonly string[], fields: number): boolean {
  const { typed, text } = kinds(row);
  return text >= 1 && text >= typed && row.length >= Math.min(2, fields);
}

/** Find the table in the first rows of a file; null when no data line is found. */
export function detectTableLayout(rows: readonly (readonly string[])[], fields: number): TableLayout | null {
  let dataStart = -1;
  for (let i = 0; i < rows.length; i++) {
    const next = rows.slice(i, i + 3).filter((r) => r.length > 1 || r[0]?.trim());
    if (isDataLike(rows[i]!) && next.every(isDataLike)) {
      dataStart = i;
      break;
    }
  }
  if (dataStart < 0) return null;
  let unitsRow: number | null = null;
  let headerRow: number | null = null;
  const above = (i: number) => (i >= 0 ? rows[i] : undefined);
  if (above(dataStart - 1) && isUnitsLike(rows[dataStart - 1]!) && above(dataStart - 2) && isHeaderLike(rows[dataStart - 2]!, fields)) {
    unitsRow = dataStart - 1;
    headerRow = dataStart - 2;
  } else if (above(dataStart - 1) && isHeaderLike(rows[dataStart - 1]!, fields)) {
    headerRow = dataStart - 1;
  }
  const width = Math.max(fields, rows[dataStart]!.length);
  const header = headerRow === null ? [] : rows[headerRow]!;
  const unitLine = unitsRow === null ? [] : rows[unitsRow]!;
  const names: string[] = [];
  const units: string[] = [];
  for (let c = 0; c < width; c++) {
    const name = header[c]?.trim() || `Column ${c + 1}`;
    const written = unitLine[c]?.trim() ?? '';
    names.push(name);
    units.push(written || (UNIT_IN_NAME.exec(name)?.[1] ?? ''));
  }
  return { preambleLines: headerRow ?? dataStart, headerRow, unitsRow, dataStart, names, units };
}
