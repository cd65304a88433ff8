/** What every part of the room screen is given: the room (edited in place), how to say it changed, and its problems by field path. */
import type { DocumentRoom } from '../../model/survey-document.ts';

export interface RoomPartProps {
  room: DocumentRoom;
  /** The room was edited: check and autosave it. */
  changed: () => void;
  /** The model's problem with a field of the room ("schedule.periods.1.start"), if any. */
  problemFor: (field: string) => string | undefined;
}
