/**
 * The report's page and type: A4 portrait in points, generous margins, one sans face at four
 * sizes, and a palette of greys with one deep blue-green accent for rules and headings. Every
 * meaning is carried by words; colour only separates, so the report reads the same in black and
 * white (the accent prints as a dark grey, fills as light greys).
 */
export const PAGE = { width: 595.28, height: 841.89, margin: 50, top: 64, bottom: 56 } as const;

export const TYPE = {
  title: 22,
  heading: 14,
  subheading: 11,
  body: 9.5,
  small: 8,
  tiny: 7,
  line: 1.32,
} as const;

/** RGB triples. */
export const INK = [26, 26, 26] as const;
export const MUTED = [90, 90, 90] as const;
export const ACCENT = [22, 78, 88] as const;
export const RULE = [160, 160, 160] as const;
export const FILL_HEAD = [222, 228, 229] as const;
export const FILL_ALT = [245, 246, 246] as const;
export const FILL_PERIOD = [232, 236, 237] as const;
