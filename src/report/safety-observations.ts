/**
 * Safety items as recorded on the day: facts the surveyor wrote down about combustion
 * appliances, combustion-air vents, carbon monoxide alarms and dead extract fans in rooms with
 * mould. They are observations, not the judgement's verdict; the summary lists them apart from
 * improvements (practice.md §3) whether or not the judgement is available.
 *
* Example: a kitchen with an open-flued gas boiler and no CO alarm gives hazards
 * ['Gas boiler (open-flued): no carbon monoxide alarm found'].
 */
import type { DocumentRoom } from '../model/survey-document.ts';

const APPLIANCE_WORDS: Record<string, string> = {
  'gas-boiler': 'Gas boiler',
  'gas-water-heater': 'Gas water heater',
  'gas-fire': 'Gas fire',
  'gas-cooker': 'Gas cooker',
  'oil-boiler': 'Oil boiler',
  'solid-fuel-stove': 'Solid-fuel stove',
  'open-fire': 'Open fire',
  'unflued-heater': 'Unflued heater',
  other: 'Combustion appliance',
};

const FLUE_WORDS: Record<string, string> = {
  'room-sealed': 'room-sealed',
  'open-flued': 'open-flued',
  flueless: 'flueless',
  'not-known': 'flue type not known',
};

/** The appliance in words. Example: applianceWords({ kind: 'gas-boiler', flue: 'open-flued' }) = 'Gas boiler (open-flued)'. */
export function applianceWords(a: DocumentRoom['appliances'][number]): string {
  return `${APPLIANCE_WORDS[a.kind] ?? a.kind} (${FLUE_WORDS[a.flue] ?? a.flue})`;
}

/**
 * A room's safety lines for the report: the judgement's safety items when there is a judgement
 * (it reads the same records and states who should act), otherwise the hazards as recorded; and
 * in both cases the paperwork not seen (a gas safety record), which the judgement does not rate.
 */
export function roomSafetyLines(room: DocumentRoom, judged: readonly string[] | null): { text: string; judged: boolean }[] {
  const { hazards, paperwork } = safetyObservations(room);
  return [
    ...(judged ? judged.map((text) => ({ text, judged: true })) : hazards.map((text) => ({ text: `${text} (recorded on the day)`, judged: false }))),
    ...paperwork.map((text) => ({ text: `${text} (recorded on the day)`, judged: false })),
  ];
}

/** The safety observations recorded for one room: hazards, and paperwork not seen. */
export function safetyObservations(room: DocumentRoom): { hazards: string[]; paperwork: string[] } {
  const out: string[] = [];
  const paperwork: string[] = [];
  for (const a of room.appliances) {
    const name = applianceWords(a);
    const needsAir = a.flue === 'open-flued' || a.flue === 'flueless' || a.flue === 'not-known';
    if (needsAir && a.combustionAirVentPresent === 'no') out.push(`${name}: no combustion-air vent found`);
    if (needsAir && a.combustionAirVentClear === 'no') out.push(`${name}: combustion-air vent not clear`);
    if (a.coAlarmPresent === 'no') out.push(`${name}: no carbon monoxide alarm found`);
    else if (a.coAlarmTested === 'no') out.push(`${name}: carbon monoxide alarm not working when tested`);
    if (a.gasSafetyRecordSeen === 'no') paperwork.push(`${name}: gas safety record not seen`);
    if (a.flue === 'flueless' || a.kind === 'unflued-heater') out.push(`${name}: burns into the room; its fumes and moisture stay in the room`);
  }
  for (const o of room.openings) {
    if (o.type === 'vent' && o.purpose === 'combustion-air' && (o.operability === 'blocked' || o.operability === 'seized')) {
      out.push('Combustion-air vent blocked or shut');
    }
  }
  const mould = room.defects.some((d) => d.kind === 'mould');
  if (mould && room.defects.some((d) => d.kind === 'fan-dead')) out.push('Extract fan not working in a room with mould');
  return { hazards: out, paperwork };
}
