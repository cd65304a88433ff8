import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { fanFlow, fanFlowRange, RATED_FLOW_DERATING } from '../../src/core/fan-flow.ts';
import type { FanInput } from '../../src/core/airflow-inputs.ts';

const fan = (over: Partial<FanInput> = {}): FanInput => ({
  kind: 'fan',
  id: 'bathroom-fan',
  role: 'extract',
  system: 'local',
  running: true,
  ...over,
});

describe('fanFlow (src/core/fan-flow.ts)', () => {
  it('uses a measured flow when present, ±15 %', () => {
    // common practice (no published source): hood/anemometer field readings ±10–15 %.
    const item = fanFlow(fan({ measuredFlow_m3s: 0.012, ratedFlow_m3s: 0.03 }));
    approxEqual(item.flow.central, 0.012, { rel: 1e-12 });
    approxEqual(item.flow.low, 0.0102, { rel: 1e-9 });
    approxEqual(item.flow.high, 0.0138, { rel: 1e-9 });
    expect(item.warnings.map((w) => w.code)).toEqual(['extract-draws-indoor-air']);
  });

  it('derates a rated flow and flags it', () => {
    const item = fanFlow(fan({ ratedFlow_m3s: 0.015 }));
    approxEqual(item.flow.central, 0.015 * RATED_FLOW_DERATING.central, { rel: 1e-12 });
    expect(item.flow.high).toBeLessThanOrEqual(0.015);
    expect(item.warnings.map((w) => w.code)).toContain('fan-rated-flow-derated');
  });

  it('counts nothing while not running, with no figure, or when recirculating', () => {
    expect(fanFlow(fan({ running: false, measuredFlow_m3s: 0.02 })).flow.high).toBe(0);
    expect(fanFlow(fan({ running: false, measuredFlow_m3s: 0.02 })).warnings[0]?.code).toBe('fan-not-running');
    expect(fanFlow(fan()).warnings[0]?.code).toBe('fan-flow-unknown');
    const hood = fanFlow(fan({ role: 'recirculating', measuredFlow_m3s: 0.05 }));
    expect(hood.flow.high).toBe(0);
    expect(hood.countsAsOutdoorAir).toBe(false);
  });

  it('a supply terminal is mechanical supply without the indoor-air note', () => {
    const item = fanFlow(fan({ role: 'supply', system: 'whole-dwelling-balanced', measuredFlow_m3s: 0.01 }));
    expect(item.mechanism).toBe('mechanical-supply');
    expect(item.warnings).toEqual([]);
  });

  it('fanFlowRange keeps low ≤ central ≤ high', () => {
    const { flow } = fanFlowRange(fan({ ratedFlow_m3s: 0.02 }));
    expect(flow.low).toBeLessThanOrEqual(flow.central);
    expect(flow.central).toBeLessThanOrEqual(flow.high);
  });
});
