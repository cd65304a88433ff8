import { analyseSurvey } from './src/analysis/analyse-survey.ts';
import { buildReport } from './src/report/report-model.ts';
import { readFileSync } from 'node:fs';
const f = JSON.parse(readFileSync('test/fixtures/demo-survey.json','utf8'));
const d = f.surveys[Number(process.argv[2] ?? 0)];
const m = buildReport(d, analyseSurvey(d, {draws: 200}), { issueDate: '2026-01-20', appVersion: '0.1.0' });
console.log(JSON.stringify({...m, rooms: m.rooms.map(r => ({...r, chart: r.chart ? {...r.chart, series: r.chart.series.length} : null}))}, null, 1));
