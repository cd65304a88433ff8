/**
 * Where a change in a noisy record happens, to the reading: the split of a short stretch of
 * readings into two straight lines with the least total squared error (a two-segment
 * least-squares change point). The running median places a sharp corner only to within half
 * its window; this puts it back where the readings turn (people arrive, people leave).
 *
 * Units: times s, levels ppm. Returns an index of the series.
 *
 * Example: readings 800, 800, 800, 800, 860, 920, 980, 1040 at one-minute steps → the corner is at
 * the fourth reading (index 3), the last one before the rise.
 */

/** Best split index in [from, to] (inclusive) over the usable, finite readings; `fallback` if too few. */
export function refineCorner(times: Float64Array, co2: Float64Array, usable: Uint8Array, from: number, to: number, fallback: number): number {
  const idx: number[] = [];
  for (let i = Math.max(0, from); i <= Math.min(times.length - 1, to); i++) if (usable[i] && Number.isFinite(co2[i]!)) idx.push(i);
  const m = idx.length;
  if (m < 8) return fallback;
  const t0 = times[idx[0]!]!;
  // Prefix sums of 1, t, y, t², t·y, y² for straight-line fits of any run in O(1).
  const S = Array.from({ length: 6 }, () => new Float64Array(m + 1));
  for (let k = 0; k < m; k++) {
    const t = times[idx[k]!]! - t0;
    const y = co2[idx[k]!]!;
    const terms = [1, t, y, t * t, t * y, y * y];
    for (let j = 0; j < 6; j++) S[j]![k + 1] = S[j]![k]! + terms[j]!;
  }
  const sse = (a: number, b: number) => {
    const [n, st, sy, stt, sty, syy] = S.map((s) => s[b]! - s[a]!) as [number, number, number, number, number, number];
    const vt = stt - (st * st) / n;
    const vy = syy - (sy * sy) / n;
    const cty = sty - (st * sy) / n;
    return vt > 0 ? vy - (cty * cty) / vt : vy;
  };
  let best = fallback;
  let bestError = Infinity;
  // The corner reading ends the first line and starts the second.
  for (let k = 3; k <= m - 4; k++) {
    const error = sse(0, k + 1) + sse(k, m);
    if (error < bestError) {
      bestError = error;
      best = idx[k]!;
    }
  }
  return best;
}
