/**
 * The report model: everything the findings report says, as plain data, built from the survey
 * document and analyseSurvey's results only. Renderers (pdf/, report-csv.ts) lay it out and add
 * nothing of substance; every number in it is one of the analysis's numbers converted to display
 * units and rounded (report-figure.ts), so the app, the command line and the paper agree.
 *
 * Sections, in reading order: front matter, summary, since the last visit (repeat visits), rooms to fix (ranked), a sheet per room,
 * dwellings, instruments, methods, criteria, limitations and cautions, sign-off, appendix.
 * Judgement-dependent parts (priority, checks, fixes, moisture findings) come from the
 * judgement view (judgement-view.ts); without it the report ranks by the headline figures,
 * says the judgement was not available and gives no verdict.
 *
 * Example: buildReport(doc, analyseSurvey(doc), { issueDate: '2026-01-20', appVersion: '0.1.0' })
 * .rooms.map((r) => r.title) lists every room of the survey in the survey's order.
 */
import type { AnalysisResults } from '../analysis/results.ts';
import type { ChartLimit, ChartPeriod, ChartSeries } from '../chart/time-chart.ts';
import { buildingUseLabel } from '../core/building-uses.ts';
import type { SurveyDocument } from '../model/survey-document.ts';
import { judgementView, type ReportJudgementView, type ReportPriority, type ReportUrgency } from './judgement-view.ts';
import { displayNumber, numberText, type ReportFigure } from './report-figure.ts';
import { CAUTIONS, FACTS_AND_OPINIONS, INDEPENDENCE, LIMITATIONS, NON_INTRUSIVE, SCREENING_NOTE } from './report-cautions.ts';
import { recordedClock, recordedDate, recordedDateTime, recordedZone } from './recorded-time.ts';
import { rankRooms } from './room-ranking.ts';
import { buildRoomSheet } from './room-sheet.ts';
import { criteriaRows, instrumentRows, methodRows } from './survey-tables.ts';
import { loggerCharts, readingRows } from './readings-appendix.ts';
import { dwellingPages } from './dwelling-pages.ts';
import { reportFileName } from './report-file-name.ts';
import { summaryOf } from './report-summary.ts';
import type { VisitComparison } from '../analysis/compare-visits.ts';
import { sinceLastVisitSection, type SinceLastVisitSection } from './since-last-visit.ts';

export interface ReportOptions {
  /** Date of issue, ISO (2026-01-20). A parameter, so the same inputs give the same report. */
  issueDate: string;
  appVersion: string;
  /** The client's or surveyor's reference; default: "VW-" and the survey id's first 8 characters. */
  reference?: string;
  checkedBy?: string;
  /** The judgement to report; default: judgementView(results). */
  judgement?: ReportJudgementView | null;
  /** This survey compared with the one it started from (compareVisits); gives the "Since the last visit" section. */
  previousVisit?: VisitComparison;
}

/** A chart as data: the renderer turns it into geometry with src/chart/time-chart.ts. */
export interface ReportChart {
  title: string;
  yLabel: string;
  series: ChartSeries[];
  limits: ChartLimit[];
  periods: ChartPeriod[];
  timeRange_s?: [number, number];
  yInclude: number[];
  /** What the chart shows, in words (for readers who cannot see it, and for print). */
  caption: string;
}

/** One row of the ranked table. */
export interface RankedRoom {
  rank: number;
  roomId: string;
  /** "Flat 3 / Bedroom 1 (B.G.04)": area, room and the client's number. */
  place: string;
  use: string;
  priority: ReportPriority | 'not-judged';
  priorityText: string;
  urgency: ReportUrgency | 'not-judged';
  /** The criterion and its status, or what the order is by when not judged. */
  criterion: string;
  value: string;
  limit: string;
  fix: string;
}

export interface SafetyLine {
  place: string;
  text: string;
  /** True when the judgement states it; false for an observation recorded on the day. */
  judged: boolean;
}

export interface ReportSummary {
  judgementAvailable: boolean;
  /** What the summary rests on, in words. */
  basis: string;
  safety: SafetyLine[];
  worst: RankedRoom[];
  actions: { urgency: ReportUrgency | 'not-judged'; text: string }[];
  counts: { label: string; count: number }[];
  screening: string;
}

