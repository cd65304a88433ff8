/**
 * What happens to the rest of a survey when an area is removed: its rooms move to the area it
 * sat in (or to no area when it was at the top), and so do the areas inside it; its own facts —
 * the dwelling's bedrooms, floor area, occupants and its whole-dwelling system — go with it.
 * Nothing measured is lost: rooms keep their readings, photos and logger files.
 *
 * Pure: the store applies the plan inside its transaction, the open survey applies it in memory,
 * and the screen words it before the surveyor confirms.
 *
 * Example: removing "Flat 3" (on "Floor 2") with rooms Kitchen and Bedroom 1 gives
 * { parentId: floor2.id, roomIds: [kitchen.id, bedroom1.id], areaIds: [] }.
 */

interface AreaLike {
  id: string;
  parentId?: string | undefined;
}
interface RoomLike {
  id: string;
  areaId?: string | undefined;
}

export interface AreaRemovalPlan {
  /** Where the rooms and inner areas go: the removed area's parent, or undefined for "no area". */
  parentId: string | undefined;
  /** Rooms directly in the removed area, which move to `parentId`. */
  roomIds: string[];
  /** Areas directly inside the removed area, which move up to `parentId`. */
  areaIds: string[];
}

/** The plan for removing area `areaId` (undefined when it is not among `areas`). */
export function areaRemovalPlan(areas: readonly AreaLike[], rooms: readonly RoomLike[], areaId: string): AreaRemovalPlan | undefined {
  const area = areas.find((a) => a.id === areaId);
  if (!area) return undefined;
  const parentId = area.parentId !== undefined && areas.some((a) => a.id === area.parentId) ? area.parentId : undefined;
  return {
    parentId,
    roomIds: rooms.filter((r) => r.areaId === areaId).map((r) => r.id),
    areaIds: areas.filter((a) => a.id !== areaId && a.parentId === areaId).map((a) => a.id),
  };
}

/** A record moved to `parentId` (the key removed when it moves to the top / to no area). */
export function movedTo<T extends object, K extends keyof T & string>(record: T, key: K, parentId: string | undefined): T {
  const { [key]: _old, ...rest } = record;
  return (parentId === undefined ? rest : { ...rest, [key]: parentId }) as T;
}
