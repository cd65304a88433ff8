/**
 * Dew point (frost point below the triple point): the temperature at which air's vapour
 * pressure equals the saturation pressure, found by inverting Hyland–Wexler (ASHRAE HoF 2017
 * ch. 1 eqns 5–6) with Newton steps on ln p_ws, kept inside a shrinking bracket so that every
 * step is safe (bisection when a Newton step would leave it). The handbook's own regression
 * (eqns 37–38) is given too, for comparison only: the handbook calls it less accurate.
 */
import { logSaturationPressure, saturationPressureLogSlope, TRIPLE_POINT_C } from './saturation-pressure.ts';
import { vapourPressureFromRelativeHumidity } from './vapour-pressure.ts';

const LOWEST_C = -100;
const HIGHEST_C = 200;

/**
 * Dew point (°C) of air holding vapour at pressure p_w (Pa); ice below the triple point.
 * No vapour (p_w ≤ 0) has no dew point: −Infinity. Valid for p_w between p_ws(−100 °C) and
 * p_ws(200 °C); beyond them the bracket end is returned.
 * Example: dewPointFromVapourPressure(1403.3) = 12.01 °C (20 °C, 60 % RH; references.md §7.6).
 */
export function dewPointFromVapourPressure(vapour_Pa: number): number {
  if (!(vapour_Pa > 0)) return Number.NEGATIVE_INFINITY;
  const target = Math.log(vapour_Pa);
  const gap = (t: number) => logSaturationPressure(t) - target;
  let lo = LOWEST_C;
  let hi = HIGHEST_C;
  if (gap(lo) >= 0) return lo;
  if (gap(hi) <= 0) return hi;
  // Start from the Magnus-type inversion (Alduchov & Eskridge 1996), close to the root.
  const g = Math.log(vapour_Pa / 610.94);
  let t = Math.min(hi, Math.max(lo, (243.04 * g) / (17.625 - g)));
  for (let i = 0; i < 60; i++) {
    const f = gap(t);
    if (f === 0) return t;
    if (f < 0) lo = t;
    else hi = t;
    let next = t - f / saturationPressureLogSlope(t);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - t) < 1e-10) return next;
    t = next;
  }
  return t;
}

/**
 * Dew point (°C) of air at t_C (°C) and rh_pct (%). Example: dewPoint(20, 60) = 12.01 °C.
 */
export function dewPoint(t_C: number, rh_pct: number): number {
  return dewPointFromVapourPressure(vapourPressureFromRelativeHumidity(t_C, rh_pct));
}

/**
 * The ASHRAE HoF 2017 ch. 1 dew-point regression (eqn 37 for 0–93 °C, eqn 38 below 0 °C), with
 * α = ln(p_w/kPa). For comparison with the exact inversion; not used for judgements.
 * Example: dewPointAshraeRegression(1403.3) = 12.04 °C (references.md §7.6).
 */
export function dewPointAshraeRegression(vapour_Pa: number): number {
  const pw_kPa = vapour_Pa / 1000;
  const a = Math.log(pw_kPa);
  const above = 6.54 + 14.526 * a + 0.7389 * a * a + 0.09486 * a * a * a + 0.4569 * pw_kPa ** 0.1984;
  return above >= TRIPLE_POINT_C ? above : 6.09 + 12.608 * a + 0.4959 * a * a;
}
