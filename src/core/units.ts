/**
 * Units: the one place where SI values become display units and back.
 *
 * The engine works in SI (m, m², m³, s, m³/s, ppm, °C, Pa, kg/kg). Screens, the report and the
 * command line convert only here, at the edge.
 *
 * Conversion factors are exact by definition unless noted:
 * - 1 m³ = 1000 L; 1 h = 3600 s; 1 m² = 1e6 mm².
 * - 1 ft = 0.3048 m exactly (International yard and pound agreement, 1959); hence
 *   1 ft³/min (cfm) = 0.3048³ m³ / 60 s = 0.471947443 L/s, 1 in = 25.4 mm exactly.
 * - °F = °C × 9/5 + 32 (definition of the Fahrenheit scale).
 *
 * Example: airChangesPerHour(0.1, 151.2) = 2.381 h⁻¹ (100 L/s through a 151.2 m³ classroom).
 */

/** Litres in one cubic metre. */
export const LITRES_PER_M3 = 1000;
/** Seconds in one hour. */
export const SECONDS_PER_HOUR = 3600;
/** Square millimetres in one square metre. */
export const MM2_PER_M2 = 1e6;
/** Metres in one foot (exact). */
export const METRES_PER_FOOT = 0.3048;
/** Litres per second in one cubic foot per minute (exact from the foot). */
export const LPS_PER_CFM = (METRES_PER_FOOT ** 3 * LITRES_PER_M3) / 60;
/** Square millimetres in one square inch (exact). */
export const MM2_PER_IN2 = 25.4 * 25.4;

/** m³/s -> L/s. Example: litresPerSecond(0.05) = 50. */
export function litresPerSecond(flow_m3s: number): number {
  return flow_m3s * LITRES_PER_M3;
}

/** L/s -> m³/s. Example: fromLitresPerSecond(50) = 0.05. */
export function fromLitresPerSecond(flow_Ls: number): number {
  return flow_Ls / LITRES_PER_M3;
}

/** m³/s -> m³/h. Example: cubicMetresPerHour(0.05) = 180. */
export function cubicMetresPerHour(flow_m3s: number): number {
  return flow_m3s * SECONDS_PER_HOUR;
}

/** m³/h -> m³/s. Example: fromCubicMetresPerHour(180) = 0.05. */
export function fromCubicMetresPerHour(flow_m3h: number): number {
  return flow_m3h / SECONDS_PER_HOUR;
}

/**
 * Air changes per hour from a supply and a room volume.
 * flow in m³/s, volume in m³, result in h⁻¹. A room of zero volume has no defined rate: NaN.
 * Example: airChangesPerHour(0.1, 151.2) = 2.381.
 */
export function airChangesPerHour(flow_m3s: number, volume_m3: number): number {
  if (!(volume_m3 > 0)) return Number.NaN;
  return (flow_m3s * SECONDS_PER_HOUR) / volume_m3;
}

/** Supply (m³/s) that gives `ach` air changes per hour in `volume_m3`. Example: (0.5, 30) -> 0.0041667. */
export function flowFromAirChanges(ach_perHour: number, volume_m3: number): number {
  return (ach_perHour * volume_m3) / SECONDS_PER_HOUR;
}

/** Air change rate λ in s⁻¹ -> h⁻¹. Example: perHour(1/3600) = 1. */
export function perHour(rate_perSecond: number): number {
  return rate_perSecond * SECONDS_PER_HOUR;
}

/** Air change rate in h⁻¹ -> s⁻¹. Example: perSecond(3.6) = 0.001. */
export function perSecond(rate_perHour: number): number {
  return rate_perHour / SECONDS_PER_HOUR;
}

/** L/s per person from a supply in m³/s. No people: NaN (the metric is undefined). Example: (0.1, 20) -> 5. */
export function litresPerSecondPerPerson(flow_m3s: number, people: number): number {
  if (!(people > 0)) return Number.NaN;
  return litresPerSecond(flow_m3s) / people;
}

