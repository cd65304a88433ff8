/**
 * One room's sheet: observation (what was found) → measurement (what was read and what it
 * gives) → interpretation (the headline figures, scenarios, day profile, agreement with the
 * prediction, checks) → recommendation, with moisture findings, a chart and photos. Every
 * figure is the analysis's, rounded by report-figure.ts and labelled with its basis.
 *
 * Example: for the demo's Classroom B1 the measurement rows hold the build-up and the decay of
 * the day, and the headline supply is labelled 'measured'.
 */
import type { AnalysisResults, MeasuredEstimate, RoomResults, ScenarioId } from '../analysis/results.ts';
import { roomUseLabel, type RoomUse } from '../core/room-uses.ts';
import { displayQuantity } from '../core/units.ts';
import type { DocumentRoom, SurveyDocument } from '../model/survey-document.ts';
import { periodWords, statusWords } from './criterion-words.ts';
import type { ReportCheckView, ReportJudgementView } from './judgement-view.ts';
import { BASIS_WORDS, boundsFigure, displayNumber, numberText, rangeText, reportFigure, type ReportFigure } from './report-figure.ts';
import type { ReportChart, RoomSheet } from './report-model.ts';
import { clockSeconds, recordedClock, recordedDate } from './recorded-time.ts';
import { checkWords, defectWords, openingWords, scheduleWords } from './record-words.ts';
import { checkValueText, PRIORITY_WORDS } from './room-ranking.ts';
import { METHOD_WORDS } from './method-words.ts';
import { roomPlace } from './room-place.ts';
import { applianceWords, roomSafetyLines } from './safety-observations.ts';

/** At most this many cautions on a sheet (the rest are counted), so a sheet stays within two pages. */
export const CAUTIONS_SHOWN = 6;

const SET_WORDS: Record<MeasuredEstimate['setKind'], string> = {
  decay: 'Decay test',
  'seeded-decay': 'Seeded decay test',
  'build-up': 'Build-up while occupied',
  steady: 'Near-steady occupied level',
  spot: 'Single reading',
};

const SCENARIO_WORDS: Record<ScenarioId, string> = {
  'as-found': 'As found',
  closed: 'Everything closed',
  'vents-open': 'Vents open',
  'windows-open': 'Windows open',
  'design-occupancy': 'Full design occupancy',
};

const OUTCOME_WORDS = {
  agree: 'agrees with',
  'measured-above': 'is above',
  'measured-below': 'is below',
  'not-compared': 'was not compared with',
} as const;

function measuredBasis(m: MeasuredEstimate): string {
  return m.kind === 'upper-bound' ? 'measured (an upper bound)' : m.kind === 'range' ? 'measured (bounds only)' : 'measured';
}

function shownFact(si: number, kind: Parameters<typeof displayQuantity>[1]): string {
  const d = displayQuantity(si, kind);
  return `${numberText(d.value)} ${d.unit}`;
}

function measurementRows(room: RoomResults): RoomSheet['measurement']['rows'] {
  return room.measured
    .filter((m) => m.kind !== 'none')
    .map((m) => {
      const basis = { basis: 'measured' as const, method: m.method };
      return {
        label: `${SET_WORDS[m.setKind]}${m.setId === room.bestMeasuredSetId ? ' (used)' : ''}`,
        time: m.from && m.to ? `${recordedClock(m.from)}–${recordedClock(m.to)}` : '—',
        method: `${METHOD_WORDS[m.method].name} (${m.readingsUsed} readings${m.readingsExcluded ? `, ${m.readingsExcluded} left out` : ''})`,
        basis: measuredBasis(m),
        supply: reportFigure('Outdoor air', { ...m.supply_m3s, ...basis }, 'flow'),
        airChanges: reportFigure('Air changes', { ...m.airChangeRate_perSecond, ...basis }, 'airChanges'),
        perPerson: m.occupants ? reportFigure('Per person', { ...m.supplyPerPerson_m3s, ...basis }, 'flowPerPerson') : null,
        steady: m.occupants ? reportFigure('Steady CO2', { ...m.steadyLevel_ppm, ...basis }, 'co2') : null,
      };
    });
}

