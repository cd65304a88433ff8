/**
 * A logger's record: the file it came from, which column held what, the time zone its clock
 * was in, the times (ms since 1970-01-01 UTC) and values (CO₂ ppm, °C, %) as parallel number
 * arrays, and the periods accepted for analysis. In the survey file the arrays are plain JSON
 * numbers; on the device they may be kept as Float64Array.
 */
import { z } from 'zod';
import { MAX_NOTE_LENGTH, choice, co2Ppm, indoorTempC, measure, outdoorTempC, recordId, relativeHumidity, requiredText, text } from './field-rules.ts';

/** Earliest and latest logger time accepted: 2000-01-01 and 2200-01-01 UTC, in ms. */
export const EARLIEST_LOGGER_TIME_MS = Date.UTC(2000, 0, 1);
export const LATEST_LOGGER_TIME_MS = Date.UTC(2200, 0, 1);
/** Most points in one series (a week at 10 s intervals is 60,480). */
export const MAX_SERIES_POINTS = 200_000;

const loggerTime = z
  .number({ error: 'Logger time must be a number of milliseconds' })
  .min(EARLIEST_LOGGER_TIME_MS, { error: 'Logger time is before the year 2000: check the logger’s clock' })
  .max(LATEST_LOGGER_TIME_MS, { error: 'Logger time is after the year 2200: check the logger’s clock' });

export const PERIOD_KINDS = ['decay', 'build-up', 'steady', 'excluded'] as const;

export const acceptedPeriodSchema = z
  .strictObject({
    id: recordId,
    kind: choice('Period kind', PERIOD_KINDS),
    start_ms: loggerTime,
    end_ms: loggerTime,
    note: text('Period note', MAX_NOTE_LENGTH),
  })
  .refine((p) => p.end_ms > p.start_ms, { error: 'A period must end after it starts' });

export const columnMapSchema = z.strictObject({
  time: requiredText('Time column'),
  co2: text('CO₂ column').optional(),
  temperature: text('Temperature column').optional(),
  relativeHumidity: text('Humidity column').optional(),
});

/**
 * The temperature rule for a logger's place: the indoor range in a room, the outdoor range for
 * the outdoor logger (no room), so an outdoor logger on a hard winter night is kept.
 * Example: temperatureRuleFor(undefined).safeParse(-35).success = true; temperatureRuleFor('r1') refuses it.
 */
export function temperatureRuleFor(roomId: string | undefined): typeof indoorTempC {
  return roomId === undefined ? outdoorTempC : indoorTempC;
}

/** Any temperature a logger indoors or outdoors may hold, °C; the place's own range is checked after. */
const anyLoggerTempC = measure(
  'Logger temperature',
  '°C',
  Math.min(indoorTempC.minValue!, outdoorTempC.minValue!),
  Math.max(indoorTempC.maxValue!, outdoorTempC.maxValue!),
);

const points = (item: z.ZodNumber) =>
  z.array(item).max(MAX_SERIES_POINTS, { error: `A logger series holds at most ${MAX_SERIES_POINTS} points` });

export const loggerSeriesSchema = z
  .strictObject({
    id: recordId,
    /** The room the logger stood in; absent for an outdoor logger. */
    roomId: recordId.optional(),
    instrumentId: recordId.optional(),
    sourceFile: requiredText('Logger file name'),
    columns: columnMapSchema,
    /** IANA time zone of the logger's clock, as Europe/London. */
    timeZone: requiredText('Time zone'),
    times_ms: points(loggerTime).min(1, { error: 'A logger series needs at least one time' }),
    co2_ppm: points(co2Ppm).optional(),
    /** °C; the indoor range in a room, the outdoor range for the outdoor logger (temperatureRuleFor). */
    temp_C: points(anyLoggerTempC).optional(),
    rh_pct: points(relativeHumidity).optional(),
    periods: z.array(acceptedPeriodSchema),
  })
  .superRefine((s, ctx) => {
    for (const key of ['co2_ppm', 'temp_C', 'rh_pct'] as const) {
      const values = s[key];
      if (values && values.length !== s.times_ms.length) {
        ctx.addIssue({
          code: 'custom',
          path: [key],
          input: values.length,
          message: `has ${values.length} values for ${s.times_ms.length} times: each time needs one value`,
        });
      }
    }
    if (s.temp_C) {
      // One message for the first point outside the place's range (a file may hold thousands).
      const rule = temperatureRuleFor(s.roomId);
      const bad = s.temp_C.findIndex((t) => !rule.safeParse(t).success);
      if (bad >= 0) {
        const problem = rule.safeParse(s.temp_C[bad]);
        ctx.addIssue({
          code: 'custom',
          path: ['temp_C', bad],
          input: s.temp_C[bad],
          message: `${problem.error?.issues[0]?.message ?? 'Temperature is out of range'}${s.roomId === undefined ? ' (an outdoor logger)' : ' (a logger in a room)'}`,
        });
      }
    }
    const outOfOrder = s.times_ms.findIndex((t, i) => i > 0 && t <= s.times_ms[i - 1]!);
    if (outOfOrder > 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['times_ms', outOfOrder],
        input: s.times_ms[outOfOrder],
        message: 'Logger times must rise from one point to the next',
      });
    }
  });

export type LoggerSeries = z.infer<typeof loggerSeriesSchema>;
