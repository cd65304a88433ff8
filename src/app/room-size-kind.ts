/**
 * Switching how a room's size is given (length × width, floor area, or parts), keeping what it
 * can: a box becomes a floor area of length × width; one size becomes a room of one part; one
 * part becomes that size again; several parts become one floor area with their total floor area
 * and the height that keeps their total volume (to the millimetre), or (length × width) the
 * first part. Sizes being
 * typed may have empty fields (never 0): what cannot be worked out is left empty. Metres, m².
 *
 * Example: switchSize({ kind: 'parts', parts: [{ kind: 'box', length_m: 5, width_m: 4, height_m: 2.4 },
 * { kind: 'area', floorArea_m2: 6, height_m: 3 }] }, 'area') = { kind: 'area', floorArea_m2: 26, height_m: 2.538 }
 * (20 + 6 m², 48 + 18 = 66 m³).
 */

/** One part's size as edited: any field may be empty while it is typed. */
export interface PartDraft {
  kind: 'box' | 'area';
  length_m?: number;
  width_m?: number;
  floorArea_m2?: number;
  height_m?: number;
}

export type SizeDraft = PartDraft | { kind: 'parts'; parts: PartDraft[] };
export type SizeKind = SizeDraft['kind'];

/** A part's floor area, m², or undefined while a field is empty. */
export function partFloorArea(p: PartDraft): number | undefined {
  if (p.kind === 'area') return p.floorArea_m2;
  return p.length_m !== undefined && p.width_m !== undefined ? p.length_m * p.width_m : undefined;
}

/** Total floor area and volume of the parts, or undefined while any field is empty. */
export function totalsOf(parts: readonly PartDraft[]): { floor_m2: number; volume_m3: number } | undefined {
  let floor_m2 = 0;
  let volume_m3 = 0;
  for (const p of parts) {
    const floor = partFloorArea(p);
    if (floor === undefined || p.height_m === undefined) return undefined;
    floor_m2 += floor;
    volume_m3 += floor * p.height_m;
  }
  return { floor_m2, volume_m3 };
}

function withHeight<T extends PartDraft>(part: T, height_m: number | undefined): T {
  return height_m === undefined ? part : { ...part, height_m };
}

/** One part given the other way: a box's floor area is kept; an area's length and width start empty. */
export function switchPart(part: PartDraft, kind: 'box' | 'area'): PartDraft {
  if (part.kind === kind) return { ...part };
  if (kind === 'area') {
    const floor = partFloorArea(part);
    return withHeight(floor === undefined ? { kind } : { kind, floorArea_m2: floor }, part.height_m);
  }
  return withHeight({ kind }, part.height_m);
}

/** The size given another way, keeping what it can (see the file's doc block). */
export function switchSize(size: SizeDraft, kind: SizeKind): SizeDraft {
  if (kind === 'parts') return size.kind === 'parts' ? size : { kind: 'parts', parts: [{ ...size }] };
  if (size.kind !== 'parts') return switchPart(size, kind);
  const [first] = size.parts;
  if (size.parts.length === 1 || kind === 'box') return first ? switchPart(first, kind) : { kind };
  const totals = totalsOf(size.parts);
  return totals && totals.floor_m2 > 0 ? { kind: 'area', floorArea_m2: totals.floor_m2, height_m: Math.round((1000 * totals.volume_m3) / totals.floor_m2) / 1000 } : switchPart(first!, 'area');
}
