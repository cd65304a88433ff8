/** Places in the app and their addresses: every place survives a round trip through its hash. */
import { describe, it, expect } from 'vitest';
import { hashFor, placeFromHash, type Place } from '../../src/app/navigation.svelte.ts';

const id = '6f1c2f0e-9a51-4c3e-8d5e-2b7a3c1d9e00';
const room = '0a7d6c5b-4e3f-4a2b-9c1d-0e9f8a7b6c5d';
const area = '1b2c3d4e-5f60-4a7b-8c9d-0e1f2a3b4c5d';

describe('navigation places', () => {
  const places: Place[] = [
    { screen: 'surveys', surveyId: null, roomId: null, test: null, areaId: null },
    { screen: 'settings', surveyId: null, roomId: null, test: null, areaId: null },
    { screen: 'overview', surveyId: id, roomId: null, test: null, areaId: null },
    { screen: 'details', surveyId: id, roomId: null, test: null, areaId: null },
    { screen: 'visit', surveyId: id, roomId: null, test: null, areaId: null },
    { screen: 'room', surveyId: id, roomId: room, test: null, areaId: null },
    { screen: 'findings', surveyId: id, roomId: room, test: null, areaId: null },
    { screen: 'test', surveyId: id, roomId: room, test: 'seeded-decay', areaId: null },
    { screen: 'area', surveyId: id, roomId: null, test: null, areaId: area },
  ];
  it.each(places)('$screen round-trips through its hash', (place) => {
    expect(placeFromHash(hashFor(place))).toEqual(place);
  });

  it('reads the address an older release wrote for a survey as its overview', () => {
    expect(placeFromHash(`#/survey/${id}`).screen).toBe('overview');
    expect(placeFromHash('#/nowhere').screen).toBe('surveys');
  });

  it('writes an area screen as …/area/<areaId>, and an area address without its id as the overview', () => {
    expect(hashFor({ screen: 'area', surveyId: id, areaId: area })).toBe(`#/survey/${id}/area/${area}`);
    expect(placeFromHash(`#/survey/${id}/area/${area}`)).toEqual({ screen: 'area', surveyId: id, roomId: null, test: null, areaId: area });
    expect(placeFromHash(`#/survey/${id}/area/`).screen).toBe('overview');
    // An id with characters that need escaping survives the round trip.
    expect(placeFromHash(hashFor({ screen: 'area', surveyId: id, areaId: 'a/b c' })).areaId).toBe('a/b c');
  });
});