export interface RoomSheet {
  roomId: string;
  title: string;
  place: string;
  use: string;
  priorityText: string;
  observation: { facts: [string, string][]; openings: string[]; defects: string[]; appliances: string[]; interview: string[]; notes: string };
  measurement: {
    rows: { label: string; time: string; method: string; basis: string; supply: ReportFigure; airChanges: ReportFigure; perPerson: ReportFigure | null; steady: ReportFigure | null }[];
    outdoor: string;
    none: string | null;
  };
  interpretation: {
    headline: ReportFigure[];
    headlineSource: string;
    scenarios: { label: string; weather: string; supply: ReportFigure; perPerson: ReportFigure | null; steady: ReportFigure | null }[];
    profile: string[];
    reconciliation: string[];
    checks: { criterion: string; status: string; period: string; value: string; limit: string; finding: string }[];
    /** What would settle the checks left uncertain or not assessed, once each. */
    settleBy: string[];
    /** Duties that apply but no reading can test (fitness for habitation, hazard rating), by name. */
    duties: string[];
    cautions: string[];
  };
  moisture: string[];
  recommendation: { lines: string[]; safety: string[] };
  chart: ReportChart | null;
  photos: { caption: string; jpegBase64: string; width_px: number; height_px: number }[];
}

export interface DwellingPage {
  areaId: string;
  title: string;
  facts: [string, string][];
  figures: ReportFigure[];
  rooms: string[];
  findings: string[];
  cautions: string[];
}

export interface ReportModel {
  meta: {
    title: string;
    fileName: string;
    /** The results CSV's name, beside the PDF's. */
    csvFileName: string;
    reference: string;
    revision: number;
    issueDate: string;
    versions: [string, string][];
  };
  front: {
    client: string;
    site: string;
    buildingUse: string;
    purpose: string;
    scope: string;
    roomsSeen: string[];
    method: string;
    visits: string[];
    surveyors: string[];
    weather: string[];
    occupancy: string[];
    outdoor: string;
  };
  summary: ReportSummary;
  /** Present when the survey started from an earlier one and that survey was compared. */
  sinceLastVisit: SinceLastVisitSection | null;
  ranked: { basis: string; rows: RankedRoom[] };
  rooms: RoomSheet[];
  dwellings: DwellingPage[];
  instruments: string[][];
  methods: string[][];
  criteria: { note: string; rows: string[][] };
  limitations: string[];
  cautions: string[];
  signOff: { preparedBy: string; qualifications: string; checkedBy: string; independence: string; factsAndOpinions: string };
  appendix: { readings: { room: string; rows: string[][] }[]; outdoor: string[][]; loggers: ReportChart[] };
}

/**
 * The day's weather as the surveyor recorded it; a temperature or humidity not typed in but
 * logged outdoors is added, saying it came from the outdoor logger (day-outdoor-conditions.ts).
 */
function weatherLines(doc: SurveyDocument, results: AnalysisResults): string[] {
  const w = doc.survey.weather;
  const lines: string[] = [];
  if (w.conditions) lines.push(w.conditions);
  const facts = [
    w.outdoorTemp_C !== undefined ? `outdoor ${w.outdoorTemp_C} °C` : '',
    w.outdoorRh_pct !== undefined ? `${w.outdoorRh_pct} % relative humidity` : '',
    w.wind ? `wind ${w.wind}${w.windFrom ? ` from the ${w.windFrom}` : ''}` : '',
    w.rainInPreviousDays === undefined ? '' : w.rainInPreviousDays ? 'rain in the previous days' : 'no rain in the previous days',
  ].filter(Boolean);
  if (facts.length) lines.push(`${facts.join(', ')}.`);
  const { temp_C, rh_pct } = results.dayOutdoor;
  const logged = [
    w.outdoorTemp_C === undefined && temp_C?.basis === 'outdoor-logger' ? { text: `outdoor ${numberText(displayNumber(temp_C.value, 'temperature')!)} °C`, words: temp_C.words } : null,
    w.outdoorRh_pct === undefined && rh_pct?.basis === 'outdoor-logger' ? { text: `${numberText(displayNumber(rh_pct.value, 'relativeHumidity')!)} % relative humidity`, words: rh_pct.words } : null,
  ].filter((x) => x !== null);
  if (logged.length) lines.push(`Not recorded by the surveyor; logged: ${logged.map((x) => `${x.text} (${x.words})`).join(', ')}.`);
  return lines.length ? lines : ['Not recorded.'];
}

