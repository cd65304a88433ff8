/**
 * Facts about this device that decide whether stored surveys are safe: installed or in a
 * browser tab, iOS Safari (which deletes a tab's data after 7 days without a visit), whether
 * the browser has granted persistent storage, how much is used, and whether we are online.
 *
 * `navigator.storage.persist()` is a request the browser may refuse silently (headless Chromium
 * always says false): false is a normal answer, shown as "not protected", never an error.
 */
export interface StorageUse {
  usedBytes: number;
  quotaBytes: number;
}

function detectIos(nav: Navigator): boolean {
  return /iPad|iPhone|iPod/.test(nav.userAgent) || (nav.platform === 'MacIntel' && nav.maxTouchPoints > 1);
}

function detectInstalled(): boolean {
  const standalone = (navigator as Navigator & { standalone?: boolean }).standalone === true;
  return standalone || window.matchMedia('(display-mode: standalone)').matches;
}

class DeviceStatus {
  installed = $state(false);
  ios = $state(false);
  online = $state(true);
  /** null until asked; undefined where the browser has no storage API (old iOS). */
  persisted = $state<boolean | null | undefined>(null);
  use = $state<StorageUse | undefined>(undefined);

  /** On iOS in a Safari tab, data is only safe once the app is on the home screen. */
  get iosTab(): boolean {
    return this.ios && !this.installed;
  }

  /** Read everything once and keep online state current. Call from the app's start. */
  start(): void {
    this.ios = detectIos(navigator);
    this.installed = detectInstalled();
    this.online = navigator.onLine;
    window.addEventListener('online', () => (this.online = true));
    window.addEventListener('offline', () => (this.online = false));
    window.matchMedia('(display-mode: standalone)').addEventListener('change', () => {
      this.installed = detectInstalled();
    });
    void this.refreshStorage();
  }

  async refreshStorage(): Promise<void> {
    const storage = navigator.storage as StorageManager | undefined;
    if (!storage?.persisted) {
      this.persisted = undefined;
      return;
    }
    this.persisted = await storage.persisted();
    if (storage.estimate) {
      const { usage = 0, quota = 0 } = await storage.estimate();
      this.use = { usedBytes: usage, quotaBytes: quota };
    }
  }

  /** Ask the browser to protect stored data from eviction. Safe to call repeatedly. */
  async requestProtection(): Promise<void> {
    const storage = navigator.storage as StorageManager | undefined;
    if (!storage?.persist) {
      this.persisted = undefined;
      return;
    }
    this.persisted = (await storage.persisted()) || (await storage.persist());
    await this.refreshStorage();
  }
}

export const deviceStatus = new DeviceStatus();
