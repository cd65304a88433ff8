/**
 * The text fields of the survey file, found by walking its JSON Schema: every property whose
 * schema is a string with no fixed list of values, pattern or format — text a person types.
 * Paths read like `surveys[].rooms[].name`. Tests use it to make every text field of the file a
 * decision: what the anonymised export does with it, and whether its name sounds like a person.
 */
import { surveyFileJsonSchema } from '../../src/model/json-schema.ts';

type Node = Record<string, unknown>;

export interface SchemaField {
  /** Dotted path with [] for list items, e.g. `surveys[].survey.surveyors[].name`. */
  path: string;
  /** The property's own name, e.g. `name`. */
  key: string;
  /** A string with no enum, const, pattern or format: free text. */
  freeText: boolean;
  /** Its JSON type(s) as the schema states them. */
  type: string;
}

/** Every property of the survey file's schema, with whether it is free text. */
export function schemaFields(schema: Node = surveyFileJsonSchema()): SchemaField[] {
  const defs = (schema.$defs ?? {}) as Record<string, Node>;
  const found = new Map<string, SchemaField>();
  const visit = (node: Node, path: string, key: string, depth: number): void => {
    if (depth > 40) return;
    const ref = node.$ref;
    if (typeof ref === 'string') {
      const target = defs[ref.replace('#/$defs/', '')];
      if (target) visit(target, path, key, depth + 1);
      return;
    }
    for (const list of ['anyOf', 'oneOf', 'allOf'] as const) {
      for (const option of (node[list] as Node[] | undefined) ?? []) visit(option, path, key, depth + 1);
    }
    if (node.type === 'string' && path !== '') {
      const fixed = 'enum' in node || 'const' in node || 'pattern' in node || 'format' in node;
      found.set(path, { path, key, freeText: !fixed, type: 'string' });
    } else if (typeof node.type === 'string' && node.type !== 'object' && node.type !== 'array' && path !== '' && !found.has(path)) {
      found.set(path, { path, key, freeText: false, type: node.type });
    }
    const properties = (node.properties ?? {}) as Record<string, Node>;
    for (const [name, inner] of Object.entries(properties)) visit(inner, path ? `${path}.${name}` : name, name, depth + 1);
    if (node.items && typeof node.items === 'object') visit(node.items as Node, `${path}[]`, key, depth + 1);
  };
  visit(schema, '', '', 0);
  return [...found.values()];
}
