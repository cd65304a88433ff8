/**
 * The ways to divide a set of openings into a low group and a high group, for the two-level
 * stack forms of BS 5925 (single-sided two openings; cross ventilation with low and high pairs).
 *
 * The published forms are for two openings (or two pairs) a vertical distance H_1 apart. With
 * more openings we try every division between distinct centre heights and take, for each, the
 * *smallest* separation across it (the gap between the highest low opening and the lowest high
 * one). Taking the smallest separation errs low, never high, and keeps the result from falling
 * when an opening is opened wider (our application of the published forms).
 */

/** An opening reduced to what the stack forms need: open area (m²) and centre height (m). */
export interface LevelledArea {
  area_m2: number;
  centreHeight_m: number;
}

/** One division: total low and high areas (m²) and the vertical gap between them (m). */
export interface HeightSplit {
  lowArea_m2: number;
  highArea_m2: number;
  separation_m: number;
}

/**
 * Every division of the open areas between distinct centre heights (none if all at one height).
 * Source: our application of the BS 5925 two-level stack forms (see the file note).
 * Example: heightSplits([{ area_m2: 0.2, centreHeight_m: 0.5 }, { area_m2: 0.2, centreHeight_m: 2.0 }])
 *   = [{ lowArea_m2: 0.2, highArea_m2: 0.2, separation_m: 1.5 }].
 */
export function heightSplits(openings: readonly LevelledArea[]): HeightSplit[] {
  const open = openings.filter((o) => o.area_m2 > 0);
  const heights = [...new Set(open.map((o) => o.centreHeight_m))].sort((a, b) => a - b);
  const splits: HeightSplit[] = [];
  for (let i = 0; i + 1 < heights.length; i++) {
    const below = heights[i]!;
    const above = heights[i + 1]!;
    let low = 0;
    let high = 0;
    for (const o of open) {
      if (o.centreHeight_m <= below) low += o.area_m2;
      else high += o.area_m2;
    }
    splits.push({ lowArea_m2: low, highArea_m2: high, separation_m: above - below });
  }
  return splits;
}
