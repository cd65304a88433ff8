/**
 * Reference libraries used only by tests ship no usable type declarations (odex, which
 * ships TypeScript source that fails our strict settings, is loaded with require instead).
 * Tests describe the part of each API they use with a local interface where they import it.
 */
declare module 'jstat';
declare module 'psychrolib';
