import { describe, it, expect } from 'vitest';
import { heightSplits } from '../../src/core/opening-height-splits.ts';

describe('heightSplits (src/core/opening-height-splits.ts)', () => {
  it('two openings give one division with their centre-to-centre separation', () => {
    expect(
      heightSplits([
        { area_m2: 0.2, centreHeight_m: 0.5 },
        { area_m2: 0.2, centreHeight_m: 2.0 },
      ]),
    ).toEqual([{ lowArea_m2: 0.2, highArea_m2: 0.2, separation_m: 1.5 }]);
  });

  it('openings at one height, or closed ones, give no division', () => {
    expect(heightSplits([{ area_m2: 0.2, centreHeight_m: 1 }, { area_m2: 0.3, centreHeight_m: 1 }])).toEqual([]);
    expect(heightSplits([{ area_m2: 0.2, centreHeight_m: 1 }, { area_m2: 0, centreHeight_m: 2 }])).toEqual([]);
  });

  it('three heights give two divisions with the smallest gap across each', () => {
    const splits = heightSplits([
      { area_m2: 0.1, centreHeight_m: 2.0 },
      { area_m2: 0.2, centreHeight_m: 0.5 },
      { area_m2: 0.3, centreHeight_m: 1.0 },
    ]);
    expect(splits).toHaveLength(2);
    expect(splits[0]!.lowArea_m2).toBeCloseTo(0.2, 12);
    expect(splits[0]!.highArea_m2).toBeCloseTo(0.4, 12);
    expect(splits[0]!.separation_m).toBeCloseTo(0.5, 12);
    expect(splits[1]!.lowArea_m2).toBeCloseTo(0.5, 12);
    expect(splits[1]!.separation_m).toBeCloseTo(1.0, 12);
  });
});
