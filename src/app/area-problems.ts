/**
 * An area as edited, checked with the model's schema before it is saved: either the record to
 * save, or the problems, each naming the field. A terminal's flow is typed in L/s, so its
 * problems are worded in L/s (the schema's limits are m³/s): an empty flow says it is empty.
 *
 * Example: a terminal with no flow gives { field: 'dwelling.system.terminals.0.flow_m3s',
 * message: 'Terminal flow is empty: type the measured flow in L/s' }; one of 2500 L/s gives
 * 'Terminal flow must be between 0 and 2,000 L/s'.
 */
import { litresPerSecond } from '../core/units.ts';
import { areaSchema, terminalSchema, type Area } from '../model/area.ts';
import { formatLimit } from '../model/field-rules.ts';
import { validationProblems, type ValidationProblem } from '../model/validation-problem.ts';

export type AreaCheck = { ok: true; area: Area } | { ok: false; problems: ValidationProblem[] };

const FLOW = terminalSchema.shape.flow_m3s;
const FLOW_FIELD = /^dwelling\.system\.terminals\.(\d+)\.flow_m3s$/;

function flowMessage(value: unknown): string {
  if (value === undefined) return 'Terminal flow is empty: type the measured flow in L/s';
  const [low, high] = [FLOW.minValue ?? 0, FLOW.maxValue ?? Infinity].map((x) => formatLimit(litresPerSecond(x)));
  return `Terminal flow must be between ${low} and ${high} L/s`;
}

/** Check an area (a plain snapshot, not a Svelte proxy). */
export function checkArea(area: Area): AreaCheck {
  const parsed = areaSchema.safeParse(area);
  if (parsed.success) return { ok: true, area: parsed.data };
  const terminals = area.dwelling?.system?.terminals ?? [];
  const problems = validationProblems(parsed.error).map((p) => {
    const flow = FLOW_FIELD.exec(p.field);
    return flow ? { ...p, message: flowMessage(terminals[Number(flow[1])]?.flow_m3s) } : p;
  });
  return { ok: false, problems };
}
