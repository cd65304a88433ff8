/**
 * Turns a zod error into problems a surveyor can act on: the field, the value and the rule.
 * zod's own wording for a wrong type ("Invalid input: expected string…") is replaced by plain
 * words, and a field that is absent is called missing.
 *
 * Example: a survey with title "" gives
 * [{ field: 'title', message: 'Survey title is empty: give the survey a name', value: '' }].
 */
import type { z } from 'zod';

export interface ValidationProblem {
  /** Dotted path of the field, e.g. "rooms.3.height_m". Empty for the whole record. */
  field: string;
  /** What is wrong, in plain words. */
  message: string;
  /** The value found there (undefined when the field is missing). */
  value?: unknown;
}

const EXPECTED: Record<string, string> = {
  string: 'must be text',
  number: 'must be a number',
  int: 'must be a whole number',
  boolean: 'must be true or false',
  array: 'must be a list',
  object: 'must be a group of fields',
};

function valueAt(input: unknown, path: readonly PropertyKey[]): unknown {
  let at: unknown = input;
  for (const key of path) {
    if (typeof at !== 'object' || at === null) return undefined;
    at = (at as Record<PropertyKey, unknown>)[key];
  }
  return at;
}

function plainMessage(issue: z.core.$ZodIssue, value: unknown, present: boolean): string {
  if (issue.code === 'unrecognized_keys') {
    return `Has fields Ventwalk does not know: ${issue.keys.join(', ')} (made by another program, or edited by hand?)`;
  }
  if (!present && issue.code !== 'custom') return 'is missing';
  if (issue.code === 'invalid_type' && issue.message.startsWith('Invalid input')) {
    return `${EXPECTED[issue.expected] ?? `must be ${issue.expected}`}, not ${value === null ? 'empty (null)' : typeof value}`;
  }
  return issue.message;
}

/** Problems of a failed parse; pass the input to have each problem carry the value found. */
export function validationProblems(error: z.ZodError, input?: unknown): ValidationProblem[] {
  return error.issues.map((issue) => {
    const parent = valueAt(input, issue.path.slice(0, -1));
    const last = issue.path[issue.path.length - 1];
    const present = last === undefined || (typeof parent === 'object' && parent !== null && last in parent);
    const value = valueAt(input, issue.path);
    return {
      field: issue.path.map(String).join('.'),
      message: plainMessage(issue, value, present),
      ...(input !== undefined && present ? { value } : {}),
    };
  });
}
