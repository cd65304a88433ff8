/**
 * The delimiter of a logger file, chosen from comma, semicolon, tab and bar by which one splits
 * the later lines of a sample (the data, after any preamble) into the same number of fields,
 * most of them numbers or times. A first line "sep=;" (a spreadsheet convention) decides it.
 * Semicolon usually comes with a decimal comma, which splits badly on commas: "10:00;21,5;45"
 * gives the same two fields per line on commas but three typed fields on semicolons.
 *
 * Example: detectDelimiter(['Time;CO2', '2024-10-27 01:00;812', '2024-10-27 01:01;815']) →
 * { delimiter: ';', fields: 2, confidence: 1 }.
 */
import Papa from 'papaparse';
import { cellKind } from './cell-kind.ts';

export type Delimiter = ',' | ';' | '\t' | '|';
export const DELIMITERS: readonly Delimiter[] = [',', ';', '\t', '|'];

export interface DelimiterDetection {
  delimiter: Delimiter;
  /** Fields in most data lines. */
  fields: number;
  /** 0–1: the share of data lines with that many fields, times the share of their cells that are typed. */
  confidence: number;
  /** True when a "sep=" line named it (that line is then preamble). */
  declared: boolean;
}

const DECLARED = /^sep=(.)\s*$/i;

export function detectDelimiter(sampleLines: readonly string[]): DelimiterDetection | null {
  const declared = DECLARED.exec(sampleLines[0] ?? '')?.[1];
  const lines = sampleLines.filter((l) => l.trim() !== '' && !DECLARED.test(l));
  if (lines.length === 0) return null;
  // The later half of the sample is most likely data.
  const tail = lines.slice(Math.floor(lines.length / 2)).join('\n');
  let best: DelimiterDetection | null = null;
  let bestScore = 0;
  for (const delimiter of DELIMITERS) {
    const rows = Papa.parse<string[]>(tail, { delimiter, skipEmptyLines: true }).data;
    const counts = new Map<number, number>();
    for (const row of rows) counts.set(row.length, (counts.get(row.length) ?? 0) + 1);
    let fields = 0;
    let most = 0;
    for (const [n, c] of counts) if (c > most || (c === most && n > fields)) [fields, most] = [n, c];
    if (fields < 2) continue;
    let typed = 0;
    let cells = 0;
    for (const row of rows) {
      if (row.length !== fields) continue;
      for (const cell of row) {
        cells++;
        if (cellKind(cell) !== 'text') typed++;
      }
    }
    const consistency = most / rows.length;
    const typedShare = cells ? typed / cells : 0;
    const score = consistency * typedShare + fields * 1e-6;
    if (delimiter === declared) return { delimiter, fields, confidence: 1, declared: true };
    if (score > bestScore) {
      bestScore = score;
      best = { delimiter, fields, confidence: Math.min(1, consistency * typedShare), declared: false };
    }
  }
  return best;
}
