/**
 * Psychrometrics of the engine (saturation pressure, vapour pressure, humidity ratio, dew point,
 * vapour density, moist-air density, standard atmosphere) against published values of ASHRAE
 * HoF 2017 ch. 1 and the ASHRAE reference library psychrolib.
 */
import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { psychrolib } from './psychrolib-reference.ts';
import { saturationPressure, saturationPressureLogSlope, logSaturationPressure } from '../../src/core/saturation-pressure.ts';
import {
  relativeHumidityFromVapourPressure,
  vapourDensity,
  vapourPressureFromDensity,
  vapourPressureFromRelativeHumidity,
} from '../../src/core/vapour-pressure.ts';
import {
  humidityRatioFromRelativeHumidity,
  humidityRatioFromVapourPressure,
  relativeHumidityFromHumidityRatio,
  vapourPressureFromHumidityRatio,
} from '../../src/core/humidity-ratio.ts';
import { dewPoint, dewPointAshraeRegression, dewPointFromVapourPressure } from '../../src/core/dew-point.ts';
import { dryAirPerCubicMetre, moistAirDensity, moistAirSpecificVolume } from '../../src/core/moist-air-density.ts';
import { standardAtmospherePressure } from '../../src/core/standard-atmosphere.ts';

describe('saturation pressure (Hyland–Wexler)', () => {
  it('matches ASHRAE HoF 2017 ch. 1 Table 3 within 300 ppm, as psychrolib tests it', () => {
    // Published values: ASHRAE HoF 2017 ch. 1 Table 3, asserted with 300 ppm relative tolerance
    // in psychrolib's tests/js/test_psychrolib_si.js.
    for (const [t, p] of [
      [-20, 103.24],
      [-5, 401.74],
      [5, 872.6],
      [25, 3169.7],
      [50, 12351.3],
      [100, 101418.0],
    ] as const) {
      approxEqual(saturationPressure(t), p, { rel: 3e-4 }, `p_ws(${t} °C)`);
    }
  });

  it('agrees with psychrolib to rounding over −60…100 °C', () => {
    // psychrolib GetSatVapPres (ASHRAE HoF 2017 ch. 1 eqns 5–6, switch at the triple point).
    for (let t = -60; t <= 100; t += 0.25) {
      approxEqual(saturationPressure(t), psychrolib.GetSatVapPres(t), { rel: 1e-12 }, `p_ws(${t})`);
    }
  });

  it('has a slope equal to the numerical derivative of ln p_ws', () => {
    // Analytic derivative of eqns 5–6 (as in psychrolib dLnPws_) checked by central difference.
    for (const t of [-30, -1, 1, 12, 40]) {
      const h = 1e-4;
      const numeric = (logSaturationPressure(t + h) - logSaturationPressure(t - h)) / (2 * h);
      approxEqual(saturationPressureLogSlope(t), numeric, { rel: 1e-7 }, `slope at ${t}`);
    }
  });

  it('gives the §7.6 values', () => {
    // references.md §7.6 [D]: p_ws(20) 2338.8 Pa, p_ws(5) 872.5 Pa; paired with psychrolib above.
    approxEqual(saturationPressure(20), 2338.8, { abs: 0.05 });
    approxEqual(saturationPressure(5), 872.5, { abs: 0.1 });
    approxEqual(saturationPressure(18), 2064, { abs: 0.5 });
  });
});

