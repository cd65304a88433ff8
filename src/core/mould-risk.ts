/**
 * Mould risk on an internal surface by the ISO 13788 / BS 5250 criterion: the MONTHLY-MEAN
 * relative humidity at the surface should stay below 80 % (ISO 13788:2012 cl. 5; BS 5250
 * Annex D; clause numbers from memory). The surface holds the room's vapour pressure at its
 * own, lower temperature:
 *
 *     θ_si = θ_e + f_Rsi·(θ_i − θ_e)          surface temperature
 *     φ_si = p_i / p_ws(θ_si)                 surface RH
 *     θ_si,min = dew point of p_i/0.8          coldest acceptable surface
 *     f_Rsi,min = (θ_si,min − θ_e)/(θ_i − θ_e) the factor the surface needs
 *
 * Inputs are monthly means (use the coldest month). A spot reading cannot establish that the
 * risk is low: with a spot basis a clear result is "not established", never "no risk".
 */
import { dewPointFromVapourPressure } from './dew-point.ts';
import { moistureWarning, type MoistureWarning } from './moisture-warnings.ts';
import { surfaceTemperature, type TemperatureFactorEstimate } from './surface-temperature-factor.ts';
import { relativeHumidityFromVapourPressure, vapourPressureFromRelativeHumidity } from './vapour-pressure.ts';

/** Mean surface RH above which mould can grow, % (ISO 13788; BS 5250). */
export const MOULD_SURFACE_RH_PCT = 80;

/** What the humidity and temperatures stand for. */
export type HumidityBasis = 'monthly-mean' | 'spot';

/** Inputs: room and outdoor temperatures (°C), room RH (%), the surface factor and the basis. */
export interface MouldRiskInput {
  insideTemp_C: number;
  insideRh_pct: number;
  outsideTemp_C: number;
  factor: TemperatureFactorEstimate;
  basis: HumidityBasis;
}

/** The verdicts of a prediction. */
export type MouldVerdict = 'risk' | 'no-risk-predicted' | 'not-established';

/** A mould-risk prediction. */
export interface MouldRiskResult {
  /** Surface temperature, °C. */
  surfaceTemp_C: number;
  /** Surface RH, % (may exceed 100: the surface would be wet). */
  surfaceRh_pct: number;
  /** Coldest surface temperature that keeps the surface RH at 80 %, °C. */
  minimumSurfaceTemp_C: number;
  /** Factor the surface needs, f_Rsi,min; null when inside is not warmer than outside. */
  requiredFactor: number | null;
  /** The surface's factor minus the factor it needs (negative: at risk); null as above. */
  margin: number | null;
  verdict: MouldVerdict;
  /** The verdict in plain words. */
  summary: string;
  method: string;
  warnings: MoistureWarning[];
}

const METHOD =
  'ISO 13788 / BS 5250 surface criterion: monthly-mean surface RH below 80 %, surface at θ_e + f_Rsi·(θ_i − θ_e)';

/**
 * Mould risk of a surface for a room state.
 * Example: 20 °C / 60 % inside, 5 °C outside, f 0.75 (monthly means) → surface 16.25 °C,
 * surface RH 75.9 %, θ_si,min 15.44 °C, f_Rsi,min 0.696, margin +0.054, 'no-risk-predicted'
 * (references.md §7.6).
 */
export function mouldRisk(input: MouldRiskInput): MouldRiskResult {
  const { insideTemp_C: ti, outsideTemp_C: te, factor, basis } = input;
  const vapour = vapourPressureFromRelativeHumidity(ti, input.insideRh_pct);
  const surface = surfaceTemperature(factor.value, ti, te);
  const surfaceRh = relativeHumidityFromVapourPressure(surface, vapour);
  const minimum = dewPointFromVapourPressure(vapour / (MOULD_SURFACE_RH_PCT / 100));
  const difference = ti - te;
  const requiredFactor = difference > 0 ? (minimum - te) / difference : null;
  const margin = requiredFactor === null ? null : factor.value - requiredFactor;
  const warnings: MoistureWarning[] = [];
  if (factor.basis === 'design-minimum') {
    warnings.push(
      moistureWarning(
        'factor-assumed',
        'The surface factor used is a design minimum for new junctions, not a property of this surface; older walls are usually much colder, so the risk is likely understated.',
      ),
    );
  }
  if (factor.basis === 'construction') {
    warnings.push(
      moistureWarning(
        'factor-from-construction',
        'The surface factor comes from the recorded construction for a plain area; corners, window reveals and junctions are colder.',
      ),
    );
  }
  if (surfaceRh >= 100) {
    warnings.push(moistureWarning('surface-saturated', 'At this surface temperature the room air would condense on it.'));
  }
  let verdict: MouldVerdict;
  let summary: string;
  if (surfaceRh >= MOULD_SURFACE_RH_PCT) {
    verdict = 'risk';
    summary = `The surface would sit at about ${surface.toFixed(1)} °C and ${Math.round(surfaceRh)} % RH, at or above the 80 % at which mould can grow.`;
  } else if (basis === 'spot') {
    verdict = 'not-established';
    summary = 'A spot reading cannot show that mould risk is low: it needs monthly-mean conditions for the coldest month.';
    warnings.push(
      moistureWarning('spot-reading', 'Spot humidity and temperature readings cannot establish mould risk; the criterion is a monthly mean.'),
    );
  } else {
    verdict = 'no-risk-predicted';
    summary = `The surface would sit at about ${surface.toFixed(1)} °C and ${Math.round(surfaceRh)} % RH, below the 80 % at which mould can grow, for these monthly conditions.`;
  }
  return { surfaceTemp_C: surface, surfaceRh_pct: surfaceRh, minimumSurfaceTemp_C: minimum, requiredFactor, margin, verdict, summary, method: METHOD, warnings };
}
