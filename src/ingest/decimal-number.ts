/**
 * A number written in a logger file, with a decimal point or a decimal comma. Thousands groups
 * written with the other mark ("1,234.5" or "1.234,5") are accepted; a lone group mark never is
 * taken for a decimal. Empty text is NaN, never 0.
 *
 * Example: parseDecimalNumber('21,5', ',') = 21.5; parseDecimalNumber('1.234,5', ',') = 1234.5;
 * parseDecimalNumber('', '.') = NaN.
 */

/** The decimal mark of a file. */
export type DecimalSeparator = '.' | ',';

const PLAIN = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;
const GROUPED_POINT = /^[-+]?\d{1,3}(,\d{3})+(\.\d+)?$/;
const GROUPED_COMMA = /^[-+]?\d{1,3}(\.\d{3})+(,\d+)?$/;

export function parseDecimalNumber(text: string, decimal: DecimalSeparator): number {
  let s = text.trim();
  if (s === '') return NaN;
  if (decimal === ',') {
    if (GROUPED_COMMA.test(s)) s = s.replaceAll('.', '');
    if (s.includes(',')) {
      if (s.indexOf(',') !== s.lastIndexOf(',') || s.includes('.')) return NaN;
      s = s.replace(',', '.');
    }
  } else if (s.includes(',')) {
    if (!GROUPED_POINT.test(s)) return NaN;
    s = s.replaceAll(',', '');
  }
  return PLAIN.test(s) ? Number(s) : NaN;
}
