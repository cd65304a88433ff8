/**
 * What is still missing for a room, in the surveyor's words, most useful first: people, openings,
 * a reading, a measured fan flow, the safety checks of a combustion appliance, and, for a room
 * with a window, its outside wall (the mould check needs its construction or a measured factor).
 *
 * Example: a room with no openings and no readings → ['openings', 'a reading'].
 */
import type { DocumentRoom } from '../model/survey-document.ts';

export function roomGaps(room: DocumentRoom): string[] {
  const gaps: string[] = [];
  if (room.occupants.length === 0 && !['circulation', 'store', 'toilet', 'wet-room', 'utility'].includes(room.use)) gaps.push('people');
  if (room.openings.length === 0) gaps.push('openings');
  if (room.readings.length === 0) gaps.push('a reading');
  if (room.openings.some((o) => o.type === 'fan' && o.measuredFlow_m3s === undefined)) gaps.push('fan flow measured');
  const unchecked = room.appliances.some((a) =>
    [a.coAlarmPresent, a.coAlarmTested, a.combustionAirVentPresent].includes('not-checked'),
  );
  if (unchecked) gaps.push('appliance safety checks');
  // A room with a window has an outside wall; an inside room has none to record.
  if (room.exposedWalls.length === 0 && room.openings.some((o) => o.type === 'window')) gaps.push('outside wall');
  return gaps;
}
