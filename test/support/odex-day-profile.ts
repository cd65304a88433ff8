/**
 * The reference for day profiles: the same mass balance V·dC/dt = Q·(C_out − C) + 1e6·G
 * integrated numerically by odex 2.0.4 (Hairer & Wanner's ODEX, Gragg–Bulirsch–Stoer
 * extrapolation), restarted at each change of conditions. Used by tests and benchmarks.
 */
import { createRequire } from 'node:module';
import type { DayProfile } from '../../src/core/day-profile.ts';
import { sourceRate, airChangeRate } from '../../src/core/balance.ts';

// Loaded with require: odex ships its TypeScript source, which fails our strict type check.
const { Solver } = createRequire(import.meta.url)('odex') as { Solver: new (n: number) => OdexSolver };
interface OdexSolver {
  absoluteTolerance: number;
  relativeTolerance: number;
  denseOutput: boolean;
  maxSteps: number;
  solve(
    f: (x: number, y: number[]) => number[],
    x0: number,
    y0: number[],
    xEnd: number,
    out?: (n: number, x0: number, x1: number, y: number[], dense?: (c: number, x: number) => number) => void,
  ): { y: number[] };
}

/**
 * Integrate the profile's conditions (not its exact levels: only the first start level is used)
 * and return the level at every `step_s` from the profile start, plus the end.
 */
export function odexLevels(profile: DayProfile, step_s: number, tolerance = 1e-10): { time_s: number[]; level_ppm: number[] } {
  const solver = new Solver(1);
  solver.absoluteTolerance = tolerance;
  solver.relativeTolerance = tolerance;
  solver.denseOutput = true;
  solver.maxSteps = 100000;
  const time_s: number[] = [];
  const level_ppm: number[] = [];
  const first = profile.pieces[0];
  if (!first) return { time_s, level_ppm };
  let level = first.startLevel_ppm;
  let next = first.start_s;
  for (const piece of profile.pieces) {
    const s = sourceRate(piece.conditions);
    const lambda = airChangeRate(piece.conditions);
    const out = piece.conditions.outdoor_ppm;
    const f = (_x: number, y: number[]): number[] => [s + lambda * (out - y[0]!)];
    const result = solver.solve(f, piece.start_s, [level], piece.end_s, (_n, x0, x1, _y, dense) => {
      while (next <= x1 && next >= x0 && dense) {
        time_s.push(next);
        level_ppm.push(dense(0, next));
        next += step_s;
      }
    });
    level = result.y[0]!;
  }
  const last = profile.pieces[profile.pieces.length - 1]!;
  if (time_s[time_s.length - 1] !== last.end_s) {
    time_s.push(last.end_s);
    level_ppm.push(level);
  }
  return { time_s, level_ppm };
}
