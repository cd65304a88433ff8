/**
 * The orifice equation (BS 5925:1991 cl. 9 eq. (2), as corrected by Amendment 1, Dec 1995):
 *
 *     Q = C_d · A · sqrt(2 Δp / ρ)
 *
 * Q in m³/s, A in m² (free area of the opening), Δp in Pa, ρ in kg/m³. With an *equivalent* area
 * (the area of a sharp-edged orifice passing the same flow, ADF / BS EN 13141-1) C_d is the
 * sharp-edge 0.61 by definition. Flow is returned as a magnitude: a negative Δp gives the same
 * flow in the other direction.
 */
import { AIR_DENSITY_KG_M3, SHARP_EDGE_DISCHARGE_COEFFICIENT } from './air-constants.ts';

/**
 * Flow through an orifice, m³/s.
 * area_m2: free area (m²) with its discharge coefficient, or an equivalent area with the default 0.61;
 * pressure_Pa: pressure difference across it (Pa); density in kg/m³ (default 1.2).
 * Source: BS 5925:1991 cl. 9 eq. (2) (Amendment 1).
 * Example: orificeFlow(0.008, 1) = 0.006299 m³/s (an 8000 mm² equivalent-area trickle vent at 1 Pa: 6.30 L/s).
 */
export function orificeFlow(
  area_m2: number,
  pressure_Pa: number,
  dischargeCoefficient = SHARP_EDGE_DISCHARGE_COEFFICIENT,
  density_kgm3 = AIR_DENSITY_KG_M3,
): number {
  if (!(area_m2 > 0)) return 0;
  return dischargeCoefficient * area_m2 * Math.sqrt((2 * Math.abs(pressure_Pa)) / density_kgm3);
}
