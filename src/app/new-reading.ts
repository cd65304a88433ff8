/**
 * A reading being entered: the time stamped when "reading now" was tapped, and the room's
 * conditions filled in from the last reading (or, for the first, from what the room has), so
 * confirming them is one tap each. Nothing is stored until the surveyor saves it.
 *
 * Example: a room with no fans gives conditions.fans = 'none'.
 */
import type { Conditions, Reading } from '../model/reading.ts';
import type { DocumentRoom } from '../model/survey-document.ts';
import { localIso } from './local-time.ts';

export function startingConditions(room: DocumentRoom): Conditions {
  const last = room.readings.at(-1)?.conditions;
  if (last) {
    const people = room.occupants.map((g) => ({ groupId: g.id, count: last.people.find((p) => p.groupId === g.id)?.count ?? 0 }));
    const { openOpeningIds: _open, ...rest } = last;
    return { ...rest, people }; // every other field is a plain value
  }
  return {
    people: room.occupants.map((g) => ({ groupId: g.id, count: g.count })),
    windows: room.openings.some((o) => o.type === 'window') ? 'all-closed' : 'none',
    doors: 'closed',
    fans: room.openings.some((o) => o.type === 'fan') ? 'off' : 'none',
    heating: 'off',
    combustion: false,
  };
}

/** A reading stamped now, its values empty; `instrumentId` is the meter last used, if any. */
export function newReading(room: DocumentRoom, now: Date, instrumentId?: string): Reading {
  return {
    id: crypto.randomUUID(),
    time: localIso(now),
    ...(instrumentId ? { instrumentId } : {}),
    conditions: startingConditions(room),
    note: '',
  };
}
