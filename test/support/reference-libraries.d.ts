/**
 * Reference libraries used only by tests ship no usable type declarations (odex ships its
 * TypeScript source, which does not pass our strict settings; tsconfig.json maps it here).
 * Tests describe the part of each API they use with a local interface where they import it.
 */
declare module 'jstat';
declare module 'odex';
declare module 'psychrolib';
