/**
 * Turns a zod error into messages a surveyor can act on: the field, the value and the rule.
 * Example: a survey with title "" gives [{ field: 'title', message: 'Survey title is empty: …' }].
 */
import type { z } from 'zod';

export interface ValidationProblem {
  /** Dotted path of the field, e.g. "rooms.3.height". Empty for the whole record. */
  field: string;
  /** What is wrong, in plain words. */
  message: string;
}

export function validationProblems(error: z.ZodError): ValidationProblem[] {
  return error.issues.map((issue) => ({
    field: issue.path.map(String).join('.'),
    message: issue.message,
  }));
}
