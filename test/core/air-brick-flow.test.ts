import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { airBrickFlow } from '../../src/core/air-brick-flow.ts';
import type { AirBrickPurpose } from '../../src/core/airflow-inputs.ts';
import { exampleAirBrick } from '../support/airflow-examples.ts';

describe('airBrickFlow (src/core/air-brick-flow.ts)', () => {
  it('counts an air brick that ventilates the room, by the orifice equation', () => {
    const item = airBrickFlow(exampleAirBrick(), 1);
    expect(item.flow.central).toBeGreaterThan(0);
    expect(item.countsAsOutdoorAir).toBe(true);
    expect(item.warnings.map((w) => w.code)).toContain('free-area-label');
  });

  it('never counts sub-floor or combustion-air bricks, and explains (practice.md §1 item 10)', () => {
    // practice.md §1 item 10 (common practice (no published source)): never count, never close combustion-air vents.
    const sub = airBrickFlow(exampleAirBrick({ purpose: 'sub-floor' }), 4);
    expect(sub.flow).toEqual({ low: 0, central: 0, high: 0 });
    expect(sub.countsAsOutdoorAir).toBe(false);
    expect(sub.warnings[0]?.code).toBe('air-brick-sub-floor');
    const comb = airBrickFlow(exampleAirBrick({ purpose: 'combustion-air' }), 4);
    expect(comb.flow.high).toBe(0);
    expect(comb.warnings[0]?.code).toBe('air-brick-combustion-air');
    expect(comb.warnings[0]?.message).toMatch(/never be closed/);
  });

  it('does not count a brick whose purpose is unknown, or a blocked one', () => {
    expect(airBrickFlow(exampleAirBrick({ purpose: 'unknown' }), 4).flow.high).toBe(0);
    expect(airBrickFlow(exampleAirBrick({ condition: 'blocked' }), 4).flow.high).toBe(0);
  });

  it('property: sub-floor and combustion-air bricks never add supply', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<AirBrickPurpose>('sub-floor', 'combustion-air'),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        (purpose, area, dp) => {
          const item = airBrickFlow(exampleAirBrick({ purpose, labelArea_m2: area, areaBasis: 'equivalent' }), dp);
          expect(item.flow.high).toBe(0);
          expect(item.countsAsOutdoorAir).toBe(false);
        },
      ),
    );
  });
});
