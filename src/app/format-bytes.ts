/**
 * Bytes as a short figure for people: 1536 -> "1.5 kB", 52428800 -> "50 MB" (powers of 1000,
 * as phones report storage).
 */
export function formatBytes(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) return 'unknown';
  const units = ['bytes', 'kB', 'MB', 'GB', 'TB'];
  let value = bytes;
  let unit = 0;
  while (value >= 1000 && unit < units.length - 1) {
    value /= 1000;
    unit += 1;
  }
  const shown = unit === 0 ? String(value) : value >= 100 ? value.toFixed(0) : Number(value.toPrecision(2)).toString();
  return `${shown} ${units[unit]}`;
}
