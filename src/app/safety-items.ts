/**
 * Safety items to show above everything else: what was seen on site that needs action whatever
 * the ventilation figures say — no CO alarm (or one not working) beside a combustion appliance,
 * a combustion-air vent missing or blocked, an open-flued or flueless appliance, a dead fan.
 * Each names its room and the check, in plain words.
 *
 * Example: a gas boiler with coAlarmPresent 'no' in "Kitchen" →
 * { roomId, room: 'Kitchen', text: 'Gas boiler: no CO alarm' }.
 */
import { APPLIANCE_KINDS } from '../model/appliance.ts';
import type { DocumentRoom } from '../model/survey-document.ts';

export interface SafetyItem {
  roomId: string;
  room: string;
  text: string;
}

export const APPLIANCE_LABELS: Record<(typeof APPLIANCE_KINDS)[number], string> = {
  'gas-boiler': 'Gas boiler',
  'gas-water-heater': 'Gas water heater',
  'gas-fire': 'Gas fire',
  'gas-cooker': 'Gas cooker or hob',
  'oil-boiler': 'Oil boiler',
  'solid-fuel-stove': 'Solid-fuel stove',
  'open-fire': 'Open fire',
  'unflued-heater': 'Unflued heater',
  other: 'Combustion appliance',
};

export function safetyItems(rooms: readonly DocumentRoom[]): SafetyItem[] {
  const items: SafetyItem[] = [];
  for (const room of rooms) {
    const add = (text: string) => items.push({ roomId: room.id, room: room.name, text });
    for (const a of room.appliances) {
      const name = APPLIANCE_LABELS[a.kind];
      if (a.coAlarmPresent === 'no') add(`${name}: no CO alarm`);
      else if (a.coAlarmTested === 'no') add(`${name}: CO alarm did not work when tested`);
      if (a.combustionAirVentPresent === 'no' && a.flue !== 'room-sealed') add(`${name}: no combustion-air vent`);
      if (a.combustionAirVentClear === 'no') add(`${name}: combustion-air vent blocked or shut`);
      if (a.flue === 'open-flued' || a.flue === 'flueless') {
        add(`${name}: ${a.flue === 'open-flued' ? 'open-flued' : 'flueless'} — any extract fan here needs a spillage check by a qualified engineer`);
      }
    }
    for (const d of room.defects) if (d.kind === 'fan-dead') add('Extract fan not working');
  }
  return items;
}
