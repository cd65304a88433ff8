/**
 * Tests of src/app/ten-more-minutes-advice.ts: the guided test never says "you can stop" on a fit
 * that warns it is too short or too thin, or whose interval reaches no air at all. The figures are
 * those seen on the test screen during a walk (three readings saved within a minute).
 */
import { describe, expect, it } from 'vitest';
import { tenMoreMinutesAdvice } from '../../src/app/ten-more-minutes-advice.ts';

const cutShort = { value: 1.9815, low: -2.6655, high: 8.332 };

describe('ten more minutes advice', () => {
  it('says keep going on a decay that warns it is too short, however little the projection narrows', () => {
    expect(tenMoreMinutesAdvice(cutShort, cutShort, [{ code: 'short-decay' }, { code: 'too-few-readings' }])).toBe('keep-going');
    expect(tenMoreMinutesAdvice({ value: 0.03, low: 0.02, high: 0.04 }, { value: 0.03, low: 0.02, high: 0.04 }, [{ code: 'too-few-readings' }])).toBe('keep-going');
  });

  it('says keep going while the interval reaches zero or is unknown, even with no warning', () => {
    expect(tenMoreMinutesAdvice(cutShort, cutShort, [])).toBe('keep-going');
    expect(tenMoreMinutesAdvice({ value: 0.03, low: null, high: null }, { value: 0.03, low: 0.02, high: 0.04 }, [])).toBe('keep-going');
  });

  it('weighs the projection only for a fit that could be stopped on', () => {
    const now = { value: 0.03, low: 0.02, high: 0.04 };
    expect(tenMoreMinutesAdvice(now, { value: 0.03, low: 0.025, high: 0.035 }, [{ code: 'small-excess' }])).toBe('worth-waiting');
    expect(tenMoreMinutesAdvice(now, { value: 0.03, low: 0.021, high: 0.039 }, [])).toBe('little-to-gain');
  });
});
