/**
 * The readings a period's fit uses: the usable readings (not spikes, not excluded, not missing)
 * from its first to its last point, times from the period's start. Long periods are averaged
 * into at most `maxPoints` equal-time bins (a 10-second logger gives 2,000 points an hour); bins
 * much shorter than the room's time constant change the fitted rate negligibly while keeping
 * every fit fast.
 *
 * Example: 600 one-minute readings with maxPoints 120 → 120 readings, each the mean time and
 * mean level of 5 minutes.
 */
import type { Reading } from '../core/supply-estimate.ts';

/** Most points given to one fit (our own choice: keeps a 100,000-row file's fits well under a second). */
export const MAX_FIT_POINTS = 120;

export function periodReadings(
  times: Float64Array,
  co2: Float64Array,
  usable: Uint8Array,
  range: { first: number; last: number; start_s: number },
  maxPoints = MAX_FIT_POINTS,
): Reading[] {
  const picked: number[] = [];
  for (let i = range.first; i <= range.last; i++) if (usable[i] && Number.isFinite(co2[i]!)) picked.push(i);
  if (picked.length <= maxPoints) return picked.map((i) => ({ time_s: times[i]! - range.start_s, level_ppm: co2[i]! }));
  const t0 = times[picked[0]!]!;
  const width = (times[picked[picked.length - 1]!]! - t0) / maxPoints;
  const out: Reading[] = [];
  let k = 0;
  for (let b = 0; b < maxPoints; b++) {
    const limit = b === maxPoints - 1 ? Infinity : t0 + (b + 1) * width;
    let sumT = 0;
    let sumC = 0;
    let m = 0;
    while (k < picked.length && times[picked[k]!]! < limit) {
      sumT += times[picked[k]!]!;
      sumC += co2[picked[k]!]!;
      m++;
      k++;
    }
    if (m > 0) out.push({ time_s: sumT / m - range.start_s, level_ppm: sumC / m });
  }
  return out;
}
