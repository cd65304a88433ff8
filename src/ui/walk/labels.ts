/** Plain words for the model's choices, as the room screens show them. */
import type { Opening } from '../../model/opening.ts';
import { APPLIANCE_LABELS } from '../../app/safety-items.ts';

type Options<T extends string> = { id: T; label: string }[];
const options = <T extends string>(labels: Record<T, string>): Options<T> =>
  (Object.entries(labels) as [T, string][]).map(([id, label]) => ({ id, label }));

export const CHECK = options({ yes: 'Yes', no: 'No', 'not-checked': 'Not checked' });
export const OPERABILITY = options({ opens: 'Opens', restricted: 'Opens only a little', blocked: 'Blocked or shut', seized: 'Will not open' });
export const WINDOW_STYLE = options({ hinged: 'Hinged', sash: 'Sash (slides up)', sliding: 'Slides sideways', louvre: 'Louvre', fixed: 'Fixed' });
export const WINDOW_HINGE = options({ side: 'Side-hung', top: 'Top-hung', bottom: 'Bottom-hung', 'centre-pivot': 'Centre pivot', 'tilt-and-turn': 'Tilt and turn' });
export const VENT_KIND = options({ 'background-vent': 'Trickle vent', 'air-brick': 'Air brick', grille: 'Grille' });
export const VENT_PURPOSE = options({ room: 'Air for the room', 'sub-floor': 'Under-floor void', 'combustion-air': 'Combustion air' });
export const LABEL_AREA_IS = options({ equivalent: 'Equivalent area', free: 'Free area', unknown: 'Not stated' });
export const FAN_DIRECTION = options({ extract: 'Extract', supply: 'Supply' });
export const ISOLATOR = options({ on: 'On', off: 'Off', none: 'None fitted', 'not-found': 'Not found' });
export const DUCTING = options({ ducted: 'Ducted outside', recirculating: 'Recirculating', 'through-wall': 'Through the wall' });
export const SEX = options({ mixed: 'Mixed', female: 'Female', male: 'Male' });
export const AREA_KIND = options({ block: 'Block', floor: 'Floor', flat: 'Flat', house: 'House', wing: 'Wing', other: 'Other' });
export const DWELLING_SYSTEM = options({
  none: 'None',
  'intermittent-extract': 'Intermittent extract fans',
  'continuous-extract': 'Continuous extract',
  'heat-recovery': 'Heat recovery',
  'positive-input': 'Positive input',
  other: 'Other',
});
export const TERMINAL_SETTING = options({ normal: 'Normal', boost: 'Boost', other: 'Other' });
/** How full a room is over a period of its day (the model's presence). */
export const PRESENCE_WORDS = options({ full: 'Full', half: 'Half full', empty: 'Empty', airing: 'Empty, aired (windows open)' });
export const FACING = options({ N: 'N', NE: 'NE', E: 'E', SE: 'SE', S: 'S', SW: 'SW', W: 'W', NW: 'NW' });


/** A short name for an opening in lists ("2 × Window, hinged"). */
export function openingName(o: Opening): string {
  const what =
    o.type === 'window'
      ? `Window, ${WINDOW_STYLE.find((s) => s.id === o.style)?.label.toLowerCase()}`
      : o.type === 'vent'
        ? VENT_KIND.find((k) => k.id === o.kind)!.label
        : o.type === 'fan'
          ? `${o.direction === 'extract' ? 'Extract' : 'Supply'} fan`
          : 'Door undercut';
  return o.count > 1 ? `${o.count} × ${what}` : what;
}

/** Words and stored units of measured quantities (defined in src/app, shared with the instrument form's rules). */
export { QUANTITY_UNITS, QUANTITY_WORDS } from '../../app/quantity-words.ts';

export const APPLIANCE_KIND = options({ ...APPLIANCE_LABELS, other: 'Other' });
export const FLUE = options({ 'room-sealed': 'Room-sealed', 'open-flued': 'Open-flued', flueless: 'Flueless', 'not-known': 'Not known' });
export const GAS_RECORD = options({ yes: 'Seen', no: 'Not available', 'not-checked': 'Not checked', 'not-applicable': 'Not applicable' });
export const DEFECT_KIND = options({
  mould: 'Mould',
  condensation: 'Condensation',
  leak: 'Leak or penetrating damp',
  'fan-dead': 'Fan not working',
  'vent-shut': 'Vent shut',
  'vent-blocked': 'Vent blocked',
  other: 'Other',
});
export const MOULD_PATTERN = options({
  spots: 'Spots',
  patches: 'Patches',
  'external-corners': 'External corners',
  'behind-furniture': 'Behind furniture',
  'ceiling-edge': 'Ceiling edge',
  'around-window': 'Around the window',
  widespread: 'Widespread',
});
export const WALL_CONSTRUCTION = options({
  'solid-masonry': 'Solid brick or stone',
  'cavity-unfilled': 'Cavity wall, not filled',
  'cavity-filled': 'Cavity wall, filled',
  'timber-frame': 'Timber frame',
  'insulated-solid': 'Solid wall, insulated',
  'curtain-wall': 'Glazed curtain wall',
  other: 'Other',
});

/** When an outdoor reading was taken. */
export const OUTDOOR_MOMENTS = options({ start: 'Start of visit', end: 'End of visit', during: 'During' });
