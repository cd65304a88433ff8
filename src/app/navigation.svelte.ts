/**
 * Which screen is showing, kept in the URL hash so the back button and a cold start on an
 * installed app land where the surveyor was. Screens: the survey list, settings, and one
 * survey's details (#/survey/<id>).
 */
export type Screen = 'surveys' | 'settings' | 'survey';

interface Place {
  screen: Screen;
  surveyId: string | null;
}

function placeFromHash(hash: string): Place {
  const [name, id] = hash.replace(/^#\/?/, '').split('/');
  if (name === 'survey' && id) return { screen: 'survey', surveyId: decodeURIComponent(id) };
  if (name === 'settings') return { screen: 'settings', surveyId: null };
  return { screen: 'surveys', surveyId: null };
}

/** The hash for a place. Example: hashFor('survey', 'abc') = '#/survey/abc'. */
export function hashFor(screen: Screen, surveyId?: string): string {
  return screen === 'survey' && surveyId ? `#/survey/${encodeURIComponent(surveyId)}` : `#/${screen}`;
}

class Navigation {
  screen = $state<Screen>('surveys');
  surveyId = $state<string | null>(null);
  /** True when the app started without a place in its address (a cold start at the start URL). */
  startedBare = false;

  start(): void {
    this.startedBare = window.location.hash.replace(/^#\/?/, '') === '';
    this.show(placeFromHash(window.location.hash));
    window.addEventListener('hashchange', () => this.show(placeFromHash(window.location.hash)));
  }

  go(screen: Screen, surveyId?: string): void {
    window.location.hash = hashFor(screen, surveyId);
    this.show({ screen, surveyId: surveyId ?? null });
  }

  private show(place: Place): void {
    this.screen = place.screen;
    this.surveyId = place.surveyId;
  }
}

export const navigation = new Navigation();
