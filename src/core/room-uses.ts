/**
 * Room uses: what a room is used for, which decides its default occupants, its day schedule and
 * the guidance that applies to it. One list for the whole app (the model's schema and the
 * screens read it from here); the ids of the engine's day templates are among them.
 *
 * Source: the uses the guidance sets distinguish (teaching spaces, dwelling rooms, offices);
 * common practice (no published source) for the grouping.
 *
 * Example: roomUseLabel('wet-room') = 'Bathroom or shower room'.
 */
export const ROOM_USES = [
  { id: 'classroom', label: 'Classroom or teaching room' },
  { id: 'hall', label: 'Hall, gym or dining room' },
  { id: 'office', label: 'Office' },
  { id: 'meeting-room', label: 'Meeting room' },
  { id: 'bedroom', label: 'Bedroom' },
  { id: 'living-room', label: 'Living room' },
  { id: 'kitchen', label: 'Kitchen' },
  { id: 'wet-room', label: 'Bathroom or shower room' },
  { id: 'toilet', label: 'Toilet' },
  { id: 'utility', label: 'Utility room' },
  { id: 'circulation', label: 'Corridor, hall or stairs' },
  { id: 'store', label: 'Store' },
  { id: 'other', label: 'Other room' },
] as const;

export type RoomUse = (typeof ROOM_USES)[number]['id'];

export const ROOM_USE_IDS = ROOM_USES.map((u) => u.id) as unknown as readonly [RoomUse, ...RoomUse[]];

/** The plain label for a room use. Example: roomUseLabel('classroom') = 'Classroom or teaching room'. */
export function roomUseLabel(id: RoomUse): string {
  return ROOM_USES.find((u) => u.id === id)?.label ?? id;
}
