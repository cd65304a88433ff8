/**
 * What the store benchmark runs inside the page: the real store and model code (bundled by
 * test/support/page-bundle.ts), a generator for a large invented data set, and the timed steps.
 * Nothing here is part of the app.
 */
import { Connection } from '../../../src/store/connection.ts';
import { importSurveys } from '../../../src/store/backup.ts';
import { listSurveys } from '../../../src/store/surveys.ts';
import { loadSurvey } from '../../../src/store/load-survey.ts';
import { saveReading } from '../../../src/store/survey-parts.ts';
import { makeSurveyFile, readSurveyFile } from '../../../src/model/survey-file.ts';
import { newSurveyRecord } from '../../../src/model/survey-defaults.ts';
import type { SurveyDocument } from '../../../src/model/survey-document.ts';
import type { Reading } from '../../../src/model/reading.ts';

const uuid = (prefix: number, n: number) => `${prefix.toString(16).padStart(8, '0')}-0000-4000-8000-${n.toString(16).padStart(12, '0')}`;

/** `surveys` invented surveys of `rooms` rooms with `readings` readings each. */
export function benchFileText(surveys: number, rooms: number, readings: number): string {
  const docs: SurveyDocument[] = [];
  for (let s = 0; s < surveys; s += 1) {
    let n = 0;
    const id = () => uuid(s + 1, ++n);
    const start = Date.UTC(2026, 0, 14, 9);
    docs.push({
      survey: newSurveyRecord({ title: `Bench survey ${s + 1} (invented)`, site: 'Benchmark Row (invented)', buildingUse: 'school' }, id(), '2026-01-14T09:00:00Z'),
      instruments: [],
      areas: [],
      rooms: Array.from({ length: rooms }, (_, r) => ({
        id: id(),
        name: `Room ${r + 1}`,
        clientRef: `R${r + 1}`,
        use: 'classroom' as const,
        geometry: { kind: 'box' as const, length_m: 7.2, width_m: 7, height_m: 2.9 },
        exposedWalls: [],
        occupants: [],
        schedule: { template: 'classroom', periods: [] },
        openings: [{ type: 'window' as const, id: id(), count: 4, condition: '', style: 'hinged' as const, hinge: 'top' as const, sashWidth_m: 0.9, sashHeight_m: 0.6, restrictor: 'yes' as const, operability: 'opens' as const }],
        appliances: [],
        defects: [],
        interview: [],
        tests: [],
        notes: '',
        updatedAt: '2026-01-14T12:00:00Z',
        readings: Array.from({ length: readings }, (_, k): Reading => ({
          id: id(),
          time: new Date(start + k * 120_000).toISOString(),
          co2_ppm: 430 + 1000 * Math.exp(-k / 8),
          temp_C: 20.5,
          rh_pct: 45,
          conditions: { people: [], windows: 'all-closed', doors: 'closed', fans: 'none', heating: 'on', combustion: false },
          note: '',
        })),
      })),
      series: [],
      photos: [],
      photosLeftOut: false,
    });
  }
  return JSON.stringify(makeSurveyFile(docs, '2026-01-14T18:00:00Z', 'bench'));
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const percentile = (xs: number[], p: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.ceil((p / 100) * xs.length) - 1)]!;

async function timed<T>(work: () => Promise<T>): Promise<[T, number]> {
  const t0 = performance.now();
  const value = await work();
  return [value, performance.now() - t0];
}

/** Run the whole benchmark on a fresh database; figures in ms. */
export async function runStoreBench(surveys: number, rooms: number, readings: number, saves: number): Promise<Record<string, number>> {
  const name = 'ventwalk-bench';
  await new Promise((resolve) => {
    const request = indexedDB.deleteDatabase(name);
    request.onsuccess = request.onerror = request.onblocked = resolve;
  });
  const text = benchFileText(surveys, rooms, readings);
  const connection = new Connection({ name });
  const [checked, checkMs] = await timed(async () => readSurveyFile(text));
  if (!checked.ok) throw new Error(JSON.stringify(checked.problems.slice(0, 3)));
  const [, importMs] = await timed(() => importSurveys(connection, checked.file, {}, () => crypto.randomUUID()));
  connection.close();

  const cold = new Connection({ name });
  const [list, listColdMs] = await timed(() => listSurveys(cold));
  const listMs: number[] = [];
  for (let i = 0; i < 20; i += 1) listMs.push((await timed(() => listSurveys(cold)))[1]);
  const target = list[0]!.id;
  const loadMs: number[] = [];
  let loadedRooms = 0;
  for (let i = 0; i < 10; i += 1) {
    const [doc, ms] = await timed(() => loadSurvey(cold, target, { photos: true }));
    loadedRooms = doc!.rooms.length;
    loadMs.push(ms);
  }
  const room = checked.file.surveys.find((s) => s.survey.id === target)!.rooms[0]!;
  const saveMs: number[] = [];
  for (let i = 0; i < saves; i += 1) {
    const reading: Reading = { ...room.readings[0]!, id: uuid(0xbe000000, i + 1), time: new Date(Date.UTC(2026, 0, 15, 9) + i * 1000).toISOString(), co2_ppm: 800 + i };
    saveMs.push((await timed(() => saveReading(cold, target, room.id, reading, reading.time)))[1]);
  }
  cold.close();
  return {
    fileMB: text.length / 1e6,
    checkMs,
    importMs,
    listColdMs,
    listMedianMs: median(listMs),
    surveysListed: list.length,
    loadMedianMs: median(loadMs),
    roomsLoaded: loadedRooms,
    saveReadingMedianMs: median(saveMs),
    saveReadingP95Ms: percentile(saveMs, 95),
    saves,
  };
}
