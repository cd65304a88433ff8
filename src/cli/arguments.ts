/**
 * A small parser for the command line's arguments: positional words, `--flag` switches and
 * `--name value` (or `--name=value`) options, checked against what a command accepts. Unknown
 * or incomplete options are a message, never an exception.
 *
 * Example: parseArguments(['file.csv', '--json', '--volume', '150'], { flags: ['json'], options: ['volume'] })
 * = { ok: true, positional: ['file.csv'], flags: Set {'json'}, options: Map {'volume' => '150'} }.
 */

export interface ArgumentSpec {
  flags: readonly string[];
  options: readonly string[];
}

export type ParsedArguments =
  | { ok: true; positional: string[]; flags: Set<string>; options: Map<string, string> }
  | { ok: false; message: string };

export function parseArguments(argv: readonly string[], spec: ArgumentSpec): ParsedArguments {
  const positional: string[] = [];
  const flags = new Set<string>();
  const options = new Map<string, string>();
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]!;
    if (!arg.startsWith('--') || arg === '--') {
      if (arg !== '--') positional.push(arg);
      continue;
    }
    const [name, inline] = arg.slice(2).split(/=(.*)/s, 2) as [string, string | undefined];
    if (spec.flags.includes(name)) {
      if (inline !== undefined) return { ok: false, message: `--${name} takes no value.` };
      flags.add(name);
    } else if (spec.options.includes(name)) {
      const value = inline ?? argv[++i];
      if (value === undefined || (inline === undefined && value.startsWith('--'))) return { ok: false, message: `--${name} needs a value.` };
      options.set(name, value);
    } else {
      const known = [...spec.flags, ...spec.options].map((n) => `--${n}`).join(', ');
      return { ok: false, message: `Unknown option --${name}. Known: ${known}.` };
    }
  }
  return { ok: true, positional, flags, options };
}

/**
 * A positive number from an option's text (decimal point or comma), or a message naming the option.
 * Example: positiveNumber('volume', '150,5') = { ok: true, value: 150.5 }.
 */
export function positiveNumber(name: string, text: string): { ok: true; value: number } | { ok: false; message: string } {
  const value = Number(text.trim().replace(',', '.'));
  return text.trim() !== '' && Number.isFinite(value) && value > 0 ? { ok: true, value } : { ok: false, message: `--${name} must be a positive number, not "${text}".` };
}

/**
 * A whole number of at least 1 from an option's text, or a message naming the option.
 * Example: wholeNumber('draws', '200') = { ok: true, value: 200 }.
 */
export function wholeNumber(name: string, text: string): { ok: true; value: number } | { ok: false; message: string } {
  return /^\d+$/.test(text.trim()) && Number(text) >= 1 ? { ok: true, value: Number(text) } : { ok: false, message: `--${name} needs a whole number of at least 1, not "${text}".` };
}
