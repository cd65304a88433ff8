import { describe, it, expect } from 'vitest';
import { clockLabel, timeTicks } from '../../src/chart/time-ticks.ts';

describe('time ticks', () => {
  it('labels a school day every two hours', () => {
    expect(timeTicks(8 * 3600, 16 * 3600, 6).map((t) => t.label)).toEqual(['08:00', '10:00', '12:00', '14:00', '16:00']);
  });

  it('uses minutes for a short decay test', () => {
    expect(timeTicks(0, 1200, 5).map((t) => t.label)).toEqual(['00:00', '00:05', '00:10', '00:15', '00:20']);
  });

  it('names the day past the first', () => {
    expect(clockLabel(86400 + 9 * 3600 + 30 * 60)).toBe('day 2 09:30');
  });
});
