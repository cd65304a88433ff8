/**
 * Read a room list (CSV or any delimited text an estates spreadsheet writes) into model areas
 * and rooms ready to add to a survey: area, room name, client's room number, use, floor area or
 * dimensions, height, occupants. Same machinery as a logger file: text from bytes
 * (decode-file-bytes.ts), the delimiter (delimiter-detection.ts), the decimal mark (decimal-
 * separator-detection.ts, over the measured columns only, so room numbers like "2.01" do not
 * vote), numbers with a point or a comma (decimal-number.ts), and columns guessed from their
 * names with confidence, reason and preview, changeable by the caller (room-list-columns.ts).
 *
 * Every row becomes a room or is listed as a problem — by file line, naming the column and what
 * is wrong — so nothing is lost without a word. An empty cell is never 0: an empty height is a
 * problem, an empty occupants cell means "not recorded" (no occupant group). Rooms get the
 * survey's model rules (the same bounds and messages as a room typed on the phone).
 *
 * Areas: each distinct area cell becomes an area, "Block B / Ground floor" (or ">") a floor
 * inside a block; an area already on the survey with the same name (any case) is reused.
 *
 * Results, never exceptions. Line numbers count every line of the file from 1.
 *
 * Example: readRoomList('Room;Use;Floor area (m²);Height (m);Pupils\nB1;Classroom;56,4;2,7;30\n',
 * { newId, now }) → status 'read', one classroom of 56.4 m² × 2.7 m with a group of 30.
 */
import Papa from 'papaparse';
import type { Area } from '../model/area.ts';
import type { OccupantGroupRecord } from '../model/occupancy.ts';
import { roomSchema, type Room } from '../model/room.ts';
import type { Geometry } from '../model/room-geometry.ts';
import { blankRoomParts } from '../model/room-defaults.ts';
import type { RoomUse } from '../core/room-uses.ts';
import { decodeFileBytes } from './decode-file-bytes.ts';
import { parseDecimalNumber, type DecimalSeparator } from './decimal-number.ts';
import { detectDecimalSeparator } from './decimal-separator-detection.ts';
import { detectDelimiter, type Delimiter } from './delimiter-detection.ts';
import {
  applyColumnUnits,
  detectRoomListColumns,
  NUMERIC_ROLES,
  ROOM_LIST_ROLE_LABELS,
  type RoomListColumn,
  type RoomListOverrides,
  type RoomListRole,
} from './room-list-columns.ts';
import { roomUseFromText } from './room-use-text.ts';

/** What an occupants count becomes: one group with these facts (the app chooses them). */
export type OccupantDefaults = Omit<OccupantGroupRecord, 'id' | 'count'>;

/** Adults at light seated work, when the caller gives nothing better. */
export const ADULT_OCCUPANTS: OccupantDefaults = { label: 'Occupants', ageBand: '30-40', sex: 'mixed', activity_met: 1.2 };

export interface RoomListOptions {
  /** Record ids (the app passes crypto.randomUUID). */
  newId: () => string;
  /** ISO time stamped on the rooms. */
  now: string;
  /** Areas already on the survey, reused by name. */
  existingAreas?: readonly Area[];
  /** The use of rooms whose use cell is empty (or when there is no use column). */
  defaultUse?: RoomUse;
  /** The group an occupants count becomes (default ADULT_OCCUPANTS). */
  occupants?: OccupantDefaults;
  /** Changes to the guessed columns. */
  columns?: RoomListOverrides;
}

/** A row left out: its file line, the column concerned (as written in the header) and what is wrong. */
export interface RoomListProblem {
  line: number;
  column: string | null;
  problem: string;
}

export interface RoomListReport {
  encoding?: string;
  delimiter: Delimiter | null;
  decimalSeparator: DecimalSeparator | null;
  headerLine: number | null;
  columns: RoomListColumn[];
  /** Data rows read (rooms + rows with problems). */
  rowsRead: number;
  /** Assumptions made (a unit read from the values, the default occupants). */
  notes: string[];
}

export type RoomListResult =
  | { status: 'read'; areas: Area[]; rooms: Room[]; problems: RoomListProblem[]; report: RoomListReport }
  | { status: 'failed'; error: string; report: RoomListReport };

const HEADER_SEARCH_LINES = 20;
const AREA_SEPARATOR = /\s+[/>]\s+/;

const isBlank = (row: readonly string[]) => row.every((cell) => cell.trim() === '');

/** Kind of a new area from its name. */
function areaKind(name: string): Area['kind'] {
  const n = name.toLowerCase();
  if (/flat|apartment/.test(n)) return 'flat';
  if (/house|bungalow|cottage/.test(n)) return 'house';
  if (/floor|level|storey|basement|mezzanine/.test(n)) return 'floor';
  if (/block|building/.test(n)) return 'block';
  if (/wing/.test(n)) return 'wing';
  return 'other';
}