function headlineFigures(room: RoomResults): ReportFigure[] {
  const h = room.headline;
  const out = [reportFigure('Outdoor air', h.supply_m3s, 'flow'), reportFigure('Air changes', h.airChangeRate_perSecond, 'airChanges')];
  if (h.supplyPerPerson_m3s) out.push(reportFigure('Outdoor air per person', h.supplyPerPerson_m3s, 'flowPerPerson'));
  if (h.steadyLevel_ppm) out.push(reportFigure('CO2 the room settles at in use', h.steadyLevel_ppm, 'co2'));
  return out;
}

function profileLines(room: RoomResults, results: AnalysisResults): string[] {
  const scenario = room.scenarios.find((s) => s.id === 'as-found');
  const p = scenario?.profile;
  if (!scenario || !p) return ['No day profile: nobody is recorded as using the room, or it has no schedule.'];
  const basis = scenario.cases.find((c) => c.weatherId === p.weatherId)?.supply_m3s.basis ?? 'predicted';
  const ends = '(from the favourable to the unfavourable end of the supply range)';
  const lines = [
    `Schedule: ${p.schedule}. As found, ${results.weatherCases.find((w) => w.id === p.weatherId)?.label ?? p.weatherId}; ${BASIS_WORDS[basis]}.`,
    `Mean CO2 while occupied: ${boundsFigure('', p.occupiedMean_ppm, 'co2', basis).text.replace(/, [a-z ]+$/, '')} ${ends}.`,
    `Peak CO2: ${boundsFigure('', p.peak_ppm, 'co2', basis).text.replace(/, [a-z ]+$/, '')}; highest ${Math.round(p.window_s / 60)}-minute mean: ${boundsFigure('', p.highestRollingMean_ppm, 'co2', basis).text.replace(/, [a-z ]+$/, '')}.`,
  ];
  for (const a of p.above) {
    const mins = (s: number | null) => (s === null ? null : Math.round(s / 60));
    lines.push(
      `Time above ${numberText(a.threshold_ppm)} ppm: ${rangeText(null, mins(a.time_s.low), mins(a.time_s.high), 'minutes')}; longest run ${rangeText(null, mins(a.longestRun_s.low), mins(a.longestRun_s.high), 'minutes')}.`,
    );
  }
  return lines;
}

/**
 * The room's day: the predicted as-found day at the two ends of the supply (when the room has a
 * schedule and people) with the periods in use shaded, and the CO2 readings. Without a predicted
 * day, a chart of one or two readings says nothing a table row does not: the page is left to the
 * findings.
 */
