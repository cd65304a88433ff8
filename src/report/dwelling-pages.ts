/**
 * A page for each dwelling (an area that is a flat or a house): its facts, the whole-dwelling
 * outdoor air from the analysis (per m² of floor and per usual occupant), the system's supply
 * and extract, the rooms in it, and the judgement's findings for it when available.
 *
 * Example: for the demo flats, dwellingPages(...)[0].title = 'Flat 3'.
 */
import type { AnalysisResults } from '../analysis/results.ts';
import type { SurveyDocument } from '../model/survey-document.ts';
import type { ReportJudgementView } from './judgement-view.ts';
import { reportFigure } from './report-figure.ts';
import type { DwellingPage } from './report-model.ts';
import { roomPlace } from './room-place.ts';

const SYSTEM_WORDS: Record<string, string> = {
  none: 'none',
  'intermittent-extract': 'intermittent extract fans',
  'continuous-extract': 'continuous extract',
  'heat-recovery': 'supply and extract with heat recovery',
  'positive-input': 'positive input ventilation',
  other: 'other',
};

export function dwellingPages(doc: SurveyDocument, results: AnalysisResults, judgement: ReportJudgementView | null): DwellingPage[] {
  return results.areas
    .filter((a) => a.kind === 'flat' || a.kind === 'house')
    .map((a) => {
      const area = doc.areas.find((x) => x.id === a.areaId)!;
      const system = area.dwelling?.system;
      const facts: [string, string][] = [
        ['Bedrooms', a.bedrooms === null ? 'not recorded' : String(a.bedrooms)],
        ['Usual occupants', a.usualOccupants === null ? 'not recorded' : String(a.usualOccupants)],
        ['Whole-dwelling system', system ? `${SYSTEM_WORDS[system.kind]}${system.mode ? `, ${system.mode}` : ''}; running: ${system.running}` : 'not recorded'],
      ];
      const figures = [
        reportFigure('Floor area', a.floorArea_m2, 'area'),
        reportFigure('Outdoor air, whole dwelling', a.supply_m3s, 'flow'),
        reportFigure('Per m² of floor', { ...a.supplyPerFloorArea_m3sm2, basis: a.supply_m3s.basis }, 'flowPerArea'),
      ];
      if (a.supplyPerOccupant_m3s) figures.push(reportFigure('Per usual occupant', { ...a.supplyPerOccupant_m3s, basis: a.supply_m3s.basis }, 'flowPerPerson'));
      if (a.balance) {
        figures.push(reportFigure('System supply', { ...a.balance.supply_m3s, basis: 'measured' }, 'flow'));
        figures.push(reportFigure('System extract', { ...a.balance.extract_m3s, basis: 'measured' }, 'flow'));
      }
      return {
        areaId: a.areaId,
        title: a.name,
        facts,
        figures,
        rooms: a.roomIds.map((id) => roomPlace(doc, doc.rooms.find((r) => r.id === id)!)),
        findings: judgement?.areas.get(a.areaId) ?? ['Not judged: the criteria judgement was not available. The whole-dwelling figures are the sum of the rooms’ headline figures and the system’s terminals.'],
        cautions: a.warnings.filter((w) => w.severity !== 'info').map((w) => w.message),
      };
    });
}
