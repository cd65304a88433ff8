/**
 * The app's single storage connection, with its events turned into state the screens show.
 */
import { Connection } from '../store/connection.ts';
import { connectionState } from './connection-state.svelte.ts';

export const connection = new Connection({
  onBlocked: () => connectionState.report('blocked'),
  onVersionChange: () => connectionState.report('version-change'),
  onTerminated: () => connectionState.report('terminated'),
});
