/**
 * The open survey on site: its whole document (header, instruments, areas, rooms with their
 * readings), the photos' descriptions, and the live findings. Screens edit the document in
 * place and say what changed; each change is checked with the model's schema and autosaved —
 * the header through a patch applied to the stored header, each room and each area edited on its
 * screen through its own autosave, readings, instruments, new areas and photos as single
 * records — and once a save has landed the analysis is asked to run again (on the survey as
 * stored). Removing an area moves its rooms to the area it sat in (area-removal.ts).
 */
import { areaSchema, type Area } from '../model/area.ts';
import { areaRemovalPlan, movedTo } from '../model/area-removal.ts';
import { withoutTerminalRoom } from '../model/terminal-room-removal.ts';
import type { Instrument } from '../model/instrument.ts';
import type { LoggerSeries } from '../model/logger-series.ts';
import type { Photo } from '../model/photo.ts';
import type { Reading } from '../model/reading.ts';
import { roomSchema, type Room } from '../model/room.ts';
import { validPart } from '../model/valid-part.ts';
import { surveySchema } from '../model/survey.ts';
import type { DocumentRoom, SurveyDocument } from '../model/survey-document.ts';
import { validationProblems, type ValidationProblem } from '../model/validation-problem.ts';
import { duplicateRoom } from '../store/duplicate-room.ts';
import { loadSurvey } from '../store/load-survey.ts';
import { getPhotoBytes, listPhotos } from '../store/photos.ts';
import { reorderRooms } from '../store/reorder-rooms.ts';
import { deleteArea, deleteInstrument, deleteReading, deleteRoom, deleteSeries } from '../store/remove-parts.ts';
import { getSurvey } from '../store/surveys.ts';
import { saveArea, saveInstrument, saveReading, saveRoom, saveSeries } from '../store/survey-parts.ts';
import { addPhoto, type PhotoPlace } from './add-photo.ts';
import { checkArea } from './area-problems.ts';
import { Autosave } from './autosave.svelte.ts';
import { LiveAnalysis } from './live-analysis.svelte.ts';
import { connection } from './storage-connection.ts';
import { knowHeader, updateSurveyHeader, type SurveyPatch } from './update-survey-header.ts';

const message = (error: unknown) => (error instanceof Error ? error.message : String(error));

class SurveyWalk {
  doc = $state<SurveyDocument | null>(null);
  photos = $state<Photo[]>([]);
  loadError = $state<string | null>(null);
  /** Problems with the header as edited, and with each room, by room id. */
  headerProblems = $state<ValidationProblem[]>([]);
  roomProblems = $state<Record<string, ValidationProblem[]>>({});
  /** Problems with each area as edited on its screen, by area id. */
  areaProblems = $state<Record<string, ValidationProblem[]>>({});
  readonly analysis = new LiveAnalysis();
  private patch: SurveyPatch = {};
  private readonly roomSaves = new Map<string, Autosave<Room>>();
  private readonly areaSaves = new Map<string, Autosave<Area>>();
  /**
   * Each room's and area's last version that passed its schema: when an edit breaks a rule in one
   * field, its valid part (valid-part.ts) is saved against it, so the rest is not lost.
   */
  private readonly lastValidRooms = new Map<string, Room>();
  private readonly lastValidAreas = new Map<string, Area>();
  readonly header = new Autosave<SurveyPatch>({
    form: 'survey header',
    save: async (patch) => {
      if (!this.doc) return;
      await updateSurveyHeader(this.doc.survey.id, patch);
      this.analyse();
    },
  });

  /** Load a survey (unless it is already open). */
  async open(surveyId: string): Promise<void> {
    if (this.doc?.survey.id === surveyId) return;
    await this.flushAll();
    this.doc = null;
    this.patch = {};
    this.loadError = null;
    this.analysis.clear();
    try {
      const [doc, photos] = await Promise.all([loadSurvey(connection, surveyId, { photos: false }), listPhotos(connection, surveyId)]);
      if (!doc) {
        this.loadError = 'This survey is not on this device (it may have been deleted).';
        return;
      }
      this.analysis.request(surveyId, 0);
      this.doc = doc;
      this.knowValid(doc);
      knowHeader(doc.survey);
      this.photos = photos;
    } catch (error) {
      this.loadError = message(error);
    }
  }

