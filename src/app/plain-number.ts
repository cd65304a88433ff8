/**
 * A number written as en-GB writes it, with thousands grouped by commas and up to six decimals
 * (trailing zeros dropped): what Intl.NumberFormat('en-GB', { maximumFractionDigits: 6 }) gives,
 * without it. The first Intl formatter a page makes loads the browser's locale data, about 30 ms
 * on a phone, in the middle of drawing the first screen that shows a figure; these figures need
 * none of it. Like Intl, it rounds the number's shortest decimal form (what String(x) writes),
 * halves away from zero: 0.0000005 is written 0.000001, though the double is a hair below.
 *
 * Examples: plainNumber(1234.5) = '1,234.5'; plainNumber(0.1 + 0.2) = '0.3';
 * plainNumber(0.5998135) = '0.599814'; plainNumber(-0.0000004) = '-0'.
 */

const DECIMALS = 6;

/** The digits of a non-negative finite number's shortest decimal form, split at the point. */
function decimalDigits(abs: number): { whole: string; fraction: string } {
  const [mantissa = '0', exponent = '0'] = String(abs).split('e');
  const [int = '0', frac = ''] = mantissa.split('.');
  let digits = int + frac;
  let point = int.length + Number(exponent);
  if (point <= 0) {
    digits = '0'.repeat(1 - point) + digits;
    point = 1;
  } else if (point > digits.length) {
    digits += '0'.repeat(point - digits.length);
  }
  return { whole: digits.slice(0, point), fraction: digits.slice(point) };
}

/** A string of decimal digits plus one ("0999" → "1000"). */
function addOne(digits: string): string {
  const out = digits.split('');
  for (let i = out.length - 1; i >= 0; i -= 1) {
    if (out[i] !== '9') {
      out[i] = String(Number(out[i]) + 1);
      return out.join('');
    }
    out[i] = '0';
  }
  return `1${out.join('')}`;
}

export function plainNumber(value: number): string {
  if (!Number.isFinite(value)) return new Intl.NumberFormat('en-GB', { maximumFractionDigits: DECIMALS }).format(value);
  const sign = value < 0 || Object.is(value, -0) ? '-' : '';
  const { whole, fraction } = decimalDigits(Math.abs(value));
  let kept = whole + fraction.slice(0, DECIMALS).padEnd(DECIMALS, '0');
  if ((fraction[DECIMALS] ?? '0') >= '5') kept = addOne(kept);
  const int = kept.slice(0, kept.length - DECIMALS).replace(/^0+(?=\d)/, '');
  const decimals = kept.slice(kept.length - DECIMALS).replace(/0+$/, '');
  return `${sign}${int.replace(/\B(?=(\d{3})+(?!\d))/g, ',')}${decimals ? `.${decimals}` : ''}`;
}