/**
 * Build the report model (see the file note).
 * Example: buildReport(doc, results, { issueDate: '2026-01-20', appVersion: '0.1.0' }).meta.fileName
 * = 'Survey-Thornwick-Lane-Primary-School-Block-B-invented-2026-01-14.pdf'.
 */
export function buildReport(doc: SurveyDocument, results: AnalysisResults, options: ReportOptions): ReportModel {
  const survey = doc.survey;
  const judgement = options.judgement === undefined ? judgementView(results) : options.judgement;
  const ranked = rankRooms(doc, results, judgement);
  const firstVisit = survey.visits[0]?.start ?? survey.createdAt;
  const roomSheets = results.rooms.map((room) => buildRoomSheet(doc, results, room, judgement));
  const occupancy = results.rooms.map((r) => {
    const f = r.occupancy.asFound;
    return `${roomSheets.find((s) => s.roomId === r.roomId)!.place}: ${f.count} ${f.count === 1 ? 'person' : 'people'} (${f.basis === 'measured' ? 'as recorded with the readings' : 'assumed: none recorded with the readings'})`;
  });
  return {
    meta: {
      title: survey.title,
      fileName: reportFileName(survey.site || survey.title, firstVisit),
      csvFileName: reportFileName(survey.site || survey.title, firstVisit, 'csv'),
      reference: options.reference ?? `VW-${survey.id.slice(0, 8)}`,
      revision: survey.revision,
      issueDate: recordedDate(options.issueDate),
      versions: [
        ['Ventwalk', options.appVersion],
        ['Engine', results.stamps.engineVersion],
        ['Analysis', results.stamps.analysisVersion],
        ['Survey file format', String(results.stamps.formatVersion)],
        ['Criteria data', judgement ? judgement.criteriaVersion : 'not applied (judgement not available)'],
        ['Monte Carlo draws per interval', String(results.settings.draws)],
      ],
    },
    front: {
      client: survey.client || 'Not recorded',
      site: survey.site || 'Not recorded',
      buildingUse: buildingUseLabel(survey.buildingUse),
      purpose: survey.purpose || 'Not recorded',
      scope: survey.scope || 'Not recorded',
      roomsSeen: roomSheets.map((s) => s.place),
      method: NON_INTRUSIVE,
      visits: survey.visits.map((v) => (v.end ? `${recordedDate(v.start)}, ${recordedClock(v.start)} to ${recordedClock(v.end)}${recordedZone(v.start) ? ` ${recordedZone(v.start)}` : ''}` : `${recordedDateTime(v.start)} (end not recorded)`)),
      surveyors: survey.surveyors.map((s) => (s.qualifications ? `${s.name}, ${s.qualifications}` : s.name)),
      weather: weatherLines(doc, results),
      occupancy,
      outdoor: `Outdoor CO2 used: ${displayNumber(results.outdoor.value_ppm, 'co2')} ppm (±${displayNumber(results.outdoor.sd_ppm, 'co2')} ppm, one standard deviation): ${results.outdoor.source}.`,
    },
    summary: summaryOf(doc, results, ranked.rows, judgement, SCREENING_NOTE),
    sinceLastVisit: options.previousVisit ? sinceLastVisitSection(options.previousVisit) : null,
    ranked,
    rooms: roomSheets,
    dwellings: dwellingPages(doc, results, judgement),
    instruments: instrumentRows(doc),
    methods: methodRows(results),
    criteria: criteriaRows(doc, judgement),
    limitations: [...LIMITATIONS],
    cautions: [...CAUTIONS],
    signOff: {
      preparedBy: survey.surveyors.map((s) => s.name).join(', ') || 'Not recorded',
      qualifications: survey.surveyors.map((s) => s.qualifications).filter(Boolean).join('; ') || 'Not recorded',
      checkedBy: options.checkedBy ?? '',
      independence: INDEPENDENCE,
      factsAndOpinions: FACTS_AND_OPINIONS,
    },
    appendix: { ...readingRows(doc, roomSheets), loggers: loggerCharts(doc, roomSheets) },
  };
}
