/**
 * Building uses: the trade's categories that decide which guidance applies to a survey.
 * One list for the whole app (the model's schema and the screens read it from here).
 *
 * Source: the categories follow the scope of the guidance sets the app applies — school
 * ventilation guidance, dwelling guidance (new work and existing rented homes) and workplace
 * guidance (see references.md §5; common practice (no published source) for the grouping).
 *
 * Example: BUILDING_USES.map((u) => u.id) = ['school', 'dwelling', 'office', 'other'].
 */
export const BUILDING_USES = [
  { id: 'school', label: 'School' },
  { id: 'dwelling', label: 'Homes (houses and flats)' },
  { id: 'office', label: 'Office or other workplace' },
  { id: 'other', label: 'Other building' },
] as const;

export type BuildingUse = (typeof BUILDING_USES)[number]['id'];

export const BUILDING_USE_IDS = BUILDING_USES.map((u) => u.id) as unknown as readonly [BuildingUse, ...BuildingUse[]];

/** The plain label for a building use. Example: buildingUseLabel('school') = 'School'. */
export function buildingUseLabel(id: BuildingUse): string {
  return BUILDING_USES.find((u) => u.id === id)?.label ?? id;
}
