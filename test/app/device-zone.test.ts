import { describe, it, expect, afterEach } from 'vitest';
import { deviceZone } from '../../src/app/logger-import.svelte.ts';

const host = globalThis as { Temporal?: unknown };
const before = host.Temporal;

describe('deviceZone', () => {
  afterEach(() => {
    host.Temporal = before;
  });

  it('takes Temporal’s zone where the platform has it', () => {
    host.Temporal = { Now: { timeZoneId: () => 'Pacific/Auckland' } };
    expect(deviceZone()).toBe('Pacific/Auckland');
  });

  it('asks Intl where it has none', () => {
    host.Temporal = undefined;
    expect(deviceZone()).toBe(Intl.DateTimeFormat().resolvedOptions().timeZone);
  });
});