/** The header row: the first of the first lines naming at least two roles. */
function findHeader(rows: readonly string[][]): { row: number; columns: RoomListColumn[] } | null {
  for (let r = 0; r < Math.min(rows.length, HEADER_SEARCH_LINES); r++) {
    const detected = detectRoomListColumns(rows[r]!.map((c) => c.trim()), []);
    if (Object.keys(detected.roles).length >= 2) return { row: r, columns: detected.columns };
  }
  return null;
}

/** Read a room list from its bytes or text. */
export function readRoomList(input: string | Uint8Array, options: RoomListOptions): RoomListResult {
  const report: RoomListReport = { delimiter: null, decimalSeparator: null, headerLine: null, columns: [], rowsRead: 0, notes: [] };
  const fail = (error: string): RoomListResult => ({ status: 'failed', error, report });
  let text: string;
  if (typeof input === 'string') text = input;
  else {
    const decoded = decodeFileBytes(input);
    if (!decoded.ok) return fail(decoded.error.message);
    text = decoded.text;
    report.encoding = decoded.encoding;
  }
  text = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (text.trim() === '') return fail('The file is empty.');
  const lines = text.split(/\r\n|\r|\n/);
  const found = detectDelimiter(lines.slice(0, 200));
  if (!found) return fail('No line of the file splits into two or more columns by comma, semicolon, tab or bar.');
  report.delimiter = found.delimiter;
  const rows = Papa.parse<string[]>(text, { delimiter: found.delimiter }).data;
  const header = findHeader(rows);
  if (!header) {
    return fail(
      `No header line naming the columns was found in the first ${HEADER_SEARCH_LINES} lines. Add one such as: Area, Room, Room number, Use, Floor area (m²), Height (m), Occupants.`,
    );
  }
  report.headerLine = header.row + 1;
  const names = header.columns.map((c) => c.name);
  const data = rows.map((row, index) => ({ row, line: index + 1 })).slice(header.row + 1).filter(({ row }) => !isBlank(row));
  const { columns, roles } = detectRoomListColumns(names, data.slice(0, 200).map((d) => d.row), options.columns);
  report.columns = columns;
  const missing = (role: RoomListRole) => `The room list has no column for the ${ROOM_LIST_ROLE_LABELS[role]}`;
  const columnList = names.join(', ') || 'none';
  if (roles.room === undefined) return fail(`${missing('room')}: name one "Room" (columns found: ${columnList}).`);
  if (roles.height === undefined && roles.dimensions === undefined) return fail(`${missing('height')}: name one "Height (m)" (columns found: ${columnList}).`);
  if (roles['floor-area'] === undefined && roles.dimensions === undefined && (roles.length === undefined || roles.width === undefined)) {
    return fail(`${missing('floor-area')} or the dimensions: name one "Floor area (m²)", or "Length (m)" and "Width (m)" (columns found: ${columnList}).`);
  }
  if (roles.use === undefined && !options.defaultUse) return fail(`${missing('use')}: name one "Use", or choose one use for every room.`);

  const measured = columns.filter((c) => NUMERIC_ROLES.has(c.role) || c.role === 'dimensions');
  const decimal = detectDecimalSeparator(data.map(({ row }) => measured.flatMap((c) => (row[c.index] ?? '').split(/\s*[x×*]\s*/i)))).decimal;
  report.decimalSeparator = decimal;
  const units = applyColumnUnits(columns, data.map((d) => d.row), decimal);
  if (units.problems.length > 0) return fail(units.problems.join('; '));
  report.notes.push(...units.assumptions);
  const occupants = options.occupants ?? ADULT_OCCUPANTS;
  if (roles.occupants !== undefined && !options.occupants) {
    report.notes.push('Occupant counts were read as adults at light seated work: change the groups where pupils or others use the rooms.');
  }

  const areas: Area[] = [];
  const areaIds = new Map<string, string>();
  for (const area of options.existingAreas ?? []) areaIds.set(`${area.parentId ?? ''}|${area.name.toLowerCase()}`, area.id);
  const areaFor = (path: string): string | undefined => {
    let parent: string | undefined;
    for (const name of path.split(AREA_SEPARATOR).map((n) => n.trim()).filter(Boolean)) {
      const key = `${parent ?? ''}|${name.toLowerCase()}`;
      let id = areaIds.get(key);
      if (!id) {
        id = options.newId();
        areas.push({ id, ...(parent ? { parentId: parent } : {}), kind: areaKind(name), name, clientRef: '', notes: '' });
        areaIds.set(key, id);
      }
      parent = id;
    }
    return parent;
  };

  const rooms: Room[] = [];
  const problems: RoomListProblem[] = [];
  for (const { row, line } of data) {
    report.rowsRead++;
    const rowProblems: RoomListProblem[] = [];
    const column = (role: RoomListRole) => (roles[role as keyof typeof roles] === undefined ? undefined : columns[roles[role as keyof typeof roles]!]!);
    const cell = (role: RoomListRole) => {
      const col = column(role);
      return col ? (row[col.index] ?? '').trim() : '';
    };
    const problem = (role: RoomListRole | null, message: string) =>
      rowProblems.push({ line, column: role === null ? null : (column(role)?.name ?? null), problem: message });
    /** A number in SI units, or undefined (empty, or a problem noted). */
    const measure = (role: RoomListRole, written = cell(role), what = ROOM_LIST_ROLE_LABELS[role]): number | undefined => {
      if (written === '') return undefined;
      const value = parseDecimalNumber(written, decimal);
      if (!Number.isFinite(value)) {
        problem(role, `The ${what} "${written}" is not a number`);
        return undefined;
      }
      return value * (column(role)?.toSI ?? 1);
    };

    const name = cell('room');
    if (name === '') problem('room', 'The room name is empty');
    const useText = cell('use');
    const use = useText === '' ? options.defaultUse : (roomUseFromText(useText) ?? undefined);
    if (!use) {
      problem('use', useText === '' ? 'The room use is empty' : `The use "${useText}" is not one Ventwalk knows: write classroom, hall, office, meeting room, bedroom, living room, kitchen, bathroom, toilet, utility, corridor, store or other`);
    }
    let length = measure('length');
    let width = measure('width');
    let height = measure('height');
    const dimensions = cell('dimensions');
    if (dimensions !== '') {
      const parts = dimensions.split(/\s*[x×*]\s*/i);
      if (parts.length < 2 || parts.length > 3) problem('dimensions', `The dimensions "${dimensions}" are not length × width (as 7.2 x 6.5)`);
      else {
        [length, width] = [measure('dimensions', parts[0], 'length'), measure('dimensions', parts[1], 'width')];
        if (parts.length === 3 && height === undefined) height = measure('dimensions', parts[2], 'height');
      }
    }
    const floorArea = measure('floor-area');
    if (height === undefined && cell('height') === '') problem(roles.height === undefined ? 'dimensions' : 'height', 'The height is empty: a room needs its height');
    let geometry: Geometry | undefined;
    if (length !== undefined && width !== undefined && height !== undefined) geometry = { kind: 'box', length_m: length, width_m: width, height_m: height };
    else if (floorArea !== undefined && height !== undefined) geometry = { kind: 'area', floorArea_m2: floorArea, height_m: height };
    else if (rowProblems.length === 0) problem(roles['floor-area'] === undefined ? 'dimensions' : 'floor-area', 'The floor area (or length and width) is empty');

    const countText = cell('occupants');
    const count = countText === '' ? undefined : parseDecimalNumber(countText, decimal);
    if (count !== undefined && !(Number.isInteger(count) && count >= 0)) problem('occupants', `The occupants "${countText}" is not a whole number of people`);

    if (rowProblems.length === 0 && geometry && use) {
      const candidate: Room = {
        id: options.newId(),
        name,
        clientRef: cell('client-ref'),
        use,
        geometry,
        ...blankRoomParts(),
        occupants: count ? [{ id: options.newId(), ...occupants, count }] : [],
        updatedAt: options.now,
      };
      const checked = roomSchema.safeParse(candidate);
      if (checked.success) {
        // Areas are made only for rooms that are kept.
        const areaId = cell('area') === '' ? undefined : areaFor(cell('area'));
        rooms.push(areaId ? { ...checked.data, areaId } : checked.data);
      } else {
        for (const issue of checked.error.issues) {
          const key = String(issue.path[issue.path.length - 1]);
          const role: RoomListRole | null =
            key === 'height_m' ? (roles.height === undefined ? 'dimensions' : 'height')
            : key === 'floorArea_m2' ? 'floor-area'
            : key === 'length_m' || key === 'width_m' ? (roles.dimensions === undefined ? (key === 'length_m' ? 'length' : 'width') : 'dimensions')
            : key === 'count' ? 'occupants'
            : key === 'name' ? 'room'
            : key === 'clientRef' ? 'client-ref'
            : null;
          const written = role ? cell(role) : '';
          problem(role, written ? `${issue.message} (found "${written}")` : issue.message);
        }
      }
    }
    problems.push(...rowProblems);
  }
  return { status: 'read', areas, rooms, problems, report };
}
