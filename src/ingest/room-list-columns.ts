/**
 * Which column of a room list holds what: the area (block, floor, flat), the room's name, the
 * client's room number, its use, its floor area or its dimensions (length and width, or one
 * "7.2 x 7" cell), its height, and how many people use it. Each column is scored from its name
 * and its values; the best column takes each role, one role per column. Every column comes back
 * with its guess, a confidence from 0 to 1, the reason, its unit and a preview of its first
 * cells, so the surveyor can change the choice (`overrides`), as with a logger file.
 *
 * Units: written in the header ("Height (m)", "Floor area [m²]", "Width mm") and converted to
 * m and m²; a length column without a unit is read in metres, or in millimetres when its values
 * are too large for metres (said in `assumptions`).
 *
 * Example: names ['Block', 'Room', 'Room no.', 'Use', 'Floor area (m²)', 'Height (m)', 'Pupils']
 * → area 0, room 1, client-ref 2, use 3, floor-area 4 (m²), height 5 (m), occupants 6.
 */
import { METRES_PER_FOOT } from '../core/units.ts';
import { cellKind } from './cell-kind.ts';
import { parseDecimalNumber, type DecimalSeparator } from './decimal-number.ts';

export type RoomListRole =
  | 'area'
  | 'room'
  | 'client-ref'
  | 'use'
  | 'floor-area'
  | 'dimensions'
  | 'length'
  | 'width'
  | 'height'
  | 'occupants'
  | 'other';

export const ROOM_LIST_ROLE_LABELS: Readonly<Record<RoomListRole, string>> = {
  area: 'area (block, floor or flat)',
  room: 'room name',
  'client-ref': 'client’s room number',
  use: 'room use',
  'floor-area': 'floor area',
  dimensions: 'dimensions (length × width)',
  length: 'length',
  width: 'width',
  height: 'height',
  occupants: 'occupants',
  other: 'not used',
};

export interface RoomListColumn {
  index: number;
  /** The header as written. */
  name: string;
  /** The unit written in the header, '' when none. */
  unit: string;
  role: RoomListRole;
  /** 0–1. */
  confidence: number;
  reason: string;
  /** The first few cells as written. */
  preview: string[];
  /** Multiply a value by this to get m (lengths) or m² (floor area); 1 for other roles. */
  toSI: number;
}

/** A caller's changes: a role for a column index (or 'other' to leave the column out). */
export type RoomListOverrides = Readonly<Record<number, RoomListRole>>;

export interface RoomListColumnDetection {
  columns: RoomListColumn[];
  /** Column index of each role taken. */
  roles: Partial<Record<Exclude<RoomListRole, 'other'>, number>>;
}

export interface ColumnUnits {
  assumptions: string[];
  /** A header unit that cannot be read, naming the column. */
  problems: string[];
}

/** Name patterns of each role, most specific first (a "Room no." is a number, not a name). */
const NAME_PATTERNS: readonly (readonly [RegExp, Exclude<RoomListRole, 'other'>])[] = [
  [/floor\s*area|\barea\b.*(m²|m2|sq|ft)|\bsize\b.*(m²|m2|sq|ft)|^(gia|nia)\b/i, 'floor-area'],
  [/dimension|\bl\s*[x×]\s*w\b|length\s*[x×]\s*width|^size$/i, 'dimensions'],
  [/height|ceiling|^h\b/i, 'height'],
  [/length|^l\b|\blong\b/i, 'length'],
  [/width|breadth|^w\b|\bwide\b/i, 'width'],
  [/occupan|people|persons|pupils|students|head\s*count|capacity|class\s*size|seats|staff\s*number/i, 'occupants'],
  [/client|(room|space)\s*(no|number|num|ref|code|id)\b|^(no|number|ref|reference|code)\.?$/i, 'client-ref'],
  [/\buse\b|usage|type|function|purpose|category|activity/i, 'use'],
  [/room|space|name|description/i, 'room'],
  [/area|block|building|floor|level|storey|wing|flat|zone|dwelling|unit/i, 'area'],
];

export const NUMERIC_ROLES = new Set<RoomListRole>(['floor-area', 'length', 'width', 'height', 'occupants']);
const LENGTH_ROLES = new Set<RoomListRole>(['length', 'width', 'height', 'dimensions']);

const UNIT_IN_BRACKETS = /[[(]\s*([^\])]+?)\s*[\])]\s*$/;
const UNIT_AT_END = /\s(m²|m2|sq\.?\s?m|ft²|ft2|sq\.?\s?ft|mm|cm|m|ft|metres|meters|feet)$/i;
const LENGTH_UNITS: Readonly<Record<string, number>> = { m: 1, metres: 1, meters: 1, cm: 0.01, mm: 0.001, ft: METRES_PER_FOOT, feet: METRES_PER_FOOT };
const AREA_UNITS: Readonly<Record<string, number>> = { 'm²': 1, m2: 1, 'sq m': 1, sqm: 1, 'sq.m': 1, 'ft²': METRES_PER_FOOT ** 2, ft2: METRES_PER_FOOT ** 2, 'sq ft': METRES_PER_FOOT ** 2, sqft: METRES_PER_FOOT ** 2 };

