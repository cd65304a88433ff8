/**
 * Saturation vapour pressure of water, Hyland–Wexler (1983) as given in ASHRAE Handbook —
 * Fundamentals (2017) ch. 1, eqns 5 (over ice) and 6 (over liquid water). T in K, p in Pa:
 *
 *     over ice:   ln p_ws = C1/T + C2 + C3·T + C4·T² + C5·T³ + C6·T⁴ + C7·ln T
 *     over water: ln p_ws = C8/T + C9 + C10·T + C11·T² + C12·T³ + C13·ln T
 *
 * The handbook states the ice form for −100…0 °C and the water form for 0…200 °C. Like the
 * ASHRAE reference implementation (psychrolib), the switch is made at the triple point
 * (0.01 °C), where the two forms meet, so the inversion for the dew point is continuous.
 * Outside −100…200 °C the forms are extrapolated (no building surface gets there).
 */
import { kelvin } from './units.ts';

/** Triple point of water, °C: where the ice and water forms switch. */
export const TRIPLE_POINT_C = 0.01;

const ICE = [-5.6745359e3, 6.3925247, -9.677843e-3, 6.2215701e-7, 2.0747825e-9, -9.484024e-13, 4.1635019] as const;
const WATER = [-5.8002206e3, 1.3914993, -4.8640239e-2, 4.1764768e-5, -1.4452093e-8, 6.5459673] as const;

/** Which surface the air is saturated over. 'auto' is ice at or below the triple point, water above. */
export type SaturationPhase = 'auto' | 'water' | 'ice';

function overIce(t_C: number, phase: SaturationPhase): boolean {
  return phase === 'ice' || (phase === 'auto' && t_C <= TRIPLE_POINT_C);
}

/**
 * Natural log of the saturation vapour pressure, ln(p_ws / Pa), at t_C (°C).
 * Example: logSaturationPressure(20) = 7.7574 (p_ws 2338.8 Pa).
 */
export function logSaturationPressure(t_C: number, phase: SaturationPhase = 'auto'): number {
  const T = kelvin(t_C);
  if (overIce(t_C, phase)) {
    const [c1, c2, c3, c4, c5, c6, c7] = ICE;
    return c1 / T + c2 + T * (c3 + T * (c4 + T * (c5 + T * c6))) + c7 * Math.log(T);
  }
  const [c8, c9, c10, c11, c12, c13] = WATER;
  return c8 / T + c9 + T * (c10 + T * (c11 + T * c12)) + c13 * Math.log(T);
}

/**
 * Slope d(ln p_ws)/dT in K⁻¹ at t_C (°C): the analytic derivative of the forms above, used to
 * invert them for the dew point. Example: saturationPressureLogSlope(20) = 0.06194 K⁻¹.
 */
export function saturationPressureLogSlope(t_C: number, phase: SaturationPhase = 'auto'): number {
  const T = kelvin(t_C);
  if (overIce(t_C, phase)) {
    const [c1, , c3, c4, c5, c6, c7] = ICE;
    return -c1 / (T * T) + c3 + T * (2 * c4 + T * (3 * c5 + T * 4 * c6)) + c7 / T;
  }
  const [c8, , c10, c11, c12, c13] = WATER;
  return -c8 / (T * T) + c10 + T * (2 * c11 + T * 3 * c12) + c13 / T;
}

/**
 * Saturation vapour pressure p_ws in Pa at t_C (°C), Hyland–Wexler (ASHRAE HoF 2017 ch. 1
 * eqns 5–6). Example: saturationPressure(25) = 3169.2 Pa (handbook Table 3: 3169.7 Pa).
 */
export function saturationPressure(t_C: number, phase: SaturationPhase = 'auto'): number {
  return Math.exp(logSaturationPressure(t_C, phase));
}
