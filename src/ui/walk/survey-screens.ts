/**
 * Each screen inside a survey as its own chunk, fetched on first use: opening the overview does
 * not wait for the room screen's code, nor a room for the findings'. The loaders are cached, so a
 * screen's code is fetched once, and the app asks for a screen's code as soon as the address
 * names it, alongside the survey shell, rather than after it (both come from the precache offline).
 *
 * Example: loadSurveyScreen('room').then((Room) => …) gives the room screen's component.
 */
import type { Component } from 'svelte';
import type { Screen } from '../../app/navigation.svelte.ts';

type SurveyScreen = Exclude<Screen, 'surveys' | 'settings'>;

type AnyComponent = Component<any>;

const LOADERS: Record<SurveyScreen, () => Promise<{ default: AnyComponent }>> = {
  overview: () => import('./OverviewScreen.svelte'),
  details: () => import('../SurveyScreen.svelte'),
  visit: () => import('./VisitScreen.svelte'),
  area: () => import('./AreaScreen.svelte'),
  room: () => import('./RoomScreen.svelte'),
  findings: () => import('../findings/FindingsScreen.svelte'),
  test: () => import('./GuidedTestScreen.svelte'),
};

const loaded = new Map<SurveyScreen, Promise<AnyComponent>>();

/** The component of a screen inside a survey, fetched once. */
export function loadSurveyScreen(screen: SurveyScreen): Promise<AnyComponent> {
  let promise = loaded.get(screen);
  if (!promise) {
    promise = LOADERS[screen]().then((m) => m.default);
    loaded.set(screen, promise);
  }
  return promise;
}

/** Start fetching a screen's code (errors surface when the screen itself asks for it). */
export function prefetchSurveyScreen(screen: Screen): void {
  if (screen === 'surveys' || screen === 'settings') return;
  loadSurveyScreen(screen).catch(() => loaded.delete(screen));
}
