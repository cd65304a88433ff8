/**
 * A room use as an estates list writes it ("Classroom", "Sports hall", "WC", "En-suite") read
 * as one of the app's room uses (core/room-uses.ts). Our own ids and labels are read first, then
 * common words, most specific first ("dining hall" is a hall, "dining room" a living room).
 * Text that matches nothing is left for the surveyor: never guessed.
 *
 * The word lists are common practice (no published source).
 *
 * Example: roomUseFromText('Science lab') = 'classroom'; roomUseFromText('W.C.') = 'toilet';
 * roomUseFromText('Plant room') = null.
 */
import { ROOM_USES, type RoomUse } from '../core/room-uses.ts';

const WORDS: readonly (readonly [RegExp, RoomUse])[] = [
  [/dining\s*(hall|area)|sports?\s*hall|assembly|gym|canteen|\bhall\b/, 'hall'],
  [/dining\s*room|living|lounge|sitting|family\s*room|reception\s*room/, 'living-room'],
  [/class|teaching|\blab|laborator|science|seminar|tutorial|music|art\s*room|\bict\b|computer\s*room|nursery|workshop/, 'classroom'],
  [/meeting|conference|board\s*room|interview\s*room/, 'meeting-room'],
  [/office|open\s*plan|staff\s*(room|base)|admin|reception/, 'office'],
  [/bed\s*room|\bbed\b|dormitor/, 'bedroom'],
  [/kitchen/, 'kitchen'],
  [/bath|shower|en[-\s]?suite|wet\s*room/, 'wet-room'],
  [/toilet|\bw\.?\s?c\b|lavator|cloakroom/, 'toilet'],
  [/utility|laundry/, 'utility'],
  [/corridor|stair|landing|lobby|entrance|circulation/, 'circulation'],
  [/store|storage|cupboard/, 'store'],
];

export function roomUseFromText(text: string): RoomUse | null {
  const words = text.trim().toLowerCase();
  if (words === '') return null;
  const exact = ROOM_USES.find((u) => u.id === words || u.label.toLowerCase() === words);
  if (exact) return exact.id;
  return WORDS.find(([pattern]) => pattern.test(words))?.[1] ?? null;
}
