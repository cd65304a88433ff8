/**
 * Room screen parts whose code is a chunk of its own, fetched when a room opens rather than with
 * the room screen: the first parts draw without waiting for (or parsing) code a surveyor seldom
 * needs first (the logger file import with its chart and tables). Fetched once per page; the
 * part stays busy (its heading drawn) until its code is in.
 *
 * Example: loadRoomPart('logger').then((LoggerImport) => …) gives the logger import component.
 */
import type LoggerImport from '../logger/LoggerImport.svelte';

interface RoomPartCode {
  logger: typeof LoggerImport;
}
export type LazyRoomPart = keyof RoomPartCode;

const LOADERS: { [K in LazyRoomPart]: () => Promise<{ default: RoomPartCode[K] }> } = {
  logger: () => import('../logger/LoggerImport.svelte'),
};

const loaded = new Map<LazyRoomPart, Promise<unknown>>();

/** The component of a lazily loaded room part, fetched once (a failed fetch is tried again next time). */
export function loadRoomPart<K extends LazyRoomPart>(part: K): Promise<RoomPartCode[K]> {
  let promise = loaded.get(part) as Promise<RoomPartCode[K]> | undefined;
  if (!promise) {
    promise = LOADERS[part]().then((m) => m.default);
    promise.catch(() => loaded.delete(part));
    loaded.set(part, promise);
  }
  return promise;
}
