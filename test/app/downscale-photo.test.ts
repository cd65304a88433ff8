import { describe, it, expect } from 'vitest';
import { fittedSize } from '../../src/app/downscale-photo.ts';

describe('stored photo size', () => {
  it('fits the long edge to 1600 px, keeping the shape', () => {
    expect(fittedSize(4000, 3000)).toEqual({ width: 1600, height: 1200 });
    expect(fittedSize(3024, 4032)).toEqual({ width: 1200, height: 1600 });
  });

  it('never enlarges', () => {
    expect(fittedSize(640, 480)).toEqual({ width: 640, height: 480 });
  });
});
