/**
 * Safety items of a room: conditions that can hurt people now, kept apart from ventilation
 * improvements and ranked above everything else (practice.md §2 items 2 and 10, §3 "Summary").
 * Each item names what was found (a fact) and who should deal with it; none is a diagnosis of
 * the appliance, which needs a registered gas or solid-fuel engineer.
 *
 * Items:
 * - no CO alarm (or not checked) in a room with a fixed combustion appliance other than a gas
 *   cooker (English rented homes must have one since 2022, from memory; good practice anywhere);
 * - a CO alarm that did not sound when tested;
 * - a combustion-air vent blocked or missing for an open-flued appliance;
 * - an open-flued appliance where extract fans run in the same dwelling: the extract can pull
 *   flue gases back into the home; a spillage test by a qualified engineer is needed;
 * - a flueless (unflued) heater: CO and a large moisture load;
 * - a dead extract fan in a room where mould was seen.
 */

/** A yes / no / not-checked answer. */
export type CheckAnswer = 'yes' | 'no' | 'not-checked';

/** A combustion appliance as the safety rules need it. */
export interface SafetyAppliance {
  id: string;
  /** In words: "gas boiler". */
  label: string;
  flue: 'room-sealed' | 'open-flued' | 'flueless' | 'not-known';
  solidFuel: boolean;
  /** A gas cooker (no alarm duty for cookers alone). */
  cooker: boolean;
  ventPresent: CheckAnswer;
  ventClear: CheckAnswer;
  coAlarmPresent: CheckAnswer;
  coAlarmTested: CheckAnswer;
}

/** The facts of a room (and its dwelling) the rules read. */
export interface SafetyFacts {
  appliances: readonly SafetyAppliance[];
  /** Working extract fans (or extract terminals) anywhere in the same dwelling, this room included. */
  extractInDwelling: number;
  /** Combustion-air air bricks or grilles recorded blocked in the room. */
  blockedCombustionAirVents: number;
  /** Extract fans recorded dead (or isolated) in the room. */
  deadExtractFans: number;
  mouldSeen: boolean;
}

export type SafetyCode =
  | 'no-co-alarm'
  | 'co-alarm-not-working'
  | 'combustion-air-blocked'
  | 'combustion-air-missing'
  | 'open-flue-with-extract'
  | 'flueless-heater'
  | 'dead-extract-with-mould';

/** One safety item: stable code, the fact in plain words, and who should act. */
export interface SafetyItem {
  code: SafetyCode;
  fact: string;
  action: string;
  /** The appliance or opening concerned, when there is one. */
  subjectId: string | null;
}

const ENGINEER = 'a registered gas engineer (or a solid-fuel engineer for solid fuel)';

/**
 * Safety items of a room, in a fixed order (the order of the list above).
 * Example: an open-flued gas boiler with its combustion-air vent blocked and an extract fan in
 * the dwelling → ['combustion-air-blocked', 'open-flue-with-extract'].
 */
export function safetyItems(facts: SafetyFacts): SafetyItem[] {
  const items: SafetyItem[] = [];
  for (const a of facts.appliances) {
    if (!a.cooker && a.coAlarmPresent !== 'yes') {
      items.push({
        code: 'no-co-alarm',
        fact: a.coAlarmPresent === 'no' ? `No carbon monoxide alarm was found with the ${a.label}.` : `Whether there is a carbon monoxide alarm with the ${a.label} was not checked.`,
        action: 'Fit (or confirm) a working carbon monoxide alarm in the room with the appliance now.',
        subjectId: a.id,
      });
    } else if (!a.cooker && a.coAlarmTested === 'no') {
      items.push({ code: 'co-alarm-not-working', fact: `The carbon monoxide alarm with the ${a.label} did not sound when tested.`, action: 'Replace the alarm or its battery now.', subjectId: a.id });
    }
  }
  const openFlued = facts.appliances.filter((a) => a.flue === 'open-flued' || (a.flue === 'not-known' && !a.cooker));
  for (const a of openFlued) {
    if (a.ventPresent === 'yes' && a.ventClear === 'no') {
      items.push({ code: 'combustion-air-blocked', fact: `The combustion-air vent for the ${a.label} is blocked.`, action: `Clear it now and never cover it; ask ${ENGINEER} to check the appliance.`, subjectId: a.id });
    } else if (a.ventPresent === 'no' && a.flue === 'open-flued') {
      items.push({ code: 'combustion-air-missing', fact: `No combustion-air vent was found for the open-flued ${a.label}.`, action: `Ask ${ENGINEER} whether the appliance needs one.`, subjectId: a.id });
    }
  }
  if (facts.blockedCombustionAirVents > 0 && !items.some((i) => i.code === 'combustion-air-blocked')) {
    items.push({ code: 'combustion-air-blocked', fact: `${facts.blockedCombustionAirVents} combustion-air vent(s) in this room are blocked.`, action: `Clear them now and never cover them; ask ${ENGINEER} to check the appliance they serve.`, subjectId: null });
  }
  for (const a of openFlued) {
    if (facts.extractInDwelling > 0) {
      items.push({
        code: 'open-flue-with-extract',
        fact: `The ${a.label} is ${a.flue === 'open-flued' ? 'open-flued' : 'of unknown flue type'} and ${facts.extractInDwelling} extract fan(s) run in the same home.`,
        action: `Ask ${ENGINEER} for a spillage test with every extract fan running before any fan is added or strengthened.`,
        subjectId: a.id,
      });
    }
  }
  for (const a of facts.appliances.filter((x) => x.flue === 'flueless' && !x.cooker)) {
    items.push({ code: 'flueless-heater', fact: `The ${a.label} has no flue: its fumes and water vapour stay in the room.`, action: `Ask ${ENGINEER} to check it; it needs the room's ventilation and a CO alarm.`, subjectId: a.id });
  }
  if (facts.deadExtractFans > 0 && facts.mouldSeen) {
    items.push({ code: 'dead-extract-with-mould', fact: 'The extract fan does not run and mould was seen in the room.', action: 'Repair or replace the extract fan now and measure its flow.', subjectId: null });
  }
  return items;
}
