/**
 * Text as the PDF's built-in fonts can print it. The 14 standard fonts cover the Windows-1252
 * code page (m², m³, °C, ±, µ, ’, –, …) but not subscripts or superscript minus: CO₂ is written
 * "CO2", h⁻¹ "/h", ≤ "<=", and anything else outside the code page becomes "?" rather than
 * garbling the whole line (jspdf prints one unknown character as noise across the string).
 *
 * Example: pdfText('CO₂ ≤ 1500 ppm, 0.5 h⁻¹') = 'CO2 <= 1500 ppm, 0.5 /h'.
 */
const REPLACEMENTS: [RegExp, string][] = [
  [/h⁻¹/g, '/h'],
  [/s⁻¹/g, '/s'],
  [/⁻¹/g, '^-1'],
  [/≤/g, '<='],
  [/≥/g, '>='],
  [/≈/g, '~'],
  [/→/g, '->'],
  [/−/g, '-'],
  [/λ/g, 'lambda'],
  [/Δ/g, 'delta '],
  [/\u00a0/g, ' '],
];

/** Characters of Windows-1252 above 0x7F that are not Latin-1 (jspdf maps these for the standard fonts). */
const CP1252_EXTRA = '€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ';

function printable(ch: string): boolean {
  const code = ch.charCodeAt(0);
  return (code >= 0x20 && code <= 0x7e) || (code >= 0xa0 && code <= 0xff) || ch === '\n' || CP1252_EXTRA.includes(ch);
}

export function pdfText(text: string): string {
  let out = text;
  for (const [pattern, replacement] of REPLACEMENTS) out = out.replace(pattern, replacement);
  out = out.replace(/[₀-₉]/g, (c) => String(c.charCodeAt(0) - 0x2080));
  return Array.from(out, (ch) => (printable(ch) ? ch : '?')).join('');
}
