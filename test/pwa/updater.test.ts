/**
 * The update flow never reloads while the app reports unsaved input (platform-pitfalls.md 2.1:
 * auto-reloading updates lose half-filled forms).
 */
import { describe, it, expect, vi, beforeEach, afterEach } from 'vitest';

const updateSW = vi.fn(async (_reload?: boolean) => undefined);
vi.mock('virtual:pwa-register', () => ({ registerSW: vi.fn(() => updateSW) }));

beforeEach(() => {
  vi.useFakeTimers();
  updateSW.mockClear();
  vi.stubGlobal('navigator', { onLine: true });
  vi.stubGlobal('document', { addEventListener: vi.fn(), visibilityState: 'visible' });
  vi.stubGlobal('window', { location: { reload: vi.fn() } });
});
afterEach(() => {
  vi.useRealTimers();
  vi.unstubAllGlobals();
});

describe('startUpdater', () => {
  it('refuses to apply an update while input is unsaved, and does not reload', async () => {
    const { startUpdater } = await import('../../src/pwa/updater.ts');
    const updater = startUpdater({ onUpdateReady: () => {}, onOfflineReady: () => {}, isReloadSafe: () => false });
    await expect(updater.applyUpdate()).resolves.toBe(false);
    vi.advanceTimersByTime(10_000);
    expect(updateSW).not.toHaveBeenCalled();
    expect(window.location.reload).not.toHaveBeenCalled();
  });

  it('applies the update when nothing is unsaved, with a fallback reload for browsers that miss controllerchange', async () => {
    const { startUpdater } = await import('../../src/pwa/updater.ts');
    const updater = startUpdater({ onUpdateReady: () => {}, onOfflineReady: () => {}, isReloadSafe: () => true });
    await expect(updater.applyUpdate()).resolves.toBe(true);
    expect(updateSW).toHaveBeenCalledWith(true);
    expect(window.location.reload).not.toHaveBeenCalled();
    vi.advanceTimersByTime(3000);
    expect(window.location.reload).toHaveBeenCalledTimes(1);
  });
});
