/**
 * Typical U-values of common UK constructions and the temperature factors they give on a plain
 * area (away from corners and junctions, which are colder). The U-values are typical figures
 * from memory, each with a range; the factor follows from f_Rsi = 1 − U·R_si
 * (surface-temperature-factor.ts). Use a recorded or measured value where there is one.
 *
 * practice.md §1.3: solid brick U≈2.1 → f≈0.48; unfilled cavity → ≈0.63; single glazing → ≈0.26.
 */
import {
  SURFACE_RESISTANCE_GLAZING_M2K_W,
  SURFACE_RESISTANCE_MOULD_M2K_W,
  temperatureFactorFromU,
  type TemperatureFactorEstimate,
} from './surface-temperature-factor.ts';

/** Constructions in the table. */
export type ConstructionKind =
  | 'solid-brick'
  | 'solid-stone'
  | 'unfilled-cavity'
  | 'filled-cavity'
  | 'insulated-modern-wall'
  | 'single-glazing'
  | 'double-glazing-early'
  | 'double-glazing-low-e';

/** One construction: typical U and range (W/(m²·K)), the R_si used and the source. */
export interface Construction {
  kind: ConstructionKind;
  label: string;
  element: 'opaque' | 'glazing';
  u_Wm2K: number;
  uLow_Wm2K: number;
  uHigh_Wm2K: number;
  surfaceResistance_m2KW: number;
  source: string;
}

const MEMORY = 'typical UK figure (from memory; check the construction and its own U-value)';

const ROWS: readonly Omit<Construction, 'surfaceResistance_m2KW'>[] = [
  { kind: 'solid-brick', label: 'Solid brick wall, about 225 mm, plastered', element: 'opaque', u_Wm2K: 2.1, uLow_Wm2K: 1.7, uHigh_Wm2K: 2.3, source: `U 2.1: ${MEMORY}; practice.md §1.3` },
  { kind: 'solid-stone', label: 'Solid stone wall, about 500 mm', element: 'opaque', u_Wm2K: 1.7, uLow_Wm2K: 1.3, uHigh_Wm2K: 2.3, source: `U 1.7: ${MEMORY}` },
  { kind: 'unfilled-cavity', label: 'Cavity wall, cavity unfilled', element: 'opaque', u_Wm2K: 1.5, uLow_Wm2K: 1.4, uHigh_Wm2K: 1.6, source: `U 1.5: ${MEMORY}; practice.md §1.3 gives f ≈ 0.63` },
  { kind: 'filled-cavity', label: 'Cavity wall, cavity filled with insulation', element: 'opaque', u_Wm2K: 0.55, uLow_Wm2K: 0.4, uHigh_Wm2K: 0.7, source: `U 0.55: ${MEMORY}` },
  { kind: 'insulated-modern-wall', label: 'Insulated wall to recent standards', element: 'opaque', u_Wm2K: 0.25, uLow_Wm2K: 0.18, uHigh_Wm2K: 0.35, source: `U 0.25: ${MEMORY}` },
  { kind: 'single-glazing', label: 'Single glazing', element: 'glazing', u_Wm2K: 5.7, uLow_Wm2K: 5.0, uHigh_Wm2K: 5.8, source: `U 5.7: ${MEMORY}; practice.md §1.3 gives f ≈ 0.26` },
  { kind: 'double-glazing-early', label: 'Double glazing, air-filled, before low-emissivity coatings', element: 'glazing', u_Wm2K: 2.8, uLow_Wm2K: 2.7, uHigh_Wm2K: 3.3, source: `U 2.8: ${MEMORY}` },
  { kind: 'double-glazing-low-e', label: 'Double glazing, low-emissivity, gas-filled', element: 'glazing', u_Wm2K: 1.4, uLow_Wm2K: 1.1, uHigh_Wm2K: 1.6, source: `U 1.4: ${MEMORY}` },
];

const TABLE: readonly Construction[] = ROWS.map((row) => ({
  ...row,
  surfaceResistance_m2KW: row.element === 'glazing' ? SURFACE_RESISTANCE_GLAZING_M2K_W : SURFACE_RESISTANCE_MOULD_M2K_W,
}));

/** All constructions in the table. */
export const CONSTRUCTIONS: readonly Construction[] = TABLE;

/**
 * The construction row for a kind. Example: construction('solid-brick').u_Wm2K = 2.1.
 */
export function construction(kind: ConstructionKind): Construction {
  return TABLE.find((c) => c.kind === kind) as Construction;
}

/**
 * The temperature factor of a construction on a plain area (typical U, and the factors of the
 * U range: a higher U gives the lower factor).
 * Example: constructionTemperatureFactor('solid-brick') = { value: 0.475, basis: 'construction',
 * label: 'Solid brick wall, …', low: 0.425, high: 0.575 }.
 */
export function constructionTemperatureFactor(kind: ConstructionKind): TemperatureFactorEstimate & { low: number; high: number } {
  const c = construction(kind);
  return {
    value: temperatureFactorFromU(c.u_Wm2K, c.surfaceResistance_m2KW),
    basis: 'construction',
    label: `${c.label} (U ${c.u_Wm2K} W/(m²·K), ${c.element === 'glazing' ? 'centre of pane; edges and frames are colder' : 'plain area; corners and junctions are colder'})`,
    low: temperatureFactorFromU(c.uHigh_Wm2K, c.surfaceResistance_m2KW),
    high: temperatureFactorFromU(c.uLow_Wm2K, c.surfaceResistance_m2KW),
  };
}
