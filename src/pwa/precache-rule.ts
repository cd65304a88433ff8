/**
 * What the service worker precaches, as a rule rather than a list, so later chunks (the report,
 * fonts, the logger parser's worker) are covered without editing anything.
 *
 * Everything emitted that the app may need offline: JS (including lazy chunks and workers), CSS,
 * HTML, fonts, icons, the manifest and the demo survey file (JSON). Left out: jspdf's optional html2canvas, canvg and
 * dompurify chunks, which the report never uses (it draws directly, never from HTML).
 */
export const precacheGlobs: string[] = ['**/*.{js,mjs,css,html,woff,woff2,ttf,otf,svg,png,ico,webmanifest,json}'];

/** File-name fragments of jspdf's optional dependencies, which Rollup names after their modules. */
export const optionalJspdfChunks: string[] = ['html2canvas', 'canvg', 'purify'];

export const precacheIgnores: string[] = optionalJspdfChunks.map((name) => `**/*${name}*`);

/** Packages of jspdf's optional chunks, by the name fragment their chunk must carry. */
const OPTIONAL_PACKAGES: Record<string, string> = { html2canvas: 'html2canvas', canvg: 'canvg', dompurify: 'purify' };

/**
 * The file name a build chunk must have so the ignore rule can see it: canvg's module is called
 * index.es.js, so its chunk would otherwise be "index.es-<hash>.js" and be precached.
 * Example: optionalChunkName(['/app/node_modules/canvg/lib/index.es.js']) = 'canvg'.
 */
export function optionalChunkName(moduleIds: readonly string[]): string | null {
  for (const [pkg, name] of Object.entries(OPTIONAL_PACKAGES)) {
    if (moduleIds.some((id) => id.includes(`/node_modules/${pkg}/`))) return name;
  }
  return null;
}