/** L/s per m² of floor from a supply in m³/s. Example: (0.05, 25) -> 2. */
export function litresPerSecondPerSquareMetre(flow_m3s: number, floorArea_m2: number): number {
  if (!(floorArea_m2 > 0)) return Number.NaN;
  return litresPerSecond(flow_m3s) / floorArea_m2;
}

/** m² -> mm² (vent areas are labelled in mm²). Example: squareMillimetres(0.008) = 8000. */
export function squareMillimetres(area_m2: number): number {
  return area_m2 * MM2_PER_M2;
}

/** mm² -> m². Example: fromSquareMillimetres(7600) = 0.0076. */
export function fromSquareMillimetres(area_mm2: number): number {
  return area_mm2 / MM2_PER_M2;
}

/** °C -> °F. Example: fahrenheit(20) = 68. */
export function fahrenheit(temp_C: number): number {
  return (temp_C * 9) / 5 + 32;
}

/** °F -> °C. Example: fromFahrenheit(68) = 20. */
export function fromFahrenheit(temp_F: number): number {
  return ((temp_F - 32) * 5) / 9;
}

/** Minutes -> seconds and back; readings are entered in minutes, the engine runs in seconds. */
export function minutes(seconds: number): number {
  return seconds / 60;
}
export function fromMinutes(mins: number): number {
  return mins * 60;
}

/** Display unit systems. SI is the default; imperial is a display choice only. */
export type UnitSystem = 'si' | 'imperial';

/** The kinds of quantity the app displays. */
export type QuantityKind =
  | 'flow' // stored m³/s; shown L/s or cfm
  | 'flowPerPerson' // stored m³/s per person; shown L/s per person or cfm per person
  | 'flowPerArea' // stored m³/s per m²; shown L/s per m² or cfm per ft²
  | 'airChanges' // stored h⁻¹; shown h⁻¹ in both systems
  | 'co2' // stored ppm; shown ppm
  | 'length' // stored m; shown m or ft
  | 'area' // stored m²; shown m² or ft²
  | 'ventArea' // stored m²; shown mm² or in²
  | 'volume' // stored m³; shown m³ or ft³
  | 'temperature' // stored °C; shown °C or °F
  | 'relativeHumidity'; // stored %; shown %

/** A value ready to show: number in display units, the unit's label and the rounding step used. */
export interface DisplayQuantity {
  value: number;
  unit: string;
  step: number;
}

interface DisplayRule {
  unit: string;
  convert: (si: number) => number;
  /** Rounding step for reports: CO2 to 10 ppm, L/s to 0.5, ACH to 0.1 (common practice (no published source)). */
  step: number;
}

const SI_RULES: Record<QuantityKind, DisplayRule> = {
  flow: { unit: 'L/s', convert: litresPerSecond, step: 0.5 },
  flowPerPerson: { unit: 'L/s per person', convert: litresPerSecond, step: 0.1 },
  flowPerArea: { unit: 'L/s per m²', convert: litresPerSecond, step: 0.01 },
  airChanges: { unit: 'h⁻¹', convert: (x) => x, step: 0.1 },
  co2: { unit: 'ppm', convert: (x) => x, step: 10 },
  length: { unit: 'm', convert: (x) => x, step: 0.01 },
  area: { unit: 'm²', convert: (x) => x, step: 0.1 },
  ventArea: { unit: 'mm²', convert: squareMillimetres, step: 100 },
  volume: { unit: 'm³', convert: (x) => x, step: 0.1 },
  temperature: { unit: '°C', convert: (x) => x, step: 0.1 },
  relativeHumidity: { unit: '%', convert: (x) => x, step: 1 },
};

