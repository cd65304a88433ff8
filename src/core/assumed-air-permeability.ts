/**
 * A default air permeability when no pressure test exists, always marked as assumed.
 *
 * Two ways, both screening values only:
 * - by construction: SAP's no-test infiltration (worksheet box (18) without a test; references.md
 *   §4.2, items from memory): 0.1·(storeys − 1) + structure [0.25 timber or steel frame, 0.35
 *   masonry] + floor [0.2 unsealed suspended timber, 0.1 sealed, 0 other] + 0.05 without a draught
 *   lobby + windows 0.25 − 0.2·(% draught-proofed)/100, in ach; turned into an equivalent q50 by
 *   SAP's own reading of q50/20 as ach (q50 = 20 × ach);
 * - by age: our screening values for UK dwellings by age band, from memory of published test
 *   surveys (older homes leakier); not a published table.
 */

/** Age bands of dwellings for the default. */
export type DwellingAgeBand =
  | 'before-1919'
  | '1919-1944'
  | '1945-1964'
  | '1965-1980'
  | '1981-1995'
  | '1996-2005'
  | '2006-2013'
  | '2014-on';

/** Recorded construction features for SAP's no-test estimate. */
export interface ConstructionFeatures {
  structure: 'masonry' | 'timber-or-steel-frame';
  floor: 'suspended-timber-unsealed' | 'suspended-timber-sealed' | 'solid-or-other';
  draughtLobby: boolean;
  /** Share of windows and doors draught-proofed, 0–100. */
  draughtProofedPercent: number;
  storeys: number;
}

/** What the default is based on. */
export type AssumedLeakageBasis = ({ by: 'construction' } & ConstructionFeatures) | { by: 'age'; ageBand: DwellingAgeBand };

/** Screening air permeability by age band, m³/(h·m²) at 50 Pa (from memory; our values). */
export const AIR_PERMEABILITY_BY_AGE: Readonly<Record<DwellingAgeBand, number>> = Object.freeze({
  'before-1919': 15,
  '1919-1944': 14,
  '1945-1964': 13,
  '1965-1980': 12,
  '1981-1995': 11,
  '1996-2005': 9,
  '2006-2013': 7,
  '2014-on': 5,
});

/** An assumed air permeability and how it was reached. */
export interface AssumedAirPermeability {
  q50_m3hm2: number;
  method: string;
}

/**
 * SAP's no-test infiltration, ach, from construction features.
 * Source: SAP worksheet box (18), no pressure test (references.md §4.2; items from memory).
 * Example: sapNoTestInfiltration({ structure: 'masonry', floor: 'suspended-timber-unsealed',
 *   draughtLobby: false, draughtProofedPercent: 0, storeys: 2 }) = 0.95 ach.
 */
export function sapNoTestInfiltration(f: ConstructionFeatures): number {
  const storeys = 0.1 * Math.max(0, f.storeys - 1);
  const structure = f.structure === 'masonry' ? 0.35 : 0.25;
  const floor = f.floor === 'suspended-timber-unsealed' ? 0.2 : f.floor === 'suspended-timber-sealed' ? 0.1 : 0;
  const lobby = f.draughtLobby ? 0 : 0.05;
  const windows = 0.25 - (0.2 * Math.min(100, Math.max(0, f.draughtProofedPercent))) / 100;
  return storeys + structure + floor + lobby + windows;
}

/**
 * Assumed air permeability (m³/(h·m²) at 50 Pa) from construction features or age band.
 * Source: see the file note; always an assumption.
 * Example: assumedAirPermeability({ by: 'age', ageBand: '1945-1964' }).q50_m3hm2 = 13.
 */
export function assumedAirPermeability(basis: AssumedLeakageBasis): AssumedAirPermeability {
  if (basis.by === 'age') {
    return {
      q50_m3hm2: AIR_PERMEABILITY_BY_AGE[basis.ageBand],
      method: `assumed from the dwelling's age (${basis.ageBand}): our screening value`,
    };
  }
  const ach = sapNoTestInfiltration(basis);
  return {
    q50_m3hm2: 20 * ach,
    method: `assumed from construction by SAP's no-test estimate (${ach.toFixed(2)} ach)`,
  };
}
