/**
 * The per-room results as CSV (RFC 4180: comma-separated, fields with commas, quotes or line
 * breaks quoted, CRLF line ends, UTF-8), one row per room in the ranked order. The numbers are the
 * report's (the analysis's, rounded by the display rules); each unit is in the column name, and
 * an empty cell means the analysis gives no such figure. Columns are documented in the README
 * ("Results CSV").
 *
 * Example: the first line is 'rank,place,client_ref,room,use,priority,…'.
 */
import type { AnalysisResults } from '../analysis/results.ts';
import { displayNumber, type ReportFigure } from './report-figure.ts';
import type { ReportModel } from './report-model.ts';

/** The column names, in order. */
export const CSV_COLUMNS = [
  'rank',
  'place',
  'client_ref',
  'room',
  'use',
  'priority',
  'floor_area_m2',
  'volume_m3',
  'people_as_found',
  'supply_Ls',
  'supply_low_Ls',
  'supply_high_Ls',
  'air_changes_per_h',
  'air_changes_low_per_h',
  'air_changes_high_per_h',
  'per_person_Ls',
  'per_person_low_Ls',
  'per_person_high_Ls',
  'steady_co2_ppm',
  'steady_co2_low_ppm',
  'steady_co2_high_ppm',
  'basis',
  'source',
] as const;

function field(value: string | number | null): string {
  if (value === null) return '';
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

const triple = (f: ReportFigure | undefined) => [f?.value ?? null, f?.low ?? null, f?.high ?? null];

/** The CSV text of the report's rooms. */
export function roomResultsCsv(model: ReportModel, results: AnalysisResults): string {
  const lines = [CSV_COLUMNS.join(',')];
  for (const row of model.ranked.rows) {
    const sheet = model.rooms.find((s) => s.roomId === row.roomId)!;
    const room = results.rooms.find((r) => r.roomId === row.roomId)!;
    const byLabel = (label: string) => sheet.interpretation.headline.find((f) => f.label === label);
    const supply = byLabel('Outdoor air');
    const values = [
      row.rank,
      row.place,
      room.clientRef,
      room.name,
      row.use,
      row.priorityText,
      displayNumber(room.floorArea_m2, 'area'),
      displayNumber(room.volume_m3, 'volume'),
      room.occupancy.asFound.count,
      ...triple(supply),
      ...triple(byLabel('Air changes')),
      ...triple(byLabel('Outdoor air per person')),
      ...triple(byLabel('CO2 the room settles at in use')),
      supply?.basis ?? null,
      sheet.interpretation.headlineSource,
    ];
    lines.push(values.map(field).join(','));
  }
  return `${lines.join('\r\n')}\r\n`;
}
