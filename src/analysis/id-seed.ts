/**
 * A Monte Carlo seed derived from record ids, so that every interval is the same on every run,
 * on every device and whatever order the rooms are in (never the clock, never Math.random).
 * FNV-1a (32-bit) over the ids joined by a separator, mixed with the caller's base seed.
 *
 * Source: Fowler–Noll–Vo hash, FNV-1a variant (offset basis 2166136261, prime 16777619).
 * Example: seedFromIds(0, 'a') = 3826002220.
 */
export function seedFromIds(base: number, ...ids: string[]): number {
  let h = (2166136261 ^ (base >>> 0)) >>> 0;
  const text = ids.join('\u0000');
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 16777619) >>> 0;
  }
  return h;
}
