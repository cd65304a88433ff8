/**
 * A survey document with every record id replaced by a new one and every reference rewritten to
 * match: used to keep both copies when an imported survey clashes with one on the device.
 * Ids are UUIDs, so a string equal to a record id is that record's id wherever it appears.
 *
 * Example: withFreshIds(doc, () => crypto.randomUUID()) gives a document whose rooms' readings
 * still belong to their tests, with no id in common with `doc`.
 */
import type { SurveyDocument } from './survey-document.ts';
import { recordIds } from './survey-references.ts';

export function withFreshIds(doc: SurveyDocument, newId: () => string): SurveyDocument {
  const renamed = new Map(recordIds(doc).map(([id]) => [id, newId()]));
  const rewrite = (value: unknown): unknown => {
    if (typeof value === 'string') return renamed.get(value) ?? value;
    if (Array.isArray(value)) return value.map(rewrite);
    if (typeof value === 'object' && value !== null) {
      return Object.fromEntries(Object.entries(value).map(([key, inner]) => [key, rewrite(inner)]));
    }
    return value;
  };
  return rewrite(doc) as SurveyDocument;
}
