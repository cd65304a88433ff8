/**
 * A room's records in words for the observation section: openings, defects and schedule
 * periods as the surveyor found them, with SI values shown in display units.
 *
 * Example: openingWords(window 1 × hinged, opens, facing N, restrictor no) =
 * '1 × hinged window facing N: opens; no restrictor'.
 */
import { displayQuantity } from '../core/units.ts';
import type { Defect } from '../model/defect.ts';
import type { Opening } from '../model/opening.ts';
import type { Schedule } from '../model/occupancy.ts';
import { numberText } from './report-figure.ts';

const OPERABILITY: Record<string, string> = { opens: 'opens', restricted: 'opens only as far as its restrictor', blocked: 'blocked', seized: 'seized (does not open)' };
const DEFECTS: Record<string, string> = {
  mould: 'Mould',
  condensation: 'Condensation',
  leak: 'Leak',
  'fan-dead': 'Extract fan not working',
  'vent-shut': 'Vent shut',
  'vent-blocked': 'Vent blocked',
  other: 'Other',
};
const PATTERNS: Record<string, string> = {
  spots: 'spots',
  patches: 'patches',
  'external-corners': 'at external corners',
  'behind-furniture': 'behind furniture',
  'ceiling-edge': 'along the ceiling edge',
  'around-window': 'around the window',
  widespread: 'widespread',
};

const ISOLATOR: Record<string, string> = { on: 'isolator on', off: 'isolator off', none: 'no isolator fitted', 'not-found': 'isolator not found' };
const DUCTING: Record<string, string> = { ducted: 'ducted outside', recirculating: 'recirculating', 'through-wall': 'through the wall' };

/** A yes / no / not-checked answer in words. Example: checkWords('not-checked') = 'not checked'. */
export function checkWords(answer: string): string {
  return answer === 'not-checked' ? 'not checked' : answer;
}

function shown(si: number, kind: Parameters<typeof displayQuantity>[1]): string {
  const d = displayQuantity(si, kind);
  return `${numberText(d.value)} ${d.unit}`;
}

/** One opening in words. */
export function openingWords(o: Opening): string {
  const where = o.facing ? ` facing ${o.facing}` : '';
  const condition = o.condition ? ` (${o.condition})` : '';
  switch (o.type) {
    case 'window':
      return `${o.count} × ${o.style} window${where}: ${OPERABILITY[o.operability]}; ${o.restrictor === 'yes' ? 'restrictor fitted' : o.restrictor === 'no' ? 'no restrictor' : 'restrictor not checked'}${condition}`;
    case 'vent': {
      const label = o.labelArea_m2 !== undefined ? `, ${shown(o.labelArea_m2, 'ventArea')} on the label (${o.labelAreaIs === 'unknown' ? 'free or equivalent not known' : `${o.labelAreaIs} area`})` : ', no label area';
      return `${o.count} × ${o.kind.replace('-', ' ')} for ${o.purpose === 'room' ? 'the room' : o.purpose.replace('-', ' ')}${where}${label}: ${OPERABILITY[o.operability]}${condition}`;
    }
    case 'fan': {
      const rated = o.ratedFlow_m3s !== undefined ? `rated ${shown(o.ratedFlow_m3s, 'flow')}` : 'rating not known';
      const measured = o.measuredFlow_m3s !== undefined ? `measured ${shown(o.measuredFlow_m3s, 'flow')}` : 'flow not measured';
      return `${o.count} × ${o.direction} fan (${DUCTING[o.ducting] ?? o.ducting}): ${rated}, ${measured}; ${ISOLATOR[o.isolator] ?? o.isolator}${condition}`;
    }
    case 'undercut':
      // A gap under a door is measured in millimetres.
      return `${o.count} × door undercut: ${numberText(Math.round(o.gap_m * 1000))} mm gap under a ${shown(o.doorWidth_m, 'length')} door${condition}`;
  }
}

/** One defect in words. */
export function defectWords(d: Defect): string {
  const extent = d.extent_m2 !== undefined ? `, about ${shown(d.extent_m2, 'area')}` : '';
  const pattern = d.pattern ? `, ${PATTERNS[d.pattern]}` : '';
  return `${DEFECTS[d.kind]}${d.location ? ` at ${d.location}` : ''}${extent}${pattern}${d.notes ? `. ${d.notes}` : ''}`;
}

/**
 * The schedule in words; without periods of its own, the day the findings used instead (`used`,
 * e.g. 'the bedroom template (invented timetable)'). Example: '22:30–07:00 full (Asleep)'.
 */
export function scheduleWords(schedule: Schedule, used?: string): string {
  if (schedule.periods.length === 0) return used ? `None recorded for the room: the findings use ${used}` : 'No schedule recorded';
  return schedule.periods.map((p) => `${p.start}–${p.end} ${p.presence}${p.label ? ` (${p.label})` : ''}`).join('; ');
}
