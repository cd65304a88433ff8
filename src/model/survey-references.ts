/**
 * The cross-record rules of a survey document: no id is used twice, and every reference (a
 * room's area, a reading's meter, a test's readings, a photo's room…) points at a record of the
 * same survey. Each problem is reported at the path of the reference, with its value.
 */
import type { z } from 'zod';

type Path = (string | number)[];

/** The document's shape as far as references go (kept structural to avoid an import cycle). */
interface ReferencedDocument {
  survey: { id: string; outdoorReadings: { id: string; instrumentId?: string | undefined }[]; designWeather: { id: string }[] };
  instruments: { id: string; checks: { referenceInstrumentId?: string | undefined }[] }[];
  areas: {
    id: string;
    parentId?: string | undefined;
    dwelling?: { system?: { terminals: { roomId?: string | undefined; instrumentId?: string | undefined }[] } | undefined } | undefined;
  }[];
  rooms: {
    id: string;
    areaId?: string | undefined;
    exposedWalls: { id: string }[];
    occupants: { id: string }[];
    openings: ({ id: string; type: string } & { measuredWith?: string | undefined })[];
    appliances: { id: string }[];
    defects: { id: string; openingId?: string | undefined }[];
    tests: { id: string; readingIds: string[] }[];
    readings: {
      id: string;
      instrumentId?: string | undefined;
      conditions: { people: { groupId: string }[]; openOpeningIds?: string[] | undefined };
    }[];
  }[];
  series: { id: string; roomId?: string | undefined; instrumentId?: string | undefined; periods: { id: string }[] }[];
  photos: { id: string; roomId?: string | undefined; defectId?: string | undefined }[];
}

export function checkReferences(doc: ReferencedDocument, ctx: z.RefinementCtx): void {
  const problem = (path: Path, input: unknown, message: string) => ctx.addIssue({ code: 'custom', path, input, message });

  // Every id once.
  const seen = new Map<string, Path>();
  for (const [id, path] of recordIds(doc)) {
    const first = seen.get(id);
    if (first) problem(path, id, `This id is already used at ${first.join('.')}: every record needs its own id`);
    else seen.set(id, path);
  }

  // References.
  const ids = <T extends { id: string }>(list: T[]) => new Set(list.map((x) => x.id));
  const must = (set: Set<string>, id: string | undefined, path: Path, what: string) => {
    if (id !== undefined && !set.has(id)) problem(path, id, `Refers to ${what} that is not in this survey`);
  };
  const instruments = ids(doc.instruments);
  const areas = ids(doc.areas);
  const rooms = ids(doc.rooms);
  const defects = new Set(doc.rooms.flatMap((r) => r.defects.map((d) => d.id)));

  doc.survey.outdoorReadings.forEach((r, i) =>
    must(instruments, r.instrumentId, ['survey', 'outdoorReadings', i, 'instrumentId'], 'an instrument'),
  );
  doc.instruments.forEach((x, i) =>
    x.checks.forEach((c, j) =>
      must(instruments, c.referenceInstrumentId, ['instruments', i, 'checks', j, 'referenceInstrumentId'], 'an instrument'),
    ),
  );
  doc.areas.forEach((a, i) => {
    must(areas, a.parentId, ['areas', i, 'parentId'], 'an area');
    a.dwelling?.system?.terminals.forEach((t, j) => {
      const at: Path = ['areas', i, 'dwelling', 'system', 'terminals', j];
      must(rooms, t.roomId, [...at, 'roomId'], 'a room');
      must(instruments, t.instrumentId, [...at, 'instrumentId'], 'an instrument');
    });
  });
  findAreaLoops(doc.areas).forEach((i) => problem(['areas', i, 'parentId'], doc.areas[i]!.parentId, 'Areas sit inside each other in a loop'));

  doc.rooms.forEach((room, r) => {
    const at: Path = ['rooms', r];
    must(areas, room.areaId, [...at, 'areaId'], 'an area');
    const groups = ids(room.occupants);
    const openings = ids(room.openings);
    const readings = ids(room.readings);
    room.openings.forEach((o, i) => must(instruments, o.measuredWith, [...at, 'openings', i, 'measuredWith'], 'an instrument'));
    room.defects.forEach((d, i) => must(openings, d.openingId, [...at, 'defects', i, 'openingId'], 'an opening of this room'));
    room.tests.forEach((t, i) =>
      t.readingIds.forEach((id, j) => must(readings, id, [...at, 'tests', i, 'readingIds', j], 'a reading of this room')),
    );
    room.readings.forEach((reading, i) => {
      const rp: Path = [...at, 'readings', i];
      must(instruments, reading.instrumentId, [...rp, 'instrumentId'], 'an instrument');
      reading.conditions.people.forEach((p, j) =>
        must(groups, p.groupId, [...rp, 'conditions', 'people', j, 'groupId'], 'an occupant group of this room'),
      );
      reading.conditions.openOpeningIds?.forEach((id, j) =>
        must(openings, id, [...rp, 'conditions', 'openOpeningIds', j], 'an opening of this room'),
      );
    });
  });
  doc.series.forEach((s, i) => {
    must(rooms, s.roomId, ['series', i, 'roomId'], 'a room');
    must(instruments, s.instrumentId, ['series', i, 'instrumentId'], 'an instrument');
  });
  doc.photos.forEach((p, i) => {
    must(rooms, p.roomId, ['photos', i, 'roomId'], 'a room');
    must(defects, p.defectId, ['photos', i, 'defectId'], 'a defect');
  });
}

/** Every record id in the document with the path where it stands. */
export function recordIds(doc: ReferencedDocument): [string, Path][] {
  const found: [string, Path][] = [[doc.survey.id, ['survey', 'id']]];
  const add = (list: { id: string }[], path: Path) => list.forEach((x, i) => found.push([x.id, [...path, i, 'id']]));
  add(doc.survey.outdoorReadings, ['survey', 'outdoorReadings']);
  add(doc.survey.designWeather, ['survey', 'designWeather']);
  add(doc.instruments, ['instruments']);
  add(doc.areas, ['areas']);
  doc.rooms.forEach((room, r) => {
    found.push([room.id, ['rooms', r, 'id']]);
    for (const key of ['exposedWalls', 'occupants', 'openings', 'appliances', 'defects', 'tests', 'readings'] as const) {
      add(room[key], ['rooms', r, key]);
    }
  });
  doc.series.forEach((series, i) => {
    found.push([series.id, ['series', i, 'id']]);
    add(series.periods, ['series', i, 'periods']);
  });
  add(doc.photos, ['photos']);
  return found;
}

/** Indexes of areas whose chain of parents comes back to itself. */
function findAreaLoops(areas: ReferencedDocument['areas']): number[] {
  const parentOf = new Map(areas.map((a) => [a.id, a.parentId]));
  return areas.flatMap((area, index) => {
    const visited = new Set<string>();
    let at: string | undefined = area.id;
    while (at !== undefined && !visited.has(at)) {
      visited.add(at);
      at = parentOf.get(at);
    }
    return at === area.id ? [index] : [];
  });
}
