import { describe, it, expect } from 'vitest';
import { formatBytes } from '../../src/app/format-bytes.ts';

describe('formatBytes', () => {
  it('uses powers of 1000 as phones report storage', () => {
    expect(formatBytes(512)).toBe('512 bytes');
    expect(formatBytes(1536)).toBe('1.5 kB');
    expect(formatBytes(52_428_800)).toBe('52 MB');
    expect(formatBytes(11_234_000_000)).toBe('11 GB');
    expect(formatBytes(-1)).toBe('unknown');
  });
});
