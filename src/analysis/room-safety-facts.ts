/**
 * The survey records a room's safety rules and fix gates read (core safety-items.ts and
 * safety-gates.ts): its combustion appliances, the extract fans of its whole home (an extract
 * fan in the bathroom can pull fumes from an open-flued boiler in the kitchen), blocked
 * combustion-air vents, dead extract fans, mould seen; and for the gates the building's age,
 * the floor (from the area names: "ground" → ground floor; "first", "second", … "upper" → above;
 * otherwise unknown, which the gates treat cautiously), outside walls and escape routes.
 *
 * The home: the room's nearest flat or house area and every room in it; a room outside any
 * dwelling is its own home.
 * Example: Flat 7's bathroom → the kitchen's open-flued gas boiler makes openFlued true.
 */
import type { GateFacts } from '../core/judgement/safety-gates.ts';
import type { SafetyAppliance, SafetyFacts } from '../core/judgement/safety-items.ts';
import type { Area } from '../model/area.ts';
import type { DocumentRoom, SurveyDocument } from '../model/survey-document.ts';
import { isFanDead, isVentBlocked } from './room-state.ts';

const LABELS: Readonly<Record<string, string>> = {
  'gas-boiler': 'gas boiler',
  'gas-water-heater': 'gas water heater',
  'gas-fire': 'gas fire',
  'gas-cooker': 'gas cooker',
  'oil-boiler': 'oil boiler',
  'solid-fuel-stove': 'solid-fuel stove',
  'open-fire': 'open fire',
  'unflued-heater': 'unflued heater',
  other: 'combustion appliance',
};
const SOLID_FUEL = new Set(['solid-fuel-stove', 'open-fire']);

/** The rooms of the room's home (the room alone when it is in no dwelling). */
export function homeRooms(room: DocumentRoom, doc: SurveyDocument): { home: Area | undefined; rooms: DocumentRoom[] } {
  const chain: Area[] = [];
  let id = room.areaId;
  while (id !== undefined && !chain.some((a) => a.id === id)) {
    const a = doc.areas.find((x) => x.id === id);
    if (!a) break;
    chain.push(a);
    id = a.parentId;
  }
  const home = chain.find((a) => a.kind === 'flat' || a.kind === 'house');
  if (!home) return { home: undefined, rooms: [room] };
  return { home, rooms: doc.rooms.filter((r) => r.areaId === home.id) };
}

function appliances(room: DocumentRoom): SafetyAppliance[] {
  return room.appliances.map((a) => ({
    id: a.id,
    label: LABELS[a.kind] ?? a.kind,
    flue: a.flue,
    solidFuel: SOLID_FUEL.has(a.kind),
    cooker: a.kind === 'gas-cooker',
    ventPresent: a.combustionAirVentPresent,
    ventClear: a.combustionAirVentClear,
    coAlarmPresent: a.coAlarmPresent,
    coAlarmTested: a.coAlarmTested,
  }));
}

const workingExtract = (r: DocumentRoom) => r.openings.filter((o) => o.type === 'fan' && o.direction === 'extract' && o.ducting !== 'recirculating' && !isFanDead(r, o)).length;

/** Safety facts of a room. */
export function safetyFacts(room: DocumentRoom, doc: SurveyDocument): SafetyFacts {
  const { home, rooms } = homeRooms(room, doc);
  const terminals = home?.dwelling?.system && home.dwelling.system.running !== 'no' ? home.dwelling.system.terminals.filter((t) => t.direction === 'extract').length : 0;
  return {
    appliances: appliances(room),
    extractInDwelling: rooms.reduce((s, r) => s + workingExtract(r), 0) + terminals,
    blockedCombustionAirVents: room.openings.filter((o) => o.type === 'vent' && o.purpose === 'combustion-air' && isVentBlocked(room, o)).length,
    deadExtractFans: room.openings.filter((o) => o.type === 'fan' && o.direction === 'extract' && isFanDead(room, o)).length,
    mouldSeen: room.defects.some((d) => d.kind === 'mould'),
  };
}

/** Gate facts of a room. */
export function gateFacts(room: DocumentRoom, doc: SurveyDocument): GateFacts {
  const { rooms } = homeRooms(room, doc);
  const all = rooms.flatMap(appliances).filter((a) => !a.cooker && (a.flue === 'open-flued' || a.flue === 'not-known'));
  const names = doc.areas.filter((a) => a.id === room.areaId || doc.areas.some((b) => b.id === room.areaId && b.parentId === a.id)).map((a) => a.name).join(' ');
  const ground = /ground/i.test(names);
  const above = /\b(first|second|third|fourth|fifth|upper|top)\b|\d+(st|nd|rd|th) floor/i.test(names);
  const year = doc.survey.builtYear;
  return {
    openFlued: all.length > 0,
    openFluedSolidFuel: all.some((a) => a.solidFuel),
    builtBefore2000: year === undefined ? 'unknown' : year < 2000,
    groundFloor: ground ? true : above ? false : 'unknown',
    aboveGroundFloor: above ? true : ground ? false : 'unknown',
    outsideWall: room.exposedWalls.length > 0,
    escapeRoute: room.use === 'circulation',
  };
}
