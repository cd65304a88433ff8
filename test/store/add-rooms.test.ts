import { describe, it, expect, afterEach } from 'vitest';
import { addAreasAndRooms } from '../../src/store/add-rooms.ts';
import { importSurveys } from '../../src/store/backup.ts';
import { loadSurvey } from '../../src/store/load-survey.ts';
import { readRoomList } from '../../src/ingest/room-list.ts';
import { closeAll, dumpAll, freshConnection, testIds } from '../support/store-helpers.ts';
import { demoFile } from '../support/fixtures.ts';

afterEach(() => closeAll());

const LIST = 'Block,Room,Use,Floor area (m²),Height (m),Pupils\nBlock B (1968),Library,Classroom,80,3,25\nAnnexe,Music room,Classroom,48,2.6,20\n';

async function schoolWithList() {
  const connection = freshConnection();
  const file = demoFile();
  const school = file.surveys[0]!;
  await importSurveys(connection, { ...file, surveys: [school] }, {}, testIds());
  const read = readRoomList(LIST, { newId: testIds(), now: '2026-04-20T08:00:00Z', existingAreas: school.areas });
  if (read.status !== 'read') throw new Error(read.error);
  return { connection, school, read };
}

describe('adding a room list to a survey', () => {
  it('adds the rooms after the existing ones, reusing an area of the survey, in one go', async () => {
    const { connection, school, read } = await schoolWithList();
    await expect(addAreasAndRooms(connection, school.survey.id, read.areas, read.rooms, '2026-04-20T08:00:00Z')).resolves.toEqual({ areas: 1, rooms: 2 });
    const loaded = (await loadSurvey(connection, school.survey.id, { photos: false }))!;
    expect(loaded.rooms.map((r) => r.name)).toEqual([...school.rooms.map((r) => r.name), 'Library', 'Music room']);
    expect(loaded.areas.map((a) => a.name)).toEqual([...school.areas.map((a) => a.name), 'Annexe']);
    expect(loaded.rooms.at(-2)!.areaId).toBe(school.areas[0]!.id);
    expect(loaded.survey.updatedAt).toBe('2026-04-20T08:00:00Z');
  });

  it('adds nothing when one record is refused', async () => {
    const { connection, school, read } = await schoolWithList();
    const before = await dumpAll(connection);
    const bad = { ...read.rooms[1]!, name: '' };
    await expect(addAreasAndRooms(connection, school.survey.id, read.areas, [read.rooms[0]!, bad], '2026-04-20T08:00:00Z')).rejects.toThrow(/Room name is empty/);
    await expect(addAreasAndRooms(connection, 'f0000000-0000-4000-8000-000000000000', read.areas, read.rooms, '2026-04-20T08:00:00Z')).rejects.toThrow(/no longer on the device/);
    expect(await dumpAll(connection)).toEqual(before);
  });
});
