/**
 * Which screen is showing, kept in the URL hash so the back button and a cold start on an
 * installed app land where the surveyor was. Screens: the survey list and settings.
 */
export type Screen = 'surveys' | 'settings';

const SCREENS: readonly Screen[] = ['surveys', 'settings'];

function screenFromHash(hash: string): Screen {
  const name = hash.replace(/^#\/?/, '');
  return (SCREENS as readonly string[]).includes(name) ? (name as Screen) : 'surveys';
}

class Navigation {
  screen = $state<Screen>('surveys');

  start(): void {
    this.screen = screenFromHash(window.location.hash);
    window.addEventListener('hashchange', () => (this.screen = screenFromHash(window.location.hash)));
  }

  go(screen: Screen): void {
    window.location.hash = `#/${screen}`;
    this.screen = screen;
  }
}

export const navigation = new Navigation();
