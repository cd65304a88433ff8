/**
 * Tests of src/analysis/reconcile.ts: one test per reason a measurement and its prediction
 * disagree, chosen from what was recorded; agreement when the intervals overlap; and the demo's
 * Classroom B1 end to end. Flows are invented plumbing values (m³/s), not evidence for a formula.
 */
import { describe, expect, it } from 'vitest';
import { analyseSurvey } from '../../src/analysis/analyse-survey.ts';
import { reconcile, type ReconcileInputs } from '../../src/analysis/reconcile.ts';
import type { MeasuredEstimate } from '../../src/analysis/results.ts';
import type { RoomState } from '../../src/analysis/room-state.ts';
import type { SurveyDocument } from '../../src/model/survey-document.ts';
import { demoFile } from '../support/fixtures.ts';

function measured(value: number, low: number, high: number): MeasuredEstimate {
  return {
    setId: 'test-1',
    source: 'test',
    setKind: 'decay',
    method: 'decay-log-linear',
    kind: 'estimate',
    supply_m3s: { value, low, high },
    airChangeRate_perSecond: { value: null, low: null, high: null },
    supplyPerPerson_m3s: { value: null, low: null, high: null },
    steadyLevel_ppm: { value: null, low: null, high: null },
    tier: 1,
    readingsUsed: 10,
    readingsExcluded: 0,
    from: null,
    to: null,
    state: null,
    occupants: null,
    interval: { kind: 'monte-carlo', confidence: 0.95 },
    meter: { instrumentId: null, source: '', offset_ppm: 0, offsetSd_ppm: 25, gain: 1, gainSd: 0.015, noiseSd_ppm: 10 },
    outdoor: { value_ppm: 430, sd_ppm: 5, sameMeterAsRoom: true, readings: 2, source: '' },
    details: {},
    warnings: [],
  };
}

const shut: RoomState = { open: new Map(), fansRunning: new Set(), doorsOpen: false, recordedOneByOne: true, assumptions: [] };
const PREDICTED = { low: 0.004, central: 0.008, high: 0.012 };

function inputs(over: Partial<ReconcileInputs>): ReconcileInputs {
  return {
    measured: measured(0.03, 0.027, 0.033),
    state: shut,
    predicted: PREDICTED,
    predictedUnder: 'test case',
    fanCounted: false,
    anythingOpen: false,
    leakageAssumed: true,
    ...over,
  };
}

describe('reconcile', () => {
  it('agrees when the measured interval overlaps the predicted range, and never averages them', () => {
    const r = reconcile(inputs({ measured: measured(0.011, 0.01, 0.013) }));
    expect(r.outcome).toBe('agree');
    expect(r.reason).toBeNull();
    expect(r.measured_m3s).toEqual({ value: 0.011, low: 0.01, high: 0.013 });
  });

  it('door open to a corridor: measured above, doors recorded open', () => {
    const r = reconcile(inputs({ state: { ...shut, doorsOpen: true } }));
    expect([r.outcome, r.reason]).toEqual(['measured-above', 'door-open-to-corridor']);
  });

  it('unrecorded opening: measured above, doors shut, something recorded open', () => {
    const r = reconcile(inputs({ anythingOpen: true }));
    expect([r.outcome, r.reason]).toEqual(['measured-above', 'unrecorded-opening']);
  });

  it('leakier fabric than assumed: measured above, everything shut, leakage assumed', () => {
    const r = reconcile(inputs({}));
    expect([r.outcome, r.reason]).toEqual(['measured-above', 'leakier-fabric-than-assumed']);
    // With a pressure test the fabric is known, so the excess points to an opening instead.
    expect(reconcile(inputs({ leakageAssumed: false })).reason).toBe('unrecorded-opening');
  });

  it('fan off or weak: measured below a prediction that counts a running fan', () => {
    const r = reconcile(inputs({ measured: measured(0.002, 0.0015, 0.0025), fanCounted: true }));
    expect([r.outcome, r.reason]).toEqual(['measured-below', 'fan-off-or-weak']);
  });

  it('openings pass less than predicted: measured below with no fan', () => {
    const r = reconcile(inputs({ measured: measured(0.002, 0.0015, 0.0025) }));
    expect([r.outcome, r.reason]).toEqual(['measured-below', 'openings-pass-less-than-predicted']);
  });

  it('a logger period without a recorded state is not compared', () => {
    const r = reconcile(inputs({ state: null, predicted: null }));
    expect([r.outcome, r.reason]).toEqual(['not-compared', 'state-not-recorded']);
  });

  it('finds the demo Classroom B1, shut up with nothing open, leakier than its assumed leakage', () => {
    const doc = demoFile().surveys[0]! as SurveyDocument;
    const b1 = analyseSurvey(doc, { draws: 100 }).rooms.find((r) => r.name === 'Classroom B1')!;
    const decay = b1.reconciliation.find((r) => r.method === 'decay-log-linear')!;
    expect(decay.outcome).toBe('measured-above');
    expect(decay.reason).toBe('leakier-fabric-than-assumed');
    expect(decay.predictedUnder).toMatch(/day of the visit/);
    // The measurement stays the headline: a prediction never outranks it.
    expect(b1.headline.supply_m3s.basis).toBe('measured');
  });
});
