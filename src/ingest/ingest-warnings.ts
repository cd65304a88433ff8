/**
 * What the importer tells the surveyor about a logger file: a stable code for software and a
 * plain-English message, with the file line and the column where there is one. Expected
 * conditions (a malformed row, a duplicate time, a clock change) are notes like these, never
 * exceptions.
 */

/** Stable codes of the importer's notes. */
export type IngestCode =
  | 'empty-file'
  | 'not-text'
  | 'no-data-rows'
  | 'no-time-column'
  | 'no-value-column'
  | 'unknown-time-zone'
  | 'unreadable-times'
  | 'date-order-ambiguous'
  | 'date-order-inconsistent'
  | 'date-order-from-sequence'
  | 'malformed-row'
  | 'missing-value'
  | 'duplicate-time'
  | 'out-of-order'
  | 'clock-change-repeated'
  | 'clock-change-skipped'
  | 'fahrenheit-converted'
  | 'fraction-humidity-converted'
  | 'unit-assumed'
  | 'value-out-of-range'
  | 'too-many-points'
  | 'gap'
  | 'door-open'
  | 'combustion-suspected'
  | 'excluded-by-caller'
  | 'volume-unknown'
  | 'needs-occupancy'
  | 'occupied-during-decay'
  | 'unoccupied-rise'
  | 'outdoor-series-short'
  | 'internal-error';

/** One note. `line` is the 1-based line of the file; `column` the column's name as written. */
export interface IngestWarning {
  code: IngestCode;
  message: string;
  line?: number;
  column?: string;
}

/**
 * Build a note. Example: ingestWarning('malformed-row', 'Line 12 has 2 fields; 4 were expected.', { line: 12 })
 * = { code: 'malformed-row', message: 'Line 12 has 2 fields; 4 were expected.', line: 12 }.
 */
export function ingestWarning(code: IngestCode, message: string, where: { line?: number; column?: string } = {}): IngestWarning {
  return { code, message, ...where };
}
