/**
 * The reference tables of the report: instruments (model, serial, accuracy, calibration, field
 * checks), methods (each method used, with its published name and source) and criteria (source,
 * status, averaging period, and "not yet confirmed against …" where a value is from memory).
 *
 * Example: instrumentRows(demoSchool)[0] = ['CO2 meter …', 'SN …', 'CO2 ±50 ppm + 3 % of reading', …].
 */
import type { AnalysisResults } from '../analysis/results.ts';
import type { AirflowMechanism } from '../core/airflow-item.ts';
import { criterionCaveat } from '../core/criteria/criterion-caveat.ts';
import { selectCriteria } from '../core/criteria/select-criteria.ts';
import type { RoomUse } from '../core/room-uses.ts';
import { roomUseLabel } from '../core/room-uses.ts';
import type { QuantityKind } from '../core/units.ts';
import type { MeasuredQuantity } from '../model/instrument.ts';
import type { SurveyDocument } from '../model/survey-document.ts';
import { metricKind, periodWords, sourceWords, statusWords } from './criterion-words.ts';
import type { ReportJudgementView } from './judgement-view.ts';
import { METHOD_WORDS } from './method-words.ts';
import { numberText, reportFigure } from './report-figure.ts';
import { limitText } from './room-ranking.ts';
import { allCriteria } from '../core/criteria/criteria-sets.ts';
import { recordedDate, recordedDateTime } from './recorded-time.ts';

const PREDICTION_WORDS: Record<Exclude<AirflowMechanism, 'none'>, { name: string; source: string }> = {
  'single-sided': { name: 'Predicted: windows on one side', source: 'BS 5925 single-sided formulas (wind and stack), range covering de Gids & Phaff' },
  cross: { name: 'Predicted: cross ventilation', source: 'BS 5925 cross-ventilation formulas, only with the internal path recorded open' },
  'background-vent': { name: 'Predicted: background vents', source: 'Orifice equation (BS 5925) on the equivalent area' },
  'air-brick': { name: 'Predicted: air bricks and grilles', source: 'Orifice equation (BS 5925) on the equivalent area' },
  'mechanical-extract': { name: 'Extract fans', source: 'Measured flow where measured, else the rated flow reduced for installation' },
  'mechanical-supply': { name: 'Mechanical supply', source: 'Measured terminal flows' },
  recirculating: { name: 'Recirculating units', source: 'Counted as no outdoor air' },
  'internal-transfer': { name: 'Air from other rooms', source: 'Orifice equation on undercuts and grilles; a capacity, never counted as outdoor air' },
  leakage: { name: 'Predicted: leakage through the fabric', source: 'LBL model from the air permeability, with the divide-by-20 rule as a check' },
};

const QUANTITY: Record<MeasuredQuantity, { words: string; kind: QuantityKind | null; unit: string }> = {
  co2: { words: 'CO2', kind: null, unit: 'ppm' },
  temperature: { words: 'temperature', kind: null, unit: '°C' },
  'relative-humidity': { words: 'relative humidity', kind: null, unit: '% RH' },
  'surface-temperature': { words: 'surface temperature', kind: null, unit: '°C' },
  airflow: { words: 'airflow', kind: 'flow', unit: 'L/s' },
  'air-speed': { words: 'air speed', kind: null, unit: 'm/s' },
  pressure: { words: 'pressure', kind: null, unit: 'Pa' },
  'moisture-content': { words: 'moisture content', kind: null, unit: '%' },
};

function amount(q: MeasuredQuantity, si: number): string {
  const rule = QUANTITY[q];
  if (rule.kind) {
    const f = reportFigure('', { value: si, low: null, high: null }, rule.kind);
    return `${numberText(f.value!)} ${f.unit}`;
  }
  return `${numberText(si)} ${rule.unit}`;
}

/** Rows: instrument, serial, measures, accuracy, calibrated, field checks. */
export function instrumentRows(doc: SurveyDocument): string[][] {
  return doc.instruments.map((i) => [
    i.model,
    i.serial || 'not recorded',
    i.measures.map((q) => QUANTITY[q].words).join(', '),
    i.accuracy.length ? i.accuracy.map((a) => `${QUANTITY[a.quantity].words} ±${amount(a.quantity, a.plusMinus)}${a.percentOfReading ? ` + ${numberText(a.percentOfReading)} % of reading` : ''}`).join('; ') : 'not recorded',
    i.calibratedOn ? recordedDate(i.calibratedOn) : 'not recorded',
    i.checks.length
      ? i.checks.map((c) => `${recordedDateTime(c.time)}: ${QUANTITY[c.quantity].words} against ${c.reference || 'another instrument'}, offset ${c.offset >= 0 ? '+' : ''}${amount(c.quantity, c.offset)}`).join('; ')
      : 'none recorded',
  ]);
}

