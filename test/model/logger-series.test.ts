/**
 * The logger-series record's temperature range follows where the logger stood: the indoor range
 * (−30 to 60 °C) in a room, the outdoor range (−50 to 50 °C) for the outdoor logger. The ranges
 * are the model's own (field-rules.ts); the records are invented.
 */
import { describe, it, expect } from 'vitest';
import { loggerSeriesSchema, temperatureRuleFor } from '../../src/model/logger-series.ts';

const T0 = Date.UTC(2026, 0, 14, 6, 0);
const series = (temp_C: number[], roomId?: string) => ({
  id: '11111111-1111-4111-8111-111111111111',
  ...(roomId ? { roomId } : {}),
  sourceFile: 'invented.csv',
  columns: { time: 'When', temperature: 'Temp' },
  timeZone: 'Europe/Oslo',
  times_ms: temp_C.map((_, i) => T0 + i * 60_000),
  temp_C,
  periods: [],
});
const ROOM = '22222222-2222-4222-8222-222222222222';

describe('logger series temperatures', () => {
  it('accepts a hard winter night on the outdoor logger', () => {
    expect(loggerSeriesSchema.safeParse(series([-2, -18, -35, -41])).success).toBe(true);
  });

  it('refuses the same night from a logger in a room, naming the point and the range', () => {
    const r = loggerSeriesSchema.safeParse(series([-2, -18, -35, -41], ROOM));
    expect(r.success).toBe(false);
    const issue = r.error!.issues.find((i) => i.path[0] === 'temp_C')!;
    expect(issue.path).toEqual(['temp_C', 2]);
    expect(issue.message).toBe('Temperature must be between -30 and 60 °C (a logger in a room)');
  });

  it('refuses an outdoor temperature above the outdoor range but keeps a hot room', () => {
    const r = loggerSeriesSchema.safeParse(series([20, 55]));
    expect(r.error!.issues[0]!.message).toBe('Outdoor temperature must be between -50 and 50 °C (an outdoor logger)');
    expect(loggerSeriesSchema.safeParse(series([20, 55], ROOM)).success).toBe(true);
  });

  it('picks the rule by place', () => {
    expect(temperatureRuleFor(undefined).safeParse(-45).success).toBe(true);
    expect(temperatureRuleFor(ROOM).safeParse(-45).success).toBe(false);
  });
});
