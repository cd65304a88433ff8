/**
 * The valid part of an edit: when a record as edited breaks a rule in one field, everything else
 * the surveyor changed can still be saved. Field by field (into nested objects, and into lists
 * item by item, matching items by `id`), each edited value that passes its own rule is taken;
 * a value that does not keeps the last valid one (a new list item that breaks a rule is left
 * out). The result is checked against the whole schema (rules across fields included); when it
 * still fails, the last valid record stands.
 *
 * The screen keeps showing what was typed and the problem under its field; only storage gets
 * the valid part, so nothing else is lost while one field waits to be put right.
 *
 * Example: a room whose name changed to "Lab 2" and whose height was typed as 45 m (above the
 * limit), last valid with name "Lab" and height 2.7 → the same room named "Lab 2", height 2.7.
 */
import { z } from 'zod';

type Plain = Record<string, unknown>;
const isPlain = (x: unknown): x is Plain => typeof x === 'object' && x !== null && !Array.isArray(x);
const idOf = (x: unknown): unknown => (isPlain(x) ? x.id : undefined);

function unwrapped(schema: z.ZodType): z.ZodType {
  return schema instanceof z.ZodOptional ? (schema.unwrap() as z.ZodType) : schema;
}

/** The valid part of `edited` under `schema`, falling back to `last` (undefined: leave it out). */
function part(schema: z.ZodType, edited: unknown, last: unknown): unknown {
  if (schema.safeParse(edited).success) return edited;
  const inner = unwrapped(schema);
  let merged: unknown = undefined;
  if (inner instanceof z.ZodObject && isPlain(edited)) {
    const before = isPlain(last) ? last : {};
    const shape = inner.shape as Record<string, z.ZodType>;
    const out: Plain = {};
    for (const key of new Set([...Object.keys(edited), ...Object.keys(before)])) {
      const field = shape[key];
      const value = field ? part(field, edited[key], before[key]) : undefined;
      if (value !== undefined) out[key] = value;
    }
    merged = out;
  } else if (inner instanceof z.ZodArray && Array.isArray(edited)) {
    const before = Array.isArray(last) ? last : [];
    const element = inner.element as z.ZodType;
    merged = edited.flatMap((item) => {
      if (element.safeParse(item).success) return [item];
      const id = idOf(item);
      const previous = id === undefined ? undefined : before.find((b) => idOf(b) === id);
      if (previous === undefined) return [];
      const kept = part(element, item, previous);
      return kept === undefined ? [] : [kept];
    });
  }
  return merged !== undefined && schema.safeParse(merged).success ? merged : last;
}

/**
 * The record to store for an edit that broke a rule: its valid part (the last valid record when
 * nothing else of the edit can be kept), or undefined when not even that passes the schema.
 */
export function validPart<T>(schema: z.ZodType<T>, edited: unknown, last: T): T | undefined {
  const kept = part(schema, edited, last);
  const parsed = schema.safeParse(kept);
  return parsed.success ? parsed.data : undefined;
}