const IMPERIAL_RULES: Record<QuantityKind, DisplayRule> = {
  flow: { unit: 'cfm', convert: (q) => litresPerSecond(q) / LPS_PER_CFM, step: 1 },
  flowPerPerson: { unit: 'cfm per person', convert: (q) => litresPerSecond(q) / LPS_PER_CFM, step: 0.1 },
  flowPerArea: {
    unit: 'cfm per ft²',
    convert: (q) => (litresPerSecond(q) / LPS_PER_CFM) * METRES_PER_FOOT ** 2,
    step: 0.01,
  },
  airChanges: SI_RULES.airChanges,
  co2: SI_RULES.co2,
  length: { unit: 'ft', convert: (m) => m / METRES_PER_FOOT, step: 0.1 },
  area: { unit: 'ft²', convert: (a) => a / METRES_PER_FOOT ** 2, step: 1 },
  ventArea: { unit: 'in²', convert: (a) => squareMillimetres(a) / MM2_PER_IN2, step: 0.1 },
  volume: { unit: 'ft³', convert: (v) => v / METRES_PER_FOOT ** 3, step: 1 },
  temperature: { unit: '°F', convert: fahrenheit, step: 0.1 },
  relativeHumidity: SI_RULES.relativeHumidity,
};

/** Round to the nearest multiple of `step` without binary noise. Example: roundToStep(1316.47, 10) = 1320. */
export function roundToStep(value: number, step: number): number {
  if (!Number.isFinite(value) || !(step > 0)) return value;
  const text = step.toString();
  const decimals = text.includes('.') ? text.length - text.indexOf('.') - 1 : 0;
  return Number((Math.round(value / step) * step).toFixed(Math.min(decimals, 12)));
}

/**
 * Convert an SI value to a display quantity, rounded to the reporting step.
 * Example: displayQuantity(0.0523, 'flow', 'si') -> { value: 52.5, unit: 'L/s', step: 0.5 }.
 */
export function displayQuantity(si: number, kind: QuantityKind, system: UnitSystem = 'si'): DisplayQuantity {
  const rule = (system === 'si' ? SI_RULES : IMPERIAL_RULES)[kind];
  return { value: roundToStep(rule.convert(si), rule.step), unit: rule.unit, step: rule.step };
}

/** Convert without rounding (for charts and tables that round themselves). */
export function toDisplayUnits(si: number, kind: QuantityKind, system: UnitSystem = 'si'): number {
  return (system === 'si' ? SI_RULES : IMPERIAL_RULES)[kind].convert(si);
}

/** The label of a kind's display unit. Example: displayUnit('ventArea', 'si') = 'mm²'. */
export function displayUnit(kind: QuantityKind, system: UnitSystem = 'si'): string {
  return (system === 'si' ? SI_RULES : IMPERIAL_RULES)[kind].unit;
}

/** ppm per unit volume fraction: a CO2 source of G m³/s into Q m³/s raises the level by 1e6·G/Q ppm. */
export const PPM_PER_VOLUME_FRACTION = 1e6;

/** Offset between the Celsius and Kelvin scales (exact, SI Brochure 9th ed.). */
export const KELVIN_AT_ZERO_CELSIUS = 273.15;

/** Standard atmosphere at sea level in Pa (exact, ISO 2533). */
export const STANDARD_PRESSURE_PA = 101325;

/** °C -> K. Example: kelvin(20) = 293.15. */
export function kelvin(temp_C: number): number {
  return temp_C + KELVIN_AT_ZERO_CELSIUS;
}

/** Pa -> kPa. Example: kilopascals(101325) = 101.325. */
export function kilopascals(pressure_Pa: number): number {
  return pressure_Pa / 1000;
}

/** g/h -> kg/s (moisture sources are quoted in g/h). Example: fromGramsPerHour(3600) = 0.001. */
export function fromGramsPerHour(rate_gh: number): number {
  return rate_gh / 1000 / SECONDS_PER_HOUR;
}

/** kg/s -> g/h. Example: gramsPerHour(0.001) = 3600. */
export function gramsPerHour(rate_kgs: number): number {
  return rate_kgs * 1000 * SECONDS_PER_HOUR;
}
