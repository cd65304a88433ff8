import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { dwellingBalance } from '../../src/core/whole-dwelling-balance.ts';
import type { FanInput } from '../../src/core/airflow-inputs.ts';

const terminal = (id: string, role: 'supply' | 'extract', q: number, system: FanInput['system']): FanInput => ({
  kind: 'fan',
  id,
  role,
  system,
  running: true,
  measuredFlow_m3s: q,
});

describe('dwellingBalance (src/core/whole-dwelling-balance.ts)', () => {
  it('flags a balanced system whose supply and extract differ by more than 10 %', () => {
    // conservation of air mass (dwelling as one zone); the 10 % tolerance is our own (common practice (no published source)).
    const b = dwellingBalance([
      terminal('bed-1', 'supply', 0.012, 'whole-dwelling-balanced'),
      terminal('bed-2', 'supply', 0.018, 'whole-dwelling-balanced'),
      terminal('bath', 'extract', 0.016, 'whole-dwelling-balanced'),
      terminal('kitchen', 'extract', 0.02, 'whole-dwelling-balanced'),
    ]);
    approxEqual(b.supply.central, 0.03, { rel: 1e-12 });
    approxEqual(b.extract.central, 0.036, { rel: 1e-12 });
    approxEqual(b.mismatch, 0.006 / 0.036, { rel: 1e-9 });
    approxEqual(b.madeUpThroughEnvelope_m3s, 0.006, { rel: 1e-9 });
    expect(b.warnings.map((w) => w.code)).toEqual(['dwelling-supply-extract-unbalanced']);
  });

  it('accepts a balanced system within tolerance and ignores local fans and stopped terminals', () => {
    const b = dwellingBalance([
      terminal('bed', 'supply', 0.03, 'whole-dwelling-balanced'),
      terminal('bath', 'extract', 0.029, 'whole-dwelling-balanced'),
      terminal('hood', 'extract', 0.05, 'local'),
      { ...terminal('kitchen', 'extract', 0.02, 'whole-dwelling-balanced'), running: false },
    ]);
    expect(b.warnings).toEqual([]);
    approxEqual(b.extract.central, 0.029, { rel: 1e-12 });
  });

  it('an extract-only system is made up through the envelope, without a balance warning', () => {
    const b = dwellingBalance([terminal('bath', 'extract', 0.015, 'whole-dwelling-extract')]);
    expect(b.mismatch).toBe(1);
    approxEqual(b.madeUpThroughEnvelope_m3s, 0.015, { rel: 1e-12 });
    expect(b.warnings).toEqual([]);
    expect(dwellingBalance([]).mismatch).toBe(0);
  });
});
