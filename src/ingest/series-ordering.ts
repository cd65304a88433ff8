/**
 * Readings put in time order with repeated times removed. Loggers append after a restart, or a
 * file is pasted together, so rows can arrive out of order or twice. The sort is stable (rows
 * with the same time keep file order) and the first row of each time is kept; a repeat whose
 * values differ is counted apart, since one of them is wrong.
 *
 * Example: times [60, 0, 60] with CO2 [810, 800, 815] → times [0, 60], CO2 [800, 810];
 * outOfOrder 1, duplicates 1 (conflicting 1, at the third row's line).
 */

/** Parallel columns: times in s and any value columns of the same length, with file lines. */
export interface SeriesColumns {
  times_s: Float64Array;
  values: Array<Float64Array | null>;
  lines: Uint32Array;
}

export interface OrderingReport {
  /** Rows whose time was earlier than the row before. */
  outOfOrder: number;
  /** Rows dropped because their time was already present. */
  duplicates: number;
  /** Of those, rows whose values differed from the row kept. */
  conflicting: number;
  /** File lines of the first dropped rows (at most 20). */
  duplicateLines: number[];
}

function same(a: number, b: number): boolean {
  return a === b || (Number.isNaN(a) && Number.isNaN(b));
}

export function orderSeries(input: SeriesColumns): { columns: SeriesColumns; report: OrderingReport } {
  const n = input.times_s.length;
  let outOfOrder = 0;
  for (let i = 1; i < n; i++) if (input.times_s[i]! < input.times_s[i - 1]!) outOfOrder++;
  let order: Uint32Array | null = null;
  if (outOfOrder > 0) {
    const idx = Array.from({ length: n }, (_, i) => i);
    idx.sort((a, b) => input.times_s[a]! - input.times_s[b]! || a - b);
    order = Uint32Array.from(idx);
  }
  const at = (i: number) => (order ? order[i]! : i);
  const keep: number[] = [];
  let duplicates = 0;
  let conflicting = 0;
  const duplicateLines: number[] = [];
  for (let i = 0; i < n; i++) {
    const row = at(i);
    const last = keep.length ? keep[keep.length - 1]! : -1;
    if (last >= 0 && input.times_s[row] === input.times_s[last]) {
      duplicates++;
      if (input.values.some((v) => v && !same(v[row]!, v[last]!))) conflicting++;
      if (duplicateLines.length < 20) duplicateLines.push(input.lines[row]!);
      continue;
    }
    keep.push(row);
  }
  if (!order && duplicates === 0) return { columns: input, report: { outOfOrder, duplicates, conflicting, duplicateLines } };
  const pickF = (a: Float64Array) => Float64Array.from(keep, (r) => a[r]!);
  return {
    columns: { times_s: pickF(input.times_s), values: input.values.map((v) => (v ? pickF(v) : null)), lines: Uint32Array.from(keep, (r) => input.lines[r]!) },
    report: { outOfOrder, duplicates, conflicting, duplicateLines },
  };
}
