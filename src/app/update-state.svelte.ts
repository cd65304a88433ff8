/**
 * The update and offline notices the screens show, fed by the service-worker updater.
 * An update waits while any form holds unsaved input; the notice says so instead of reloading.
 */
import { startUpdater, type Updater } from '../pwa/updater.ts';
import { unsavedInput } from './unsaved-input.svelte.ts';

class UpdateState {
  updateReady = $state(false);
  offlineReady = $state(false);
  /** Set when the person asked to update while input was unsaved. */
  waitingForSave = $state(false);
  private updater: Updater | undefined;

  start(): void {
    if (!('serviceWorker' in navigator)) return;
    this.updater = startUpdater({
      onUpdateReady: () => (this.updateReady = true),
      onOfflineReady: () => (this.offlineReady = true),
      isReloadSafe: () => !unsavedInput.pending,
    });
  }

  /** Apply the update now if nothing is unsaved; otherwise say why it waits. */
  async update(): Promise<void> {
    const applied = (await this.updater?.applyUpdate()) ?? false;
    this.waitingForSave = !applied;
  }

  dismissOfflineNotice(): void {
    this.offlineReady = false;
  }
}

export const updateState = new UpdateState();
