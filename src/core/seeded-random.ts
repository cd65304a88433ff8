/**
 * Seeded pseudo-random numbers for Monte Carlo intervals. The engine has no randomness of its
 * own: every caller passes a seed, so the same inputs always give the same interval.
 */

/** A stream of seeded random variates. */
export interface SeededRandom {
  /** Uniform on (0, 1), never exactly 0 or 1. */
  uniform(): number;
  /** Standard normal variate (mean 0, standard deviation 1). */
  normal(): number;
  /** Student t variate with `dof` degrees of freedom (dof > 0). */
  studentT(dof: number): number;
}

/**
 * A seeded generator: Mulberry32 (T. Ettinger, 2017, public-domain 32-bit generator) for
 * uniforms, the Marsaglia polar form of the Box–Muller transform (Box & Muller 1958, Ann. Math.
 * Stat. 29:610; Marsaglia & Bray 1964, SIAM Review 6:260) for normals, and Bailey's polar
 * method (Bailey 1994, Math. Comp. 62:779) for Student t variates.
 *
 * seed: any number (its low 32 bits are used). Outputs are dimensionless.
 * Example: createSeededRandom(42).uniform() = 0.6011037519201636 (the same every run).
 */
export function createSeededRandom(seed: number): SeededRandom {
  let state = seed >>> 0;
  let spareNormal: number | null = null;

  function uniform(): number {
    state = (state + 0x6d2b79f5) >>> 0;
    let z = state;
    z = Math.imul(z ^ (z >>> 15), z | 1);
    z ^= z + Math.imul(z ^ (z >>> 7), z | 61);
    const u = ((z ^ (z >>> 14)) >>> 0) / 4294967296;
    return u === 0 ? 0.5 / 4294967296 : u;
  }

  // A point uniform in the unit disc (excluding the centre), kept in locals rather than a
  // returned tuple: Monte Carlo loops call this millions of times and must not allocate.
  let discX = 0;
  let discY = 0;
  let discW = 0;
  function drawDiscPoint(): void {
    for (;;) {
      const x = 2 * uniform() - 1;
      const y = 2 * uniform() - 1;
      const w = x * x + y * y;
      if (w > 0 && w < 1) {
        discX = x;
        discY = y;
        discW = w;
        return;
      }
    }
  }

  function normal(): number {
    if (spareNormal !== null) {
      const value = spareNormal;
      spareNormal = null;
      return value;
    }
    drawDiscPoint();
    const scale = Math.sqrt((-2 * Math.log(discW)) / discW);
    spareNormal = discY * scale;
    return discX * scale;
  }

  function studentT(dof: number): number {
    drawDiscPoint();
    return discX * Math.sqrt((dof * (Math.pow(discW, -2 / dof) - 1)) / discW);
  }

  return { uniform, normal, studentT };
}