function dayChart(doc: SurveyDocument, room: DocumentRoom, results: AnalysisResults, result: RoomResults): ReportChart | null {
  const readings = room.readings.filter((r) => r.co2_ppm !== undefined).sort((a, b) => Date.parse(a.time) - Date.parse(b.time));
  const asFound = result.scenarios.find((s) => s.id === 'as-found')?.profile ?? null;
  const curve = asFound?.curve ?? null;
  if (!curve && readings.length < 3) return null;
  const day = readings[0]?.time.slice(0, 10) ?? '';
  const times = readings.map((r) => clockSeconds(r.time, day));
  const values = readings.map((r) => r.co2_ppm!);
  const limits = results.settings.thresholds_ppm.map((t) => ({ value: t, label: `${numberText(t)} ppm` }));
  const series: ReportChart['series'] = [];
  let captionStart: string;
  let periods: ReportChart['periods'];
  let timeRange_s: [number, number];
  if (curve) {
    series.push(
      { id: 'low-supply', label: 'predicted, low end of the supply', times_s: curve.time_s, values: curve.unfavourable_ppm, style: 'line' },
      { id: 'high-supply', label: 'predicted, high end of the supply', times_s: curve.time_s, values: curve.favourable_ppm, style: 'line' },
    );
    periods = curve.inUse.map((p) => ({ from_s: p.from_s, to_s: p.to_s, label: p.label || 'in use' }));
    const weather = results.weatherCases.find((w) => w.id === asFound!.weatherId)?.label;
    const peak = (levels: number[]) => numberText(displayNumber(Math.max(...levels), 'co2') ?? 0);
    captionStart = `CO2 over the day as predicted from ${asFound!.schedule}${weather ? ` (${weather})` : ''}, a screening estimate: solid line at the low end of the supply (highest ${peak(curve.unfavourable_ppm)} ppm), dotted at the high end (highest ${peak(curve.favourable_ppm)} ppm); shaded: in use`;
    const all = [...curve.time_s, ...times];
    timeRange_s = [Math.min(...all), Math.max(...all)];
  } else {
    const steady = result.headline.steadyLevel_ppm;
    const steadyValue = displayNumber(steady?.value ?? null, 'co2');
    if (steadyValue !== null) limits.push({ value: steadyValue, label: `settles at about ${numberText(steadyValue)} ppm (${BASIS_WORDS[steady!.basis]})` });
    const t0 = Math.min(...times);
    const t1 = Math.max(...times);
    const pad = Math.max(1800, (t1 - t0) * 0.05);
    timeRange_s = [t0 - pad, t1 + pad];
    periods = room.schedule.periods
      .filter((p) => p.presence === 'full' || p.presence === 'half')
      .map((p) => {
        const [sh, sm] = p.start.split(':').map(Number);
        const [eh, em] = p.end.split(':').map(Number);
        const from = sh! * 3600 + sm! * 60;
        let to = eh! * 3600 + em! * 60;
        if (to <= from) to += 86_400;
        return { from_s: from, to_s: to, label: p.label || `in use (${p.presence})` };
      })
      .filter((p) => p.to_s > timeRange_s[0] && p.from_s < timeRange_s[1]);
    captionStart = `${readings.length} CO2 readings from ${recordedClock(readings[0]!.time)} to ${recordedClock(readings.at(-1)!.time)}${periods.length ? '; shaded: the room’s scheduled use' : ''}`;
  }
  if (readings.length > 0) {
    series.push({ id: 'readings', label: 'CO2 read in the room', times_s: times, values, style: !curve && readings.length > 12 ? 'line' : 'points' });
  }
  const readWords = curve
    ? readings.length > 0
      ? `; ${readings.length} CO2 reading${readings.length === 1 ? '' : 's'} from ${recordedClock(readings[0]!.time)} to ${recordedClock(readings.at(-1)!.time)} as points`
      : '; no CO2 readings taken'
    : '';
  return {
    title: curve ? `The day in this room: CO2 predicted${readings.length > 0 ? ` and read on ${recordedDate(day)}` : ''}` : `CO2 readings on ${recordedDate(day)}`,
    yLabel: 'CO2 (ppm)',
    series,
    limits,
    periods,
    timeRange_s,
    yInclude: [results.outdoor.value_ppm],
    caption: `${captionStart}${readWords}; dashed lines at ${limits.map((l) => l.label).join(', ')}.`,
  };
}

function moistureLines(room: DocumentRoom, judged: string[] | undefined): string[] {
  const lines = room.defects.filter((d) => d.kind === 'mould' || d.kind === 'condensation' || d.kind === 'leak').map((d) => `Seen: ${defectWords(d).replace(/\.$/, '')}.`);
  const rh = room.readings.filter((r) => r.rh_pct !== undefined);
  if (rh.length) {
    const highest = rh.reduce((a, b) => (b.rh_pct! > a.rh_pct! ? b : a));
    lines.push(
      `Relative humidity read: ${rh.length} reading${rh.length === 1 ? '' : 's'}, highest ${shownFact(highest.rh_pct!, 'relativeHumidity')} at ${recordedClock(highest.time)}${highest.temp_C !== undefined ? ` (${shownFact(highest.temp_C, 'temperature')})` : ''}, measured.`,
    );
  }
  for (const r of room.readings) {
    if (r.surfaceTemp_C !== undefined) lines.push(`Surface temperature ${shownFact(r.surfaceTemp_C, 'temperature')} at ${recordedClock(r.time)}${r.note ? ` (${r.note})` : ''}, measured.`);
  }
  if (judged) lines.push(...judged);
  else lines.push('Condensation and mould risk were not assessed in this report (judgement not available). Spot humidity readings alone cannot establish mould risk.');
  return lines;
}

