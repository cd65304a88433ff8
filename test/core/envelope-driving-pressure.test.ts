import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { envelopeDrivingPressure, FACADE_PRESSURE_COEFFICIENT } from '../../src/core/envelope-driving-pressure.ts';
import { COLD_CALM, MILD_CALM } from '../../src/core/weather-cases.ts';

describe('envelopeDrivingPressure (src/core/envelope-driving-pressure.ts)', () => {
  it('stack is ρ·g·h·Δθ/T̄ over half the ceiling height; wind is ½ρU²ΔC_p', () => {
    // derived (our computation from hydrostatics and dynamic pressure, the basis of the BS 5925 forms):
    // 1.2·9.81·1.2·20/283.15 = 0.9978 Pa; ½·1.2·0.5²·0.3 = 0.045 Pa.
    const p = envelopeDrivingPressure(COLD_CALM, 0.5, 2.4);
    approxEqual(p.stack_Pa, 0.9978, { abs: 5e-5 });
    approxEqual(p.wind_Pa, 0.5 * 1.2 * 0.25 * FACADE_PRESSURE_COEFFICIENT, { rel: 1e-12 });
    approxEqual(p.total_Pa, p.stack_Pa + p.wind_Pa, { rel: 1e-12 });
  });

  it('cold weather drives about 1 Pa across a room-height envelope, the pressure vents are rated at', () => {
    // Equivalent area is defined at 1 Pa (references.md §3.1 [M]); common practice (no published source) that
    // winter stack across a storey is of that order.
    expect(envelopeDrivingPressure(COLD_CALM, 0, 2.4).total_Pa).toBeGreaterThan(0.5);
    expect(envelopeDrivingPressure(COLD_CALM, 0, 2.4).total_Pa).toBeLessThan(2);
    expect(envelopeDrivingPressure(MILD_CALM, 0, 2.4).total_Pa).toBeLessThan(envelopeDrivingPressure(COLD_CALM, 0, 2.4).total_Pa);
  });
});
