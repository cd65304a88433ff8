/**
 * Service-worker registration and updates, without any UI.
 *
 * - registerType 'prompt': a new version waits until the person says "update".
 * - `applyUpdate()` refuses while the app reports unsaved input, so a reload never loses a form.
 * - Checks for a new version on start, when the app becomes visible and hourly, only online.
 * - After asking the new worker to take over, reloads itself if the browser has not done so
 *   within 3 s (installed iOS apps sometimes never fire `controllerchange`).
 */
import { registerSW } from 'virtual:pwa-register';

export interface UpdaterHooks {
  /** A new version is installed and waiting. */
  onUpdateReady: () => void;
  /** The app is cached and will start without a network from now on. */
  onOfflineReady: () => void;
  /** True when reloading now would lose nothing. */
  isReloadSafe: () => boolean;
}

export interface Updater {
  /** Apply the waiting update. Returns false (and does nothing) while input is unsaved. */
  applyUpdate: () => Promise<boolean>;
}

const HOURLY_MS = 60 * 60 * 1000;
const FALLBACK_RELOAD_MS = 3000;

export function startUpdater(hooks: UpdaterHooks): Updater {
  let registration: ServiceWorkerRegistration | undefined;
  const check = () => {
    if (navigator.onLine && registration && !registration.installing) void registration.update().catch(() => undefined);
  };

  const updateSW = registerSW({
    immediate: true,
    onNeedRefresh: hooks.onUpdateReady,
    onOfflineReady: hooks.onOfflineReady,
    onRegisteredSW: (_url, reg) => {
      registration = reg;
      setInterval(check, HOURLY_MS);
      document.addEventListener('visibilitychange', () => {
        if (document.visibilityState === 'visible') check();
      });
    },
  });

  return {
    async applyUpdate() {
      if (!hooks.isReloadSafe()) return false;
      await updateSW(true);
      setTimeout(() => window.location.reload(), FALLBACK_RELOAD_MS);
      return true;
    },
  };
}
