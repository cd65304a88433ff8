/**
 * Engine III's own cost on 5,000 rooms (the demo surveys copied): criteria checks, moisture and
 * mould, safety, fix sizing by the engine's cheap predictions (no Monte Carlo), priority and
 * ranking — timed apart from stage one (the figures, with their Monte Carlo intervals), which
 * analysis.bench.ts times in full. Stage one here runs at 50 draws; the judgement does not
 * depend on the number of draws.
 */
import type { BenchContext } from '../bench-context.ts';
import { judgeSurvey, surveyFigures } from '../../../src/analysis/analyse-survey.ts';
import { demoCopies } from './demo-copies.ts';

export default async function judgementBench(ctx: BenchContext): Promise<void> {
  const surveys = demoCopies(5000);
  const rooms = surveys.reduce((s, d) => s + d.rooms.length, 0);
  judgeSurvey(surveyFigures(surveys[0]!, { draws: 50 })); // warm-up
  let figuresS = 0;
  let judgeS = 0;
  let options = 0;
  for (const doc of surveys) {
    const t0 = performance.now();
    const figures = surveyFigures(doc, { draws: 50 });
    const t1 = performance.now();
    const results = judgeSurvey(figures);
    const t2 = performance.now();
    figuresS += (t1 - t0) / 1000;
    judgeS += (t2 - t1) / 1000;
    options += results.rooms.reduce((s, r) => s + (r.judgement.fixes?.options.length ?? 0), 0);
  }
  ctx.report(`judgement of ${rooms} rooms (criteria, moisture, safety, fixes, priority, ranking)`, {
    rooms,
    fix_options: options,
    judgement_s: judgeS,
    judgement_ms_per_room: (judgeS * 1000) / rooms,
    figures_at_50_draws_s: figuresS,
    total_s: figuresS + judgeS,
    target_s: 3,
  });
}
