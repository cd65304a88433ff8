import { describe, it, expect } from 'vitest';
import { CROSS_DEPTH_RATIO, depthLimitWarnings, SINGLE_SIDED_DEPTH_RATIO } from '../../src/core/ventilation-depth-limit.ts';

describe('depthLimitWarnings (src/core/ventilation-depth-limit.ts)', () => {
  it('uses about 2.5 H single-sided and 5 H cross', () => {
    // CIBSE AM10 rules of thumb, from memory (references.md §3.2 [C2], practice.md §1 item 9b).
    expect(SINGLE_SIDED_DEPTH_RATIO).toBe(2.5);
    expect(CROSS_DEPTH_RATIO).toBe(5);
  });

  it('warns only beyond the limit for the mode', () => {
    expect(depthLimitWarnings(7, 2.4, 'single-sided').map((w) => w.code)).toEqual(['beyond-single-sided-depth']);
    expect(depthLimitWarnings(6, 2.4, 'single-sided')).toEqual([]);
    expect(depthLimitWarnings(7, 2.4, 'cross')).toEqual([]);
    expect(depthLimitWarnings(13, 2.4, 'cross').map((w) => w.code)).toEqual(['beyond-cross-depth']);
    expect(depthLimitWarnings(undefined, 2.4, 'single-sided')).toEqual([]);
  });
});
