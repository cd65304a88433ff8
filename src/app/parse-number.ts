/**
 * Our own parser for numbers people type: trims, reads a decimal comma or a decimal point,
 * treats an empty field as empty (never 0), and rejects anything else with a message that
 * names the field. Thousands separators are refused rather than guessed ("1,500" could be one
 * and a half or fifteen hundred).
 *
 * Examples: parseTypedNumber('2,4', 'Room height') → { ok: true, value: 2.4 };
 * parseTypedNumber('  ', …) → { ok: true, value: undefined };
 * parseTypedNumber('2.4m', 'Room height') → { ok: false, message: 'Room height: type a number such as 2.4 or 2,4' }.
 */
export type ParsedNumber = { ok: true; value: number | undefined } | { ok: false; message: string };

const NUMBER = /^[+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)$/;

export function parseTypedNumber(typed: string, field: string): ParsedNumber {
  const text = typed.trim().replace(/^−/, '-'); // a typographic minus from some keyboards
  if (text === '') return { ok: true, value: undefined };
  if (!NUMBER.test(text)) {
    return { ok: false, message: `${field}: type a number such as 2.4 or 2,4` };
  }
  const value = Number(text.replace(',', '.'));
  if (!Number.isFinite(value)) return { ok: false, message: `${field}: the number is too large` };
  return { ok: true, value: value + 0 };
}
