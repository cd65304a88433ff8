/**
 * Which screen is showing, kept in the URL hash so the back button and a cold start on an
 * installed app land where the surveyor was. Screens: the survey list, settings, and inside one
 * survey its overview (#/survey/<id>), settings (…/details), start of visit (…/visit), an area's
 * details (…/area/<areaId>), a room (…/room/<roomId>), its findings (…/room/<roomId>/findings)
 * and a guided test (…/room/<roomId>/test/<kind>).
 */
export type Screen = 'surveys' | 'settings' | 'overview' | 'details' | 'visit' | 'area' | 'room' | 'findings' | 'test';

export interface Place {
  screen: Screen;
  surveyId: string | null;
  roomId: string | null;
  /** The guided test's kind on the test screen (decay, seeded-decay, build-up). */
  test: string | null;
  /** The area on the area screen. */
  areaId: string | null;
}

const NONE = { surveyId: null, roomId: null, test: null, areaId: null };
const SURVEY_SCREENS = new Set(['details', 'visit']);

export function placeFromHash(hash: string): Place {
  // The fourth part is the room's id, or the area's on the area screen.
  const [name, id, part, roomId, roomPart, test] = hash.replace(/^#\/?/, '').split('/').map(decodeURIComponent);
  if (name === 'settings') return { screen: 'settings', ...NONE };
  if (name !== 'survey' || !id) return { screen: 'surveys', ...NONE };
  const survey = { ...NONE, surveyId: id };
  if (part && SURVEY_SCREENS.has(part)) return { screen: part as Screen, ...survey };
  if (part === 'area' && roomId) return { screen: 'area', ...survey, areaId: roomId };
  if (part === 'room' && roomId) {
    const room = { ...survey, roomId };
    if (roomPart === 'findings') return { screen: 'findings', ...room };
    if (roomPart === 'test' && test) return { screen: 'test', ...room, test };
    return { screen: 'room', ...room };
  }
  return { screen: 'overview', ...survey };
}

/**
 * The hash for a place. Examples: hashFor({ screen: 'overview', surveyId: 'abc' }) = '#/survey/abc';
 * hashFor({ screen: 'room', surveyId: 'a', roomId: 'r' }) = '#/survey/a/room/r';
 * hashFor({ screen: 'area', surveyId: 'a', areaId: 'f' }) = '#/survey/a/area/f'.
 */
export function hashFor(place: Partial<Place> & { screen: Screen }): string {
  const { screen, surveyId, roomId, test, areaId } = place;
  if (!surveyId || screen === 'surveys' || screen === 'settings') return `#/${screen === 'settings' ? 'settings' : 'surveys'}`;
  const survey = `#/survey/${encodeURIComponent(surveyId)}`;
  if (screen === 'overview') return survey;
  if (screen === 'details' || screen === 'visit') return `${survey}/${screen}`;
  if (screen === 'area') return `${survey}/area/${encodeURIComponent(areaId ?? '')}`;
  const room = `${survey}/room/${encodeURIComponent(roomId ?? '')}`;
  if (screen === 'findings') return `${room}/findings`;
  if (screen === 'test') return `${room}/test/${encodeURIComponent(test ?? 'decay')}`;
  return room;
}

class Navigation {
  screen = $state<Screen>('surveys');
  surveyId = $state<string | null>(null);
  roomId = $state<string | null>(null);
  test = $state<string | null>(null);
  areaId = $state<string | null>(null);
  /** True when the app started without a place in its address (a cold start at the start URL). */
  startedBare = false;
  private listeners: ((place: Place) => void)[] = [];

  start(): void {
    this.startedBare = window.location.hash.replace(/^#\/?/, '') === '';
    this.show(placeFromHash(window.location.hash));
    window.addEventListener('hashchange', () => this.show(placeFromHash(window.location.hash)));
  }

  go(place: Partial<Place> & { screen: Screen }): void {
    window.location.hash = hashFor(place);
    this.show(placeFromHash(hashFor(place)));
  }

  /** Call `listener` with every place shown from now on. */
  onChange(listener: (place: Place) => void): void {
    this.listeners.push(listener);
  }

  private show(place: Place): void {
    this.screen = place.screen;
    this.surveyId = place.surveyId;
    this.roomId = place.roomId;
    this.test = place.test;
    this.areaId = place.areaId;
    for (const listener of this.listeners) listener(place);
  }
}

export const navigation = new Navigation();
