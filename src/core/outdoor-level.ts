/**
 * The outdoor CO2 level a survey uses: from its outdoor readings when there are any, otherwise a
 * default with its source, a wide interval and a warning. Never 400 ppm: outdoor air is now
 * about 420–440 ppm, more in towns on still winter days (practice.md §2.5; common practice (no
 * published source); global background above 420 ppm since 2023, NOAA Mauna Loa record, from memory).
 */
import type { MeterErrorModel } from './meter-error.ts';
import { warn, type EngineWarning } from './warnings.ts';

/** Default outdoor level and its standard uncertainty, ppm (95 % ≈ 386–484 ppm). */
export const DEFAULT_OUTDOOR_PPM = 435;
export const DEFAULT_OUTDOOR_SD_PPM = 25;

/** The outdoor level for a survey. */
export interface OutdoorLevel {
  /**
   * Level, ppm. With readings on the room meter this is in that meter's reading scale (its
   * offset and gain then cancel with the room's); otherwise it is the true level.
   */
  value_ppm: number;
  /** Standard uncertainty, ppm. */
  sd_ppm: number;
  /** True when the outdoor readings were taken on the same meter as the room readings. */
  sameMeterAsRoom: boolean;
  /** Number of outdoor readings behind it (0 for the default). */
  readings: number;
  source: string;
  warnings: EngineWarning[];
}

/**
 * Outdoor level from the survey's outdoor readings (ppm). On the room's own meter the
 * uncertainty is the scatter of the mean (at least the meter noise); on another meter that
 * meter's offset and gain uncertainty are added. No readings: the default with a warning.
 * Example: outdoorLevel([428, 436], { sameMeterAsRoom: true, meter }) with noise 10 ppm →
 * 432 ± 7.1 ppm.
 */
export function outdoorLevel(
  readings_ppm: readonly number[],
  options: { sameMeterAsRoom: boolean; meter: MeterErrorModel },
): OutdoorLevel {
  const n = readings_ppm.length;
  if (n === 0) {
    return {
      value_ppm: DEFAULT_OUTDOOR_PPM,
      sd_ppm: DEFAULT_OUTDOOR_SD_PPM,
      sameMeterAsRoom: false,
      readings: 0,
      source: 'default: typical outdoor air 420–440 ppm, higher in towns (common practice (no published source))',
      warnings: [
        warn(
          'outdoor-assumed',
          `No outdoor reading was taken, so ${DEFAULT_OUTDOOR_PPM} ppm (likely between ${DEFAULT_OUTDOOR_PPM - 2 * DEFAULT_OUTDOOR_SD_PPM} and ${DEFAULT_OUTDOOR_PPM + 2 * DEFAULT_OUTDOOR_SD_PPM} ppm) is assumed. Results are less certain; read outdoors at the start and end of the visit.`,
        ),
      ],
    };
  }
  const mean = readings_ppm.reduce((a, b) => a + b, 0) / n;
  const scatter = n > 1 ? readings_ppm.reduce((a, r) => a + (r - mean) ** 2, 0) / (n - 1) : 0;
  const meter = options.meter;
  const spread = Math.sqrt(Math.max(scatter, meter.noiseSd_ppm ** 2) / n);
  const sd = options.sameMeterAsRoom ? spread : Math.hypot(spread, meter.offsetSd_ppm, meter.gainSd * mean);
  const warnings: EngineWarning[] = [];
  if (readings_ppm.some((r) => r < 390 || r > 500)) {
    warnings.push(
      warn(
        'outdoor-reading-unusual',
        'An outdoor reading is below 390 or above 500 ppm. Check the meter had settled and was away from people, flues and traffic.',
      ),
    );
  }
  return {
    value_ppm: mean,
    sd_ppm: sd,
    sameMeterAsRoom: options.sameMeterAsRoom,
    readings: n,
    source: `${n} outdoor reading${n > 1 ? 's' : ''}${options.sameMeterAsRoom ? ' on the room meter' : ' on another meter'}`,
    warnings,
  };
}