/** The unit written in a header: "Height (m)" → "m", "Floor area m²" → "m²". */
export function headerUnit(name: string): string {
  return (UNIT_IN_BRACKETS.exec(name)?.[1] ?? UNIT_AT_END.exec(name)?.[1] ?? '').trim();
}

function typedShare(rows: readonly (readonly string[])[], c: number): { numbers: number; filled: number } {
  let numbers = 0;
  let filled = 0;
  for (const row of rows) {
    const kind = cellKind(row[c] ?? '');
    if (kind === 'empty') continue;
    filled++;
    if (kind === 'number') numbers++;
  }
  return { numbers, filled };
}

/** Guess the columns from the header and a sample of rows, then apply the caller's changes. */
export function detectRoomListColumns(
  names: readonly string[],
  rows: readonly (readonly string[])[],
  overrides: RoomListOverrides = {},
): RoomListColumnDetection {
  const columns: RoomListColumn[] = names.map((name, index) => ({
    index,
    name,
    unit: headerUnit(name),
    role: 'other',
    confidence: 0,
    reason: '',
    preview: rows.slice(0, 5).map((r) => r[index] ?? ''),
    toSI: 1,
  }));
  const pairs: { c: number; role: Exclude<RoomListRole, 'other'>; score: number; reason: string }[] = [];
  for (const col of columns) {
    const bare = col.name.replace(UNIT_IN_BRACKETS, '').trim();
    const { numbers, filled } = typedShare(rows, col.index);
    const numeric = filled > 0 && numbers / filled >= 0.8;
    const match = NAME_PATTERNS.find(([pattern]) => pattern.test(bare));
    if (!match) continue;
    let role = match[1];
    // "Area" alone is a floor area when its cells are numbers.
    if (role === 'area' && numeric && /^area$/i.test(bare)) role = 'floor-area';
    const valuesFit = NUMERIC_ROLES.has(role) ? numeric : role === 'dimensions' || role === 'client-ref' || filled === 0 || !numeric;
    pairs.push({ c: col.index, role, score: valuesFit ? 0.9 : 0.5, reason: valuesFit ? 'name, values fit' : 'name; values do not look right' });
  }
  pairs.sort((a, b) => b.score - a.score || a.c - b.c);
  const roles: RoomListColumnDetection['roles'] = {};
  for (const p of pairs) {
    if (roles[p.role] !== undefined || columns[p.c]!.role !== 'other') continue;
    roles[p.role] = p.c;
    Object.assign(columns[p.c]!, { role: p.role, confidence: p.score, reason: p.reason });
  }
  for (const [key, role] of Object.entries(overrides)) {
    const col = columns[Number(key)];
    if (!col) continue;
    for (const [taken, index] of Object.entries(roles)) if (index === col.index || taken === role) delete roles[taken as keyof typeof roles];
    for (const other of columns) if (other.role === role && role !== 'other') Object.assign(other, { role: 'other', confidence: 0, reason: '' });
    Object.assign(col, { role, confidence: 1, reason: 'chosen' });
    if (role !== 'other') roles[role] = col.index;
  }

  return { columns, roles };
}

/**
 * Read each measured column's unit into its `toSI` factor (in place), with the file's decimal
 * mark for the values that decide an unwritten unit.
 */
export function applyColumnUnits(columns: RoomListColumn[], rows: readonly (readonly string[])[], decimal: DecimalSeparator): ColumnUnits {
  const assumptions: string[] = [];
  const problems: string[] = [];
  for (const col of columns) {
    const unit = col.unit.toLowerCase().replace(/\s+/g, ' ');
    const table = col.role === 'floor-area' ? AREA_UNITS : LENGTH_ROLES.has(col.role) ? LENGTH_UNITS : null;
    if (!table) continue;
    if (unit !== '') {
      const factor = table[unit];
      const known = col.role === 'floor-area' ? 'm², ft²' : 'm, cm, mm, ft';
      if (factor === undefined) problems.push(`Column "${col.name}": the unit "${col.unit}" is not one Ventwalk reads for a ${ROOM_LIST_ROLE_LABELS[col.role]} (${known})`);
      else col.toSI = factor;
    } else if (table === LENGTH_UNITS && col.role !== 'dimensions') {
      const values = rows.map((r) => parseDecimalNumber(r[col.index] ?? '', decimal)).filter(Number.isFinite).sort((a, b) => a - b);
      if (values.length > 0 && values[Math.floor(values.length / 2)]! > 100) {
        col.toSI = LENGTH_UNITS.mm!;
        assumptions.push(`"${col.name}" has no unit and its values are too large for metres: read as millimetres.`);
      }
    }
  }
  return { assumptions, problems };
}
