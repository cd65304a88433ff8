/**
 * The questions to ask the people who use a room, by kind of building, in our own words
 * (practice.md §2.7: homes — mould history, heating, why vents are shut, fan use, drying,
 * cooking, people overnight, past repairs; schools — timetable, class sizes, window habits,
 * propped doors, complaints). Answers are stored by topic on the room.
 */
import type { BuildingUse } from '../core/building-uses.ts';

const HOMES = [
  'When and where did the mould or damp first appear?',
  'How is the home heated, and for how many hours a day?',
  'Are trickle vents or windows kept shut? Why (draughts, noise, security)?',
  'Is the extract fan used? If not, why not?',
  'Where is washing dried?',
  'How much cooking is done, and is the cooker hood used?',
  'How many people sleep here?',
  'Past repairs or mould treatments?',
];
const SCHOOLS = [
  'Timetable: when is the room used, and by which classes?',
  'Class sizes and ages',
  'Are windows opened in lessons? In winter?',
  'Are doors propped open?',
  'Complaints: stuffiness, cold, headaches, smells?',
  'Any air handling: its schedule, CO₂ set-point, dampers?',
];
const WORKPLACES = [
  'How many people use the room, and for which hours?',
  'Are windows opened? In winter?',
  'Complaints: stuffiness, cold, draughts, smells?',
  'Any mechanical ventilation: its schedule and settings?',
];

export function interviewTopics(use: BuildingUse): string[] {
  return use === 'dwelling' ? HOMES : use === 'school' ? SCHOOLS : WORKPLACES;
}
