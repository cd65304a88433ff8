/**
 * Single-zone moisture balance on the humidity ratio, with the dry-air MASS flow (not vapour
 * density), so that warming the incoming air does not create or lose water:
 *
 *     M·dW/dt = ṁ·(W_out − W) + G,   ṁ = ρ_da·Q,   M = ρ_da·V
 *
 * W in kg/kg dry air, G the moisture released in the room in kg/s, Q the outdoor-air supply in
 * m³/s at room temperature (as a CO2 test measures it), V the room volume in m³, and ρ_da the
 * dry air per m³ of the incoming air once warmed to room temperature, (p − p_w,out)/(R_da·T_room).
 * Steady state W_in = W_out + G/ṁ; for constant conditions the exact solution has the same
 * exponential form as the CO2 balance (λ = Q/V), so it is computed by the same function.
 *
 * Sources: ASHRAE HoF 2017 ch. 1 (humidity ratio, eqn 20; specific volume, eqn 26); the balance
 * form of references.md §6.1 corrected as practice.md §1.5 asks (mass, not vapour density).
 * Hygroscopic surfaces (plaster, timber, furnishings) buffer moisture; this balance leaves them
 * out, so real rooms move more slowly towards the steady value than it says.
 */
import { levelAfter, type BalanceConditions } from './balance.ts';
import { dewPointFromVapourPressure } from './dew-point.ts';
import { humidityRatioFromRelativeHumidity, vapourPressureFromHumidityRatio } from './humidity-ratio.ts';
import { dryAirPerCubicMetre } from './moist-air-density.ts';
import { moistureWarning, type MoistureWarning } from './moisture-warnings.ts';
import { STANDARD_PRESSURE_PA } from './units.ts';
import { relativeHumidityFromVapourPressure, vapourPressureFromRelativeHumidity } from './vapour-pressure.ts';

/** Constant conditions of one piece of time, SI units. */
export interface MoistureBalanceConditions {
  /** Room volume, m³ (> 0). */
  volume_m3: number;
  /** Outdoor air supply by all routes, m³/s at room temperature (≥ 0). */
  supply_m3s: number;
  /** Outdoor air temperature, °C. */
  outdoorTemp_C: number;
  /** Outdoor relative humidity, %. */
  outdoorRh_pct: number;
  /** Room air temperature, °C. */
  roomTemp_C: number;
  /** Moisture released in the room (people, cooking, washing, drying), kg/s (≥ 0). */
  source_kgs: number;
  /** Barometric pressure, Pa (default 101325). */
  pressure_Pa?: number;
}

/** The room's humidity from a balance, with the outdoor state it was computed from. */
export interface MoistureBalanceResult {
  /** Room humidity ratio, kg/kg dry air. */
  humidityRatio_kgkg: number;
  /** Room vapour pressure, Pa. */
  vapour_Pa: number;
  /** Room relative humidity at room temperature, % (above 100 means the air would condense). */
  relativeHumidity_pct: number;
  /** Room dew point, °C. */
  dewPoint_C: number;
  /** Room vapour pressure minus outdoor vapour pressure, Pa (the ISO 13788 "excess"). */
  vapourPressureExcess_Pa: number;
  /** Dry-air mass flow of the supply, kg/s. */
  dryAirFlow_kgs: number;
  method: string;
  warnings: MoistureWarning[];
}

const METHOD_STEADY =
  'steady humidity-ratio balance with dry-air mass flow: W_in = W_out + G/(ρ_da·Q), ρ_da of the supply warmed to room temperature';
const METHOD_TRANSIENT =
  'exact humidity-ratio balance for constant conditions: W(t) = W_ss + (W_0 − W_ss)·e^(−λt), λ = Q/V';

interface Prepared {
  pressure: number;
  outdoorRatio: number;
  outdoorVapour: number;
  dryAirDensity: number;
}

