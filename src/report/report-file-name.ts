/**
 * The report's file name: "Survey-<site>-<date>.pdf", safe on every file system and share target
 * (letters, digits and hyphens only). Example: reportFileName('Calder Rise, Larkhill Road',
 * '2026-01-21T09:30:00Z') = 'Survey-Calder-Rise-Larkhill-Road-2026-01-21.pdf'.
 */
export function reportFileName(site: string, date: string, extension = 'pdf'): string {
  const safe = site
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .replace(/-+$/, '');
  return `Survey-${safe || 'site'}-${date.slice(0, 10)}.${extension}`;
}
