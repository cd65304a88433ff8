/**
 * The report's fixed wording: what the survey did not do, the limitations of screening
 * estimates, the cautions every report repeats, and the sign-off statements. Plain words, no
 * health claims, no blame on occupants, deference to local regulations and competent practice.
 */

/** Said on the front page about how the survey was done. */
export const NON_INTRUSIVE =
  'The survey was non-intrusive: nothing was opened up, lifted or taken apart, and only the rooms listed were seen.';

/** Said under the summary and at the top of the limitations. */
export const SCREENING_NOTE =
  'The figures in this report are screening estimates from a simple model of each room and a few readings on one day. They show where a room stands and which fixes are worth a closer look; they are not a design. Local building regulations and a competent designer or engineer decide any work.';

/** Limitations of the method and of the day. */
export const LIMITATIONS: readonly string[] = [
  SCREENING_NOTE,
  'The readings describe the day of the visit: its weather, its occupancy and the way windows, doors, vents and fans were set then. Another day, another season or another way of using a room can give different figures.',
  'Predictions from openings, fans and leakage are given as ranges over stated weather cases; the formulas behind them are approximate (often within 30–50 % at best), so a prediction is never weighed as equal to a measurement.',
  'Each interval covers the meter’s stated accuracy, the outdoor level, the occupants’ output and the room’s size as far as they are known; it does not cover every way a day can differ from the one surveyed.',
  'This is not a gas safety, electrical, structural, fire or asbestos inspection, and it does not assess radon, nitrogen dioxide, particles or other pollutants.',
];

/** Cautions repeated in every report. */
export const CAUTIONS: readonly string[] = [
  'Never block, cover or close vents that supply air to combustion appliances or flues, and never count them as room ventilation.',
  'CO2 indicates how well a room is ventilated for the people in it. It is not a measure of other pollutants, and a low CO2 level does not show that the air is free of them.',
  'Carbon monoxide needs its own alarm: a CO2 meter does not detect it. Where there is a combustion appliance, check that a carbon monoxide alarm is fitted and works.',
  'Before adding an extract fan where there is an open-flued appliance, have a registered gas or solid-fuel engineer check that the flue cannot spill.',
  'Do not remove window restrictors on upper floors, and do not undercut or wedge open fire doors to move air.',
  'Work at height and on windows follows the site’s safety rules; check for asbestos before drilling in buildings from before 2000.',
];

/** The statement of independence the surveyor signs. */
export const INDEPENDENCE =
  'I confirm that the facts in this report are as found on the day, that the opinions are my own, and that I have no financial interest in any work it recommends.';

/** How facts and opinions are kept apart in the room sheets. */
export const FACTS_AND_OPINIONS =
  'In each room sheet the observation and measurement sections record facts as found; the interpretation and recommendation sections give the surveyor’s opinion on them.';
