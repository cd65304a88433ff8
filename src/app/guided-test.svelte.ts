/**
 * A guided test in one room: a decay ("people have left"), a seeded decay (CO₂ released in an
 * empty room) or a build-up across a lesson. It keeps the clock — a reading is due every
 * `interval_s` — saves each reading with the conditions set at the start, and, from the second
 * reading on, saves the test itself on the room so the analysis fits it.
 */
import type { Conditions, Reading, RoomTest } from '../model/reading.ts';
import type { DocumentRoom } from '../model/survey-document.ts';
import { startingConditions } from './new-reading.ts';
import { localIso } from './local-time.ts';
import { surveyWalk } from './survey-walk.svelte.ts';
import type { MeasuredEstimate, Ranged } from '../analysis/results.ts';
import type { SurveyDocument } from '../model/survey-document.ts';
import { projectTenMoreMinutes } from './decay-projection.ts';

export type GuidedKind = RoomTest['kind'];

export class GuidedTest {
  readonly testId = crypto.randomUUID();
  conditions = $state<Conditions>() as Conditions;
  interval_s = $state(180);
  startedAt = $state<number | null>(null);
  lastAt = $state<number | null>(null);
  readings = $state<Reading[]>([]);
  now = $state(Date.now());
  private ticker: ReturnType<typeof setInterval> | undefined;

  constructor(
    readonly room: DocumentRoom,
    readonly kind: GuidedKind,
  ) {
    const start = startingConditions(room);
    // A decay is taken with the room empty; a build-up with its people in.
    this.conditions = kind === 'build-up' ? start : { ...start, people: start.people.map((p) => ({ ...p, count: 0 })), combustion: false };
  }

  /** Seconds until the next reading is due (0: due now), or null before the start. */
  get dueIn(): number | null {
    if (this.lastAt === null) return this.startedAt === null ? null : 0;
    return Math.max(0, Math.ceil((this.lastAt + this.interval_s * 1000 - this.now) / 1000));
  }

  start(now = Date.now()): void {
    this.startedAt = now;
    this.now = now;
    this.ticker = setInterval(() => (this.now = Date.now()), 1000);
  }

  stop(): void {
    clearInterval(this.ticker);
  }

  /** Save one reading of the test (CO₂ in ppm, optionally temperature and humidity). */
  async addReading(values: Pick<Reading, 'co2_ppm' | 'temp_C' | 'rh_pct'>, instrumentId: string | undefined, now = new Date()): Promise<void> {
    const reading: Reading = {
      id: crypto.randomUUID(),
      time: localIso(now),
      ...values,
      ...(instrumentId ? { instrumentId } : {}),
      conditions: $state.snapshot(this.conditions) as Conditions,
      note: '',
    };
    const saved = await surveyWalk.saveReading(this.room.id, reading, now);
    this.readings.push(saved);
    this.lastAt = now.getTime();
    if (this.readings.length >= 2) this.saveTest();
  }

  /** The interval ten more minutes of readings would give, if the decay carries on as fitted. */
  project(fit: MeasuredEstimate): Promise<Ranged | null> {
    const doc = $state.snapshot(surveyWalk.doc) as SurveyDocument;
    return projectTenMoreMinutes(doc, this.room.id, this.testId, fit, this.interval_s);
  }

  private saveTest(): void {
    const test: RoomTest = { id: this.testId, kind: this.kind, readingIds: this.readings.map((r) => r.id), note: '' };
    const i = this.room.tests.findIndex((t) => t.id === this.testId);
    if (i === -1) this.room.tests.push(test);
    else this.room.tests[i] = test;
    surveyWalk.roomChanged(this.room.id);
  }
}