  /** Forget the open survey (after saving what is pending), so the next open reads it afresh. */
  async close(): Promise<void> {
    await this.flushAll();
    this.doc = null;
    this.analysis.clear();
  }

  /**
   * Read the open survey again from storage, in place (the screen stays): rooms and areas were
   * added by another use case, e.g. a room list. Pending edits are saved first.
   */
  async reload(): Promise<void> {
    const surveyId = this.doc?.survey.id;
    if (!surveyId) return;
    await this.flushAll();
    const doc = await loadSurvey(connection, surveyId, { photos: false });
    if (!doc || this.doc?.survey.id !== surveyId) return;
    this.doc = doc;
    this.knowValid(doc);
    knowHeader(doc.survey);
    this.analyse();
  }

  /** Remember a survey's rooms and areas as stored (so as checked) as their last valid versions. */
  private knowValid(doc: SurveyDocument): void {
    this.lastValidRooms.clear();
    this.lastValidAreas.clear();
    for (const { readings: _readings, ...room } of doc.rooms) this.lastValidRooms.set(room.id, structuredClone(room));
    for (const area of doc.areas) this.lastValidAreas.set(area.id, structuredClone(area));
  }

  async flushAll(): Promise<void> {
    const saves = [...this.roomSaves.values(), ...this.areaSaves.values()];
    await Promise.all([this.header.flush(), ...saves.map((save) => save.flush())]);
  }

  /** Read the stored header again (another screen changed it), unless edits here are waiting. */
  async reloadHeader(): Promise<void> {
    if (!this.doc || this.header.state !== 'saved') return;
    const stored = await getSurvey(connection, this.doc.survey.id);
    if (stored && this.doc?.survey.id === stored.id) {
      knowHeader(stored);
      this.doc.survey = stored;
    }
  }

  /** Another screen saved the header of the open survey: read it again and analyse afresh. */
  async headerSavedElsewhere(surveyId: string): Promise<void> {
    if (this.doc?.survey.id !== surveyId) return;
    await this.reloadHeader();
    this.analyse();
  }

  room(roomId: string | null): DocumentRoom | undefined {
    return this.doc?.rooms.find((r) => r.id === roomId);
  }

  /** Change header fields: shown at once, checked, and saved once typing pauses. */
  patchSurvey(patch: SurveyPatch): void {
    if (!this.doc) return;
    Object.assign(this.doc.survey, patch);
    this.patch = { ...this.patch, ...$state.snapshot(patch) };
    const parsed = surveySchema.safeParse($state.snapshot(this.doc.survey));
    if (!parsed.success) {
      this.headerProblems = validationProblems(parsed.error);
      this.header.refuse(this.headerProblems.map((p) => p.message).join('; '));
      return;
    }
    this.headerProblems = [];
    this.header.edit(this.patch);
  }

  /** The autosave of one room (its own, so edits to two rooms never replace each other). */
  roomSave(roomId: string): Autosave<Room> {
    return this.recordSave(this.roomSaves, roomId, `room ${roomId}`, (room) => saveRoom(connection, this.doc!.survey.id, room));
  }

  /** A room was edited in place: check it, then save it once typing pauses. */
  roomChanged(roomId: string, now = new Date()): void {
    const room = this.room(roomId);
    if (!room || !this.doc) return;
    room.updatedAt = now.toISOString();
    const { readings: _readings, ...record } = $state.snapshot(room);
    const parsed = roomSchema.safeParse(record);
    if (!parsed.success) {
      const problems = validationProblems(parsed.error);
      this.roomProblems[roomId] = problems;
      const message = problems.map((p) => p.message).join('; ');
      const last = this.lastValidRooms.get(roomId);
      const kept = last && validPart(roomSchema, record, last);
      if (kept) this.roomSave(roomId).editPartly(kept, `${message}. Everything else in this room is saved.`);
      else this.roomSave(roomId).refuse(message);
      return;
    }
    this.roomProblems[roomId] = [];
    this.lastValidRooms.set(roomId, parsed.data);
    this.roomSave(roomId).edit(parsed.data);
  }

  area(areaId: string | null): Area | undefined {
    return this.doc?.areas.find((a) => a.id === areaId);
  }

