/**
 * The report's front page with an outdoor logger on the survey (src/report/report-model.ts): the
 * outdoor CO2 line names the logger, and a temperature and humidity the surveyor did not type in
 * are added from the logger, saying so, while typed ones are kept. The demo school and an
 * invented roof logger (test/support/outdoor-logger-series.ts); expectations our own construction.
 */
import { describe, expect, it } from 'vitest';
import { analyseSurvey } from '../../src/analysis/analyse-survey.ts';
import { surveyDocumentSchema, type SurveyDocument } from '../../src/model/survey-document.ts';
import { buildReport } from '../../src/report/report-model.ts';
import { demoFile } from '../support/fixtures.ts';
import { roofLogger, withLogger } from '../support/outdoor-logger-series.ts';

const OPTIONS = { issueDate: '2026-01-22', appVersion: '0.1.0' };
const school = (): SurveyDocument => surveyDocumentSchema.parse(demoFile().surveys[0]);
const report = (doc: SurveyDocument) => buildReport(doc, analyseSurvey(doc, { draws: 50 }), OPTIONS);

describe('the report front with an outdoor logger', () => {
  it('says the outdoor CO2 came from the logger, with its uncertainty', () => {
    const front = report(withLogger(school(), roofLogger())).front;
    expect(front.outdoor).toMatch(/^Outdoor CO2 used: 4[23]0 ppm \(±\d+ ppm, one standard deviation\): outdoor logger “roof-logger\.csv”: median of \d+ points/);
  });

  it('words spot readings as before, without the logger', () => {
    expect(report(school()).front.outdoor).toMatch(/^Outdoor CO2 used: 4\d0 ppm \(±\d+ ppm, one standard deviation\): 2 outdoor readings on another meter\.$/);
  });

  it('adds the logged temperature and humidity only where none was typed', () => {
    const typed = report(withLogger(school(), roofLogger())).front.weather;
    expect(typed.join(' ')).not.toContain('logged');
    const bare = school();
    const untyped = { ...bare, survey: { ...bare.survey, outdoorReadings: [], weather: { ...bare.survey.weather, outdoorTemp_C: undefined, outdoorRh_pct: undefined } } };
    const weather = report(withLogger(untyped, roofLogger())).front.weather;
    expect(weather.at(-1)).toMatch(/^Not recorded by the surveyor; logged: outdoor −3 °C \(median of the outdoor logger “roof-logger\.csv” from \d\d:\d\d to \d\d:\d\d\), 91 % relative humidity \(median of the outdoor logger “roof-logger\.csv” from/);
  });
});