describe('vapour pressure, humidity ratio, dew point, densities', () => {
  it('match the §7.6 values for 20 °C / 60 % RH, paired with psychrolib', () => {
    // references.md §7.6 [D]: p_w 1403.3 Pa, t_d 12.01 °C, W 8.734 g/kg, 10.37 g/m³.
    const pw = vapourPressureFromRelativeHumidity(20, 60);
    approxEqual(pw, 1403.3, { abs: 0.05 });
    approxEqual(pw, psychrolib.GetVapPresFromRelHum(20, 0.6), { rel: 1e-12 });
    approxEqual(dewPoint(20, 60), 12.01, { abs: 0.005 });
    approxEqual(dewPoint(20, 60), psychrolib.GetTDewPointFromRelHum(20, 0.6), { abs: 1e-3 }); // psychrolib stops at 0.001 K
    approxEqual(dewPointAshraeRegression(pw), 12.04, { abs: 0.005 }); // ASHRAE HoF 2017 ch. 1 eqn 37, references.md §7.6
    approxEqual(humidityRatioFromVapourPressure(pw) * 1000, 8.734, { abs: 5e-4 });
    approxEqual(vapourDensity(pw, 20) * 1000, 10.37, { abs: 0.005 });
  });

  it('give the §7.6 dew points', () => {
    // references.md §7.6 [D], each paired with psychrolib GetTDewPointFromRelHum.
    for (const [t, rh, td] of [
      [20, 50, 9.27],
      [21, 65, 14.18],
      [25, 50, 13.86],
    ] as const) {
      approxEqual(dewPoint(t, rh), td, { abs: 0.005 }, `t_d(${t}, ${rh})`);
      approxEqual(dewPoint(t, rh), psychrolib.GetTDewPointFromRelHum(t, rh / 100), { abs: 1e-3 });
    }
  });

  it('psychrolib docs example: 25 °C, 80 % → dew point 21.3094 °C', () => {
    // psychrolib module overview example (ASHRAE HoF 2017 ch. 1 inversion of eqn 6).
    approxEqual(dewPoint(25, 80), 21.3094, { abs: 5e-4 });
  });

  it('ASHRAE HoF 2017 ch. 1 Example 1: 40 °C dry bulb, 20 °C wet bulb → dew point ≈ 7 °C', () => {
    // ASHRAE HoF 2017 ch. 1 Example 1 as asserted in psychrolib's tests: W ≈ 0.0065, t_d ≈ 7 °C (±0.5).
    // The humidity ratio of that state comes from psychrolib's wet-bulb relation (eqns 33, 35).
    const w = psychrolib.GetHumRatioFromTWetBulb(40, 20, 101325);
    approxEqual(w, 0.0065, { abs: 1e-4 });
    approxEqual(dewPointFromVapourPressure(vapourPressureFromHumidityRatio(w)), 7, { abs: 0.5 });
  });

  it('invert each other', () => {
    // Algebraic inverses (ASHRAE HoF 2017 ch. 1 eqn 20 and eqn 22); checked by round trip.
    approxEqual(vapourPressureFromHumidityRatio(humidityRatioFromVapourPressure(1200)), 1200, { rel: 1e-12 });
    approxEqual(relativeHumidityFromHumidityRatio(18, humidityRatioFromRelativeHumidity(18, 70)), 70, { rel: 1e-12 });
    approxEqual(vapourPressureFromDensity(vapourDensity(900, 5), 5), 900, { rel: 1e-12 });
    approxEqual(relativeHumidityFromVapourPressure(10, vapourPressureFromRelativeHumidity(10, 45)), 45, { rel: 1e-12 });
  });

  it('gives −Infinity as the dew point of perfectly dry air', () => {
    expect(dewPointFromVapourPressure(0)).toBe(Number.NEGATIVE_INFINITY);
  });

  it('standard atmosphere matches ASHRAE HoF 2017 ch. 1 Table 1', () => {
    // ASHRAE HoF 2017 ch. 1 Table 1 (via references.md §6.4 [C]): 500 m 95.461 kPa; 1000 m 89.875 kPa.
    approxEqual(standardAtmospherePressure(0), 101325, { abs: 1e-9 });
    approxEqual(standardAtmospherePressure(500), 95461, { abs: 1 });
    approxEqual(standardAtmospherePressure(1000), 89875, { abs: 1 });
    approxEqual(standardAtmospherePressure(1000), psychrolib.GetStandardAtmPressure(1000), { rel: 1e-12 });
  });

  it('moist-air volume and density match psychrolib', () => {
    // psychrolib GetMoistAirVolume / GetMoistAirDensity (ASHRAE HoF 2017 ch. 1 eqns 26, 11).
    for (const [t, w, p] of [
      [20, 0.008734, 101325],
      [-10, 0.0012, 95461],
      [35, 0.02, 89875],
    ] as const) {
      approxEqual(moistAirSpecificVolume(t, w, p), psychrolib.GetMoistAirVolume(t, w, p), { rel: 1e-12 });
      approxEqual(moistAirDensity(t, w, p), psychrolib.GetMoistAirDensity(t, w, p), { rel: 1e-12 });
      // 1/v is the dry-air partial density (p − p_w)/(R_da·T): ASHRAE HoF 2017 ch. 1 eqn 14 with R_da 287.042;
      // 1e-7 because the handbook rounds 1/0.621945 = 1.6078592 to 1.607858.
      const pw = vapourPressureFromHumidityRatio(w, p);
      approxEqual(dryAirPerCubicMetre(t, w, p), (p - pw) / (287.042 * (t + 273.15)), { rel: 1e-7 });
    }
  });
});

/** The sweep compares our functions with psychrolib at every whole degree and every 5 % RH. */
function sweepDeviations(): { humidityRatio: number; dewPoint_K: number; vapourPressure: number } {
  let humidityRatio = 0;
  let dewPointK = 0;
  let vapour = 0;
  for (let t = -20; t <= 50; t += 1) {
    for (let rh = 5; rh <= 95; rh += 5) {
      const ours = humidityRatioFromRelativeHumidity(t, rh);
      const ref = psychrolib.GetHumRatioFromRelHum(t, rh / 100, 101325);
      humidityRatio = Math.max(humidityRatio, Math.abs(ours - ref) / ref);
      dewPointK = Math.max(dewPointK, Math.abs(dewPoint(t, rh) - psychrolib.GetTDewPointFromRelHum(t, rh / 100)));
      const pw = vapourPressureFromRelativeHumidity(t, rh);
      vapour = Math.max(vapour, Math.abs(pw - psychrolib.GetVapPresFromRelHum(t, rh / 100)) / pw);
    }
  }
  return { humidityRatio, dewPoint_K: dewPointK, vapourPressure: vapour };
}

describe('sweep against psychrolib, −20…50 °C and 5…95 % RH', () => {
  it('stays within round-off for W and p_w and within psychrolib’s 0.001 K stop for the dew point', () => {
    // psychrolib ends its Newton iteration when a step is below 0.001 K (PSYCHROLIB_TOLERANCE),
    // so its dew point is good to about that; ours iterates to 1e-10 K.
    const d = sweepDeviations();
    expect(d.humidityRatio).toBeLessThan(1e-12);
    expect(d.vapourPressure).toBeLessThan(1e-12);
    expect(d.dewPoint_K).toBeLessThan(1e-3);
  });
});