  /** The autosave of one area edited on its screen. */
  areaSave(areaId: string): Autosave<Area> {
    return this.recordSave(this.areaSaves, areaId, `area ${areaId}`, (area) => saveArea(connection, this.doc!.survey.id, area, new Date().toISOString()));
  }

  /** An area was edited in place: check it (problems name the field), then save it once typing pauses. */
  areaChanged(areaId: string): void {
    const area = this.area(areaId);
    if (!area) return;
    const edited = $state.snapshot(area) as Area;
    const checked = checkArea(edited);
    if (!checked.ok) {
      this.areaProblems[areaId] = checked.problems;
      const message = checked.problems.map((p) => p.message).join('; ');
      const last = this.lastValidAreas.get(areaId);
      const kept = last && validPart(areaSchema, edited, last);
      if (kept) this.areaSave(areaId).editPartly(kept, `${message}. Everything else in this area is saved.`);
      else this.areaSave(areaId).refuse(message);
      return;
    }
    this.areaProblems[areaId] = [];
    this.lastValidAreas.set(areaId, checked.area);
    this.areaSave(areaId).edit(checked.area);
  }

  /**
   * Remove an area: its rooms and the areas inside it move to the area it sat in (or to no
   * area), its dwelling facts and system go with it. Pending edits are saved first.
   */
  async removeArea(areaId: string, now = new Date()): Promise<void> {
    await this.flushAll();
    await deleteArea(connection, this.doc!.survey.id, areaId, now.toISOString());
    const doc = this.doc!;
    const plan = areaRemovalPlan(doc.areas, doc.rooms, areaId);
    this.areaSaves.get(areaId)?.closeForm();
    this.areaSaves.delete(areaId);
    this.lastValidAreas.delete(areaId);
    delete this.areaProblems[areaId];
    if (plan) {
      doc.areas = doc.areas.filter((a) => a.id !== areaId).map((a) => (plan.areaIds.includes(a.id) ? movedTo(a, 'parentId', plan.parentId) : a));
      for (const room of doc.rooms) {
        if (!plan.roomIds.includes(room.id)) continue;
        if (plan.parentId === undefined) delete room.areaId;
        else room.areaId = plan.parentId;
        room.updatedAt = now.toISOString();
      }
    }
    this.analyse();
  }

  /** Save a new room (already complete and valid) last in the survey. */
  async addRoom(room: Room): Promise<DocumentRoom> {
    const saved = await saveRoom(connection, this.doc!.survey.id, room);
    this.lastValidRooms.set(saved.id, structuredClone(saved));
    const added = { ...saved, readings: [] };
    this.doc!.rooms.push(added);
    this.analyse();
    return added;
  }

  /** A copy of a room's size and openings, saved as a new room. */
  async duplicate(roomId: string, now = new Date()): Promise<DocumentRoom> {
    await this.roomSave(roomId).flush();
    const copy = await duplicateRoom(connection, roomId, () => crypto.randomUUID(), now.toISOString());
    this.lastValidRooms.set(copy.id, structuredClone(copy));
    const added = { ...copy, readings: [] };
    this.doc!.rooms.push(added);
    this.analyse();
    return added;
  }

  /** Move a room one place up (-1) or down (+1) in the walking order. */
  async move(roomId: string, by: -1 | 1): Promise<void> {
    const rooms = this.doc!.rooms;
    const from = rooms.findIndex((r) => r.id === roomId);
    const to = from + by;
    if (from < 0 || to < 0 || to >= rooms.length) return;
    const order = rooms.map((r) => r.id);
    [order[from], order[to]] = [order[to]!, order[from]!];
    await reorderRooms(connection, this.doc!.survey.id, order);
    const [room] = rooms.splice(from, 1);
    rooms.splice(to, 0, room!);
  }

  /**
   * Remove a room entered by mistake, with its readings, photos and logger series; a terminal
   * that served it keeps the room's name as its location.
   */
  async removeRoom(roomId: string, now = new Date()): Promise<void> {
    await this.flushAll();
    const room = this.room(roomId);
    await deleteRoom(connection, this.doc!.survey.id, roomId, now.toISOString());
    if (room) this.doc!.areas = this.doc!.areas.map((a) => withoutTerminalRoom(a, room));
    this.doc!.rooms = this.doc!.rooms.filter((r) => r.id !== roomId);
    this.lastValidRooms.delete(roomId);
    this.photos = this.photos.filter((p) => p.roomId !== roomId);
    this.analyse();
  }