/** Build one room's sheet. */
const OUTCOME_WORDS_CHECK: Record<ReportCheckView['outcome'], string> = {
  meets: 'meets it',
  short: 'does not meet it',
  uncertain: 'uncertain',
  'not-assessed': 'not assessed',
};

export function buildRoomSheet(doc: SurveyDocument, results: AnalysisResults, room: RoomResults, judgement: ReportJudgementView | null): RoomSheet {
  const record = doc.rooms.find((r) => r.id === room.roomId)!;
  const j = judgement?.rooms.get(room.roomId);
  const asFound = room.occupancy.asFound;
  const groups = asFound.groups.map((g) => `${g.count} ${g.label || g.ageBand}`).join(', ');
  const rows = measurementRows(room);
  const best = room.measured.find((m) => m.setId === room.bestMeasuredSetId);
  const outdoor = best?.outdoor ?? { ...results.outdoor, sameMeterAsRoom: false };
  // Disagreements with the prediction are already stated under measured-against-predicted.
  const cautions = [...new Set(room.warnings.filter((w) => w.severity !== 'info' && w.code !== 'disagrees-with-prediction').map((w) => (w.severity === 'error' ? `Not used: ${w.message}` : w.message)))];
  const shownCautions = cautions.length > CAUTIONS_SHOWN ? [...cautions.slice(0, CAUTIONS_SHOWN), `and ${cautions.length - CAUTIONS_SHOWN} more in the analysis results.`] : cautions;
  const safety = roomSafetyLines(record, judgement ? (j?.safety ?? []) : null).map((l) => l.text);
  const weatherLabel = (id: string) => results.weatherCases.find((w) => w.id === id)?.label ?? id;
  return {
    roomId: room.roomId,
    title: record.clientRef ? `${record.name} (${record.clientRef})` : record.name,
    place: roomPlace(doc, record),
    use: roomUseLabel(room.use as RoomUse),
    priorityText: PRIORITY_WORDS[j?.priority ?? 'not-judged'],
    observation: {
      facts: [
        ['Use', roomUseLabel(room.use as RoomUse)],
        ['Size', `${shownFact(room.floorArea_m2, 'area')} floor, ${shownFact(room.ceilingHeight_m, 'length')} high, ${shownFact(room.volume_m3, 'volume')}`],
        ['People as found', `${asFound.count}${groups ? ` (${groups})` : ''}, ${BASIS_WORDS[asFound.basis]}`],
        ['People at full use', `${room.occupancy.design.count}, ${BASIS_WORDS[room.occupancy.design.basis]}`],
        ['Schedule', scheduleWords(record.schedule, room.scenarios.find((s) => s.id === 'as-found')?.profile?.schedule)],
        ['Room temperature', reportFigure('', room.roomTemp_C, 'temperature').text],
      ],
      openings: record.openings.map(openingWords),
      defects: record.defects.map(defectWords),
      appliances: record.appliances.map(
        (a) =>
          `${applianceWords(a)}: combustion-air vent ${checkWords(a.combustionAirVentPresent)}${a.combustionAirVentPresent === 'yes' ? ` (clear: ${checkWords(a.combustionAirVentClear)})` : ''}; CO alarm ${checkWords(a.coAlarmPresent)}${a.coAlarmPresent === 'yes' ? ` (tested: ${checkWords(a.coAlarmTested)})` : ''}; gas safety record seen: ${checkWords(a.gasSafetyRecordSeen)}`,
      ),
      interview: record.interview.map((i) => `${i.topic}: ${i.answer}`),
      notes: record.notes,
    },
    measurement: {
      rows,
      outdoor: `Outdoor CO2 taken as ${displayNumber(outdoor.value_ppm, 'co2')} ppm (${outdoor.source}${outdoor.sameMeterAsRoom ? ', read on the same meter' : ''}).`,
      none: rows.length === 0 ? (room.suggestion ? `No usable measurement of this room's supply. ${room.suggestion}` : 'No usable measurement of this room’s supply.') : null,
    },
    interpretation: {
      headline: headlineFigures(room),
      headlineSource: room.headline.measuredSetId
        ? 'From the measurement marked “used” above, for the room as found.'
        : `Predicted from the openings, fans and leakage for the room as found, under the weather case that gives the least air: ${weatherLabel(room.headline.weatherId ?? '')}.`,
      scenarios: room.scenarios.map((s) => {
        const c = s.cases.find((x) => x.weatherId === s.worstWeatherId)!;
        return {
          label: SCENARIO_WORDS[s.id],
          weather: weatherLabel(c.weatherId).replace(/ \(.*\)$/, ''),
          supply: reportFigure('Outdoor air', c.supply_m3s, 'flow'),
          perPerson: c.supplyPerPerson_m3s ? reportFigure('Per person', c.supplyPerPerson_m3s, 'flowPerPerson') : null,
          steady: c.steadyLevel_ppm ? reportFigure('Steady CO2', c.steadyLevel_ppm, 'co2') : null,
        };
      }),
      profile: profileLines(room, results),
      reconciliation: room.reconciliation
        .filter((r) => r.outcome !== 'not-compared')
        .map((r) => `The ${METHOD_WORDS[r.method].name.toLowerCase()} measurement ${OUTCOME_WORDS[r.outcome]} the prediction for its recorded state (${r.predictedUnder}). ${r.explanation}`),
      checks: (j?.checks ?? []).filter((c) => c.metric !== 'qualitative-duty').map((c) => ({
        // The source and any "not yet confirmed" caveat are in the criteria table; * marks a caveat.
        criterion: `${c.title}${c.caveat ? ' *' : ''}`,
        status: `${statusWords(c.status)} (${c.role})`,
        period: periodWords(c.period),
        value: checkValueText(c, 'value'),
        limit: checkValueText(c, 'limit'),
        finding: OUTCOME_WORDS_CHECK[c.outcome],
      })),
      settleBy: [...new Set((j?.checks ?? []).flatMap((c) => ((c.outcome === 'uncertain' || c.outcome === 'not-assessed') && c.settleBy ? [c.settleBy] : [])))],
      duties: (j?.checks ?? []).filter((c) => c.metric === 'qualitative-duty').map((c) => `${c.title} (${statusWords(c.status)})`),
      cautions: shownCautions,
    },
    moisture: moistureLines(record, j?.moisture),
    recommendation: {
      lines: j
        ? j.fixes.map((f) => `${f.title}${f.extraSupply_m3s !== null ? `: about ${displayNumber(f.extraSupply_m3s, 'flow')} L/s more outdoor air` : ''}${f.items.length ? `. ${f.items.join('; ')}` : ''}.`)
        : [
            'No fix is sized in this report: fixes come from the criteria judgement, which was not available.',
            ...(room.suggestion ? [`To settle this room’s figures: ${room.suggestion}`] : []),
          ],
      safety: [...new Set([...safety, ...(j?.fixes.flatMap((f) => f.safetyNotes) ?? [])])],
    },
    chart: dayChart(doc, record, results, room),
    photos: doc.photos
      .filter((p) => p.roomId === room.roomId && p.jpegBase64.length > 0)
      .map((p) => ({ caption: `${p.caption || 'Photo'} (${recordedDate(p.takenAt)}, ${recordedClock(p.takenAt)})`, jpegBase64: p.jpegBase64, width_px: p.width_px, height_px: p.height_px })),
  };
}
