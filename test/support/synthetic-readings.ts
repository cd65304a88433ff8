/**
 * Synthetic readings with known truth for coverage tests and benchmarks: a true curve read by a
 * meter with its own offset, gain and noise, drawn from the same error model the engine assumes.
 * Uses the engine's seeded generator so every run is the same.
 */
import { createSeededRandom, type SeededRandom } from '../../src/core/seeded-random.ts';
import type { MeterErrorModel } from '../../src/core/meter-error.ts';
import type { Reading } from '../../src/core/supply-estimate.ts';

/** A meter drawn from its error model: reading = gain·true + offset + noise. */
export interface DrawnMeter {
  read(trueLevel: number): number;
}

export function drawMeter(model: MeterErrorModel, rng: SeededRandom): DrawnMeter {
  const offset = model.offset_ppm + model.offsetSd_ppm * rng.normal();
  const gain = model.gain * (1 + model.gainSd * rng.normal());
  return { read: (c) => gain * c + offset + model.noiseSd_ppm * rng.normal() };
}

/** Readings of a true curve every step_s from 0 to duration_s. */
export function readCurve(curve: (t: number) => number, meter: DrawnMeter, step_s: number, duration_s: number): Reading[] {
  const out: Reading[] = [];
  for (let t = 0; t <= duration_s + 1e-9; t += step_s) out.push({ time_s: t, level_ppm: meter.read(curve(t)) });
  return out;
}

export { createSeededRandom };

import type { OutdoorLevel } from '../../src/core/outdoor-level.ts';
import type { UncertaintyInputs } from '../../src/core/supply-estimate.ts';

/** A perfect meter and an exactly known outdoor level: for checks of the arithmetic alone. */
export function exactInputs(volume_m3: number, outdoor_ppm: number, occupants?: UncertaintyInputs['occupants']): UncertaintyInputs {
  const outdoor: OutdoorLevel = { value_ppm: outdoor_ppm, sd_ppm: 0, sameMeterAsRoom: true, readings: 1, source: 'test', warnings: [] };
  return {
    volume_m3,
    volumeSd_m3: 0,
    outdoor,
    meter: { offset_ppm: 0, offsetSd_ppm: 0, gain: 1, gainSd: 0, noiseSd_ppm: 0, source: 'perfect meter (test)' },
    occupants,
  };
}