  /** Remove a reading entered by mistake; it leaves any test that grouped it. */
  async removeReading(roomId: string, readingId: string, now = new Date()): Promise<void> {
    await this.roomSave(roomId).flush();
    await deleteReading(connection, this.doc!.survey.id, readingId, now.toISOString());
    const room = this.room(roomId)!;
    room.readings = room.readings.filter((r) => r.id !== readingId);
    room.tests = room.tests
      .map((t) => ({ ...t, readingIds: t.readingIds.filter((id) => id !== readingId) }))
      .filter((t) => t.readingIds.length >= 2);
    this.analyse();
  }

  async saveArea(area: Area, now = new Date()): Promise<void> {
    const saved = await saveArea(connection, this.doc!.survey.id, $state.snapshot(area) as Area, now.toISOString());
    this.lastValidAreas.set(saved.id, structuredClone(saved));
    this.upsert(this.doc!.areas, saved);
    this.analyse();
  }

  /** Remove an instrument added by mistake; the store refuses while any record names it. */
  async removeInstrument(instrumentId: string, now = new Date()): Promise<void> {
    await deleteInstrument(connection, this.doc!.survey.id, instrumentId, now.toISOString());
    this.doc!.instruments = this.doc!.instruments.filter((i) => i.id !== instrumentId);
    this.analyse();
  }

  async saveInstrument(instrument: Instrument, now = new Date()): Promise<void> {
    const saved = await saveInstrument(connection, this.doc!.survey.id, $state.snapshot(instrument) as Instrument, now.toISOString());
    this.upsert(this.doc!.instruments, saved);
    this.analyse();
  }

  /** Save a reading of a room (the room's pending edits are saved first). */
  async saveReading(roomId: string, reading: Reading, now = new Date()): Promise<Reading> {
    await this.roomSave(roomId).flush();
    const saved = await saveReading(connection, this.doc!.survey.id, roomId, $state.snapshot(reading) as Reading, now.toISOString());
    this.upsert(this.room(roomId)!.readings, saved);
    this.analyse();
    return saved;
  }

  /** Save a logger series (a room's or the outdoor logger's); the findings follow. */
  async saveSeries(series: LoggerSeries, now = new Date()): Promise<LoggerSeries> {
    const saved = await saveSeries(connection, this.doc!.survey.id, series, now.toISOString());
    this.upsert(this.doc!.series, saved);
    this.analyse();
    return saved;
  }

  /** Remove a logger series (the outdoor logger, say); the findings follow. */
  async removeSeries(seriesId: string, now = new Date()): Promise<void> {
    await deleteSeries(connection, this.doc!.survey.id, seriesId, now.toISOString());
    this.doc!.series = this.doc!.series.filter((s) => s.id !== seriesId);
    this.analyse();
  }

  async addPhoto(file: Blob, place: Omit<PhotoPlace, 'surveyId'>): Promise<void> {
    const photo = await addPhoto(file, { ...place, surveyId: this.doc!.survey.id });
    this.photos.push(photo);
  }

  /** A photo's picture as an object URL (the caller revokes it), or undefined. */
  async photoUrl(photoId: string): Promise<string | undefined> {
    const bytes = await getPhotoBytes(connection, photoId);
    return bytes && URL.createObjectURL(new Blob([bytes], { type: 'image/jpeg' }));
  }

  /** The autosave of one record, made on first use: `write` stores it, then the findings follow. */
  private recordSave<T>(saves: Map<string, Autosave<T>>, id: string, form: string, write: (value: T) => Promise<unknown>): Autosave<T> {
    let save = saves.get(id);
    if (!save) {
      save = new Autosave<T>({
        form,
        save: async (value) => {
          await write(value);
          this.analyse();
        },
      });
      saves.set(id, save);
    }
    return save;
  }

  /** Stored data changed: the findings follow. */
  private analyse(): void {
    if (this.doc) this.analysis.request(this.doc.survey.id);
  }

  private upsert<T extends { id: string }>(list: T[], record: T): void {
    const i = list.findIndex((x) => x.id === record.id);
    if (i === -1) list.push(record);
    else list[i] = record;
  }
}

export const surveyWalk = new SurveyWalk();
