/**
 * The decimal mark of a logger file, from its data cells: "21,5" (one comma between digits,
 * not a group of three) counts for a comma, "21.5" for a point. With a comma delimiter a decimal
 * comma can only sit in quoted cells, which the count sees the same way.
 *
 * Example: detectDecimalSeparator([['2024-10-27 01:00', '21,5', '812']]) = { decimal: ',', confidence: 1 }.
 */
import type { DecimalSeparator } from './decimal-number.ts';

const COMMA_DECIMAL = /^[-+]?\d+,(\d{1,2}|\d{4,})$/;
const POINT_DECIMAL = /^[-+]?\d+\.(\d{1,2}|\d{4,})$/;
const AMBIGUOUS_COMMA = /^[-+]?\d{1,3},\d{3}$/;
const AMBIGUOUS_POINT = /^[-+]?\d{1,3}\.\d{3}$/;

export interface DecimalSeparatorDetection {
  decimal: DecimalSeparator;
  /** 0–1: share of decimal-looking cells that agree; 0.5 when no cell shows a decimal mark. */
  confidence: number;
}

export function detectDecimalSeparator(rows: readonly (readonly string[])[]): DecimalSeparatorDetection {
  let comma = 0;
  let point = 0;
  let commaThousandsLike = 0;
  let pointThousandsLike = 0;
  for (const row of rows) {
    for (const raw of row) {
      const cell = raw.trim();
      if (COMMA_DECIMAL.test(cell)) comma++;
      else if (POINT_DECIMAL.test(cell)) point++;
      else if (AMBIGUOUS_COMMA.test(cell)) commaThousandsLike++;
      else if (AMBIGUOUS_POINT.test(cell)) pointThousandsLike++;
    }
  }
  if (comma === 0 && point === 0) {
    // Only three-digit groups seen: "1,234" is more often a decimal comma file's 1.234 in a
    // semicolon file than a thousands group, but nothing is sure.
    return { decimal: commaThousandsLike > pointThousandsLike ? ',' : '.', confidence: 0.5 };
  }
  return comma > point ? { decimal: ',', confidence: comma / (comma + point) } : { decimal: '.', confidence: point / (comma + point) };
}
