/**
 * The appendix: every reading with its time and the conditions recorded with it, the outdoor
 * readings, and each logger's record as a chart with its accepted periods shaded.
 *
 * Times are printed as recorded (recorded-time.ts); a logger's times, kept in ms since 1970 UTC,
 * are shown on its own clock (its IANA time zone).
 *
 * Example: readingRows(demoFlats, sheets).readings[0].rows[0][0] = '09:42'.
 */
import type { ChartPeriod } from '../chart/time-chart.ts';
import type { DocumentRoom, SurveyDocument } from '../model/survey-document.ts';
import { numberText } from './report-figure.ts';
import type { ReportChart, RoomSheet } from './report-model.ts';
import { recordedClock, recordedDate } from './recorded-time.ts';

/** A recorded value as typed: binary noise from arithmetic (20.700000000000003) is dropped, nothing else. */
function value(x: number | undefined, unit: string): string {
  return x === undefined ? '—' : `${numberText(Number(x.toPrecision(12)))}${unit}`;
}

function conditionsWords(room: DocumentRoom, r: DocumentRoom['readings'][number]): string {
  const c = r.conditions;
  const people = c.people.reduce((s, p) => s + p.count, 0);
  const parts = [
    `${people} ${people === 1 ? 'person' : 'people'}`,
    `windows ${c.windows.replace('-', ' ')}`,
    `doors ${c.doors}`,
    `fans ${c.fans}`,
    `heating ${c.heating}`,
  ];
  if (c.combustion) parts.push('something burning');
  if (c.openOpeningIds?.length) parts.push(`${c.openOpeningIds.length} of ${room.openings.length} openings open`);
  return parts.join(', ');
}

/** Reading tables: one per room with readings, and the outdoor readings. */
export function readingRows(doc: SurveyDocument, sheets: readonly RoomSheet[]): { readings: { room: string; rows: string[][] }[]; outdoor: string[][] } {
  const instrument = (id: string | undefined) => doc.instruments.find((i) => i.id === id)?.model ?? '—';
  const readings = doc.rooms
    .filter((room) => room.readings.length > 0)
    .map((room) => ({
      room: sheets.find((s) => s.roomId === room.id)?.place ?? room.name,
      rows: [...room.readings]
        .sort((a, b) => Date.parse(a.time) - Date.parse(b.time) || (a.id < b.id ? -1 : 1))
        .map((r) => [
          `${recordedDate(r.time)} ${recordedClock(r.time)}`,
          value(r.co2_ppm, ' ppm'),
          value(r.temp_C, ' °C'),
          value(r.rh_pct, ' %'),
          value(r.surfaceTemp_C, ' °C'),
          conditionsWords(room, r),
          `${instrument(r.instrumentId)}${r.note ? `; ${r.note}` : ''}`,
        ]),
    }));
  const outdoor = [...doc.survey.outdoorReadings]
    .sort((a, b) => Date.parse(a.time) - Date.parse(b.time))
    .map((r) => [`${recordedDate(r.time)} ${recordedClock(r.time)}`, r.moment, value(r.co2_ppm, ' ppm'), value(r.temp_C, ' °C'), value(r.rh_pct, ' %'), r.location || '—', instrument(r.instrumentId)]);
  return { readings, outdoor };
}

/** Seconds since midnight of the first day, on the logger's own clock. */
function loggerClock(timeZone: string): (ms: number) => number {
  const format = new Intl.DateTimeFormat('en-GB', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', second: '2-digit', hourCycle: 'h23' });
  return (ms: number) => {
    const p = Object.fromEntries(format.formatToParts(new Date(ms)).map((x) => [x.type, x.value]));
    return Date.UTC(Number(p.year), Number(p.month) - 1, Number(p.day), Number(p.hour), Number(p.minute), Number(p.second)) / 1000;
  };
}

const PERIOD_WORDS: Record<string, string> = { decay: 'decay', 'build-up': 'build-up', steady: 'steady', excluded: 'left out' };

/** Each logger's CO2 record as a chart, its accepted periods shaded and named. */
export function loggerCharts(doc: SurveyDocument, sheets: readonly RoomSheet[]): ReportChart[] {
  return doc.series
    .filter((s) => s.co2_ppm && s.co2_ppm.length > 0)
    .map((s) => {
      const local = loggerClock(s.timeZone);
      const first = local(s.times_ms[0]!);
      const midnight = Math.floor(first / 86_400) * 86_400;
      const t = (ms: number) => local(ms) - midnight;
      const periods: ChartPeriod[] = s.periods.map((p) => ({ from_s: t(p.start_ms), to_s: t(p.end_ms), label: PERIOD_WORDS[p.kind] ?? p.kind }));
      const room = sheets.find((r) => r.roomId === s.roomId)?.place ?? 'outdoors';
      const day = new Date(midnight * 1000).toISOString().slice(0, 10);
      return {
        title: `Logger ${s.sourceFile}: ${room}`,
        yLabel: 'CO2 (ppm)',
        series: [{ id: s.id, label: 'CO2 logged', times_s: s.times_ms.map(t), values: s.co2_ppm! }],
        limits: [],
        periods,
        yInclude: [],
        caption: `${s.times_ms.length} points from ${recordedDate(day)}, on the logger's clock (${s.timeZone}); shaded: the periods accepted for analysis (${s.periods.map((p) => `${PERIOD_WORDS[p.kind] ?? p.kind}${p.note ? `: ${p.note}` : ''}`).join('; ') || 'none'}).`,
      };
    });
}
