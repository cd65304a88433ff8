/**
 * Reference libraries used only by tests ship no type declarations. Tests describe the part of
 * each API they use with a local interface where they import it.
 */
declare module 'jstat';
declare module 'odex';
declare module 'psychrolib';
