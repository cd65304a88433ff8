/**
 * The next visit to a building, started from an earlier survey of it: what the building IS is
 * copied, what was MEASURED or OBSERVED on the day is not, so nothing from last time can pass
 * for a new finding.
 *
 * Copied, with new ids: the building's facts (site, client, surveyors, purpose, scope, use,
 * ventilation type, stage, construction, year, storeys, terrain, shelter, air permeability,
 * criteria, units, weather cases); the areas (a dwelling's system kind kept, its mode, terminals
 * and their measured flows not); the rooms with their names and numbers, use, size, exposed
 * walls (without measured surface factors, unless a measurement is all that describes a wall), occupant groups and schedule, openings (without
 * condition notes or measured fan flows; whether each opens is kept for the surveyor to
 * confirm) and combustion appliances (the day's checks — vent clear, alarm tested, safety
 * record seen — set back to "not checked").
 *
 * Never copied: readings, tests, defects, interview answers, notes, photos, logger series,
 * instruments, visits, weather, outdoor readings, issued revisions.
 *
 * The new survey records where it came from: `survey.previousSurveyId`, and on each room
 * `previousRoomId`, the map from this visit's rooms to last time's that the comparison uses
 * (analysis/compare-visits.ts).
 *
 * Example: repeatVisit(autumnTerm, newId, '2026-04-20T08:00:00Z').rooms[0].previousRoomId =
 * autumnTerm.rooms[0].id, with no readings and revision 1.
 */
import type { Area } from './area.ts';
import type { Appliance } from './appliance.ts';
import type { ExposedWall } from './exposed-wall.ts';
import type { Opening } from './opening.ts';
import type { DocumentRoom, SurveyDocument } from './survey-document.ts';
import type { Survey } from './survey.ts';
import { MAX_NAME_LENGTH } from './field-rules.ts';

export interface RepeatVisitInput {
  /** The new survey's title; default: the earlier title with "(next visit)". */
  title?: string;
}

/** An opening as it stands, with nothing measured or observed on the day. */
function openingAsBuilt(opening: Opening, id: string): Opening {
  if (opening.type === 'fan') {
    const { measuredFlow_m3s: _flow, measuredWith: _instrument, ...fan } = opening;
    return { ...structuredClone(fan), id, condition: '' };
  }
  return { ...structuredClone(opening), id, condition: '' };
}

/** An appliance with the day's checks to be made again. */
function applianceToRecheck(appliance: Appliance, id: string): Appliance {
  return {
    ...appliance,
    id,
    combustionAirVentClear: 'not-checked',
    coAlarmTested: 'not-checked',
    gasSafetyRecordSeen: 'not-checked',
    notes: '',
  };
}

/** A wall's construction without the day's surface measurement (kept only when it is all that describes the wall). */
function wallAsBuilt(wall: ExposedWall, id: string): ExposedWall {
  const { measured, ...built } = wall;
  return built.construction === undefined && measured ? { ...built, measured: structuredClone(measured), id } : { ...built, id };
}

function areaAsBuilt(area: Area, id: string, parentId: string | undefined): Area {
  const { dwelling } = area;
  const system = dwelling?.system;
  return {
    id,
    ...(parentId ? { parentId } : {}),
    kind: area.kind,
    name: area.name,
    clientRef: area.clientRef,
    notes: '',
    ...(dwelling
      ? { dwelling: { ...dwelling, ...(system ? { system: { kind: system.kind, mode: '', running: 'not-checked', terminals: [], notes: '' } } : {}) } }
      : {}),
  };
}

function defaultTitle(title: string): string {
  const next = `${title} (next visit)`;
  return next.length <= MAX_NAME_LENGTH ? next : title;
}

export function repeatVisit(previous: SurveyDocument, newId: () => string, now: string, input: RepeatVisitInput = {}): SurveyDocument {
  const old = previous.survey;
  const areaIds = new Map(previous.areas.map((a) => [a.id, newId()]));
  const survey: Survey = {
    id: newId(),
    title: input.title ?? defaultTitle(old.title),
    site: old.site,
    client: old.client,
    surveyors: structuredClone(old.surveyors),
    purpose: old.purpose,
    scope: old.scope,
    visits: [],
    buildingUse: old.buildingUse,
    ...(old.ventilation ? { ventilation: old.ventilation } : {}),
    ...(old.stage ? { stage: old.stage } : {}),
    construction: old.construction,
    ...(old.builtYear !== undefined ? { builtYear: old.builtYear } : {}),
    ...(old.storeys !== undefined ? { storeys: old.storeys } : {}),
    ...(old.terrain ? { terrain: old.terrain } : {}),
    ...(old.shelter ? { shelter: old.shelter } : {}),
    ...(old.airPermeability ? { airPermeability: structuredClone(old.airPermeability) } : {}),
    ...(old.criteria ? { criteria: structuredClone(old.criteria) } : {}),
    units: old.units,
    weather: { conditions: '' },
    outdoorReadings: [],
    designWeather: old.designWeather.map((w) => ({ ...w, id: newId() })),
    notes: '',
    revision: 1,
    issued: [],
    createdAt: now,
    updatedAt: now,
    previousSurveyId: old.id,
  };
  const rooms: DocumentRoom[] = previous.rooms.map((room) => {
    const areaId = room.areaId === undefined ? undefined : areaIds.get(room.areaId);
    return {
      id: newId(),
      ...(areaId ? { areaId } : {}),
      name: room.name,
      clientRef: room.clientRef,
      use: room.use,
      geometry: structuredClone(room.geometry),
      exposedWalls: room.exposedWalls.map((wall) => wallAsBuilt(wall, newId())),
      occupants: room.occupants.map((g) => ({ ...g, id: newId() })),
      schedule: structuredClone(room.schedule),
      openings: room.openings.map((o) => openingAsBuilt(o, newId())),
      appliances: room.appliances.map((a) => applianceToRecheck(a, newId())),
      defects: [],
      interview: [],
      tests: [],
      notes: '',
      updatedAt: now,
      previousRoomId: room.id,
      readings: [],
    };
  });
  return {
    survey,
    instruments: [],
    areas: previous.areas.map((a) => areaAsBuilt(a, areaIds.get(a.id)!, a.parentId === undefined ? undefined : areaIds.get(a.parentId))),
    rooms,
    series: [],
    photos: [],
    photosLeftOut: false,
  };
}
