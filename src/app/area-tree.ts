/**
 * Areas inside areas (a flat on a floor of a block): which areas sit inside one, which may hold
 * it (never itself or one inside it, so no loop is possible), and which rooms it holds.
 *
 * Example: with Block B ⊃ Floor 2 ⊃ Flat 3, areasWithin(areas, floor2) = {Floor 2, Flat 3} and
 * parentChoices(areas, floor2) = [Block B].
 */
interface AreaLike {
  id: string;
  parentId?: string | undefined;
}

/** Ids of the area and of every area inside it, at any depth. */
export function areasWithin(areas: readonly AreaLike[], areaId: string): Set<string> {
  const ids = new Set([areaId]);
  let grew = true;
  while (grew) {
    grew = false;
    for (const a of areas) {
      if (a.parentId !== undefined && ids.has(a.parentId) && !ids.has(a.id)) {
        ids.add(a.id);
        grew = true;
      }
    }
  }
  return ids;
}

/** The areas `areaId` may sit in: all but itself and the areas inside it, in survey order. */
export function parentChoices<T extends AreaLike>(areas: readonly T[], areaId: string): T[] {
  const inside = areasWithin(areas, areaId);
  return areas.filter((a) => !inside.has(a.id));
}

/** The rooms of an area and of the areas inside it, in walking order. */
export function roomsWithin<R extends { areaId?: string | undefined }>(areas: readonly AreaLike[], rooms: readonly R[], areaId: string): R[] {
  const inside = areasWithin(areas, areaId);
  return rooms.filter((r) => r.areaId !== undefined && inside.has(r.areaId));
}
