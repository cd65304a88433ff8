/**
 * Which built chunks ask the browser to compile all their functions ahead of use, and how.
 *
 * V8 compiles a function on its first call unless told otherwise; opening a screen then spends
 * much of each step compiling code used for the first time (a choice group's, a number field's)
 * on the page's one thread. A script that starts with the magic comment below is compiled whole
 * while it streams in, on a background thread (Chromium 136 and later; other browsers read it as
 * a comment). Left out: the report's PDF renderer and jspdf's optional chunks, large and used
 * only when a report is made (or never), whose eager compilation would cost memory for nothing.
 *
 * Example: wantsEagerCompile('assets/RoomScreen-B5ijKNXE.js') = true;
 * wantsEagerCompile('assets/render-report-pdf-BapjAYc0.js') = false.
 */
import { optionalJspdfChunks } from './precache-rule.ts';

/** V8's explicit compile hint for a whole file (must come first in the file). */
export const EAGER_COMPILE_HINT = '//# allFunctionsCalledOnLoad\n';

/** Chunks whose code runs only when a report is made. */
const REPORT_ONLY = ['render-report-pdf'];

/** True for a built JavaScript chunk that should carry the hint. */
export function wantsEagerCompile(fileName: string): boolean {
  const name = fileName.split('/').pop() ?? fileName;
  if (!name.endsWith('.js')) return false;
  return ![...REPORT_ONLY, ...optionalJspdfChunks].some((part) => name.includes(part));
}
