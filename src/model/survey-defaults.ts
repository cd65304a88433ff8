/**
 * A new survey's header: what a person typed when starting it, the id and clock the app gives
 * it, and everything else empty (""), unset or an empty list — never an invented value.
 * Also brings a header stored by an older release (title, site and use only) up to the
 * current shape with the same empty values.
 *
 * Example: newSurveyRecord({ title: 'Block C', site: '', buildingUse: 'school' }, id, '2026-11-30T09:00:00Z')
 * gives revision 1, units 'si', surveyors [] and notes ''.
 */
import type { NewSurveyInput, Survey } from './survey.ts';

type Blank = Omit<Survey, 'id' | 'title' | 'site' | 'buildingUse' | 'createdAt' | 'updatedAt'>;

function blankFields(): Blank {
  return {
    client: '',
    surveyors: [],
    purpose: '',
    scope: '',
    visits: [],
    construction: '',
    units: 'si',
    weather: { conditions: '' },
    outdoorReadings: [],
    designWeather: [],
    notes: '',
    revision: 1,
    issued: [],
  };
}

export function newSurveyRecord(input: NewSurveyInput, id: string, now: string): Survey {
  return { ...blankFields(), ...input, id, createdAt: now, updatedAt: now };
}

/** An older stored header with every field it lacks filled with its empty value. */
export function completeSurveyRecord(stored: Pick<Survey, 'id' | 'title' | 'site' | 'buildingUse' | 'createdAt' | 'updatedAt'>): Survey {
  return { ...blankFields(), ...stored };
}
