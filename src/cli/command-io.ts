/**
 * What a command needs from the outside world, passed in so tests run commands in-process:
 * two output streams and file reading and writing. main.ts passes the real ones.
 */
export interface CommandIo {
  out: (s: string) => void;
  err: (s: string) => void;
  readFile: (path: string) => Promise<string>;
  writeFile: (path: string, data: Uint8Array | string) => Promise<void>;
}

/** Exit codes: 0 done, 1 internal error, 2 bad input (arguments or files). */
export const EXIT = { ok: 0, internal: 1, badInput: 2 } as const;
