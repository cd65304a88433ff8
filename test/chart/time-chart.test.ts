import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { svgPath, timeChart } from '../../src/chart/time-chart.ts';

const day = { width: 320, height: 180, margin: { top: 10, right: 10, bottom: 30, left: 50 } };

describe('timeChart', () => {
  it('maps times and values into the plot box, with the limit line at its value', () => {
    const g = timeChart({
      ...day,
      yLabel: 'CO₂ (ppm)',
      series: [{ id: 'profile', label: 'Predicted', times_s: [8 * 3600, 12 * 3600, 16 * 3600], values: [450, 1300, 900] }],
      limits: [{ value: 1500, label: '1500 ppm (20-minute cap)' }],
    });
    expect(g.plot).toEqual({ x: 50, y: 10, width: 260, height: 140 });
    const [first, mid, last] = g.series[0]!.segments[0]!;
    expect(first!.x).toBe(50);
    expect(last!.x).toBe(310);
    approxEqual(mid!.x, 180, { abs: 1e-9 });
    // Axis 400…1600 (nice ticks): 1500 sits 1/12 of the height below the top.
    approxEqual(g.limits[0]!.y, 10 + 140 / 12, { abs: 1e-9 });
    expect(g.xTicks.map((t) => t.label)).toEqual(['08:00', '10:00', '12:00', '14:00', '16:00']);
    expect(g.yTicks[0]!.label).toBe('400');
  });

  it('breaks a logger line at a gap instead of drawing across it', () => {
    const times = [0, 60, 120, 180, 3600, 3660, 3720];
    const g = timeChart({ ...day, yLabel: 'ppm', series: [{ id: 'log', label: 'Logger', times_s: times, values: [500, 510, 520, 530, 800, 810, 820] }] });
    expect(g.series[0]!.segments.map((s) => s.length)).toEqual([4, 3]);
  });

  it('shades periods clipped to the time range', () => {
    const g = timeChart({
      ...day,
      yLabel: 'ppm',
      timeRange_s: [0, 1000],
      series: [{ id: 's', label: 's', times_s: [0, 1000], values: [400, 800] }],
      periods: [{ from_s: -100, to_s: 500, label: 'Decay test' }, { from_s: 2000, to_s: 3000, label: 'outside' }],
    });
    expect(g.periods).toEqual([{ x0: 50, x1: 180, label: 'Decay test' }]);
  });

  it('writes SVG paths', () => {
    expect(svgPath([{ x: 1, y: 2 }, { x: 3.25, y: 4 }])).toBe('M1.0 2.0 L3.3 4.0');
  });
});
