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

/**
 * Plain "-12.5" or "812" (with the file's own decimal mark, no grouping, no exponent) read by
 * hand: the common case, once per cell of a 100,000-row file. NaN when the text is anything else.
 */
function plainNumber(text: string, mark: number): number {
  const n = text.length;
  let i = 0;
  let sign = 1;
  let c = text.charCodeAt(0);
  if (c === 45 || c === 43) {
    sign = c === 45 ? -1 : 1;
    i = 1;
  }
  let whole = 0;
  let digits = 0;
  for (; i < n; i++) {
    c = text.charCodeAt(i);
    if (c < 48 || c > 57) break;
    whole = whole * 10 + (c - 48);
    digits++;
  }
  if (i === n) return digits ? sign * whole : NaN;
  if (c !== mark || digits > 15) return NaN;
  let fraction = 0;
  let scale = 1;
  for (i++; i < n; i++) {
    c = text.charCodeAt(i);
    if (c < 48 || c > 57 || scale > 1e15) return NaN;
    fraction = fraction * 10 + (c - 48);
    scale *= 10;
  }
  return digits || scale > 1 ? sign * (whole + fraction / scale) : NaN;
}

export function parseDecimalNumber(text: string, decimal: DecimalSeparator): number {
  const quick = plainNumber(text, decimal === ',' ? 44 : 46);
  if (!Number.isNaN(quick)) return quick;
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