/** Rows: method, what it follows, where it was used. */
export function methodRows(results: AnalysisResults): string[][] {
  const used = new Map<string, Set<string>>();
  const note = (key: string, room: string) => used.set(key, (used.get(key) ?? new Set()).add(room));
  for (const room of results.rooms) {
    for (const m of room.measured) if (m.kind !== 'none') note(`m:${m.method}`, room.name);
    for (const s of room.scenarios) for (const c of s.cases) for (const item of c.prediction.items) if (item.mechanism !== 'none') note(`p:${item.mechanism}`, room.name);
  }
  const rows: string[][] = [];
  for (const [key, rooms] of used) {
    const list = [...rooms].join(', ');
    if (key.startsWith('m:')) {
      const words = METHOD_WORDS[key.slice(2) as keyof typeof METHOD_WORDS];
      rows.push([words.name, words.source, list]);
    } else {
      const words = PREDICTION_WORDS[key.slice(2) as Exclude<AirflowMechanism, 'none'>];
      rows.push([words.name, words.source, list]);
    }
  }
  rows.push([
    'Intervals',
    `Monte Carlo over meter offset, gain and noise, outdoor level, occupants' output and room size: ${results.settings.draws} draws, 2.5th to 97.5th percentile; predictions over the weather cases ${results.weatherCases.map((w) => w.label).join('; ')}.`,
    'every room',
  ]);
  return rows;
}

/**
 * Criteria rows: criterion, source, status, averaging period, role, caveat. From the judgement
 * when there is one; otherwise those the criteria data holds for the survey's building and room
 * uses, listed for reference and said to be unapplied.
 */
/**
 * The surveyor's recorded edits to the criteria set, in words (the report must disclose any
 * departure from the published figures). Example: 'Changed for this survey: HSE: consistently
 * above 1500 ppm… — limit 1200 ppm instead of 1500 ppm (stricter client brief).'
 */
function editWords(doc: SurveyDocument): string {
  const choice = doc.survey.criteria;
  if (!choice || choice.overrides.length === 0) return '';
  const lines = choice.overrides.map((o) => {
    const c = allCriteria().find((x) => x.id === o.thresholdId);
    if (!c) return `${o.thresholdId}: ${numberText(o.value)} (${o.reason})`;
    return `${c.title} — limit ${limitText(c.metric, o.value)} instead of ${limitText(c.metric, c.limit)} (${o.reason})`;
  });
  return ` Changed for this survey: ${lines.join('; ')}.`;
}

export function criteriaRows(doc: SurveyDocument, judgement: ReportJudgementView | null): { note: string; rows: string[][] } {
  const rows = new Map<string, string[]>();
  if (judgement) {
    for (const room of judgement.rooms.values()) {
      for (const c of room.checks) rows.set(c.criterionId, [c.title, c.source, `${statusWords(c.status)} (${c.role})`, periodWords(c.period), c.caveat || 'confirmed', 'see the room sheets']);
    }
    return { note: `The criteria each room was judged against.${editWords(doc)}`, rows: [...rows.values()] };
  }
  const survey = doc.survey;
  const uses = [...new Set(doc.rooms.map((r) => r.use))];
  for (const use of uses) {
    const { selected } = selectCriteria({ buildingUse: survey.buildingUse, roomUse: use, situation: survey.stage ?? 'existing', ventilation: survey.ventilation ?? 'unknown' });
    for (const s of selected) {
      const c = s.criterion;
      const kind = metricKind(c.metric);
      const limit = c.limit === null ? '' : kind ? ` (${reportFigure('', { value: c.limit, low: null, high: null }, kind).text})` : ` (${c.limit})`;
      const prior = rows.get(c.id);
      const forUse = roomUseLabel(use as RoomUse).toLowerCase();
      if (prior) prior[5] = `${prior[5]}, ${forUse}`;
      else rows.set(c.id, [`${c.title}${limit}`, sourceWords(c.source), `${statusWords(c.status)} (${s.role})`, periodWords(c.period), criterionCaveat(c) || 'confirmed', forUse]);
    }
  }
  return {
    note: 'The criteria judgement was not available, so no room has been judged against these. They are the criteria Ventwalk holds for the rooms of this survey, listed so that the reader can see which yardsticks apply, with their status and averaging period.',
    rows: [...rows.values()],
  };
}
