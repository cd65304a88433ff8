/**
 * Where a room is, in the client's terms: its areas from the top down, its name and the
 * client's room number. Example: roomPlace(doc, room) = 'Block B (1968) / Ground floor /
 * Classroom B1 (B.G.04)'.
 */
import type { DocumentRoom, SurveyDocument } from '../model/survey-document.ts';

export function roomPlace(doc: SurveyDocument, room: Pick<DocumentRoom, 'areaId' | 'name' | 'clientRef'>): string {
  const path: string[] = [];
  const seen = new Set<string>();
  let areaId = room.areaId;
  while (areaId && !seen.has(areaId)) {
    seen.add(areaId);
    const area = doc.areas.find((a) => a.id === areaId);
    if (!area) break;
    path.unshift(area.name);
    areaId = area.parentId;
  }
  path.push(room.clientRef ? `${room.name} (${room.clientRef})` : room.name);
  return path.join(' / ');
}
