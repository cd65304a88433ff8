import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import {
  AIR_PERMEABILITY_BY_AGE,
  assumedAirPermeability,
  sapNoTestInfiltration,
} from '../../src/core/assumed-air-permeability.ts';

describe('assumed air permeability (src/core/assumed-air-permeability.ts)', () => {
  it("SAP's no-test estimate adds its construction items", () => {
    // SAP worksheet box (18) without a pressure test (references.md §4.2; items from memory).
    // derived (our computation): 0.1 + 0.35 + 0.2 + 0.05 + 0.25 = 0.95 ach.
    approxEqual(
      sapNoTestInfiltration({ structure: 'masonry', floor: 'suspended-timber-unsealed', draughtLobby: false, draughtProofedPercent: 0, storeys: 2 }),
      0.95,
      { rel: 1e-12 },
    );
    // 0 + 0.25 + 0 + 0 + 0.05 = 0.30 ach.
    approxEqual(
      sapNoTestInfiltration({ structure: 'timber-or-steel-frame', floor: 'solid-or-other', draughtLobby: true, draughtProofedPercent: 100, storeys: 1 }),
      0.3,
      { rel: 1e-12 },
    );
  });

  it('turns the no-test rate into q50 by SAP’s q50/20 = ach reading, and says it is assumed', () => {
    const r = assumedAirPermeability({
      by: 'construction',
      structure: 'masonry',
      floor: 'solid-or-other',
      draughtLobby: false,
      draughtProofedPercent: 50,
      storeys: 2,
    });
    approxEqual(r.q50_m3hm2, 20 * (0.1 + 0.35 + 0.05 + 0.15), { rel: 1e-12 });
    expect(r.method).toMatch(/assumed/);
  });

  it('age defaults fall with newer construction (from memory; our screening values)', () => {
    const values = Object.values(AIR_PERMEABILITY_BY_AGE);
    for (let i = 1; i < values.length; i++) expect(values[i]!).toBeLessThanOrEqual(values[i - 1]!);
    expect(assumedAirPermeability({ by: 'age', ageBand: '1945-1964' }).q50_m3hm2).toBe(13);
  });
});