function prepare(c: MoistureBalanceConditions): Prepared {
  const pressure = c.pressure_Pa ?? STANDARD_PRESSURE_PA;
  const outdoorRatio = humidityRatioFromRelativeHumidity(c.outdoorTemp_C, c.outdoorRh_pct, pressure);
  return {
    pressure,
    outdoorRatio,
    outdoorVapour: vapourPressureFromRelativeHumidity(c.outdoorTemp_C, c.outdoorRh_pct),
    dryAirDensity: dryAirPerCubicMetre(c.roomTemp_C, outdoorRatio, pressure),
  };
}

function resultFor(
  c: MoistureBalanceConditions,
  p: Prepared,
  ratio: number,
  method: string,
  warnings: MoistureWarning[],
): MoistureBalanceResult {
  const vapour = Number.isFinite(ratio) ? vapourPressureFromHumidityRatio(ratio, p.pressure) : Number.POSITIVE_INFINITY;
  const rh = relativeHumidityFromVapourPressure(c.roomTemp_C, vapour);
  if (rh > 100) {
    warnings.push(
      moistureWarning(
        'air-saturated',
        'The balance gives more vapour than the room air can hold: water would condense on the coldest surfaces first, so the real humidity is capped and surfaces get wet.',
      ),
    );
  }
  return {
    humidityRatio_kgkg: ratio,
    vapour_Pa: vapour,
    relativeHumidity_pct: rh,
    dewPoint_C: Number.isFinite(vapour) ? dewPointFromVapourPressure(vapour) : Number.POSITIVE_INFINITY,
    vapourPressureExcess_Pa: vapour - p.outdoorVapour,
    dryAirFlow_kgs: p.dryAirDensity * c.supply_m3s,
    method,
    warnings,
  };
}

/**
 * Steady room humidity for constant outdoor air, supply and moisture release.
 * With no supply and a source the humidity has no steady value: Infinity with a warning.
 * Example: bedroom of 30 m³ at 0.5 ACH (Q = 4.167e-3 m³/s), two adults asleep (2 × 40 g/h =
 * 2.222e-5 kg/s), outdoor 5 °C / 85 %, room 18 °C → W 9.017 g/kg, p_w 1448 Pa, 70.1 % RH.
 */
export function steadyIndoorHumidity(c: MoistureBalanceConditions): MoistureBalanceResult {
  const p = prepare(c);
  const warnings: MoistureWarning[] = [];
  let ratio: number;
  if (c.supply_m3s > 0) ratio = p.outdoorRatio + c.source_kgs / (p.dryAirDensity * c.supply_m3s);
  else if (c.source_kgs > 0) {
    ratio = Number.POSITIVE_INFINITY;
    warnings.push(
      moistureWarning('no-supply', 'With no outdoor air the moisture released has nowhere to go: the room has no steady humidity.'),
    );
  } else ratio = p.outdoorRatio;
  return resultFor(c, p, ratio, METHOD_STEADY, warnings);
}

/**
 * Room humidity after t_s seconds of constant conditions, starting at startRh_pct (%) at room
 * temperature: the exact exponential solution. The balance is the CO2 one with W·1e6 in the
 * place of ppm and G/ρ_da in the place of the CO2 source, so balance.ts computes it.
 * Example: the bedroom of steadyIndoorHumidity from 55 % RH after 2 h (one time constant)
 * → 64.6 % RH.
 */
export function indoorHumidityAfter(c: MoistureBalanceConditions, startRh_pct: number, t_s: number): MoistureBalanceResult {
  const p = prepare(c);
  const start = humidityRatioFromRelativeHumidity(c.roomTemp_C, startRh_pct, p.pressure);
  const scaled: BalanceConditions = {
    volume_m3: c.volume_m3,
    supply_m3s: c.supply_m3s,
    outdoor_ppm: p.outdoorRatio * 1e6,
    source_m3s: c.source_kgs / p.dryAirDensity,
  };
  const ratio = levelAfter(scaled, start * 1e6, t_s) / 1e6;
  const warnings = [
    moistureWarning(
      'buffering-ignored',
      'Walls, furnishings and fabrics take up and give back moisture, so the room changes more slowly than this calculation shows.',
    ),
  ];
  return resultFor(c, p, ratio, METHOD_TRANSIENT, warnings);
}
