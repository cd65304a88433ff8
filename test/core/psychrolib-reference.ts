/**
 * The ASHRAE reference psychrometrics library (psychrolib, MIT licence, the official
 * JavaScript of psychrometrics/psychrolib implementing ASHRAE HoF 2017 ch. 1), typed for the
 * few functions the moisture tests compare against, set to SI units.
 */
import { createRequire } from 'node:module';

export interface PsychroLib {
  SI: number;
  SetUnitSystem(system: number): void;
  GetSatVapPres(t_C: number): number;
  GetVapPresFromRelHum(t_C: number, rh: number): number;
  GetHumRatioFromRelHum(t_C: number, rh: number, p_Pa: number): number;
  GetHumRatioFromTWetBulb(t_C: number, tWetBulb_C: number, p_Pa: number): number;
  GetHumRatioFromVapPres(pw_Pa: number, p_Pa: number): number;
  GetVapPresFromHumRatio(w: number, p_Pa: number): number;
  GetTDewPointFromRelHum(t_C: number, rh: number): number;
  GetTDewPointFromVapPres(t_C: number, pw_Pa: number): number;
  GetRelHumFromVapPres(t_C: number, pw_Pa: number): number;
  GetMoistAirVolume(t_C: number, w: number, p_Pa: number): number;
  GetMoistAirDensity(t_C: number, w: number, p_Pa: number): number;
  GetStandardAtmPressure(altitude_m: number): number;
}

const psychrolib = createRequire(import.meta.url)('psychrolib') as PsychroLib;
psychrolib.SetUnitSystem(psychrolib.SI);

export { psychrolib };
